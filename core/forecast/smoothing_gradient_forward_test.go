package forecast

// This file keeps the forward-mode gradient over the four constants (the
// derivative of every state carried forward with the states), which the
// adjoint pass replaced in the fits; TestSSEGradient checks one against
// the other.

// forwardConstWork is scratch space for [esForm.sseGradForward].
type forwardConstWork struct {
	s  []float64         // seasonal states
	ds [][nConst]float64 // their derivatives
}

func newForwardConstWork(m int) *forwardConstWork {
	return &forwardConstWork{s: make([]float64, m), ds: make([][nConst]float64, m)}
}

// sseGradForward returns the SSE of the one-step errors of y under the constants p
// and the initial states init, and stores its gradient in grad when grad
// is not nil. The initial states are held fixed (their derivatives are 0).
func (f esForm) sseGradForward(y []float64, p [nConst]float64, init esStates, w *forwardConstWork, grad *[nConst]float64) float64 {
	alpha, beta, gamma, phi := p[iAlpha], p[iBeta], p[iGamma], p[iPhi]
	l, b := init.level, init.trend
	if !f.trend {
		b, phi = 0, 1
	}
	copy(w.s, init.season)
	for j := range w.ds {
		w.ds[j] = [nConst]float64{}
	}
	var dl, db, g [nConst]float64
	sse := 0.0
	for t, v := range y {
		a := l + phi*b
		var da [nConst]float64
		for k := range da {
			da[k] = dl[k] + phi*db[k]
		}
		if f.trend {
			da[iPhi] += b
		}
		j := t % f.m
		var pred, lNew float64
		var dpred, dlNew [nConst]float64
		switch f.season {
		case NoSeason:
			pred, dpred = a, da
			lNew = alpha*v + (1-alpha)*a
			for k := range dlNew {
				dlNew[k] = (1 - alpha) * da[k]
			}
			dlNew[iAlpha] += v - a
		case Additive:
			s, ds := w.s[j], w.ds[j]
			pred = a + s
			lNew = alpha*(v-s) + (1-alpha)*a
			sNew := gamma*(v-a) + (1-gamma)*s
			var dsNew [nConst]float64
			for k := range dpred {
				dpred[k] = da[k] + ds[k]
				dlNew[k] = -alpha*ds[k] + (1-alpha)*da[k]
				dsNew[k] = -gamma*da[k] + (1-gamma)*ds[k]
			}
			dlNew[iAlpha] += v - s - a
			dsNew[iGamma] += v - a - s
			w.s[j], w.ds[j] = sNew, dsNew
		case Multiplicative:
			s, ds := w.s[j], w.ds[j]
			pred = a * s
			lNew = alpha*(v/s) + (1-alpha)*a
			sNew := gamma*(v/a) + (1-gamma)*s
			var dsNew [nConst]float64
			cl := -alpha * v / (s * s)
			cs := -gamma * v / (a * a)
			for k := range dpred {
				dpred[k] = da[k]*s + a*ds[k]
				dlNew[k] = cl*ds[k] + (1-alpha)*da[k]
				dsNew[k] = cs*da[k] + (1-gamma)*ds[k]
			}
			dlNew[iAlpha] += v/s - a
			dsNew[iGamma] += v/a - s
			w.s[j], w.ds[j] = sNew, dsNew
		}
		if f.trend {
			bNew := beta*(lNew-l) + (1-beta)*phi*b
			var dbNew [nConst]float64
			for k := range dbNew {
				dbNew[k] = beta*(dlNew[k]-dl[k]) + (1-beta)*phi*db[k]
			}
			dbNew[iBeta] += lNew - l - phi*b
			dbNew[iPhi] += (1 - beta) * b
			b, db = bNew, dbNew
		}
		l, dl = lNew, dlNew
		e := v - pred
		sse += e * e
		for k := range g {
			g[k] -= 2 * e * dpred[k]
		}
	}
	if grad != nil {
		*grad = g
	}
	return sse
}
