package backtest

import (
	"context"
	"fmt"
	"strings"

	"quillcast/core/accuracy"
	"quillcast/core/forecast"
)

// GridRow is the accuracy of a method with one value of the swept
// parameter.
type GridRow struct {
	Value float64
	// Training scores the in-sample one-step forecasts (the fitted values)
	// on the training period.
	Training accuracy.Scores
	// Validation scores the forecasts made at the end of training for every
	// validation period; it holds no periods when there is no validation.
	Validation accuracy.Scores
	// Failed says why the method could not be fitted with this value; ""
	// when it was.
	Failed string
}

// GridSweep is the accuracy of a method against the value of one parameter,
// on training and validation at once.
type GridSweep struct {
	Method string           // catalogue label, such as "ses"
	Param  string           // the swept parameter, such as "alpha"
	By     accuracy.Measure // the measure that picks the best value
	Rows   []GridRow        // one per grid value, in grid order
	// Best is the value with the best training score and BestValidation
	// the one with the best validation score (0 with HasValidation false).
	Best, BestValidation float64
	HasValidation        bool
	// Explanation says in plain words what the sweep shows: where too
	// little smoothing chases noise and too much flattens the pattern.
	Explanation string
}

// SweepGrid fits the catalogue method named method with the settings base
// plus param set to each value of grid in turn, on y[0:trainEnd] (trainEnd
// 0: all of y), and scores it on training (one-step fitted values) and on
// validation y[trainEnd:] (forecasts from the end of training). by picks
// the best value; 0 means RMSE. MASE is scaled by the training series'
// mean absolute difference at lag season (1 without a season).
//
// A value the method cannot be fitted with gets a row with Failed set. It
// returns an error for an unknown method or parameter, a value the
// catalogue refuses, when no value can be fitted, or when ctx is cancelled.
func SweepGrid(ctx context.Context, y []float64, trainEnd, season int, method string, base forecast.Settings, param string, grid []float64, by accuracy.Measure) (*GridSweep, error) {
	if err := checkFinite(y); err != nil {
		return nil, err
	}
	if trainEnd == 0 {
		trainEnd = len(y)
	}
	if trainEnd < 2 || trainEnd > len(y) {
		return nil, fmt.Errorf("the training period ends at period %d of a %d-period series; it needs at least 2 periods and cannot pass the end", trainEnd, len(y))
	}
	if len(grid) == 0 {
		return nil, fmt.Errorf("no values to sweep %s over; give a list or range such as 0.1..0.9", param)
	}
	sp, ok := forecast.Lookup(method)
	if !ok {
		return nil, fmt.Errorf("%q is not a method of the catalogue", method)
	}
	if by == 0 {
		by = accuracy.RMSE
	}
	train, valid := y[:trainEnd], y[trainEnd:]
	scale := accuracy.NaiveScale(train, max(season, 1))
	s := &GridSweep{Method: method, Param: param, By: by, HasValidation: len(valid) > 0}
	for _, v := range grid {
		if err := ctx.Err(); err != nil {
			return nil, fmt.Errorf("sweep stopped: %w", err)
		}
		set := forecast.Settings{}
		for k, x := range base {
			set[k] = x
		}
		set[param] = forecast.Setting{Number: v}
		m, err := sp.New(set)
		if err != nil {
			return nil, err
		}
		row := GridRow{Value: v}
		fit, err := m.Fit(train, season)
		if err != nil {
			row.Failed = err.Error()
			s.Rows = append(s.Rows, row)
			continue
		}
		row.Training = accuracy.Evaluate(train, fit.Fitted, scale)
		row.Validation = accuracy.Evaluate(valid, fit.Forecast(len(valid)), scale)
		s.Rows = append(s.Rows, row)
	}
	best, okTrain := bestRow(s.Rows, by, func(r GridRow) accuracy.Scores { return r.Training })
	if !okTrain {
		return nil, fmt.Errorf("%s could not be scored with any value of %s: %s", method, param, firstFailure(s.Rows))
	}
	s.Best = best
	if s.HasValidation {
		s.BestValidation, _ = bestRow(s.Rows, by, func(r GridRow) accuracy.Scores { return r.Validation })
	}
	s.Explanation = explainGrid(s)
	return s, nil
}

// bestRow returns the grid value with the best defined score; the first
// wins ties.
func bestRow(rows []GridRow, by accuracy.Measure, pick func(GridRow) accuracy.Scores) (float64, bool) {
	var best accuracy.Result
	var value float64
	for _, r := range rows {
		if r.Failed != "" {
			continue
		}
		if res := pick(r).Of(by); res.Better(by, best) {
			best, value = res, r.Value
		}
	}
	return value, best.Defined
}

func firstFailure(rows []GridRow) string {
	for _, r := range rows {
		if r.Failed != "" {
			return r.Failed
		}
	}
	return "every score is undefined"
}

// explainGrid writes the plain-words reading of a parameter sweep.
func explainGrid(s *GridSweep) string {
	var b strings.Builder
	fmt.Fprintf(&b, "On the training period %s=%s has the lowest %s.", s.Param, num(s.Best), s.By)
	if s.HasValidation {
		fmt.Fprintf(&b, " On the validation period %s=%s does best; choosing by the validation period uses it up, so it no longer tests the choice honestly.", s.Param, num(s.BestValidation))
	}
	switch strings.ToLower(s.Param) {
	case "alpha", "beta", "gamma":
		fmt.Fprintf(&b, " A %s near 1 smooths little and chases noise; a %s near 0 smooths heavily, flattening the pattern and lagging behind changes.", s.Param, s.Param)
	case "width":
		b.WriteString(" Narrow windows chase noise; wide windows flatten the pattern and lag behind a trend.")
	case "phi":
		b.WriteString(" A phi near 1 carries the trend on undamped; a smaller phi flattens the forecast sooner.")
	default:
		b.WriteString(" " + smoothingNote)
	}
	lo, hi := s.Rows[0].Value, s.Rows[0].Value
	for _, r := range s.Rows {
		lo, hi = min(lo, r.Value), max(hi, r.Value)
	}
	b.WriteString(edgeNote("value", s.Best == lo, s.Best == hi, false))
	return b.String()
}
