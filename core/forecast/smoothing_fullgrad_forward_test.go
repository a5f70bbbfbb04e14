package forecast

import (
	"math"
	"math/rand/v2"
	"testing"
)

// This file keeps the forward-mode derivation of the full gradient (the
// derivative of every state carried forward with the states, as in
// smoothing_gradient.go), which the adjoint pass of smoothing_fullgrad.go
// replaced in the fits; TestSSEGradFull checks one against the other.

// forwardWork is scratch space for [esForm.sseGradFullForward].
type forwardWork struct {
	s                  []float64   // seasonal states
	ds                 [][]float64 // their derivatives, m by nVars
	dl, db, da, dp, dn []float64   // level, trend, base, prediction, new level derivatives
	dbn, dsn           []float64   // new trend and new seasonal state derivatives
}

func newForwardWork(f esForm) *forwardWork {
	k := f.nVars()
	w := &forwardWork{s: make([]float64, f.m), ds: make([][]float64, f.m)}
	for j := range w.ds {
		w.ds[j] = make([]float64, k)
	}
	w.dl, w.db, w.da, w.dp = make([]float64, k), make([]float64, k), make([]float64, k), make([]float64, k)
	w.dn, w.dbn, w.dsn = make([]float64, k), make([]float64, k), make([]float64, k)
	return w
}

// sseGradFullForward returns the SSE of y under the constants p and the initial
// states init and writes its gradient over the full layout into grad.
func (f esForm) sseGradFullForward(y []float64, p [nConst]float64, init esStates, w *forwardWork, grad []float64) float64 {
	alpha, beta, gamma, phi := p[iAlpha], p[iBeta], p[iGamma], p[iPhi]
	l, b := init.level, init.trend
	if !f.trend {
		b, phi = 0, 1
	}
	copy(w.s, init.season)
	k := f.nVars()
	clear(w.dl)
	clear(w.db)
	clear(grad)
	w.dl[nConst] = 1
	if f.trend {
		w.db[nConst+1] = 1
	}
	for j := range w.ds {
		clear(w.ds[j])
		if f.season != NoSeason {
			w.ds[j][nConst+2+j] = 1
		}
	}
	dl, db, da, dp, dn, dbn, dsn := w.dl, w.db, w.da, w.dp, w.dn, w.dbn, w.dsn
	sse := 0.0
	for t, v := range y {
		a := l + phi*b
		for i := range k {
			da[i] = dl[i] + phi*db[i]
		}
		if f.trend {
			da[iPhi] += b
		}
		j := t % f.m
		var pred, lNew float64
		switch f.season {
		case NoSeason:
			pred = a
			lNew = alpha*v + (1-alpha)*a
			for i := range k {
				dp[i] = da[i]
				dn[i] = (1 - alpha) * da[i]
			}
			dn[iAlpha] += v - a
		case Additive:
			s, ds := w.s[j], w.ds[j]
			pred = a + s
			lNew = alpha*(v-s) + (1-alpha)*a
			sNew := gamma*(v-a) + (1-gamma)*s
			for i := range k {
				dp[i] = da[i] + ds[i]
				dn[i] = -alpha*ds[i] + (1-alpha)*da[i]
				dsn[i] = -gamma*da[i] + (1-gamma)*ds[i]
			}
			dn[iAlpha] += v - s - a
			dsn[iGamma] += v - a - s
			w.s[j] = sNew
			copy(ds, dsn)
		case Multiplicative:
			s, ds := w.s[j], w.ds[j]
			pred = a * s
			lNew = alpha*(v/s) + (1-alpha)*a
			sNew := gamma*(v/a) + (1-gamma)*s
			cl := -alpha * v / (s * s)
			cs := -gamma * v / (a * a)
			for i := range k {
				dp[i] = da[i]*s + a*ds[i]
				dn[i] = cl*ds[i] + (1-alpha)*da[i]
				dsn[i] = cs*da[i] + (1-gamma)*ds[i]
			}
			dn[iAlpha] += v/s - a
			dsn[iGamma] += v/a - s
			w.s[j] = sNew
			copy(ds, dsn)
		}
		if f.trend {
			bNew := beta*(lNew-l) + (1-beta)*phi*b
			for i := range k {
				dbn[i] = beta*(dn[i]-dl[i]) + (1-beta)*phi*db[i]
			}
			dbn[iBeta] += lNew - l - phi*b
			dbn[iPhi] += (1 - beta) * b
			b = bNew
			copy(db, dbn)
		}
		l = lNew
		copy(dl, dn)
		e := v - pred
		sse += e * e
		for i := range k {
			grad[i] -= 2 * e * dp[i]
		}
	}
	return sse
}

// TestSSEGradFull compares the adjoint gradient over the full layout with
// the forward-mode one and with central finite differences (hand rule:
// step 1e-6 relative to each variable's size) for every model form, damped.
func TestSSEGradFull(t *testing.T) {
	rng := rand.New(rand.NewPCG(11, 13))
	y := seededSeasonal(rng, 40, 4)
	p := [nConst]float64{0.35, 0.15, 0.25, 0.92}
	for _, tt := range []struct {
		name string
		f    esForm
	}{
		{"ses", esForm{m: 1}},
		{"holt", esForm{trend: true, m: 1}},
		{"additive", esForm{trend: true, season: Additive, m: 4}},
		{"additive, no trend", esForm{season: Additive, m: 4}},
		{"multiplicative", esForm{trend: true, season: Multiplicative, m: 4}},
	} {
		t.Run(tt.name, func(t *testing.T) {
			init := esStates{level: y[0], trend: 0.7, season: []float64{3, -2, 1, -2}[:tt.f.m]}
			if tt.f.season == Multiplicative {
				init.season = []float64{1.05, 0.95, 1.1, 0.9}
			}
			if tt.f.season == NoSeason {
				init.season = []float64{0}
			}
			k := tt.f.nVars()
			adj, fwd := make([]float64, k), make([]float64, k)
			sse := tt.f.sseGradFull(y, p, init, newFullWork(tt.f), adj)
			sseF := tt.f.sseGradFullForward(y, p, init, newForwardWork(tt.f), fwd)
			if !within(sse, sseF, 0, 1e-12) {
				t.Errorf("SSE %g, forward pass %g", sse, sseF)
			}
			w := newFullWork(tt.f)
			scratch := make([]float64, k)
			at := func(i int, d float64) float64 {
				q, st := p, esStates{level: init.level, trend: init.trend, season: clone(init.season)}
				switch {
				case i < nConst:
					q[i] += d
				case i == nConst:
					st.level += d
				case i == nConst+1:
					st.trend += d
				default:
					st.season[i-nConst-2] += d
				}
				return tt.f.sseGradFull(y, q, st, w, scratch)
			}
			for i := range k {
				if i >= nConst+2+len(init.season) {
					break
				}
				if !within(adj[i], fwd[i], 1e-8, 1e-8) {
					t.Errorf("variable %d: adjoint %g, forward %g", i, adj[i], fwd[i])
				}
				h := 1e-6 * max(1, math.Abs(init.level))
				if i < nConst {
					h = 1e-6
				}
				num := (at(i, h) - at(i, -h)) / (2 * h)
				if math.Abs(num-adj[i]) > 1e-4*(1+math.Abs(num)) {
					t.Errorf("variable %d: adjoint %g, finite difference %g", i, adj[i], num)
				}
			}
		})
	}
}
