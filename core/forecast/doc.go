// Package forecast fits forecasting methods to a training series and
// returns their fitted values, forecasts, parameters, initial states and
// prediction intervals.
//
// # Where to start
//
// [Catalog] lists every method with its parameters; [Lookup] finds one by
// the name written in steps ("naive", "holt-winters", ...), and its New
// builds a [Method] from the user's [Settings]. [Method.Fit] returns a
// [Fit]: [Fit.Forecast] gives point forecasts for horizons 1..h,
// [Fit.Residuals] the in-sample one-step errors, and [Fit.Interval] the
// analytic prediction interval where a standard formula exists.
//
// # Conventions
//
// Series positions are 0-based periods, horizons count from 1. A season
// length of 0 or 1 means no season. Errors never panic on user input: a
// series too short, a season too long, a non-positive value under a
// multiplicative season and a bad setting each return an [*Error] whose
// message says what is needed, with a cause for errors.Is.
package forecast
