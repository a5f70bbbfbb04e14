package forecast

import (
	"fmt"
	"math"
)

// Theta is the Theta method of V. Assimakopoulos and K. Nikolopoulos
// (2000), "The theta model: a decomposition approach to forecasting",
// International Journal of Forecasting 16(4), 521-530, in the equivalent
// form shown by R. J. Hyndman and B. Billah (2003), "Unmasking the Theta
// method", International Journal of Forecasting 19(2), 287-290: simple
// exponential smoothing with a drift of half the least squares slope b0,
//
//	forecast h = l_n + (b0/2) * (h - 1 + (1 - (1-alpha)^n) / alpha),
//
// where l_n and alpha come from simple exponential smoothing (level0 =
// y[0], alpha estimated unless Alpha is set) and b0 is the slope of the
// straight line fitted to the series against time. Before fitting, the
// series is seasonally adjusted by classical multiplicative decomposition
// when the 90% seasonality test at lag m finds a season (adjust.go), and
// the forecasts are multiplied back by the seasonal indices.
//
// The one-step fitted value of period t uses the same formula with h = 1
// from the origin t-1 (t values seen). The analytic interval is that of
// simple exponential smoothing around the Theta forecast, scaled by the
// seasonal index; it leaves out the uncertainty of the drift, as the
// standard implementation does (from memory), so it is too narrow.
type Theta struct {
	Alpha *float64 // fixed smoothing constant; nil estimates it
	Cycle int      // season length; 0 takes the series' own; 1 skips seasonal adjustment
}

// Name returns "theta".
func (Theta) Name() string { return "theta" }

// Fit fits the Theta method; it needs at least 3 values.
func (th Theta) Fit(y []float64, season int) (*Fit, error) {
	name := th.Name()
	if err := checkSeries(name, y, 3, "two to draw the trend line and one to learn from"); err != nil {
		return nil, err
	}
	m := seasonLength(th.Cycle, season)
	adj, z, note := adjustSeason(name, y, m)
	ses, err := Smoothing{Alpha: th.Alpha}.Fit(z, 0)
	if err != nil {
		return nil, err
	}
	n := len(y)
	b0 := lineSlope(z)
	alpha := ses.Params[0].Value
	level := ses.Components["level"]
	// weight returns (1 - (1-alpha)^k)/alpha, which tends to k as alpha -> 0.
	weight := func(k int) float64 {
		if alpha < 1e-10 {
			return float64(k)
		}
		return (1 - math.Pow(1-alpha, float64(k))) / alpha
	}
	level0 := ses.States[0].Value
	fitted := make([]float64, n)
	for t := range n {
		prev := level0
		if t > 0 {
			prev = level[t-1]
		}
		fitted[t] = (prev + b0/2*weight(t)) * adj.index(t)
	}
	lastLevel, wn := level[n-1], weight(n)
	f := &Fit{
		Method: name, N: n, Season: season, Fitted: fitted, Converged: ses.Converged,
		Params: []Param{
			ses.Params[0],
			{Name: "drift", Value: b0 / 2, Estimated: true},
		},
		States:      append([]Param{ses.States[0]}, adj.states()...),
		Init:        "level0 is the first seasonally adjusted value; drift is half the slope of the least squares line through the adjusted series",
		Follows:     Patterns{Level: true, Trend: true, Season: adj.indices != nil},
		train:       clone(y),
		Evaluations: ses.Evaluations,
		path: func(h int) []float64 {
			out := make([]float64, h)
			for i := range out {
				out[i] = lastLevel + b0/2*(float64(i)+wn)
			}
			return adj.reseason(out, n)
		},
	}
	f.sigma2, f.hasSigma2 = ses.Sigma2()
	f.variance = func(h int) ([]float64, bool) {
		v := make([]float64, h)
		for i := range v {
			k := adj.index(n + i)
			v[i] = f.sigma2 * (1 + alpha*alpha*float64(i)) * k * k
		}
		return v, true
	}
	if note != "" {
		f.Notes = append(f.Notes, note)
	}
	f.Notes = append(f.Notes, ses.Notes...)
	f.Notes = append(f.Notes, fmt.Sprintf("the interval is that of simple exponential smoothing and leaves out the uncertainty of the drift (%s per period), so it is too narrow", fmtNum(b0/2)))
	return f, nil
}

// lineSlope returns the least squares slope of z against time.
func lineSlope(z []float64) float64 {
	n := float64(len(z))
	tm := (n - 1) / 2
	zm := mean(z)
	num, den := 0.0, 0.0
	for t, v := range z {
		d := float64(t) - tm
		num += d * (v - zm)
		den += d * d
	}
	return num / den
}

func thetaSpec() Spec {
	return Spec{
		Name: "theta", Title: "Theta method",
		Summary: "Simple exponential smoothing plus half the slope of the long-run trend line, after seasonal adjustment when a test finds a season.",
		Source:  "V. Assimakopoulos and K. Nikolopoulos (2000), International Journal of Forecasting 16(4), 521-530; R. J. Hyndman and B. Billah (2003), International Journal of Forecasting 19(2), 287-290",
		Assumes: "a steady long-run trend around which the level wanders; a season, if any, that scales with the level",
		Follows: Patterns{Level: true, Trend: true, Season: true},
		Params:  []ParamSpec{alphaParam(), cycleParam()},
		New: func(st Settings) (Method, error) {
			return Theta{Alpha: st.optional("alpha"), Cycle: st.whole("cycle")}, nil
		},
	}
}
