package backtest

import (
	"fmt"
	"math/rand/v2"
	"testing"
)

// randomWalk returns n points of a seeded random walk around 1000.
func randomWalk(n int, seed uint64) []float64 {
	r := rand.New(rand.NewPCG(seed, 1))
	y := make([]float64, n)
	v := 1000.0
	for i := range y {
		v += r.NormFloat64()
		y[i] = v
	}
	return y
}

var sweepSizes = []int{10_000, 100_000, 1_000_000}

// BenchmarkMovingAverageSweep sweeps widths 1..200 with running sums.
func BenchmarkMovingAverageSweep(b *testing.B) {
	for _, n := range sweepSizes {
		y := randomWalk(n, 7)
		b.Run(fmt.Sprintf("n=%d", n), func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				if _, err := SweepMovingAverage(y, n-12, Range{1, 200}); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}

// BenchmarkMovingAverageSweepPlain is the baseline: every forecast re-adds
// its w values, O(n*w) per width.
func BenchmarkMovingAverageSweepPlain(b *testing.B) {
	for _, n := range sweepSizes {
		y := randomWalk(n, 7)
		b.Run(fmt.Sprintf("n=%d", n), func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				plainSweep(y, n-12, 200)
			}
		})
	}
}

// plainSweep is the straightforward sweep: the sum of squared one-step
// errors per width, each forecast summing its window afresh.
func plainSweep(y []float64, trainEnd, maxWidth int) []float64 {
	sse := make([]float64, maxWidth)
	for w := 1; w <= maxWidth; w++ {
		for t := w; t < trainEnd; t++ {
			var s float64
			for _, v := range y[t-w : t] {
				s += v
			}
			e := y[t] - s/float64(w)
			sse[w-1] += e * e
		}
	}
	return sse
}
