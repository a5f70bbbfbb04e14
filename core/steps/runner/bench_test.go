package runner

import (
	"context"
	"fmt"
	"strings"
	"testing"

	"quillcast/core/session"
)

// BenchmarkRun measures a full run of the demo session, a re-run after
// editing its last step (the case that must feel instant), and a short
// session on monthly series of growing length.
func BenchmarkRun(b *testing.B) {
	doc, data := sessionFile(b, "demo.md"), demoData(b)
	b.Run("demo/full", func(b *testing.B) {
		b.ReportAllocs()
		for b.Loop() {
			New().Run(context.Background(), doc, data)
		}
	})
	b.Run("demo/rerun-after-last-step-edit", func(b *testing.B) {
		text := doc.String()
		edits := []*session.Document{
			session.Parse(strings.Replace(text, "pick by=mase", "pick by=rmse", 1)),
			session.Parse(text),
		}
		r := New()
		r.Run(context.Background(), doc, data)
		b.ReportAllocs()
		i := 0
		for b.Loop() {
			r.Run(context.Background(), edits[i%2], data)
			i++
		}
	})
	body := "load orders.csv\nsplit last=12\nforecast moving-average width=12 as=ma\nforecast seasonal-naive\nforecast ses\nevaluate\nsweep moving-average width=2..24"
	for _, n := range []int{48, 240, 1200} {
		d := Data{Files: map[string][]byte{"orders.csv": synthetic(n, 500, 2, 60)}}
		sd := stepsDoc(body)
		b.Run(fmt.Sprintf("session/%d-periods", n), func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				New().Run(context.Background(), sd, d)
			}
		})
	}
}
