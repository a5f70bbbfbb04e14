// Package accuracy scores forecasts against what happened: the point
// measures ME, MAE, MSE, RMSE, MAPE, MPE, sMAPE and MASE, and the coverage
// and Winkler score of prediction intervals.
//
// # Where to start
//
// [Evaluate] scores a forecast against the actual values of the same
// periods and returns [Scores], from which [Scores.Of] gives one [Result]
// per [Measure]. MASE needs a [Scale] made from the training series by
// [NaiveScale]. [ParseMeasure] reads a measure's name as written in steps
// ("rmse", "mase"), and [Measure.Definition] gives the plain definition to
// print in the page and the memo. [ScoreIntervals] scores prediction
// intervals by coverage and the [Winkler] score. [Tally] and
// [IntervalTally] gather the same scores one period at a time, for
// rolling-origin evaluation by horizon.
//
//	scale := accuracy.NaiveScale(train, 12) // seasonal naive scaling
//	s := accuracy.Evaluate(actual, forecast, scale)
//	if r := s.Of(accuracy.MAPE); !r.Defined {
//		fmt.Println(r.Reason) // MAPE undefined: 3 actual values are zero
//	}
//
// # Conventions
//
// The error of a period is e = actual - forecast, so a positive ME means the
// forecasts were too low. Percentage measures are in percent. A period where
// the actual value or the forecast is NaN or infinite is left out and
// counted in [Scores.Skipped].
//
// A measure that cannot be computed (MAPE with a zero actual value, MASE on
// a constant training series, anything on no periods) is reported as
// undefined with the reason in plain words; a [Result] never holds NaN or
// an infinity.
package accuracy
