package forecast

import (
	"fmt"
	"strings"
)

// Combination averages the fitted values and forecasts of several methods
// with equal weights, such as the M3 benchmark of ses, holt and damped.
// Each member is fitted to the same series; if one fails, the combination
// fails with that member's reason. It has no analytic interval (the
// members' errors are correlated by an unknown amount); use empirical
// intervals from a backtest.
//
// Source: S. Makridakis and M. Hibon (2000), "The M3-Competition: results,
// conclusions and implications", International Journal of Forecasting
// 16(4), 451-476 (the equal-weight combination of single, Holt and damped
// smoothing); R. T. Clemen (1989), "Combining forecasts: a review and
// annotated bibliography", International Journal of Forecasting 5(4),
// 559-583.
type Combination struct {
	Methods []Method // members, at least two
}

// Name returns "comb-" followed by the members' names joined by "-", such
// as "comb-ses-holt-damped".
func (c Combination) Name() string {
	names := make([]string, len(c.Methods))
	for i, m := range c.Methods {
		names[i] = m.Name()
	}
	return "comb-" + strings.Join(names, "-")
}

// Fit fits every member and averages them.
func (c Combination) Fit(y []float64, season int) (*Fit, error) {
	if len(c.Methods) < 2 {
		return nil, settingError("a combination needs at least two methods, such as of=ses,holt,damped")
	}
	n := len(y)
	fits := make([]*Fit, len(c.Methods))
	f := &Fit{Method: c.Name(), N: n, Season: season, Converged: true, train: clone(y),
		Init: "each member sets its own initial states"}
	for i, m := range c.Methods {
		fi, err := m.Fit(y, season)
		if err != nil {
			return nil, fmt.Errorf("combination member %s: %w", m.Name(), err)
		}
		fits[i] = fi
		f.Converged = f.Converged && fi.Converged
		f.Follows.Level = f.Follows.Level || fi.Follows.Level
		f.Follows.Trend = f.Follows.Trend || fi.Follows.Trend
		f.Follows.Season = f.Follows.Season || fi.Follows.Season
		f.Evaluations += fi.Evaluations
		for _, p := range fi.Params {
			p.Name = m.Name() + "." + p.Name
			f.Params = append(f.Params, p)
		}
		for _, p := range fi.States {
			p.Name = m.Name() + "." + p.Name
			f.States = append(f.States, p)
		}
		for _, note := range fi.Notes {
			f.Notes = append(f.Notes, m.Name()+": "+note)
		}
	}
	f.Fitted = average(len(fits), func(i int) []float64 { return fits[i].Fitted })
	f.path = func(h int) []float64 {
		return average(len(fits), func(i int) []float64 { return fits[i].Forecast(h) })
	}
	return f, nil
}

// average returns the element-wise mean of k slices of equal length; an
// element is NaN when any member lacks it (NaN propagates through the sum).
func average(k int, get func(i int) []float64) []float64 {
	out := clone(get(0))
	for i := 1; i < k; i++ {
		for t, v := range get(i) {
			out[t] += v
		}
	}
	for t := range out {
		out[t] /= float64(k)
	}
	return out
}

func combinationSpec() Spec {
	return Spec{
		Name: "combination", Title: "Equal-weight combination",
		Summary: "The average of the forecasts of several methods; often more accurate than any one of them.",
		Source:  "S. Makridakis and M. Hibon (2000), International Journal of Forecasting 16(4), 451-476",
		Assumes: "what each member assumes; the members' errors partly cancel",
		Follows: Patterns{Level: true, Trend: true, Season: true},
		Params: []ParamSpec{{Name: "of", Kind: List, Default: "ses,holt,damped",
			Help: "methods to average, separated by commas; each uses its default settings"}},
		New: func(st Settings) (Method, error) {
			var members []Method
			for _, name := range strings.Split(st.word("of", "ses,holt,damped"), ",") {
				name = strings.TrimSpace(name)
				sp, ok := Lookup(name)
				if !ok || name == "combination" {
					return nil, settingError("of=%s: %q is not a method that can be combined; write names such as ses,holt,damped", st.word("of", ""), name)
				}
				m, err := sp.New(nil)
				if err != nil {
					return nil, err
				}
				members = append(members, m)
			}
			if len(members) < 2 {
				return nil, settingError("a combination needs at least two methods, such as of=ses,holt,damped")
			}
			return Combination{Methods: members}, nil
		},
	}
}
