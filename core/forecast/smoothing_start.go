package forecast

import "math"

// This file estimates the initial states of exponential smoothing together
// with the open constants, when [Smoothing.EstimateStates] asks for it, by
// minimising the same in-sample SSE over both (the "estimated" start of
// R. J. Hyndman, A. B. Koehler, R. D. Snyder and S. Grose (2002), "A state
// space framework for automatic forecasting using exponential smoothing
// methods", International Journal of Forecasting 18(3), 439-454, section
// 2.4, with SSE in place of the likelihood). It starts from the constants
// fitted with the heuristic states and from the heuristic states
// themselves, so the result is never worse than the heuristic fit.
//
// The seasonal states and the level can trade off exactly (adding c to the
// level and taking c from every additive seasonal state, or scaling them
// by c and 1/c for a multiplicative season, leaves every prediction
// unchanged), which leaves the search a flat valley. The sum of the
// seasonal states is therefore held at its starting value (0 for the
// additive heuristic, m for the multiplicative one): the last state is
// the starting sum minus the others.
//
// Bounds, with r the range of the series (max - min, or the size of the
// values when constant): level0 within [min - r, max + r]; trend0 within
// [-r, r]; additive seasonal states within [-r, r]; multiplicative ones
// within [0.05, 20]. Each variable is scaled to [0, 1] for the search.

// stateBounds returns the search box of the full variable layout.
func (f esForm) stateBounds(y []float64) (lo, hi []float64) {
	k := f.nVars()
	lo, hi = make([]float64, k), make([]float64, k)
	for c := range nConst {
		lo[c], hi[c] = constBounds(c)
	}
	ymin, ymax := y[0], y[0]
	for _, v := range y {
		ymin, ymax = math.Min(ymin, v), math.Max(ymax, v)
	}
	r := ymax - ymin
	if r == 0 {
		r = math.Max(math.Abs(ymax), 1)
	}
	lo[nConst], hi[nConst] = ymin-r, ymax+r
	lo[nConst+1], hi[nConst+1] = -r, r
	for j := range f.m {
		if f.season == Multiplicative {
			lo[nConst+2+j], hi[nConst+2+j] = 0.05, 20
		} else {
			lo[nConst+2+j], hi[nConst+2+j] = -r, r
		}
	}
	return lo, hi
}

// solveStates refines sol by estimating the open constants and the states
// whose indices (in the full layout) are listed in states, from init.
// It returns the new constants and states.
func (pr *esProblem) solveStates(sol esSolution, states []int) (esSolution, esStates) {
	f := pr.form
	init := esStates{level: pr.init.level, trend: pr.init.trend, season: clone(pr.init.season)}
	if len(states) == 0 || math.IsInf(sol.sse, 1) || sol.sse == 0 {
		return sol, init
	}
	last := -1 // full-layout index of the dependent seasonal state
	if f.season != NoSeason && states[len(states)-1] == nConst+2+f.m-1 {
		last = states[len(states)-1]
		states = states[:len(states)-1]
	}
	vars := append(append([]int(nil), pr.free...), states...)
	seasonSum := 0.0
	for _, v := range init.season {
		seasonSum += v
	}
	lo, hi := f.stateBounds(pr.y)
	full := make([]float64, f.nVars())
	for c := range nConst {
		full[c] = sol.p[c]
	}
	full[nConst], full[nConst+1] = init.level, init.trend
	copy(full[nConst+2:], init.season)
	x := clone(full)
	unpack := func(u []float64) ([nConst]float64, esStates) {
		for i, k := range vars {
			x[k] = lo[k] + u[i]*(hi[k]-lo[k])
		}
		if last >= 0 {
			x[last] = seasonSum
			for k := nConst + 2; k < last; k++ {
				x[last] -= x[k]
			}
		}
		var p [nConst]float64
		copy(p[:], x[:nConst])
		return p, esStates{level: x[nConst], trend: x[nConst+1], season: x[nConst+2:]}
	}
	w := newFullWork(f)
	g := make([]float64, f.nVars())
	best, bestStates := sol, esStates{level: init.level, trend: init.trend, season: clone(init.season)}
	scale := sol.sse
	fg := func(u, grad []float64) float64 {
		p, st := unpack(u)
		sse := f.sseGradFull(pr.y, p, st, w, g)
		best.evals++
		if sse < best.sse {
			best.p, best.sse = p, sse
			bestStates.level, bestStates.trend = st.level, st.trend
			copy(bestStates.season, st.season)
		}
		for i, k := range vars {
			gk := g[k]
			if last >= 0 && k >= nConst+2 {
				gk -= g[last]
			}
			grad[i] = gk * (hi[k] - lo[k]) / scale
		}
		if math.IsNaN(sse) {
			return math.Inf(1)
		}
		return sse / scale
	}
	u0 := make([]float64, len(vars))
	ulo, uhi := make([]float64, len(vars)), make([]float64, len(vars))
	for i, k := range vars {
		u0[i] = math.Min(math.Max((full[k]-lo[k])/(hi[k]-lo[k]), 0), 1)
		uhi[i] = 1
	}
	// Tolerance 1e-5 on the projected gradient of the scaled problem: a move
	// across a variable's whole range would change the SSE by at most
	// 0.001% to first order. Tighter targets stall on rounding where the
	// level and seasonal states are strongly correlated.
	res := boxMin{lo: ulo, hi: uhi, tol: 1e-5, maxEvals: 600}.run(fg, u0)
	best.converged = res.converged
	return best, bestStates
}
