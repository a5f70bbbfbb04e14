package forecast

import "fmt"

// The benchmark family: naive, seasonal naive, drift and overall mean.
// Their point forecasts and intervals are the closed forms of
// R. J. Hyndman and G. Athanasopoulos, Forecasting: Principles and
// Practice, 3rd edition (2021), section 5.2 (methods) and section 5.5
// (benchmark prediction intervals); the formulas are common practice.

// Naive forecasts every horizon with the last value.
// fitted[t] = y[t-1] (NaN at t = 0). Interval variance sigma^2*h with
// sigma^2 the mean of the n-1 squared first differences.
type Naive struct{}

// Name returns "naive".
func (Naive) Name() string { return "naive" }

// Fit fits the naive method; it needs at least one value.
func (m Naive) Fit(y []float64, season int) (*Fit, error) {
	if err := checkSeries(m.Name(), y, 1, "one value"); err != nil {
		return nil, err
	}
	n := len(y)
	fitted := nanSlice(n)
	copy(fitted[1:], y[:n-1])
	f := &Fit{
		Method: m.Name(), N: n, Season: season, Fitted: fitted, Converged: true,
		Init:    "no initial states: the forecast is the last value",
		Follows: Patterns{Level: true},
		train:   clone(y), path: flat(y[n-1]),
	}
	if n >= 2 {
		f.sigma2, f.hasSigma2 = meanSquaredDiff(y, 1), true
		f.variance = func(h int) ([]float64, bool) {
			v := make([]float64, h)
			for i := range v {
				v[i] = f.sigma2 * float64(i+1)
			}
			return v, true
		}
	}
	return f, nil
}

// SeasonalNaive forecasts each horizon with the value one season earlier:
// forecast h = y[n-m+((h-1) mod m)], fitted[t] = y[t-m] (NaN for t < m).
// Cycle overrides the series' season length when positive. Interval
// variance sigma^2*(floor((h-1)/m)+1), sigma^2 the mean of the n-m squared
// lag-m differences.
type SeasonalNaive struct {
	Cycle int // season length; 0 takes the series' own
}

// Name returns "seasonal-naive".
func (SeasonalNaive) Name() string { return "seasonal-naive" }

// Fit fits the seasonal naive method; it needs a season of at least 2
// periods and one full season of values.
func (m SeasonalNaive) Fit(y []float64, season int) (*Fit, error) {
	s := seasonLength(m.Cycle, season)
	if s < 2 {
		return nil, &Error{Cause: ErrSeason, Msg: "seasonal-naive needs a season of at least 2 periods; give the series a period such as month or quarter, or write cycle=12"}
	}
	if err := checkSeries(m.Name(), y, s, fmt.Sprintf("one full season of %d periods", s)); err != nil {
		return nil, err
	}
	n := len(y)
	fitted := nanSlice(n)
	copy(fitted[s:], y[:n-s])
	last := clone(y[n-s:])
	f := &Fit{
		Method: m.Name(), N: n, Season: s, Fitted: fitted, Converged: true,
		Init:    "no initial states: each forecast repeats the value one season earlier",
		Follows: Patterns{Level: true, Season: true},
		train:   clone(y),
		path: func(h int) []float64 {
			out := make([]float64, h)
			for i := range out {
				out[i] = last[i%s]
			}
			return out
		},
	}
	if n > s {
		f.sigma2, f.hasSigma2 = meanSquaredDiff(y, s), true
		f.variance = func(h int) ([]float64, bool) {
			v := make([]float64, h)
			for i := range v {
				v[i] = f.sigma2 * float64(i/s+1)
			}
			return v, true
		}
	}
	return f, nil
}

// Drift extends the line through the first and last values:
// slope = (y[n-1]-y[0])/(n-1), forecast h = y[n-1] + h*slope,
// fitted[t] = y[t-1] + slope. The interval variance is
// sigma^2*h*(1 + h/(n-1)): the random-walk term plus the variance of h
// times the slope, a mean of n-1 differences (hand derivation; the
// handbook above writes T for n-1). sigma^2 is the sum of squared
// deviations of the n-1 differences from the slope over n-2.
type Drift struct{}

// Name returns "drift".
func (Drift) Name() string { return "drift" }

// Fit fits the drift method; it needs at least two values.
func (m Drift) Fit(y []float64, season int) (*Fit, error) {
	if err := checkSeries(m.Name(), y, 2, "a first and a last value"); err != nil {
		return nil, err
	}
	n := len(y)
	slope := (y[n-1] - y[0]) / float64(n-1)
	fitted := nanSlice(n)
	for t := 1; t < n; t++ {
		fitted[t] = y[t-1] + slope
	}
	last := y[n-1]
	f := &Fit{
		Method: m.Name(), N: n, Season: season, Fitted: fitted, Converged: true,
		Params:  []Param{{Name: "slope", Value: slope, Estimated: true}},
		Init:    "no initial states: the slope joins the first and last values",
		Follows: Patterns{Level: true, Trend: true},
		train:   clone(y),
		path: func(h int) []float64 {
			out := make([]float64, h)
			for i := range out {
				out[i] = last + float64(i+1)*slope
			}
			return out
		},
	}
	if n >= 3 {
		ss := 0.0
		for t := 1; t < n; t++ {
			d := y[t] - y[t-1] - slope
			ss += d * d
		}
		f.sigma2, f.hasSigma2 = ss/float64(n-2), true
		f.variance = func(h int) ([]float64, bool) {
			v := make([]float64, h)
			for i := range v {
				k := float64(i + 1)
				v[i] = f.sigma2 * k * (1 + k/float64(n-1))
			}
			return v, true
		}
	}
	return f, nil
}

// Mean forecasts every horizon with the mean of the training values.
// Interval: Student t quantile with n-1 degrees of freedom times the
// sample standard deviation s times sqrt(1+1/n).
type Mean struct{}

// Name returns "mean".
func (Mean) Name() string { return "mean" }

// Fit fits the overall mean; it needs at least one value.
func (m Mean) Fit(y []float64, season int) (*Fit, error) {
	if err := checkSeries(m.Name(), y, 1, "one value"); err != nil {
		return nil, err
	}
	n := len(y)
	mu := mean(y)
	fitted := make([]float64, n)
	for t := range fitted {
		fitted[t] = mu
	}
	f := &Fit{
		Method: m.Name(), N: n, Season: season, Fitted: fitted, Converged: true,
		Params:  []Param{{Name: "mean", Value: mu, Estimated: true}},
		Init:    "no initial states: the forecast is the mean of the training values",
		Follows: Patterns{},
		train:   clone(y), path: flat(mu),
	}
	if n >= 2 {
		ss := 0.0
		for _, v := range y {
			ss += (v - mu) * (v - mu)
		}
		f.sigma2, f.hasSigma2 = ss/float64(n-1), true
		f.df = float64(n - 1)
		f.variance = func(h int) ([]float64, bool) {
			v := make([]float64, h)
			for i := range v {
				v[i] = f.sigma2 * (1 + 1/float64(n))
			}
			return v, true
		}
	}
	return f, nil
}

// meanSquaredDiff returns the mean of the squared lag differences of y
// (len(y) must exceed lag).
func meanSquaredDiff(y []float64, lag int) float64 {
	ss := 0.0
	for t := lag; t < len(y); t++ {
		d := y[t] - y[t-lag]
		ss += d * d
	}
	return ss / float64(len(y)-lag)
}

// clone returns a copy of y.
func clone(y []float64) []float64 { return append([]float64(nil), y...) }

const benchmarkSource = "R. J. Hyndman and G. Athanasopoulos, Forecasting: Principles and Practice, 3rd ed. (2021), sections 5.2 and 5.5"

func naiveSpec() Spec {
	return Spec{
		Name: "naive", Title: "Naive",
		Summary: "Every forecast equals the last value. The yardstick any method must beat.",
		Source:  benchmarkSource,
		Assumes: "the next value is most likely the last one: no trend, no season",
		Follows: Patterns{Level: true},
		New:     func(Settings) (Method, error) { return Naive{}, nil },
	}
}

func seasonalNaiveSpec() Spec {
	return Spec{
		Name: "seasonal-naive", Title: "Seasonal naive",
		Summary: "Each forecast repeats the value of the same period one season earlier.",
		Source:  benchmarkSource,
		Assumes: "a stable seasonal pattern and no trend",
		Follows: Patterns{Level: true, Season: true},
		Params:  []ParamSpec{cycleParam()},
		New: func(s Settings) (Method, error) {
			return SeasonalNaive{Cycle: s.whole("cycle")}, nil
		},
	}
}

func driftSpec() Spec {
	return Spec{
		Name: "drift", Title: "Drift",
		Summary: "Extends the straight line through the first and last values.",
		Source:  benchmarkSource,
		Assumes: "a steady average change per period and no season",
		Follows: Patterns{Level: true, Trend: true},
		New:     func(Settings) (Method, error) { return Drift{}, nil },
	}
}

func meanSpec() Spec {
	return Spec{
		Name: "mean", Title: "Overall mean",
		Summary: "Every forecast equals the mean of the training values.",
		Source:  benchmarkSource,
		Assumes: "values vary around one fixed level: no trend, no season, no shifts",
		New:     func(Settings) (Method, error) { return Mean{}, nil },
	}
}
