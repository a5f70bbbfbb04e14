package forecast

import "math"

// Catalogue entries of the exponential smoothing family.

const smoothingSource = "R. J. Hyndman and G. Athanasopoulos, Forecasting: Principles and Practice, 3rd ed. (2021), sections 8.1-8.3; R. J. Hyndman, A. B. Koehler, J. K. Ord and R. D. Snyder, Forecasting with Exponential Smoothing (2008), chapter 6 (intervals)"

func alphaParam() ParamSpec {
	return ParamSpec{Name: "alpha", Kind: Number, Min: 0, Max: 1,
		Help: "how fast the level follows new values, from 0 (never) to 1 (fully); estimated when left out"}
}

func betaParam() ParamSpec {
	return ParamSpec{Name: "beta", Kind: Number, Min: 0, Max: 1,
		Help: "how fast the trend follows changes of the level, from 0 to 1; estimated when left out"}
}

func gammaParam() ParamSpec {
	return ParamSpec{Name: "gamma", Kind: Number, Min: 0, Max: 1,
		Help: "how fast the seasonal pattern follows new seasons, from 0 to 1; estimated when left out"}
}

func phiParam() ParamSpec {
	return ParamSpec{Name: "phi", Kind: Number, Min: 0.01, Max: 1,
		Help: "how much of the trend carries into each further period (1 = no damping); estimated from 0.8 to 0.995 when left out"}
}

func level0Param() ParamSpec {
	return ParamSpec{Name: "level0", Kind: Number, Min: math.Inf(-1), Max: math.Inf(1),
		Help: "level before the first value; by default set from the first values"}
}

func trend0Param() ParamSpec {
	return ParamSpec{Name: "trend0", Kind: Number, Min: math.Inf(-1), Max: math.Inf(1),
		Help: "trend per period before the first value; by default set from the first values"}
}

func startParam() ParamSpec {
	return ParamSpec{Name: "start", Kind: Choice, Choices: []string{"first-values", "estimated"}, Default: "first-values",
		Help: "how the initial states are set: from the first values by a fixed rule, or estimated with the smoothing constants (slower, closer fit)"}
}

// estimated reports whether the settings ask for estimated initial states.
func estimated(st Settings) bool { return st.word("start", "first-values") == "estimated" }

func sesSpec() Spec {
	return Spec{
		Name: "ses", Title: "Simple exponential smoothing",
		Summary: "A weighted average of past values with weights falling off exponentially; every forecast is the latest smoothed level.",
		Source:  smoothingSource,
		Assumes: "a level that wanders slowly: no trend and no season",
		Follows: Patterns{Level: true},
		Params:  []ParamSpec{alphaParam(), level0Param(), startParam()},
		New: func(st Settings) (Method, error) {
			return Smoothing{Alpha: st.optional("alpha"), Level0: st.optional("level0"), EstimateStates: estimated(st)}, nil
		},
	}
}

func holtSpec() Spec {
	return Spec{
		Name: "holt", Title: "Holt's linear trend",
		Summary: "Smooths a level and a trend; forecasts continue the latest trend in a straight line.",
		Source:  smoothingSource,
		Assumes: "a trend that changes slowly and no season",
		Follows: Patterns{Level: true, Trend: true},
		Params:  []ParamSpec{alphaParam(), betaParam(), level0Param(), trend0Param(), startParam()},
		New: func(st Settings) (Method, error) {
			return Smoothing{Trend: true, Alpha: st.optional("alpha"), Beta: st.optional("beta"),
				Level0: st.optional("level0"), Trend0: st.optional("trend0"), EstimateStates: estimated(st)}, nil
		},
	}
}

func dampedSpec() Spec {
	return Spec{
		Name: "damped", Title: "Damped trend",
		Summary: "Holt's method with the trend fading towards a flat line further ahead; often the safer choice for longer horizons.",
		Source:  smoothingSource + "; E. S. Gardner Jr and E. McKenzie (1985), Management Science 31(10), 1237-1246",
		Assumes: "a trend that will not last forever and no season",
		Follows: Patterns{Level: true, Trend: true},
		Params:  []ParamSpec{alphaParam(), betaParam(), phiParam(), level0Param(), trend0Param(), startParam()},
		New: func(st Settings) (Method, error) {
			return Smoothing{Trend: true, Damped: true, Alpha: st.optional("alpha"), Beta: st.optional("beta"),
				Phi: st.optional("phi"), Level0: st.optional("level0"), Trend0: st.optional("trend0"), EstimateStates: estimated(st)}, nil
		},
	}
}

func holtWintersSpec() Spec {
	return Spec{
		Name: "holt-winters", Title: "Holt-Winters exponential smoothing",
		Summary: "Smooths a level, a trend and a seasonal pattern, added to the level or scaling it.",
		Source:  smoothingSource + "; P. R. Winters (1960), Management Science 6(3), 324-342",
		Assumes: "a seasonal pattern that repeats with slow changes, a slowly changing trend, and at least two full seasons of data; a multiplicative season needs positive values",
		Follows: Patterns{Level: true, Trend: true, Season: true},
		Params: []ParamSpec{
			{Name: "season", Kind: Choice, Choices: []string{"additive", "multiplicative"}, Default: "additive",
				Help: "additive when the seasonal swings stay the same size, multiplicative when they grow with the level"},
			{Name: "damped", Kind: Choice, Choices: []string{"no", "yes"}, Default: "no",
				Help: "yes fades the trend further ahead"},
			alphaParam(), betaParam(), gammaParam(), phiParam(), cycleParam(), level0Param(), trend0Param(),
			{Name: "season0", Kind: List,
				Help: "seasonal states before the first value, one per period of the cycle, separated by commas; by default set from the first season"},
			startParam(),
		},
		New: func(st Settings) (Method, error) {
			m := Smoothing{Trend: true, Season: Additive, Cycle: st.whole("cycle"),
				Alpha: st.optional("alpha"), Beta: st.optional("beta"), Gamma: st.optional("gamma"),
				Phi: st.optional("phi"), Level0: st.optional("level0"), Trend0: st.optional("trend0"),
				EstimateStates: estimated(st)}
			if st.word("season", "additive") == "multiplicative" {
				m.Season = Multiplicative
			}
			m.Damped = st.word("damped", "no") == "yes" || m.Phi != nil
			if v, ok := st["season0"]; ok {
				s0, err := ParseNumbers(v.Word)
				if err != nil {
					return nil, err
				}
				m.Season0 = s0
			}
			return m, nil
		},
	}
}
