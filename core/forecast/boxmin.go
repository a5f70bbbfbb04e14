package forecast

import "math"

// boxMin is a small projected quasi-Newton minimiser for a few variables
// inside a box lo <= x <= hi, used to estimate smoothing constants.
//
// Why not gonum/optimize, decided by measurement (boxmin_compare_test.go,
// measured on a 2-core machine shared with other work, medians of the
// paired benchmark BenchmarkOptimizerPaired, where every iteration runs
// all three minimisers in rotating order so they meet the same load):
// additive Holt-Winters, season 12, 144 seeded monthly points, alpha,
// beta and gamma open, the same exact gradient and the same two grid
// starts; gonum's LBFGS and BFGS work on a logistic transform of the box.
//
//	                      evaluations  native     js/wasm (Node 20)
//	boxmin (local runs)   36           129 µs     417 µs
//	gonum LBFGS           21           197 µs     492 µs
//	gonum BFGS            20           196 µs     541 µs
//	one SSE+gradient pass              3.3 µs     10.2 µs
//
// (Measured with the forward-mode gradient; the adjoint pass of
// smoothing_fullgrad.go has since cut one pass to about 2 µs natively,
// which makes gonum's fixed cost per evaluation weigh more, not less.)
// All three reach the same SSE (1592.894079 to ten digits; 162, 147 and
// 146 evaluations for the whole fit with its 125-point grid), and
// TestBoxMinAgainstGonum holds boxmin within a relative 1e-6 of both on
// every reference fitted case. gonum needs fewer evaluations but spends
// about 6 µs natively and 13 µs in wasm on each one beyond the model
// itself (Minimize hands every evaluation between goroutines), more than
// the 3 to 10 µs the model costs, so boxmin is 1.5 times faster natively
// and 1.2 times in wasm. Size: importing gonum/optimize (it brings
// stat/distmv, spatial/r1 and golang.org/x/tools/container/intsets) adds
// 187,168 bytes raw, 50,703 gzip -9 and 35,522 brotli to a js/wasm main
// that already uses this package (257 KB, 68 KB and 52 KB to an empty
// one), against a payload target of 1.4 MB gzip that the engine nearly
// fills. A logistic transform also never reaches a bound, where smoothing
// constants often belong. The problems have at most four variables (plus
// the initial states with start=estimated), so a plain loop is short.
//
// Method: the projected BFGS method with an active set. Variables at a
// bound whose gradient pushes outwards are held; the others move along
// d solving B_FF d = -g_F, where B is the BFGS estimate of the Hessian and
// F the free variables (the reduced Newton step), and the step is
// projected onto the box and shortened until the Armijo condition holds.
// Convergence means the projected gradient max|P(x-g)-x| fell below tol.
// Source: D. P. Bertsekas (1982), "Projected Newton methods for
// optimization problems with simple constraints", SIAM Journal on Control
// and Optimization 20(2), 221-246; J. Nocedal and S. J. Wright, Numerical
// Optimization, 2nd ed. (2006), sections 6.1 (BFGS) and 16.7 (gradient
// projection).
type boxMin struct {
	lo, hi   []float64
	tol      float64 // projected-gradient tolerance
	maxEvals int     // evaluation budget
}

// boxWork is the scratch space of one run, allocated once so that an
// iteration allocates nothing.
type boxWork struct {
	active []bool
	free   []int
	a      [][]float64 // the reduced system, k rows of k+1
	hs     []float64
}

func newBoxWork(k int) *boxWork {
	w := &boxWork{active: make([]bool, k), free: make([]int, 0, k), a: make([][]float64, k), hs: make([]float64, k)}
	for r := range w.a {
		w.a[r] = make([]float64, k+1)
	}
	return w
}

// boxResult is the outcome of [boxMin.run].
type boxResult struct {
	x         []float64
	f         float64
	converged bool
	evals     int
}

// run minimises fg from x0 (moved into the box first). fg returns the
// function value and writes the gradient into grad.
func (b boxMin) run(fg func(x, grad []float64) float64, x0 []float64) boxResult {
	k := len(x0)
	x := make([]float64, k)
	for i := range x {
		x[i] = math.Min(math.Max(x0[i], b.lo[i]), b.hi[i])
	}
	g := make([]float64, k)
	f := fg(x, g)
	res := boxResult{x: x, f: f, evals: 1}
	if math.IsInf(f, 0) || math.IsNaN(f) {
		return res
	}
	h := identity(k, 0)
	bw := newBoxWork(k)
	xn, gn, d, s, yv := make([]float64, k), make([]float64, k), make([]float64, k), make([]float64, k), make([]float64, k)
	for res.evals < b.maxEvals {
		if b.projGrad(x, g) < b.tol {
			res.converged = true
			break
		}
		active := b.active(x, g, bw.active)
		b.direction(h, g, active, d, bw)
		if h == nil || dot(g, d) >= 0 {
			// First step or a bad direction: steepest descent, scaled so
			// that the largest move is a tenth of its interval.
			h = nil
			scale := 0.0
			for i := range d {
				d[i] = 0
				if !active[i] {
					d[i] = -g[i]
					scale = math.Max(scale, math.Abs(g[i])/(b.hi[i]-b.lo[i]))
				}
			}
			if scale == 0 {
				res.converged = true
				break
			}
			for i := range d {
				d[i] *= 0.1 / scale
			}
		}
		fn, ok := b.search(fg, x, f, g, d, xn, gn, &res)
		if !ok {
			if h == nil {
				break // no decrease even along the steepest direction
			}
			h = nil // retry from steepest descent
			continue
		}
		for i := range s {
			s[i], yv[i] = xn[i]-x[i], gn[i]-g[i]
		}
		h = bfgsUpdate(h, s, yv, bw.hs)
		copy(x, xn)
		copy(g, gn)
		df := f - fn
		f = fn
		if df <= 1e-14*math.Max(1, math.Abs(f)) && b.projGrad(x, g) < 100*b.tol {
			res.converged = true
			break
		}
	}
	res.x, res.f = x, f
	if !res.converged && b.projGrad(x, g) < b.tol {
		res.converged = true
	}
	return res
}

// search shortens the projected step along d until the Armijo condition
// holds; it writes the new point and gradient into xn and gn.
func (b boxMin) search(fg func(x, grad []float64) float64, x []float64, f float64, g, d, xn, gn []float64, res *boxResult) (float64, bool) {
	t := 1.0
	for range 40 {
		if res.evals >= b.maxEvals {
			return f, false
		}
		moved := 0.0
		decrease := 0.0
		for i := range x {
			xn[i] = math.Min(math.Max(x[i]+t*d[i], b.lo[i]), b.hi[i])
			moved = math.Max(moved, math.Abs(xn[i]-x[i]))
			decrease += g[i] * (xn[i] - x[i])
		}
		if moved == 0 {
			return f, false
		}
		fn := fg(xn, gn)
		res.evals++
		if fn <= f+1e-4*decrease && !math.IsNaN(fn) {
			return fn, true
		}
		t *= 0.5
	}
	return f, false
}

// active marks in a the variables held at a bound: at the lower bound with
// a positive gradient or at the upper bound with a negative one.
func (b boxMin) active(x, g []float64, a []bool) []bool {
	for i := range x {
		eps := 1e-10 * (b.hi[i] - b.lo[i])
		a[i] = (x[i] <= b.lo[i]+eps && g[i] > 0) || (x[i] >= b.hi[i]-eps && g[i] < 0)
	}
	return a
}

// direction sets d to the solution of B_FF d_F = -g_F over the free
// variables F (0 for held ones). It leaves d at 0 when h is nil or B_FF
// is singular. w holds the reduced system.
func (b boxMin) direction(h [][]float64, g []float64, active []bool, d []float64, w *boxWork) {
	for i := range d {
		d[i] = 0
	}
	if h == nil {
		return
	}
	free := w.free[:0]
	for i := range g {
		if !active[i] {
			free = append(free, i)
		}
	}
	k := len(free)
	a := w.a[:k]
	for r, i := range free {
		for c, j := range free {
			a[r][c] = h[i][j]
		}
		a[r][k] = -g[i]
	}
	// Gaussian elimination with partial pivoting on the k-by-k system.
	for c := range k {
		p := c
		for r := c + 1; r < k; r++ {
			if math.Abs(a[r][c]) > math.Abs(a[p][c]) {
				p = r
			}
		}
		if a[p][c] == 0 {
			return
		}
		a[c], a[p] = a[p], a[c]
		for r := c + 1; r < k; r++ {
			q := a[r][c] / a[c][c]
			for j := c; j <= k; j++ {
				a[r][j] -= q * a[c][j]
			}
		}
	}
	for r := k - 1; r >= 0; r-- {
		v := a[r][k]
		for j := r + 1; j < k; j++ {
			v -= a[r][j] * d[free[j]]
		}
		d[free[r]] = v / a[r][r]
	}
}

// projGrad returns max|P(x-g)-x|, zero exactly at a first-order optimum.
func (b boxMin) projGrad(x, g []float64) float64 {
	m := 0.0
	for i := range x {
		p := math.Min(math.Max(x[i]-g[i], b.lo[i]), b.hi[i])
		m = math.Max(m, math.Abs(p-x[i]))
	}
	return m
}

// bfgsUpdate returns the BFGS update of the Hessian estimate h (nil means
// not yet started: the first update begins from the scaled identity
// (y'y/s'y) I of Nocedal and Wright, eq. 6.20, in its Hessian form). The
// update is skipped when the curvature s'y is not positive, which keeps h
// positive definite. hs is scratch of length len(s).
func bfgsUpdate(h [][]float64, s, y, hs []float64) [][]float64 {
	sy := dot(s, y)
	if sy <= 1e-16*math.Sqrt(dot(s, s)*dot(y, y)) {
		return h
	}
	k := len(s)
	if h == nil {
		h = identity(k, dot(y, y)/sy)
	}
	for i := range k {
		hs[i] = 0
		for j := range k {
			hs[i] += h[i][j] * s[j]
		}
	}
	shs := dot(s, hs)
	for i := range k {
		for j := range k {
			h[i][j] += y[i]*y[j]/sy - hs[i]*hs[j]/shs
		}
	}
	return h
}

// identity returns c times the k-by-k identity, or nil when c is 0.
func identity(k int, c float64) [][]float64 {
	if c == 0 {
		return nil
	}
	h := make([][]float64, k)
	for i := range h {
		h[i] = make([]float64, k)
		h[i][i] = c
	}
	return h
}

func dot(a, b []float64) float64 {
	s := 0.0
	for i := range a {
		s += a[i] * b[i]
	}
	return s
}
