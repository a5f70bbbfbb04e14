package backtest

import (
	"context"
	"fmt"
	"testing"
)

var runSizes = []int{48, 144, 480}

// BenchmarkRun backtests simple exponential smoothing on 12 one-step to
// six-step origins.
func BenchmarkRun(b *testing.B) {
	for _, n := range runSizes {
		y := randomWalk(n, 11)
		m := method(b, "ses")
		b.Run(fmt.Sprintf("n=%d", n), func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				if _, err := Run(context.Background(), y, 0, m, Origins{Last: 12, Horizon: 6}); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}

// BenchmarkAutoFit ranks the default candidates and fits the choice.
func BenchmarkAutoFit(b *testing.B) {
	for _, n := range runSizes {
		y := trendSeries(n)
		b.Run(fmt.Sprintf("n=%d", n), func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				if _, err := (Auto{Horizon: 8}).Fit(y, 0); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}

// BenchmarkEmpiricalInterval builds intervals from 1,000 errors at each of
// 12 horizons.
func BenchmarkEmpiricalInterval(b *testing.B) {
	errs := make([][]float64, 12)
	for h := range errs {
		errs[h] = randomWalk(1000, uint64(h))
	}
	e := NewEmpirical(errs)
	point := make([]float64, 12)
	b.ReportAllocs()
	for b.Loop() {
		if _, _, err := e.Interval(point, 0.95); err != nil {
			b.Fatal(err)
		}
	}
}
