package forecast

import "math"

// This file holds the SSE of the exponential smoothing recursion, alone
// (the grid search) or together with its exact gradient with respect to
// alpha, beta, gamma and phi, the initial states held fixed. The gradient
// comes from the adjoint pass of smoothing_fullgrad.go, which costs about
// three plain passes: measured on 144 monthly points (additive
// Holt-Winters, BenchmarkSSEGradient) about 2 µs against 4 µs for carrying
// the four derivatives forward with the states, the method it replaced
// (kept in smoothing_gradient_forward_test.go as a check).

// esWork is scratch space reused across evaluations of one fit.
type esWork struct {
	s    []float64 // seasonal states
	full fullWork  // records and derivatives of the adjoint pass
	g    []float64 // gradient over the full layout
}

func newESWork(m int) *esWork {
	return &esWork{s: make([]float64, m), full: fullWork{s: make([]float64, m), sbar: make([]float64, m)},
		g: make([]float64, nConst+2+m)}
}

// sseGrad returns the SSE of the one-step errors of y under the constants p
// and the initial states init, and stores its gradient in grad when grad
// is not nil. The initial states are held fixed (their derivatives are 0).
func (f esForm) sseGrad(y []float64, p [nConst]float64, init esStates, w *esWork, grad *[nConst]float64) float64 {
	if grad == nil {
		return f.sse(y, p, init, w, math.Inf(1))
	}
	sse := f.sseGradFull(y, p, init, &w.full, w.g)
	copy(grad[:], w.g[:nConst])
	return sse
}

// sse returns the SSE alone, without derivatives (the grid search). It
// stops as soon as the running sum exceeds limit and returns that partial
// sum, itself above limit: a grid point that cannot be among the best needs
// no more of the series. Pass +Inf for the whole SSE.
func (f esForm) sse(y []float64, p [nConst]float64, init esStates, w *esWork, limit float64) float64 {
	alpha, beta, gamma, phi := p[iAlpha], p[iBeta], p[iGamma], p[iPhi]
	l, b := init.level, init.trend
	if !f.trend {
		b, phi = 0, 1
	}
	s := w.s
	copy(s, init.season)
	sse := 0.0
	j := 0
	for _, v := range y {
		a := l + phi*b
		var pred, lNew float64
		switch f.season {
		case NoSeason:
			pred = a
			lNew = alpha*v + (1-alpha)*a
		case Additive:
			pred = a + s[j]
			lNew = alpha*(v-s[j]) + (1-alpha)*a
			s[j] = gamma*(v-a) + (1-gamma)*s[j]
		case Multiplicative:
			pred = a * s[j]
			lNew = alpha*(v/s[j]) + (1-alpha)*a
			s[j] = gamma*(v/a) + (1-gamma)*s[j]
		}
		if f.trend {
			b = beta*(lNew-l) + (1-beta)*phi*b
		}
		l = lNew
		e := v - pred
		sse += e * e
		if sse > limit {
			return sse
		}
		if j++; j == f.m {
			j = 0
		}
	}
	return sse
}
