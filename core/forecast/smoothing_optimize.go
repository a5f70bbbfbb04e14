package forecast

import "math"

// This file estimates the smoothing constants left open by minimising the
// in-sample SSE of one-step errors inside their bounds.
//
// Bounds: alpha, beta and gamma in [0, 1]; phi in [0.8, 0.995], the region
// of the reference fits (statsmodels' own phi region; damping weaker than
// 0.8 fades the trend within a few periods, stronger than 0.995 is hardly
// damped at all). The projected quasi-Newton loop of boxmin.go runs with
// the exact gradient of smoothing_gradient.go from the best point of a
// small grid (the same idea as the brute-force start of the reference
// fits) and from the second best; the lowest SSE evaluated wins.
// Everything is deterministic.

// constBounds returns the search interval of constant k.
func constBounds(k int) (lo, hi float64) {
	if k == iPhi {
		return 0.8, 0.995
	}
	return 0, 1
}

// constGrid returns the starting grid of constant k.
func constGrid(k int) []float64 {
	if k == iPhi {
		return []float64{0.85, 0.94, 0.98}
	}
	return []float64{0.02, 0.12, 0.35, 0.65, 0.92}
}

// esProblem is one fit of open smoothing constants.
type esProblem struct {
	form  esForm
	y     []float64
	init  esStates
	start [nConst]float64 // fixed values, and the defaults for open ones
	free  []int           // indices of the constants to estimate
}

// esSolution is the outcome of [esProblem.solve].
type esSolution struct {
	p         [nConst]float64
	sse       float64
	converged bool
	evals     int // evaluations of the SSE (with or without gradient)
}

// solve estimates the free constants.
func (pr *esProblem) solve() esSolution {
	w := newESWork(pr.form.m)
	sol := esSolution{p: pr.start, converged: true}
	sol.sse = pr.form.sseGrad(pr.y, sol.p, pr.init, w, nil)
	sol.evals++
	if len(pr.free) == 0 {
		return sol
	}
	starts := pr.gridStarts(w, &sol)
	if sol.sse == 0 || math.IsInf(sol.sse, 1) {
		// A perfect fit (a constant series, say) needs no search; an
		// infinite SSE everywhere means the data do not suit the form.
		sol.converged = sol.sse == 0
		return sol
	}
	scale := sol.sse
	sol.converged = false
	for _, st := range starts {
		pr.local(st, scale, w, &sol)
	}
	return sol
}

// gridStarts evaluates the grid, keeps the best point in sol and returns
// the best two grid points.
func (pr *esProblem) gridStarts(w *esWork, sol *esSolution) [][nConst]float64 {
	type cand struct {
		p   [nConst]float64
		sse float64
	}
	best := []cand{{sse: math.Inf(1)}, {sse: math.Inf(1)}}
	var walk func(i int, p [nConst]float64)
	walk = func(i int, p [nConst]float64) {
		if i == len(pr.free) {
			// Only the best two points matter: stop summing past the second.
			sse := pr.form.sse(pr.y, p, pr.init, w, best[1].sse)
			sol.evals++
			switch {
			case sse < best[0].sse:
				best[1], best[0] = best[0], cand{p, sse}
			case sse < best[1].sse:
				best[1] = cand{p, sse}
			}
			return
		}
		for _, v := range constGrid(pr.free[i]) {
			p[pr.free[i]] = v
			walk(i+1, p)
		}
	}
	walk(0, pr.start)
	sol.p, sol.sse = best[0].p, best[0].sse
	out := [][nConst]float64{best[0].p}
	if !math.IsInf(best[1].sse, 1) {
		out = append(out, best[1].p)
	}
	return out
}

// local runs the bounded minimiser from start and keeps the lowest SSE
// met in sol.
func (pr *esProblem) local(start [nConst]float64, scale float64, w *esWork, sol *esSolution) {
	k := len(pr.free)
	lo, hi, x0 := make([]float64, k), make([]float64, k), make([]float64, k)
	for i, c := range pr.free {
		lo[i], hi[i] = constBounds(c)
		x0[i] = start[c]
	}
	fg := func(x, grad []float64) float64 {
		p := pr.start
		for i, c := range pr.free {
			p[c] = x[i]
		}
		var g [nConst]float64
		sse := pr.form.sseGrad(pr.y, p, pr.init, w, &g)
		sol.evals++
		if sse < sol.sse {
			sol.p, sol.sse = p, sse
		}
		for i, c := range pr.free {
			grad[i] = g[c] / scale
		}
		if math.IsNaN(sse) {
			return math.Inf(1)
		}
		return sse / scale
	}
	res := boxMin{lo: lo, hi: hi, tol: 1e-7, maxEvals: 300}.run(fg, x0)
	if res.converged {
		sol.converged = true
	}
}
