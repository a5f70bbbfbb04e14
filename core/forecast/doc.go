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
// # Methods
//
//   - benchmarks: [Naive], [SeasonalNaive], [Drift], [Mean] (benchmark.go)
//     and the trailing [MovingAverage];
//   - exponential smoothing, [Smoothing]: ses, holt, damped and
//     holt-winters, additive or multiplicative, damped or not; open
//     constants are estimated by minimising the in-sample one-step SSE
//     with an exact gradient and a small bounded quasi-Newton loop
//     (boxmin.go); initial states come from the first values, or are
//     estimated too with start=estimated ([Smoothing.EstimateStates]);
//   - [Regression] on a linear, quadratic or exponential trend with
//     seasonal dummies;
//   - [Theta] and [Naive2], with the M3 seasonal adjustment;
//   - transforms and blends: [Differenced] and [Combination].
//
// # Conventions
//
// Series positions are 0-based periods, horizons count from 1. A season
// length of 0 or 1 means no season. Errors never panic on user input: a
// series too short, a season too long, a non-positive value under a
// multiplicative season and a bad setting each return an [*Error] whose
// message says what is needed, with a cause for errors.Is.
package forecast
