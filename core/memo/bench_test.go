package memo

import (
	"fmt"
	"io"
	"testing"
)

var benchRows = []int{12, 120, 1200}

func BenchmarkMarkdown(b *testing.B) {
	for _, n := range benchRows {
		m, _ := demoMemo(n)
		b.Run(fmt.Sprintf("rows=%d", n), func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				if _, err := Markdown(m); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}

func BenchmarkHTML(b *testing.B) {
	for _, n := range benchRows {
		m, _ := demoMemo(n)
		b.Run(fmt.Sprintf("rows=%d", n), func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				if _, err := HTML(m); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}

func BenchmarkZip(b *testing.B) {
	for _, n := range benchRows {
		m, sheet := demoMemo(n)
		b.Run(fmt.Sprintf("rows=%d", n), func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				if err := Zip(io.Discard, m, sheet); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}

func BenchmarkEscapeCell(b *testing.B) {
	for _, n := range []int{8, 80, 800} {
		cell := ""
		for len(cell) < n {
			cell += "a|b*c "
		}
		b.Run(fmt.Sprintf("len=%d", n), func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				_ = escapeCell(cell)
			}
		})
	}
}
