package forecast

// This file extends smoothing_gradient.go to the initial states: the SSE
// and its gradient with respect to the four constants and to level0,
// trend0 and every season0, by the same forward-mode differentiation. It
// serves the fits that estimate the initial states (smoothing_start.go).
// The variable layout is [alpha, beta, gamma, phi, level0, trend0,
// season0[0], ..., season0[m-1]]; trend0 and the seasonal states are
// present even for forms without them (their derivatives stay 0).

// nVars returns the number of variables of the full layout.
func (f esForm) nVars() int { return nConst + 2 + f.m }

// fullWork is scratch space for [esForm.sseGradFull].
type fullWork struct {
	s                  []float64   // seasonal states
	ds                 [][]float64 // their derivatives, m by nVars
	dl, db, da, dp, dn []float64   // level, trend, base, prediction, new level derivatives
	dbn, dsn           []float64   // new trend and new seasonal state derivatives
}

func newFullWork(f esForm) *fullWork {
	k := f.nVars()
	w := &fullWork{s: make([]float64, f.m), ds: make([][]float64, f.m)}
	for j := range w.ds {
		w.ds[j] = make([]float64, k)
	}
	w.dl, w.db, w.da, w.dp = make([]float64, k), make([]float64, k), make([]float64, k), make([]float64, k)
	w.dn, w.dbn, w.dsn = make([]float64, k), make([]float64, k), make([]float64, k)
	return w
}

// sseGradFull returns the SSE of y under the constants p and the initial
// states init and writes its gradient over the full layout into grad.
func (f esForm) sseGradFull(y []float64, p [nConst]float64, init esStates, w *fullWork, grad []float64) float64 {
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
