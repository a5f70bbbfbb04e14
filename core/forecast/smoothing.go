package forecast

import (
	"fmt"
	"math"
	"strconv"
)

// Smoothing is exponential smoothing in weighted-average form: simple
// exponential smoothing (no trend, no season), Holt's linear trend, the
// damped trend, and Holt-Winters with an additive or multiplicative season,
// damped or not. The equations are in smoothing_recursion.go.
//
// A nil constant is estimated by minimising the in-sample SSE of one-step
// errors (smoothing_optimize.go); a nil initial state is set by the
// heuristic of smoothing_init.go. Alpha, Beta and Gamma lie in [0, 1] and
// Phi in (0, 1]; estimated values of Phi lie in [0.8, 0.995].
//
// The analytic interval is the state-space one with additive errors
// (smoothing_interval.go), and for a multiplicative season the approximate
// one with errors proportional to the forecast
// (smoothing_interval_mult.go), whose relative variance is reported in
// Stats as "relative-sigma2".
//
// Sources: R. G. Brown (1959), Statistical Forecasting for Inventory
// Control (simple smoothing); C. C. Holt (1957, reprinted 2004),
// "Forecasting seasonals and trends by exponentially weighted moving
// averages", International Journal of Forecasting 20(1), 5-10; P. R.
// Winters (1960), "Forecasting sales by exponentially weighted moving
// averages", Management Science 6(3), 324-342; E. S. Gardner Jr and E.
// McKenzie (1985), "Forecasting trends in time series", Management Science
// 31(10), 1237-1246 (damped trend).
type Smoothing struct {
	Trend  bool       // follow a trend (Holt)
	Damped bool       // damp the trend towards a flat line (needs Trend)
	Season SeasonKind // seasonal form; NoSeason for ses, holt and damped
	Cycle  int        // season length; 0 takes the series' own

	Alpha, Beta, Gamma, Phi *float64  // fixed constants; nil estimates them
	Level0, Trend0          *float64  // fixed initial states; nil uses the heuristic
	Season0                 []float64 // fixed initial seasonal states, one per period of the cycle

	// EstimateStates estimates the initial states not given by hand
	// together with the open constants (smoothing_start.go) instead of
	// taking them from the heuristic.
	EstimateStates bool
}

// Name returns "ses", "holt", "damped" or "holt-winters".
func (s Smoothing) Name() string {
	switch {
	case s.Season != NoSeason:
		return "holt-winters"
	case s.Trend && s.Damped:
		return "damped"
	case s.Trend:
		return "holt"
	}
	return "ses"
}

// Fit fits the method to y. It needs at least 2 values for ses, 3 with a
// trend, and two full seasons under a season (so a season longer than half
// the series is refused); a multiplicative season needs positive values.
func (s Smoothing) Fit(y []float64, season int) (*Fit, error) {
	name := s.Name()
	form := esForm{trend: s.Trend, season: s.Season, m: 1}
	switch {
	case s.Season != NoSeason:
		form.m = seasonLength(s.Cycle, season)
		if form.m < 2 {
			return nil, &Error{Cause: ErrSeason, Msg: name + " needs a season of at least 2 periods; give the series a period such as month or quarter, or write cycle=12"}
		}
		if err := checkSeries(name, y, 2*form.m, fmt.Sprintf("two full seasons of %d periods; a season longer than half the series cannot be estimated", form.m)); err != nil {
			return nil, err
		}
	case s.Trend:
		if err := checkSeries(name, y, 3, "two to start the trend and one to learn from"); err != nil {
			return nil, err
		}
	default:
		if err := checkSeries(name, y, 2, "one to start the level and one to learn from"); err != nil {
			return nil, err
		}
	}
	if s.Season == Multiplicative {
		if err := checkPositive(name, "a multiplicative season scales each period by a ratio to the level", y); err != nil {
			return nil, err
		}
	}
	pr, err := s.problem(form, y)
	if err != nil {
		return nil, err
	}
	init, how := pr.init, "initial states given by hand"
	if s.Level0 == nil || (s.Trend && s.Trend0 == nil) || (s.Season != NoSeason && s.Season0 == nil) {
		_, how = form.heuristicStates(y)
		if s.Level0 != nil || s.Trend0 != nil || s.Season0 != nil {
			how = "the states not given by hand: " + how
		}
	}
	sol := pr.solve()
	if open := s.openStates(form); s.EstimateStates && len(open) > 0 {
		sol, init = pr.solveStates(sol, open)
		how = "the initial states not given by hand were estimated with the constants by minimising the in-sample squared error, starting from the first values (" + how + ")"
	}
	tr := form.run(y, sol.p, init)
	if math.IsInf(tr.sse, 0) || math.IsNaN(tr.sse) {
		return nil, &Error{Cause: ErrNotPositive, Msg: name + " broke down on this series: the smoothed level reached zero, so the seasonal ratios cannot be formed; use an additive season"}
	}
	n := len(y)
	f := &Fit{
		Method: name, N: n, Season: season, Fitted: tr.fitted,
		Init: how, Converged: sol.converged,
		Follows:    Patterns{Level: true, Trend: s.Trend, Season: s.Season != NoSeason},
		train:      clone(y),
		sigma2:     tr.sse / float64(n),
		hasSigma2:  true,
		Components: map[string][]float64{"level": tr.level},
	}
	if len(pr.free) > 0 || s.EstimateStates {
		f.Evaluations = sol.evals
	}
	if s.Season != NoSeason {
		f.Season = form.m
		f.Components["season"] = tr.season
	}
	if s.Trend {
		f.Components["trend"] = tr.trend
	}
	f.Params, f.States = s.report(form, sol.p, init, pr.free)
	f.Stats = []Param{
		{Name: "sse", Value: tr.sse, Estimated: true},
		{Name: "sigma2", Value: f.sigma2, Estimated: true},
	}
	phi := sol.p[iPhi]
	f.path = func(h int) []float64 { return form.path(n, tr.last, phi, h) }
	f.variance = etsVariance(form, sol.p, f.sigma2)
	f.Notes = boundNotes(name, sol, pr.free)
	if s.Season == Multiplicative {
		f.Notes = append(f.Notes, multSeasonInterval(f, form, sol.p, tr))
	}
	return f, nil
}

// openStates lists the initial states not given by hand, as indices of
// the full variable layout (smoothing_fullgrad.go).
func (s Smoothing) openStates(form esForm) []int {
	var open []int
	if s.Level0 == nil {
		open = append(open, nConst)
	}
	if s.Trend && s.Trend0 == nil {
		open = append(open, nConst+1)
	}
	if s.Season != NoSeason && s.Season0 == nil {
		for j := range form.m {
			open = append(open, nConst+2+j)
		}
	}
	return open
}

// problem checks the fixed constants and states and sets up the estimation.
func (s Smoothing) problem(form esForm, y []float64) (*esProblem, error) {
	pr := &esProblem{form: form, y: y, start: [nConst]float64{0.5, 0.1, 0.1, 1}}
	type fixed struct {
		k     int
		v     *float64
		used  bool
		label string
	}
	for _, c := range []fixed{
		{iAlpha, s.Alpha, true, "alpha"},
		{iBeta, s.Beta, s.Trend, "beta"},
		{iGamma, s.Gamma, s.Season != NoSeason, "gamma"},
		{iPhi, s.Phi, s.Trend && s.Damped, "phi"},
	} {
		if !c.used {
			continue
		}
		if c.v == nil {
			pr.free = append(pr.free, c.k)
			if c.k == iPhi {
				pr.start[c.k] = 0.98
			}
			continue
		}
		if c.k == iPhi && !(*c.v > 0 && *c.v <= 1) {
			return nil, settingError("phi=%s for %s is out of range; write a value above 0 and at most 1, such as 0.9", fmtNum(*c.v), s.Name())
		}
		if !(*c.v >= 0 && *c.v <= 1) {
			return nil, settingError("%s=%s for %s is out of range; write a value from 0 to 1", c.label, fmtNum(*c.v), s.Name())
		}
		pr.start[c.k] = *c.v
	}
	init, _ := form.heuristicStates(y)
	if s.Level0 != nil {
		init.level = *s.Level0
	}
	if s.Trend && s.Trend0 != nil {
		init.trend = *s.Trend0
	}
	if s.Season != NoSeason && s.Season0 != nil {
		if len(s.Season0) != form.m {
			return nil, settingError("season0 for %s has %d values but the season has %d periods; give one initial seasonal state per period", s.Name(), len(s.Season0), form.m)
		}
		init.season = clone(s.Season0)
	}
	pr.init = init
	return pr, nil
}

// report lists the constants and initial states in catalogue order.
func (s Smoothing) report(form esForm, p [nConst]float64, init esStates, free []int) (params, states []Param) {
	est := func(k int) bool {
		for _, c := range free {
			if c == k {
				return true
			}
		}
		return false
	}
	params = append(params, Param{Name: "alpha", Value: p[iAlpha], Estimated: est(iAlpha)})
	if s.Trend {
		params = append(params, Param{Name: "beta", Value: p[iBeta], Estimated: est(iBeta)})
	}
	if s.Season != NoSeason {
		params = append(params, Param{Name: "gamma", Value: p[iGamma], Estimated: est(iGamma)})
	}
	if s.Trend && s.Damped {
		params = append(params, Param{Name: "phi", Value: p[iPhi], Estimated: est(iPhi)})
	}
	states = append(states, Param{Name: "level0", Value: init.level, Estimated: s.Level0 == nil})
	if s.Trend {
		states = append(states, Param{Name: "trend0", Value: init.trend, Estimated: s.Trend0 == nil})
	}
	if s.Season != NoSeason {
		for i, v := range init.season {
			states = append(states, Param{Name: "season0[" + strconv.Itoa(i+1) + "]", Value: v, Estimated: s.Season0 == nil})
		}
	}
	return params, states
}

// boundNotes explains estimated constants that ended on a bound and a
// search that did not converge.
func boundNotes(name string, sol esSolution, free []int) []string {
	var notes []string
	for _, c := range free {
		lo, hi := constBounds(c)
		v := sol.p[c]
		switch {
		case v <= lo+1e-9:
			notes = append(notes, fmt.Sprintf("%s was estimated at its lower bound %s: %s", constName(c), fmtNum(lo), boundMeaning(c, true)))
		case v >= hi-1e-9:
			notes = append(notes, fmt.Sprintf("%s was estimated at its upper bound %s: %s", constName(c), fmtNum(hi), boundMeaning(c, false)))
		}
	}
	if !sol.converged {
		notes = append(notes, "the search for the smoothing constants of "+name+" stopped before it converged; the values shown are the best found")
	}
	return notes
}

func boundMeaning(c int, lower bool) string {
	switch {
	case c == iAlpha && lower:
		return "the level never moves from its start"
	case c == iAlpha:
		return "each forecast follows the last value fully, as the naive method does"
	case c == iBeta && lower:
		return "the trend stays at its starting value"
	case c == iBeta:
		return "the trend follows every change of the level"
	case c == iGamma && lower:
		return "the seasonal pattern stays as it started"
	case c == iGamma:
		return "the seasonal pattern follows each new season fully"
	case c == iPhi && lower:
		return "the trend dies out within a few periods"
	}
	return "the trend is hardly damped"
}

// constName returns the name of constant k.
func constName(k int) string {
	return [...]string{"alpha", "beta", "gamma", "phi"}[k]
}
