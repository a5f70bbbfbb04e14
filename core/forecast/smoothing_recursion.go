package forecast

import "math"

// This file holds the exponential smoothing recursion in weighted-average
// form with every state named at time 0, before the first observation:
//
//	prediction of y_t:  a + s_{t-m}   (a * s_{t-m} for a multiplicative season)
//	                    where a = l_{t-1} + phi*b_{t-1}
//	level:   l_t = alpha*(y_t - s_{t-m}) + (1-alpha)*a      (y_t / s_{t-m} if multiplicative)
//	trend:   b_t = beta*(l_t - l_{t-1}) + (1-beta)*phi*b_{t-1}
//	season:  s_t = gamma*(y_t - a) + (1-gamma)*s_{t-m}      (y_t / a if multiplicative)
//	forecast h: l_n + (phi + ... + phi^h)*b_n, plus (times) the latest
//	            seasonal state of the same position in the cycle
//
// Without trend b = 0; without damping phi = 1; without season s = 0 (or 1).
// Source: E. S. Gardner Jr (1985), "Exponential smoothing: the state of the
// art", Journal of Forecasting 4(1), 1-28, and (2006) "Exponential
// smoothing: the state of the art - Part II", International Journal of
// Forecasting 22(4), 637-666, section 2 (damped trend); R. J. Hyndman and
// G. Athanasopoulos, Forecasting: Principles and Practice, 3rd ed. (2021),
// sections 8.1-8.3.

// SeasonKind says how a seasonal pattern combines with level and trend.
type SeasonKind int

const (
	// NoSeason: the method follows no seasonal pattern.
	NoSeason SeasonKind = iota
	// Additive: the season adds the same amount each cycle.
	Additive
	// Multiplicative: the season scales with the level (needs positive data).
	Multiplicative
)

// String returns "none", "additive" or "multiplicative".
func (k SeasonKind) String() string {
	switch k {
	case Additive:
		return "additive"
	case Multiplicative:
		return "multiplicative"
	}
	return "none"
}

// Indices of the smoothing constants in a parameter vector.
const (
	iAlpha = iota
	iBeta
	iGamma
	iPhi
	nConst
)

// esForm is the shape of one exponential smoothing model.
type esForm struct {
	trend  bool       // has a trend state
	season SeasonKind // seasonal form
	m      int        // season length (1 without season)
}

// esStates holds the states at time 0.
type esStates struct {
	level, trend float64
	season       []float64 // season[i] is the state used for observation i (length m)
}

// esTrace is the result of running the recursion once.
type esTrace struct {
	fitted, level, trend, season []float64 // after each period; season holds s_t
	last                         esStates  // states after the last period
	sse                          float64
}

// run applies the recursion to y with the constants p and records every
// state. A multiplicative step that meets a zero prediction base or seasonal
// state makes the SSE +Inf.
func (f esForm) run(y []float64, p [nConst]float64, init esStates) esTrace {
	n := len(y)
	tr := esTrace{fitted: make([]float64, n), level: make([]float64, n)}
	if f.trend {
		tr.trend = make([]float64, n)
	}
	if f.season != NoSeason {
		tr.season = make([]float64, n)
	}
	alpha, beta, gamma, phi := p[iAlpha], p[iBeta], p[iGamma], p[iPhi]
	l, b := init.level, init.trend
	if !f.trend {
		b, phi = 0, 1
	}
	s := clone(init.season)
	for t, v := range y {
		a := l + phi*b
		var pred, lNew float64
		j := t % f.m
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
			tr.trend[t] = b
		}
		l = lNew
		tr.fitted[t] = pred
		tr.level[t] = l
		if f.season != NoSeason {
			tr.season[t] = s[j]
		}
		e := v - pred
		tr.sse += e * e
	}
	if math.IsNaN(tr.sse) {
		tr.sse = math.Inf(1)
	}
	tr.last = esStates{level: l, trend: b, season: s}
	return tr
}

// path returns the forecasts for horizons 1..h from the states after n
// observations: the level plus the damped trend sum, with the latest
// seasonal state of the same position in the cycle.
func (f esForm) path(n int, last esStates, phi float64, h int) []float64 {
	out := make([]float64, h)
	trendSum := 0.0
	pk := 1.0
	for i := range out {
		if f.trend {
			pk *= phi
			trendSum += pk * last.trend
		}
		a := last.level + trendSum
		switch f.season {
		case Additive:
			a += last.season[(n+i)%f.m]
		case Multiplicative:
			a *= last.season[(n+i)%f.m]
		}
		out[i] = a
	}
	return out
}
