package forecast

import (
	"fmt"
	"math"
	"math/rand/v2"
	"testing"
)

// simulateMultSeason draws paths of the multiplicative-error,
// multiplicative-season model of smoothing_interval_mult.go from the
// final states last (after n periods) with normal errors of standard
// deviation sigma, and returns the sample variance of y at horizons 1..h.
func simulateMultSeason(form esForm, p [nConst]float64, last esStates, n, h int, sigma float64, paths int, rng *rand.Rand) []float64 {
	alpha, gamma, phi := p[iAlpha], p[iGamma], p[iPhi]
	trendGain := alpha * p[iBeta]
	if !form.trend {
		trendGain, phi = 0, 1
	}
	sum, sum2 := make([]float64, h), make([]float64, h)
	s := make([]float64, form.m)
	for range paths {
		l, b := last.level, last.trend
		if !form.trend {
			b = 0
		}
		copy(s, last.season)
		for j := range h {
			a := l + phi*b
			k := (n + j) % form.m
			e := sigma * rng.NormFloat64()
			y := a * s[k] * (1 + e)
			l = a * (1 + alpha*e)
			b = phi*b + trendGain*a*e
			s[k] *= 1 + gamma*e
			sum[j] += y
			sum2[j] += y * y
		}
	}
	v := make([]float64, h)
	for j := range v {
		mean := sum[j] / float64(paths)
		v[j] = (sum2[j] - float64(paths)*mean*mean) / float64(paths-1)
	}
	return v
}

// TestMultSeasonVariance compares the forecast standard error of the
// multiplicative season with a seeded simulation of the same state-space
// model (40,000 paths, so the simulated standard error is itself within
// about 0.4%); they must agree within 3% at every horizon, over two to
// three seasons, for relative errors of 3% and 10%. Without the
// covariance term of the derivation the check fails beyond one season.
func TestMultSeasonVariance(t *testing.T) {
	season4 := []float64{0.8, 1.1, 1.3, 0.8}
	season12 := []float64{0.7, 0.75, 0.9, 1.0, 1.1, 1.2, 1.3, 1.25, 1.1, 1.0, 0.9, 0.8}
	tests := []struct {
		name   string
		form   esForm
		p      [nConst]float64
		last   esStates
		h      int
		sigma  float64
		within float64
	}{
		{"quarterly trend sigma 0.03", esForm{trend: true, season: Multiplicative, m: 4},
			[nConst]float64{0.3, 0.2, 0.3, 1}, esStates{level: 100, trend: 2, season: season4}, 12, 0.03, 0.03},
		{"quarterly trend sigma 0.10", esForm{trend: true, season: Multiplicative, m: 4},
			[nConst]float64{0.3, 0.2, 0.3, 1}, esStates{level: 100, trend: 2, season: season4}, 12, 0.10, 0.03},
		{"quarterly damped sigma 0.10", esForm{trend: true, season: Multiplicative, m: 4},
			[nConst]float64{0.5, 0.1, 0.6, 0.9}, esStates{level: 50, trend: -1, season: season4}, 12, 0.10, 0.03},
		{"monthly no trend sigma 0.05", esForm{season: Multiplicative, m: 12},
			[nConst]float64{0.4, 0, 0.2, 1}, esStates{level: 20, season: season12}, 24, 0.05, 0.03},
		{"monthly trend sigma 0.05", esForm{trend: true, season: Multiplicative, m: 12},
			[nConst]float64{0.2, 0.1, 0.4, 1}, esStates{level: 500, trend: 4, season: season12}, 24, 0.05, 0.03},
	}
	for i, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			n := 37 // any training length; it sets the position in the cycle
			got, ok := multSeasonVariance(tt.form, tt.p, tt.last, n, tt.sigma*tt.sigma)(tt.h)
			if !ok {
				t.Fatal("no variance")
			}
			rng := rand.New(rand.NewPCG(2026, uint64(i)))
			want := simulateMultSeason(tt.form, tt.p, tt.last, n, tt.h, tt.sigma, 40000, rng)
			worst := 0.0
			for j := range got {
				r := math.Sqrt(got[j])/math.Sqrt(want[j]) - 1
				worst = math.Max(worst, math.Abs(r))
				if math.Abs(r) > tt.within {
					t.Errorf("h=%d: standard error %.6g, simulated %.6g (%+.1f%%)", j+1, math.Sqrt(got[j]), math.Sqrt(want[j]), 100*r)
				}
			}
			t.Logf("largest difference from the simulation %.2f%%", 100*worst)
		})
	}
}

// TestMultSeasonVarianceFirstSeason: within the first season the
// seasonal factor is a known state, so the variance is s^2 times that of
// the non-seasonal model: for h = 1, s^2 sigma^2 mu_1^2, and for h = 2,
// s^2 [(1+sigma^2)(mu_2^2 + sigma^2 c_1^2 mu_1^2) - mu_2^2] (hand
// derivation from the recursion in smoothing_interval_mult.go).
func TestMultSeasonVarianceFirstSeason(t *testing.T) {
	form := esForm{trend: true, season: Multiplicative, m: 4}
	p := [nConst]float64{0.3, 0.5, 0.2, 0.9}
	last := esStates{level: 10, trend: 1, season: []float64{0.5, 1.5, 1.2, 0.8}}
	s2 := 0.04
	v, _ := multSeasonVariance(form, p, last, 8, s2)(2)
	mu1, mu2 := 10+0.9, 10+(0.9+0.81)
	c1 := 0.3 + 0.3*0.5*0.9
	want := []float64{
		0.5 * 0.5 * s2 * mu1 * mu1,
		1.5 * 1.5 * ((1+s2)*(mu2*mu2+s2*c1*c1*mu1*mu1) - mu2*mu2),
	}
	checkFloats(t, "variance", v, want, 1e-12, 1e-12)
}

// BenchmarkMultSeasonVariance measures the variance over h horizons
// (quadratic in h).
func BenchmarkMultSeasonVariance(b *testing.B) {
	form := esForm{trend: true, season: Multiplicative, m: 12}
	last := esStates{level: 100, trend: 1, season: []float64{1, 1.1, 0.9, 1, 1.2, 0.8, 1, 1.1, 0.9, 1, 1.05, 0.95}}
	for _, h := range []int{12, 48, 240} {
		b.Run(fmt.Sprintf("h=%d", h), func(b *testing.B) {
			b.ReportAllocs()
			v := multSeasonVariance(form, [nConst]float64{0.3, 0.1, 0.2, 1}, last, 144, 0.01)
			for b.Loop() {
				v(h)
			}
		})
	}
}
