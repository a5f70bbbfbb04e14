package forecast

// Naive2 is the naive method applied to the seasonally adjusted series and
// multiplied back by the seasonal indices: the M3 competition's benchmark.
// The series is adjusted by classical multiplicative decomposition only
// when the 90% seasonality test at lag m finds a season (adjust.go);
// otherwise Naive2 is the naive method. The interval is the naive interval
// on the adjusted series (sigma^2 the mean squared first difference)
// scaled by the seasonal index.
//
// Source: S. Makridakis and M. Hibon (2000), "The M3-Competition: results,
// conclusions and implications", International Journal of Forecasting
// 16(4), 451-476; S. Makridakis, S. C. Wheelwright and R. J. Hyndman,
// Forecasting: Methods and Applications, 3rd ed. (1998), section 2/5.
type Naive2 struct {
	Cycle int // season length; 0 takes the series' own; 1 skips seasonal adjustment
}

// Name returns "naive2".
func (Naive2) Name() string { return "naive2" }

// Fit fits naive2; it needs at least one value.
func (nv Naive2) Fit(y []float64, season int) (*Fit, error) {
	name := nv.Name()
	if err := checkSeries(name, y, 1, "one value"); err != nil {
		return nil, err
	}
	adj, z, note := adjustSeason(name, y, seasonLength(nv.Cycle, season))
	inner, err := Naive{}.Fit(z, 0)
	if err != nil {
		return nil, err
	}
	n := len(y)
	f := &Fit{
		Method: name, N: n, Season: season, Fitted: adj.reseason(clone(inner.Fitted), 0), Converged: true,
		States:  adj.states(),
		Init:    "no initial states: the forecast is the last seasonally adjusted value, times the seasonal index",
		Follows: Patterns{Level: true, Season: adj.indices != nil},
		train:   clone(y),
		path: func(h int) []float64 {
			return adj.reseason(inner.Forecast(h), n)
		},
	}
	if s2, ok := inner.Sigma2(); ok {
		f.sigma2, f.hasSigma2 = s2, true
		f.variance = func(h int) ([]float64, bool) {
			v := make([]float64, h)
			for i := range v {
				k := adj.index(n + i)
				v[i] = s2 * float64(i+1) * k * k
			}
			return v, true
		}
	}
	if note != "" {
		f.Notes = append(f.Notes, note)
	}
	return f, nil
}

func naive2Spec() Spec {
	return Spec{
		Name: "naive2", Title: "Naive on seasonally adjusted data",
		Summary: "The last seasonally adjusted value, put back into season; the plain naive method when a test finds no season.",
		Source:  "S. Makridakis and M. Hibon (2000), International Journal of Forecasting 16(4), 451-476",
		Assumes: "no trend; a season, if any, that scales with the level",
		Follows: Patterns{Level: true, Season: true},
		Params:  []ParamSpec{cycleParam()},
		New: func(st Settings) (Method, error) {
			return Naive2{Cycle: st.whole("cycle")}, nil
		},
	}
}
