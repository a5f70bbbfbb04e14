package series

import (
	"bytes"
	"fmt"
	"math/rand/v2"
	"testing"
)

// wideDaily returns a file of n daily rows with a date and two value
// columns, made from a fixed seed.
func wideDaily(n int) []byte {
	rng := rand.New(rand.NewPCG(7, 11))
	var b bytes.Buffer
	b.Grow(n * 32)
	b.WriteString("date,units,revenue\n")
	start := daysFromCivil(1000, 1, 1)
	for i := range n {
		p := Period{Day, start + i}
		b.Write(p.AppendText(nil))
		fmt.Fprintf(&b, ",%d,%.2f\n", 100+rng.IntN(900), 1000*rng.Float64())
	}
	return b.Bytes()
}

// longMonthly returns a long-layout file of n rows: series of 1,000
// months each, made from a fixed seed.
func longMonthly(n int) []byte {
	rng := rand.New(rand.NewPCG(3, 5))
	var b bytes.Buffer
	b.Grow(n * 24)
	b.WriteString("series,month,value\n")
	for i := range n {
		k, t := i/1000, i%1000
		fmt.Fprintf(&b, "S%d,%s,%.1f\n", k, Period{Month, 12*1950 + t}, 50+100*rng.Float64())
	}
	return b.Bytes()
}

func BenchmarkRead(b *testing.B) {
	for _, shape := range []struct {
		name string
		make func(int) []byte
	}{{"wide-daily", wideDaily}, {"long-monthly", longMonthly}} {
		for _, n := range []int{1_000, 10_000, 100_000, 1_000_000} {
			data := shape.make(n)
			b.Run(fmt.Sprintf("%s/rows=%d", shape.name, n), func(b *testing.B) {
				b.ReportAllocs()
				b.SetBytes(int64(len(data)))
				for b.Loop() {
					ds, err := Read(data, "bench.csv", ReadOptions{})
					if err != nil {
						b.Fatal(err)
					}
					if ds.Rows != n {
						b.Fatalf("read %d rows, want %d", ds.Rows, n)
					}
				}
			})
		}
	}
}

func BenchmarkParsePeriod(b *testing.B) {
	for _, label := range []string{"2024-03-01", "2024-W05", "2024-03", "2024-Q1"} {
		b.Run(label, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				if _, err := ParsePeriod(label); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}
