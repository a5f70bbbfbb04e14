package bakeoff

import (
	"bytes"
	"fmt"
	"testing"
)

// BenchmarkRead reads files of 10, 100 and 1,000 series of 48 periods.
func BenchmarkRead(b *testing.B) {
	for _, n := range []int{10, 100, 1000} {
		var buf bytes.Buffer
		buf.WriteString("series,category,period,value,role\n")
		for s := range n {
			for t := range 48 {
				role := "fit"
				if t >= 40 {
					role = "test"
				}
				fmt.Fprintf(&buf, "S%d,MICRO,%d,%d.25,%s\n", s, t+1, 1000+s+t*3, role)
			}
		}
		input := buf.Bytes()
		b.Run(fmt.Sprintf("series=%d", n), func(b *testing.B) {
			b.ReportAllocs()
			b.SetBytes(int64(len(input)))
			for b.Loop() {
				if _, err := Read(bytes.NewReader(input)); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}
