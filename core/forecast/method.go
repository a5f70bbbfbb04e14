package forecast

// This file holds the contract every forecasting method meets and the
// catalogue through which the step language, the rolling-origin evaluation
// and the bake-off find methods by name. A new method is one new file that
// implements [Method] plus one entry in the catalogue.

// Method fits one forecasting method to a training series.
//
// y holds the training values in time order, oldest first; it must not
// contain NaN (the caller fills or refuses gaps first). season is the number
// of periods in one seasonal cycle (12 for monthly data, 4 for quarterly);
// 0 or 1 means the series has no season. Fit never changes y.
//
// Fit returns an error, never a panic, when the series does not suit the
// method (too short, non-positive values under a multiplicative season,
// constant series where the method cannot work); the message says what is
// needed in words a forecaster can act on.
type Method interface {
	// Name is the method's label as written in steps and tables,
	// for example "holt-winters" or "moving-average".
	Name() string
	// Fit estimates any parameters left open from y and returns the fitted model.
	Fit(y []float64, season int) (*Fit, error)
}

// Patterns says which patterns of a series a method can follow.
type Patterns struct {
	Level  bool // follows a changing level
	Trend  bool // follows a trend
	Season bool // follows a seasonal pattern
}

// Param is one parameter or initial state of a fitted method.
type Param struct {
	Name      string  // as written in steps: "alpha", "width", "level0"
	Value     float64 // the value used
	Estimated bool    // true when chosen by the fit, false when given by the user
}

// Fit is a method fitted to a training series of length N.
//
// Positions are 0-based periods of the training series. Forecast horizons
// count from 1: horizon 1 is the period right after the last training value.
type Fit struct {
	Method    string    // the method's Name
	N         int       // length of the training series
	Season    int       // season length used; 0 or 1 when none
	Fitted    []float64 // one-step in-sample predictions, length N; NaN where the method has none yet
	Params    []Param   // parameters in catalogue order, estimated ones marked
	States    []Param   // initial states (level0, trend0, season0[1], ...)
	Init      string    // one sentence on how the initial states were set
	Converged bool      // the optimiser converged; true when nothing was estimated
	Follows   Patterns  // patterns this fit can follow
	Notes     []string  // plain-words remarks for the reader (a parameter on its bound, ...)

	// Components holds the state paths after each period, length N, for
	// methods with states: "level", "trend", "season". Nil otherwise.
	Components map[string][]float64
	// Stats holds further fitted statistics where the method has them,
	// such as "r2", "residual-se" and standard errors "se(trend)".
	Stats []Param
	// Evaluations counts evaluations of the in-sample error made while
	// estimating parameters; 0 when nothing was estimated.
	Evaluations int

	// train is a copy of the training series, for [Fit.Residuals].
	train []float64
	// path returns the point forecasts for horizons 1..h.
	path func(h int) []float64
	// variance returns the forecast-error variance for horizons 1..h and
	// whether an analytic formula exists for this method.
	variance func(h int) ([]float64, bool)
	// df is the degrees of freedom of the Student t quantile used by
	// [Fit.Interval]; 0 means the standard normal quantile.
	df float64
	// bounds, when set, replaces the symmetric interval built from variance
	// (for example a regression on logs whose interval is skewed).
	bounds func(h int, level float64) (lo, hi []float64, ok bool)
	// sigma2 is the one-step error variance behind the analytic intervals;
	// hasSigma2 says whether it was estimated.
	sigma2    float64
	hasSigma2 bool
}
