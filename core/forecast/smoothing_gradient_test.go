package forecast

import (
	"math"
	"math/rand/v2"
	"testing"
)

// TestSSEGradient compares the adjoint gradient with central finite
// differences and with the forward-mode gradient on a seeded seasonal
// series for every model form.
func TestSSEGradient(t *testing.T) {
	rng := rand.New(rand.NewPCG(3, 5))
	y := seededSeasonal(rng, 48, 4)
	forms := []struct {
		name string
		f    esForm
	}{
		{"ses", esForm{m: 1}},
		{"holt", esForm{trend: true, m: 1}},
		{"additive", esForm{trend: true, season: Additive, m: 4}},
		{"multiplicative", esForm{trend: true, season: Multiplicative, m: 4}},
	}
	p := [nConst]float64{0.4, 0.2, 0.3, 0.9}
	for _, tt := range forms {
		t.Run(tt.name, func(t *testing.T) {
			init := esStates{level: y[0], trend: 0.5, season: []float64{0, 0, 0, 0}}
			if tt.f.season == Multiplicative {
				init.season = []float64{1.05, 0.95, 1.1, 0.9}
			}
			init.season = init.season[:tt.f.m]
			if tt.f.m == 1 {
				init.season = []float64{0}
				if tt.f.season == Multiplicative {
					init.season = []float64{1}
				}
			}
			w := newESWork(tt.f.m)
			var g [nConst]float64
			tt.f.sseGrad(y, p, init, w, &g)
			var fwd [nConst]float64
			tt.f.sseGradForward(y, p, init, newForwardConstWork(tt.f.m), &fwd)
			for k := range nConst {
				if !within(g[k], fwd[k], 1e-8, 1e-8) {
					t.Errorf("d/d%s = %g, forward mode %g", constName(k), g[k], fwd[k])
				}
				const step = 1e-6
				up, down := p, p
				up[k] += step
				down[k] -= step
				num := (tt.f.sseGrad(y, up, init, w, nil) - tt.f.sseGrad(y, down, init, w, nil)) / (2 * step)
				if math.Abs(num-g[k]) > 1e-4*(1+math.Abs(num)) {
					t.Errorf("d/d%s = %g, finite difference %g", constName(k), g[k], num)
				}
			}
			sse := tt.f.sseGrad(y, p, init, w, nil)
			if run := tt.f.run(y, p, init).sse; !within(sse, run, 1e-9, 1e-12) {
				t.Errorf("sseGrad = %g, run = %g", sse, run)
			}
		})
	}
}

// seededSeasonal returns a positive trending seasonal series from rng.
func seededSeasonal(rng *rand.Rand, n, m int) []float64 {
	y := make([]float64, n)
	for t := range y {
		season := 10 * math.Sin(2*math.Pi*float64(t%max(m, 1))/float64(max(m, 1)))
		y[t] = 100 + 0.5*float64(t) + season + 3*rng.NormFloat64()
	}
	return y
}

// TestSSEGradientFull compares the gradient over constants and initial
// states with central finite differences.
func TestSSEGradientFull(t *testing.T) {
	rng := rand.New(rand.NewPCG(7, 11))
	y := seededSeasonal(rng, 40, 4)
	p := [nConst]float64{0.4, 0.2, 0.3, 0.9}
	for _, f := range []esForm{{m: 1}, {trend: true, m: 1}, {trend: true, season: Additive, m: 4}, {trend: true, season: Multiplicative, m: 4}} {
		t.Run(f.season.String()+map[bool]string{true: " trend", false: ""}[f.trend], func(t *testing.T) {
			init, _ := f.heuristicStates(y)
			w := newFullWork(f)
			g := make([]float64, f.nVars())
			sse := f.sseGradFull(y, p, init, w, g)
			if plain := f.sseGrad(y, p, init, newESWork(f.m), nil); !within(sse, plain, 1e-9, 1e-12) {
				t.Errorf("SSE %g, plain pass %g", sse, plain)
			}
			scratch := make([]float64, f.nVars())
			eval := func(k int, step float64) float64 {
				q, st := p, esStates{level: init.level, trend: init.trend, season: clone(init.season)}
				switch {
				case k < nConst:
					q[k] += step
				case k == nConst:
					st.level += step
				case k == nConst+1:
					st.trend += step
				default:
					st.season[k-nConst-2] += step
				}
				return f.sseGradFull(y, q, st, w, scratch)
			}
			for k := range f.nVars() {
				if k >= nConst+2 && f.season == NoSeason {
					continue
				}
				h := 1e-6 * max(1, abs(init.level)*float64(min(k/nConst, 1)))
				num := (eval(k, h) - eval(k, -h)) / (2 * h)
				if abs(num-g[k]) > 1e-4*(1+abs(num)) {
					t.Errorf("variable %d: gradient %g, finite difference %g", k, g[k], num)
				}
			}
		})
	}
}

func abs(x float64) float64 { return math.Abs(x) }

// TestSSELimit checks that the grid's early stop returns the whole SSE
// under a limit above it and a partial sum above the limit otherwise.
func TestSSELimit(t *testing.T) {
	y := seededSeasonal(rand.New(rand.NewPCG(8, 9)), 48, 12)
	f := esForm{trend: true, season: Additive, m: 12}
	init, _ := f.heuristicStates(y)
	p := [nConst]float64{0.3, 0.1, 0.2, 1}
	w := newESWork(12)
	full := f.sse(y, p, init, w, math.Inf(1))
	for _, tc := range []struct {
		name    string
		limit   float64
		wantAll bool
	}{
		{"limit above", full * 2, true},
		{"limit equal", full, true},
		{"limit a tenth", full / 10, false},
		{"limit zero", 0, false},
	} {
		t.Run(tc.name, func(t *testing.T) {
			got := f.sse(y, p, init, w, tc.limit)
			if tc.wantAll && !within(got, full, 0, 1e-12) {
				t.Errorf("sse with limit %g = %g; want the whole SSE %g", tc.limit, got, full)
			}
			if !tc.wantAll && !(got > tc.limit && got < full) {
				t.Errorf("sse with limit %g = %g; want a partial sum above the limit and below %g", tc.limit, got, full)
			}
		})
	}
}
