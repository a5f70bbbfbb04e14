package backtest

import (
	"fmt"
	"math"
)

// Range is an inclusive range of whole-number parameter values, such as
// the widths 2..24 of a moving-average sweep.
type Range struct {
	From, To int
}

// Errors sums up the one-step or holdout errors of one parameter value.
// N is the number of errors; when N is 0 the other fields are 0 and mean
// nothing.
type Errors struct {
	N    int
	MSE  float64 // mean squared error
	RMSE float64 // square root of MSE
	MAE  float64 // mean absolute error
}

// WidthRow holds the accuracy of the trailing moving average of one width.
type WidthRow struct {
	Width int
	// Own scores the one-step forecasts of training periods Width..T-1 (T
	// the training length): each width on every period it can forecast,
	// so wider windows are scored on fewer periods.
	Own Errors
	// Common scores the one-step forecasts of training periods W..T-1 for
	// every width, W being the widest width of the sweep: a like-for-like
	// comparison.
	Common Errors
	// Validation scores the flat forecast made at the end of training (the
	// mean of the last Width training values) against every validation
	// period; N is 0 when there is no validation period.
	Validation Errors
}

// WidthSweep is the accuracy of the trailing moving average against its
// width, on training and validation at once.
type WidthSweep struct {
	Rows []WidthRow // one per width, narrowest first
	// Best is the width with the lowest training RMSE on the common window,
	// the fair comparison; BestOwn uses each width's own window and
	// BestValidation the validation period (0 when there is none). Ties go
	// to the narrower width.
	Best, BestOwn, BestValidation int
	// Explanation says in plain words what the sweep shows: where a narrow
	// window chases noise and a wide one flattens the pattern.
	Explanation string
}

// SweepMovingAverage scores the trailing moving average for every width in
// widths on the series y, training on [0, trainEnd) and validating on
// [trainEnd, len(y)); trainEnd 0 means the whole series is training.
//
// The one-step forecast of period t is the mean of y[t-w..t-1] (width 1 is
// the naive forecast). Each width is computed with a running sum, in time
// proportional to the series length whatever the width. It returns an
// error when y holds a value that is not a finite number, or when the
// widths do not leave at least one training period to forecast.
func SweepMovingAverage(y []float64, trainEnd int, widths Range) (*WidthSweep, error) {
	if err := checkFinite(y); err != nil {
		return nil, err
	}
	if trainEnd == 0 {
		trainEnd = len(y)
	}
	if trainEnd < 0 || trainEnd > len(y) {
		return nil, fmt.Errorf("the training period ends at period %d, outside the %d-period series", trainEnd, len(y))
	}
	if widths.From < 1 || widths.To < widths.From {
		return nil, fmt.Errorf("widths %d..%d are not a range of whole numbers from 1 up; write them as, for example, 1..24", widths.From, widths.To)
	}
	if widths.To >= trainEnd {
		return nil, fmt.Errorf("a width of %d needs at least %d training periods to score even one forecast, but training has %d; sweep widths up to %d", widths.To, widths.To+1, trainEnd, trainEnd-1)
	}
	out := &WidthSweep{Rows: widthRows(y, trainEnd, widths)}
	out.Best = bestWidth(out.Rows, func(r WidthRow) Errors { return r.Common })
	out.BestOwn = bestWidth(out.Rows, func(r WidthRow) Errors { return r.Own })
	if trainEnd < len(y) {
		out.BestValidation = bestWidth(out.Rows, func(r WidthRow) Errors { return r.Validation })
	}
	out.Explanation = explainWidths(out, widths)
	return out, nil
}

// widthRow scores one width in one pass over the training data with a
// running sum of the last w values; [widthBlock] does the same for four
// widths at once. Periods before common count only on
// the width's own window; from common on they count on both, so the own
// window is the early part plus the common part.
func widthRow(y []float64, trainEnd, w, common int) WidthRow {
	var sum float64
	for _, v := range y[:w] {
		sum += v
	}
	inv := 1 / float64(w)
	var early, com accumulator
	split := min(common, trainEnd)
	for t := w; t < split; t++ {
		e := y[t] - sum*inv
		early.sq += e * e
		early.abs += math.Abs(e)
		sum += y[t] - y[t-w]
	}
	for t := split; t < trainEnd; t++ {
		e := y[t] - sum*inv
		com.sq += e * e
		com.abs += math.Abs(e)
		sum += y[t] - y[t-w]
	}
	early.n, com.n = split-w, trainEnd-split
	return finishRow(y, trainEnd, w, early, com)
}

// finishRow joins the early and common scores of width w into its own
// window and scores the holdout forecast made at the end of training.
func finishRow(y []float64, trainEnd, w int, early, com accumulator) WidthRow {
	own := accumulator{n: early.n + com.n, sq: early.sq + com.sq, abs: early.abs + com.abs}
	// Recompute the final window exactly so that the holdout forecast does
	// not carry the rounding of a long running sum.
	var last float64
	for _, v := range y[trainEnd-w : trainEnd] {
		last += v
	}
	var val accumulator
	f := last / float64(w)
	for _, v := range y[trainEnd:] {
		val.add(v - f)
	}
	return WidthRow{Width: w, Own: own.errors(), Common: com.errors(), Validation: val.errors()}
}

type accumulator struct {
	n       int
	sq, abs float64
}

func (a *accumulator) add(e float64) {
	a.n++
	a.sq += e * e
	a.abs += math.Abs(e)
}

func (a accumulator) errors() Errors {
	if a.n == 0 {
		return Errors{}
	}
	mse := a.sq / float64(a.n)
	return Errors{N: a.n, MSE: mse, RMSE: math.Sqrt(mse), MAE: a.abs / float64(a.n)}
}

// bestWidth returns the width with the lowest RMSE; the first wins ties.
func bestWidth(rows []WidthRow, pick func(WidthRow) Errors) int {
	best, bestRMSE := 0, math.Inf(1)
	for _, r := range rows {
		if e := pick(r); e.N > 0 && e.RMSE < bestRMSE {
			best, bestRMSE = r.Width, e.RMSE
		}
	}
	return best
}

// checkFinite returns an error naming the first value of y that is NaN or
// infinite, counted from 1.
func checkFinite(y []float64) error {
	for i, v := range y {
		if math.IsNaN(v) || math.IsInf(v, 0) {
			return fmt.Errorf("period %d has no usable value; fill or remove missing values before this step", i+1)
		}
	}
	return nil
}
