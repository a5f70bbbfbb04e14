package forecast

import (
	"fmt"
	"math/rand/v2"
	"testing"
)

// benchSeries returns a positive monthly series of n points with trend,
// season and noise, from a fixed seed.
func benchSeries(n int) []float64 {
	return seededSeasonal(rand.New(rand.NewPCG(2026, uint64(n))), n, 12)
}

// BenchmarkFit fits every catalogue method by series length.
func BenchmarkFit(b *testing.B) {
	for _, sp := range Catalog() {
		m, err := sp.New(nil)
		if err != nil {
			b.Fatal(err)
		}
		for _, n := range []int{48, 144, 1000} {
			y := benchSeries(n)
			b.Run(fmt.Sprintf("%s/n=%d", sp.Name, n), func(b *testing.B) {
				b.ReportAllocs()
				for b.Loop() {
					if _, err := m.Fit(y, 12); err != nil {
						b.Fatal(err)
					}
				}
			})
		}
	}
}

// BenchmarkDifferenced fits ses to lag-1 and lag-12 differences.
func BenchmarkDifferenced(b *testing.B) {
	for _, lag := range []int{1, 12} {
		m := Differenced{Lag: lag, Inner: Smoothing{}}
		for _, n := range []int{48, 144, 1000} {
			y := benchSeries(n)
			b.Run(fmt.Sprintf("lag=%d/n=%d", lag, n), func(b *testing.B) {
				b.ReportAllocs()
				for b.Loop() {
					if _, err := m.Fit(y, 12); err != nil {
						b.Fatal(err)
					}
				}
			})
		}
	}
}

// BenchmarkHoltWinters144 fits additive and multiplicative Holt-Winters,
// all three constants estimated (and the 14 initial states too with
// start=estimated), to 144 monthly points and reports the SSE evaluations
// per fit.
func BenchmarkHoltWinters144(b *testing.B) {
	y := benchSeries(144)
	for _, c := range []struct {
		name string
		m    Smoothing
	}{
		{"additive", Smoothing{Trend: true, Season: Additive}},
		{"multiplicative", Smoothing{Trend: true, Season: Multiplicative}},
		{"additive/start=estimated", Smoothing{Trend: true, Season: Additive, EstimateStates: true}},
	} {
		m := c.m
		b.Run(c.name, func(b *testing.B) {
			b.ReportAllocs()
			evals := 0
			for b.Loop() {
				f, err := m.Fit(y, 12)
				if err != nil {
					b.Fatal(err)
				}
				evals = f.Evaluations
			}
			b.ReportMetric(float64(evals), "evals/op")
		})
	}
}

// BenchmarkSSEGradient measures one evaluation of the SSE with and
// without its gradient on 144 monthly points (additive Holt-Winters).
func BenchmarkSSEGradient(b *testing.B) {
	y := benchSeries(144)
	form := esForm{trend: true, season: Additive, m: 12}
	init, _ := form.heuristicStates(y)
	w := newESWork(12)
	p := [nConst]float64{0.3, 0.05, 0.2, 1}
	b.Run("value", func(b *testing.B) {
		b.ReportAllocs()
		for b.Loop() {
			form.sseGrad(y, p, init, w, nil)
		}
	})
	b.Run("gradient", func(b *testing.B) {
		b.ReportAllocs()
		var g [nConst]float64
		for b.Loop() {
			form.sseGrad(y, p, init, w, &g)
		}
	})
	b.Run("gradient-forward", func(b *testing.B) {
		b.ReportAllocs()
		var g [nConst]float64
		fw := newForwardConstWork(12)
		for b.Loop() {
			form.sseGradForward(y, p, init, fw, &g)
		}
	})
}

// BenchmarkSSEGradFull measures one evaluation of the SSE with its
// gradient over the constants and the 14 initial states, on 144 monthly
// points (additive Holt-Winters), by the adjoint pass the fits use and by
// the forward-mode pass it replaced.
func BenchmarkSSEGradFull(b *testing.B) {
	y := benchSeries(144)
	form := esForm{trend: true, season: Additive, m: 12}
	init, _ := form.heuristicStates(y)
	p := [nConst]float64{0.3, 0.05, 0.2, 1}
	g := make([]float64, form.nVars())
	b.Run("adjoint", func(b *testing.B) {
		w := newFullWork(form)
		b.ReportAllocs()
		for b.Loop() {
			form.sseGradFull(y, p, init, w, g)
		}
	})
	b.Run("forward", func(b *testing.B) {
		w := newForwardWork(form)
		b.ReportAllocs()
		for b.Loop() {
			form.sseGradFullForward(y, p, init, w, g)
		}
	})
}
