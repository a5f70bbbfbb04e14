package forecast

import (
	"math"
	"slices"
	"testing"
	"time"

	"gonum.org/v1/gonum/optimize"
)

// This file sets boxmin.go against gonum/optimize on the same problems:
// the same SSE with the same exact gradient, the same grid starts, the
// same bounds. gonum's methods are unbounded, so each constant is written
// x = lo + (hi-lo)*logistic(u) and the gradient carried through the
// transform (dx/du = (x-lo)(hi-x)/(hi-lo)). It lives in a test file so
// that gonum/optimize never enters the wasm.

// gonumSolve is [esProblem.solve] with the local runs made by gonum's
// method instead of boxMin.
func (pr *esProblem) gonumSolve(method func() optimize.Method) esSolution {
	w := newESWork(pr.form.m)
	sol := esSolution{p: pr.start, converged: true}
	sol.sse = pr.form.sseGrad(pr.y, sol.p, pr.init, w, nil)
	sol.evals++
	if len(pr.free) == 0 {
		return sol
	}
	starts := pr.gridStarts(w, &sol)
	if sol.sse == 0 || math.IsInf(sol.sse, 1) {
		sol.converged = sol.sse == 0
		return sol
	}
	scale := sol.sse
	sol.converged = false
	for _, st := range starts {
		pr.gonumLocal(st, scale, w, &sol, method())
	}
	return sol
}

// gonumLocal runs method from start in the logistic coordinates and keeps
// the lowest SSE met in sol.
func (pr *esProblem) gonumLocal(start [nConst]float64, scale float64, w *esWork, sol *esSolution, method optimize.Method) {
	k := len(pr.free)
	lo, hi, u0 := make([]float64, k), make([]float64, k), make([]float64, k)
	for i, c := range pr.free {
		lo[i], hi[i] = constBounds(c)
		r := (start[c] - lo[i]) / (hi[i] - lo[i])
		r = math.Min(math.Max(r, 1e-6), 1-1e-6)
		u0[i] = math.Log(r / (1 - r))
	}
	// gonum asks for the value and the gradient in two calls at the same
	// point; one pass gives both, so the last point's gradient is kept.
	lastU := make([]float64, k)
	lastG := make([]float64, k)
	have := false
	eval := func(u []float64) float64 {
		p := pr.start
		dx := make([]float64, k)
		for i, c := range pr.free {
			s := 1 / (1 + math.Exp(-u[i]))
			p[c] = lo[i] + (hi[i]-lo[i])*s
			dx[i] = (hi[i] - lo[i]) * s * (1 - s)
		}
		var g [nConst]float64
		sse := pr.form.sseGrad(pr.y, p, pr.init, w, &g)
		sol.evals++
		if sse < sol.sse {
			sol.p, sol.sse = p, sse
		}
		for i, c := range pr.free {
			lastG[i] = g[c] * dx[i] / scale
		}
		copy(lastU, u)
		have = true
		if math.IsNaN(sse) {
			return math.Inf(1)
		}
		return sse / scale
	}
	prob := optimize.Problem{
		Func: eval,
		Grad: func(grad, u []float64) {
			if !have || !slices.Equal(u, lastU) {
				eval(u)
			}
			copy(grad, lastG)
		},
	}
	settings := &optimize.Settings{GradientThreshold: 1e-7, FuncEvaluations: 300}
	res, err := optimize.Minimize(prob, u0, settings, method)
	if err == nil && res != nil && (res.Status == optimize.GradientThreshold || res.Status == optimize.FunctionConvergence) {
		sol.converged = true
	}
}

// gonumMethods are the gonum minimisers compared.
func gonumMethods() []struct {
	name string
	new  func() optimize.Method
} {
	return []struct {
		name string
		new  func() optimize.Method
	}{
		{"gonum-lbfgs", func() optimize.Method { return &optimize.LBFGS{} }},
		{"gonum-bfgs", func() optimize.Method { return &optimize.BFGS{} }},
	}
}

// hwProblem is additive Holt-Winters (season 12) on the 144-point seeded
// monthly benchmark series with alpha, beta and gamma open.
func hwProblem() *esProblem {
	y := benchSeries(144)
	form := esForm{trend: true, season: Additive, m: 12}
	init, _ := form.heuristicStates(y)
	return &esProblem{form: form, y: y, init: init,
		start: [nConst]float64{0.5, 0.1, 0.1, 1}, free: []int{iAlpha, iBeta, iGamma}}
}

// optimizerRunner is one way of estimating the constants of a problem:
// the whole fit, or the local runs alone from fixed grid starts.
type optimizerRunner struct {
	name       string
	fit, local func() esSolution
}

// optimizerRunners returns boxmin and the gonum methods on pr.
func optimizerRunners(pr *esProblem) []optimizerRunner {
	w := newESWork(pr.form.m)
	var grid esSolution
	starts := pr.gridStarts(w, &grid)
	local := func(one func(st [nConst]float64, sol *esSolution)) esSolution {
		sol := grid
		sol.evals = 0
		for _, st := range starts {
			one(st, &sol)
		}
		return sol
	}
	runners := []optimizerRunner{{"boxmin", pr.solve, func() esSolution {
		return local(func(st [nConst]float64, sol *esSolution) { pr.local(st, grid.sse, w, sol) })
	}}}
	for _, m := range gonumMethods() {
		runners = append(runners, optimizerRunner{m.name, func() esSolution { return pr.gonumSolve(m.new) }, func() esSolution {
			return local(func(st [nConst]float64, sol *esSolution) { pr.gonumLocal(st, grid.sse, w, sol, m.new()) })
		}})
	}
	return runners
}

// BenchmarkOptimizer fits additive Holt-Winters to 144 monthly points with
// boxmin and with gonum's LBFGS and BFGS, from the same grid starts with
// the same gradient, and reports evaluations and the final SSE per fit.
// "fit" is the whole estimation (the 125-point grid, then the local runs
// from the best two grid points); "local" is the local runs alone, where
// the minimisers differ.
func BenchmarkOptimizer(b *testing.B) {
	runners := optimizerRunners(hwProblem())
	for _, part := range []string{"fit", "local"} {
		for _, r := range runners {
			run := r.fit
			if part == "local" {
				run = r.local
			}
			b.Run(part+"/"+r.name+"/n=144", func(b *testing.B) {
				b.ReportAllocs()
				var sol esSolution
				for b.Loop() {
					sol = run()
				}
				b.ReportMetric(float64(sol.evals), "evals/op")
				b.ReportMetric(sol.sse, "sse")
			})
		}
	}
}

// BenchmarkOptimizerPaired runs the local searches of boxmin, gonum LBFGS
// and gonum BFGS one after the other in every iteration, in rotating
// order, and reports the median time of each, so that all three meet the
// same load on a shared machine; "grad-ns" is the median time of one SSE
// and gradient pass (timed over 20 passes), the cost of the model itself.
func BenchmarkOptimizerPaired(b *testing.B) {
	pr := hwProblem()
	runners := optimizerRunners(pr)
	times := make([][]float64, len(runners))
	var grad []float64
	w := newESWork(pr.form.m)
	p := [nConst]float64{0.3, 0.05, 0.2, 1}
	var g [nConst]float64
	b.ReportAllocs()
	i := 0
	for b.Loop() {
		for k := range runners {
			j := (i + k) % len(runners)
			start := time.Now()
			runners[j].local()
			times[j] = append(times[j], float64(time.Since(start).Nanoseconds()))
		}
		start := time.Now()
		for range 20 {
			pr.form.sseGrad(pr.y, p, pr.init, w, &g)
		}
		grad = append(grad, float64(time.Since(start).Nanoseconds())/20)
		i++
	}
	for j, r := range runners {
		b.ReportMetric(median(times[j]), r.name+"-ns")
		b.ReportMetric(float64(r.local().evals), r.name+"-evals")
	}
	b.ReportMetric(median(grad), "grad-ns")
}

// median returns the median of v (v is sorted in place).
func median(v []float64) float64 {
	slices.Sort(v)
	n := len(v)
	if n%2 == 1 {
		return v[n/2]
	}
	return (v[n/2-1] + v[n/2]) / 2
}

// TestBoxMinAgainstGonum: on every reference fitted case of
// TestSmoothingEstimated (initial states held at the reference values) and
// on the benchmark series, boxmin's SSE is no worse than gonum's LBFGS and
// BFGS by more than a relative 1e-6. Reference data: the case files named
// in TestSmoothingEstimated; the comparison is between two minimisers of
// the same function, so no expected value is needed.
func TestBoxMinAgainstGonum(t *testing.T) {
	problems := map[string]*esProblem{"holt-winters additive benchmark n=144": hwProblem()}
	for _, c := range referenceFits(t) {
		s := c.m
		form := esForm{trend: s.Trend, season: s.Season, m: 1}
		if s.Season != NoSeason {
			form.m = c.season
		}
		pr, err := s.problem(form, c.y)
		if err != nil {
			t.Fatal(err)
		}
		problems[c.name] = pr
	}
	names := make([]string, 0, len(problems))
	for name := range problems {
		names = append(names, name)
	}
	slices.Sort(names)
	for _, name := range names {
		pr := problems[name]
		t.Run(name, func(t *testing.T) {
			box := pr.solve()
			for _, m := range gonumMethods() {
				g := pr.gonumSolve(m.new)
				t.Logf("boxmin SSE %.10g in %d evaluations; %s SSE %.10g in %d", box.sse, box.evals, m.name, g.sse, g.evals)
				if box.sse > g.sse*(1+1e-6) {
					t.Errorf("boxmin SSE %.10g exceeds %s SSE %.10g by more than 1e-6", box.sse, m.name, g.sse)
				}
			}
		})
	}
}
