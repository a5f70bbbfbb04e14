package forecast

import (
	"fmt"
	"strconv"
)

// Differenced fits Inner to the lag-Lag differences d[t] = y[t+Lag] - y[t]
// of the series (Lag 1 removes a trend, Lag m a season) and maps the
// results back to the original scale:
//
//	fitted[t]   = y[t-Lag] + inner fitted d[t-Lag]      (NaN for t < Lag)
//	forecast(h) = value Lag periods earlier (observed, or forecast when
//	              h > Lag) + inner forecast of d at horizon h
//
// Differencing twice is a Differenced whose Inner is a Differenced. It has
// no analytic interval (the inner errors accumulate with correlations the
// inner variances do not give); use empirical intervals from a backtest.
//
// Source: G. E. P. Box, G. M. Jenkins, G. C. Reinsel and G. M. Ljung, Time
// Series Analysis: Forecasting and Control, 5th ed. (2015), section 4.1
// (differencing); R. J. Hyndman and G. Athanasopoulos, Forecasting:
// Principles and Practice, 3rd ed. (2021), section 9.1.
type Differenced struct {
	Lag   int    // periods between the values subtracted, at least 1
	Inner Method // method fitted to the differences
}

// Name returns "diff<Lag>-" followed by the inner method's name, such as
// "diff12-naive".
func (d Differenced) Name() string {
	inner := "none"
	if d.Inner != nil {
		inner = d.Inner.Name()
	}
	return "diff" + strconv.Itoa(d.Lag) + "-" + inner
}

// Fit differences y, fits Inner and integrates back. It needs at least
// Lag+1 values, and as many more as Inner needs.
func (d Differenced) Fit(y []float64, season int) (*Fit, error) {
	name := d.Name()
	if d.Lag < 1 {
		return nil, settingError("difference lag %d is not accepted; write a whole number of periods of at least 1, such as 1 or 12", d.Lag)
	}
	if d.Inner == nil {
		return nil, settingError("differencing needs a method to fit to the differences")
	}
	if err := checkSeries(name, y, d.Lag+1, fmt.Sprintf("one lag of %d periods plus one difference", d.Lag)); err != nil {
		return nil, err
	}
	n, lag := len(y), d.Lag
	diffs := make([]float64, n-lag)
	for t := range diffs {
		diffs[t] = y[t+lag] - y[t]
	}
	in, err := d.Inner.Fit(diffs, season)
	if err != nil {
		return nil, fmt.Errorf("on the lag-%d differences: %w", lag, err)
	}
	fitted := nanSlice(n)
	for t := lag; t < n; t++ {
		fitted[t] = y[t-lag] + in.Fitted[t-lag]
	}
	tail := clone(y[n-lag:])
	f := &Fit{
		Method: name, N: n, Season: season, Fitted: fitted, Converged: in.Converged,
		Params:      append([]Param{{Name: "lag", Value: float64(lag)}}, in.Params...),
		States:      in.States,
		Stats:       in.Stats,
		Init:        fmt.Sprintf("on the lag-%d differences: %s", lag, in.Init),
		Follows:     in.Follows,
		Evaluations: in.Evaluations,
		train:       clone(y),
		path: func(h int) []float64 {
			dh := in.Forecast(h)
			out := make([]float64, h)
			for i := range out {
				base := 0.0
				if i < lag {
					base = tail[i]
				} else {
					base = out[i-lag]
				}
				out[i] = base + dh[i]
			}
			return out
		},
	}
	if lag == 1 {
		f.Follows.Level, f.Follows.Trend = true, true
	} else {
		f.Follows.Level, f.Follows.Season = true, true
	}
	f.Notes = append([]string{fmt.Sprintf("%s was fitted to the lag-%d differences and its forecasts added back to the last values", d.Inner.Name(), lag)}, in.Notes...)
	return f, nil
}
