// Package backtest answers "how well would this method have done?" for one
// series: it splits the series into a training and a validation period,
// rolls the forecast origin through the training data, turns the
// out-of-sample errors into empirical prediction intervals, sweeps a
// parameter over a grid, and chooses a method automatically from
// rolling-origin accuracy.
//
// # Positions
//
// Every position is a 0-based period of the series and every range is
// half-open: a range [Start, End) holds the periods Start, Start+1, ...,
// End-1. Converting a calendar period such as 2024-01 into a position is the
// caller's job. Horizons count from 1: horizon 1 is the first period after
// a forecast origin.
//
// # Where to start
//
//   - [Holdout.Split] makes one training and one validation period.
//   - [Folds] lists the folds of a rolling-origin evaluation and [Run]
//     scores a method on them, by horizon, with interval coverage and the
//     Winkler score.
//   - [Empirical] turns the errors of a run into prediction intervals for
//     any method.
//   - [SweepMovingAverage] and [SweepGrid] show accuracy against a
//     parameter (the moving-average width, a smoothing constant) on
//     training and validation at once.
//   - [Auto] is a forecast method named "auto" that ranks candidates by
//     rolling-origin accuracy inside the training data ([Auto.Rank] gives
//     the ranking and its evidence) and fits the equal-weight combination
//     of the best few; [AutoSpec] is its catalogue entry for the step
//     language.
//
// # References
//
// Tashman, L. J. (2000). Out-of-sample tests of forecasting accuracy: an
// analysis and review. International Journal of Forecasting 16(4), 437-450
// (rolling origin, expanding and fixed windows).
//
// Hyndman, R. J. and Athanasopoulos, G. (2021). Forecasting: Principles and
// Practice, 3rd edition, OTexts, sections 5.8 (time series cross-validation)
// and 5.5 (prediction intervals from errors).
package backtest
