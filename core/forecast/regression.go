package forecast

import (
	"fmt"
	"math"
	"strconv"

	"gonum.org/v1/gonum/mat"
)

// TrendKind is the shape of the trend in a [Regression].
type TrendKind int

const (
	// Linear: a straight line a + b*t.
	Linear TrendKind = iota
	// Quadratic: a curve a + b*t + c*t^2.
	Quadratic
	// Exponential: a constant growth rate, fitted as a straight line to the
	// logarithms of the values (positive values only).
	Exponential
)

// String returns "linear", "quadratic" or "exponential".
func (k TrendKind) String() string {
	return [...]string{"linear", "quadratic", "exponential"}[k]
}

// Regression is ordinary least squares on a trend in time t = 1..n and,
// when the series has a season of m >= 2 periods, m-1 seasonal dummies:
// the first observation's season is the baseline and dummy j (j = 2..m)
// is 1 for observations i with i mod m = j-1. An exponential trend is a
// linear trend fitted to log y; its forecasts are exp of the fitted line
// (the median, not the mean, of the forecast distribution) and its interval
// is exp of the interval on the log scale.
//
// Prediction interval: t quantile with n-p degrees of freedom times s times
// sqrt(1 + x0'(X'X)^-1 x0), s^2 = SSE/(n-p), p the number of coefficients.
// The least squares solution uses a QR factorisation (gonum/mat).
//
// Source: R. J. Hyndman and G. Athanasopoulos, Forecasting: Principles and
// Practice, 3rd ed. (2021), sections 7.4 (trend and seasonal dummy
// predictors), 7.6 (forecasting with regression) and 7.7 (nonlinear trend).
type Regression struct {
	Trend TrendKind // shape of the trend
	Cycle int       // season length; 0 takes the series' own; 1 leaves the season out
}

// Name returns "regression".
func (Regression) Name() string { return "regression" }

// Fit fits the regression. It needs more values than coefficients, and
// two full seasons when seasonal dummies are used; an exponential trend
// needs positive values.
func (r Regression) Fit(y []float64, season int) (*Fit, error) {
	name := r.Name()
	m := seasonLength(r.Cycle, season)
	if m < 2 {
		m = 1
	}
	p := 2 + (m - 1)
	if r.Trend == Quadratic {
		p++
	}
	need, why := p+1, fmt.Sprintf("one more than its %d coefficients", p)
	if m > 1 && 2*m > need {
		need, why = 2*m, fmt.Sprintf("two full seasons of %d periods", m)
	}
	if err := checkSeries(name, y, need, why); err != nil {
		return nil, err
	}
	z := y
	if r.Trend == Exponential {
		if err := checkPositive(name, "an exponential trend is fitted to the logarithms of the values", y); err != nil {
			return nil, err
		}
		z = make([]float64, len(y))
		for i, v := range y {
			z[i] = math.Log(v)
		}
	}
	n := len(y)
	row := func(t int) []float64 { return r.row(t, m, p) }
	x := mat.NewDense(n, p, nil)
	for t := range n {
		x.SetRow(t, row(t))
	}
	var qr mat.QR
	qr.Factorize(x)
	var coef mat.VecDense
	if err := qr.SolveVecTo(&coef, false, mat.NewVecDense(n, clone(z))); err != nil {
		return nil, &Error{Cause: ErrTooShort, Msg: name + " could not separate trend and season on this series; use a longer training period"}
	}
	var rFull mat.Dense
	qr.RTo(&rFull)
	rInv := mat.NewTriDense(p, mat.Upper, nil)
	for i := range p {
		for j := i; j < p; j++ {
			rInv.SetTri(i, j, rFull.At(i, j))
		}
	}
	if err := rInv.InverseTri(rInv); err != nil {
		return nil, &Error{Cause: ErrTooShort, Msg: name + " could not separate trend and season on this series; use a longer training period"}
	}
	lin := make([]float64, n)
	sse, zMean, sst := 0.0, mean(z), 0.0
	for t := range n {
		lin[t] = dot(row(t), coef.RawVector().Data)
		e := z[t] - lin[t]
		sse += e * e
		sst += (z[t] - zMean) * (z[t] - zMean)
	}
	df := float64(n - p)
	s2 := sse / df
	// leverage returns x0'(X'X)^-1 x0 = |R^-T x0|^2.
	leverage := func(x0 []float64) float64 {
		var v mat.VecDense
		v.MulVec(rInv.T(), mat.NewVecDense(p, x0))
		return mat.Dot(&v, &v)
	}
	beta := clone(coef.RawVector().Data)
	f := &Fit{
		Method: name, N: n, Season: season, Converged: true,
		Init:    "no initial states: least squares on the whole training period",
		Follows: Patterns{Trend: true, Season: m > 1},
		train:   clone(y), sigma2: s2, hasSigma2: true, df: df,
	}
	if m > 1 {
		f.Season = m
	}
	linPath := func(h int) []float64 {
		out := make([]float64, h)
		for i := range out {
			out[i] = dot(row(n+i), beta)
		}
		return out
	}
	f.Params = r.params(beta, m)
	for i := range p {
		se := math.Sqrt(s2 * leverage(unit(p, i)))
		f.Stats = append(f.Stats, Param{Name: "se(" + f.Params[i].Name + ")", Value: se, Estimated: true})
	}
	f.Stats = append(f.Stats,
		Param{Name: "residual-se", Value: math.Sqrt(s2), Estimated: true},
		Param{Name: "r2", Value: rSquared(sse, sst), Estimated: true},
		Param{Name: "adjusted-r2", Value: 1 - (1-rSquared(sse, sst))*float64(n-1)/df, Estimated: true})
	variance := func(h int) ([]float64, bool) {
		v := make([]float64, h)
		for i := range v {
			v[i] = s2 * (1 + leverage(row(n+i)))
		}
		return v, true
	}
	if r.Trend != Exponential {
		f.Fitted, f.path, f.variance = lin, linPath, variance
		return f, nil
	}
	f.Fitted = make([]float64, n)
	for t := range lin {
		f.Fitted[t] = math.Exp(lin[t])
	}
	f.path = func(h int) []float64 {
		out := linPath(h)
		for i := range out {
			out[i] = math.Exp(out[i])
		}
		return out
	}
	f.bounds = func(h int, level float64) (lo, hi []float64, ok bool) {
		centre := linPath(h)
		v, _ := variance(h)
		q := quantile(level, df)
		lo, hi = make([]float64, h), make([]float64, h)
		for i := range centre {
			w := q * math.Sqrt(v[i])
			lo[i], hi[i] = math.Exp(centre[i]-w), math.Exp(centre[i]+w)
		}
		return lo, hi, true
	}
	f.Notes = append(f.Notes, "the exponential trend is fitted to logarithms; forecasts are the median path and the interval is not symmetric")
	return f, nil
}

// row returns the design row of 0-based period t (t >= n for forecasts).
func (r Regression) row(t, m, p int) []float64 {
	x := make([]float64, p)
	tt := float64(t + 1)
	x[0], x[1] = 1, tt
	k := 2
	if r.Trend == Quadratic {
		x[2] = tt * tt
		k = 3
	}
	if j := t % m; m > 1 && j > 0 {
		x[k+j-1] = 1
	}
	return x
}

// params names the coefficients.
func (r Regression) params(beta []float64, m int) []Param {
	names := []string{"intercept", "trend"}
	if r.Trend == Quadratic {
		names = append(names, "trend2")
	}
	for j := 2; j <= m; j++ {
		names = append(names, "season["+strconv.Itoa(j)+"]")
	}
	out := make([]Param, len(beta))
	for i, b := range beta {
		out[i] = Param{Name: names[i], Value: b, Estimated: true}
	}
	return out
}

func rSquared(sse, sst float64) float64 {
	if sst == 0 {
		return 1
	}
	return 1 - sse/sst
}

func unit(p, i int) []float64 {
	u := make([]float64, p)
	u[i] = 1
	return u
}

func regressionSpec() Spec {
	return Spec{
		Name: "regression", Title: "Regression on trend and season",
		Summary: "Least squares on a trend in time and one dummy per season but the first; forecasts extend the trend and repeat the seasonal effects.",
		Source:  "R. J. Hyndman and G. Athanasopoulos, Forecasting: Principles and Practice, 3rd ed. (2021), sections 7.4, 7.6 and 7.7",
		Assumes: "a fixed trend shape and fixed seasonal effects over the whole period, with errors that are independent and equally spread",
		Follows: Patterns{Trend: true, Season: true},
		Params: []ParamSpec{
			{Name: "trend", Kind: Choice, Choices: []string{"linear", "quadratic", "exponential"}, Default: "linear",
				Help: "shape of the trend: a straight line, a curve, or constant growth (fitted to logarithms, positive values only)"},
			cycleParam(),
		},
		New: func(st Settings) (Method, error) {
			r := Regression{Cycle: st.whole("cycle")}
			switch st.word("trend", "linear") {
			case "quadratic":
				r.Trend = Quadratic
			case "exponential":
				r.Trend = Exponential
			}
			return r, nil
		},
	}
}
