package backtest

import (
	"context"
	"errors"
	"fmt"

	"quillcast/core/accuracy"
	"quillcast/core/forecast"
)

// defaultLevels are the interval levels a backtest scores when the caller
// gives none: 80% and 95% (common practice).
func defaultLevels() []float64 { return []float64{0.8, 0.95} }

// Backtest is the outcome of a rolling-origin evaluation of one method.
type Backtest struct {
	Method  string  // the method's name
	Origins Origins // the settings, defaults filled in
	Folds   []Fold  // every fold, oldest origin first
	// Forecasts[k] holds the point forecasts of fold k for horizons
	// 1..Horizon; nil where the method could not be fitted on that fold.
	Forecasts [][]float64
	// Failures says in plain words which folds could not be fitted and why.
	Failures []string
	// ByHorizon scores the forecasts by horizon: ByHorizon[h-1] is horizon h.
	ByHorizon []HorizonScores
	// Overall scores every forecast of every fold together.
	Overall accuracy.Scores
	// Intervals scores the method's analytic intervals over all horizons,
	// one entry per level; empty when the method has none.
	Intervals []accuracy.IntervalScores
	// Errors holds the out-of-sample errors by horizon, from which
	// [Empirical.Interval] makes intervals for any method.
	Errors Empirical
	// Notes are plain-words remarks for the page and the memo, such as
	// intervals covering less often than they state.
	Notes []string
}

// HorizonScores is the accuracy of the forecasts made h periods ahead.
type HorizonScores struct {
	Horizon int
	Scores  accuracy.Scores
	// Intervals scores the analytic intervals at this horizon, one entry
	// per level; empty when the method has none.
	Intervals []accuracy.IntervalScores
}

// Run evaluates method m on y by rolling origin: on each fold of
// [Folds](len(y), o) it fits m to the fold's training part only, forecasts
// the fold's horizon and compares with the actual values.
//
// season is passed to the method's Fit (0 or 1: no season). MASE is scaled
// by the in-sample mean absolute difference of the whole of y at lag season
// (lag 1 when there is no season), so that every horizon shares one scale.
// levels are the interval levels to score, strictly between 0 and 1; none
// means 0.8 and 0.95. A fold where the method cannot be fitted is listed in
// Failures and left out. Run returns an error when the settings leave no
// fold, when no fold can be fitted, or when ctx is cancelled (the error
// then wraps ctx.Err()).
func Run(ctx context.Context, y []float64, season int, m forecast.Method, o Origins, levels ...float64) (*Backtest, error) {
	if err := checkFinite(y); err != nil {
		return nil, err
	}
	if len(levels) == 0 {
		levels = defaultLevels()
	}
	for _, l := range levels {
		if !(l > 0 && l < 1) {
			return nil, fmt.Errorf("interval level %g is out of range; write a coverage between 0 and 1 such as 0.8 or 0.95", l)
		}
	}
	folds, err := Folds(len(y), o)
	if err != nil {
		return nil, err
	}
	o, _ = o.resolve(len(y))
	b := &Backtest{Method: m.Name(), Origins: o, Folds: folds, Forecasts: make([][]float64, len(folds))}
	t := newTallies(o.Horizon, levels)
	for k, f := range folds {
		if err := ctx.Err(); err != nil {
			return nil, fmt.Errorf("backtest stopped before fold %d of %d: %w", k+1, len(folds), err)
		}
		fit, err := m.Fit(y[f.TrainStart:f.TrainEnd], season)
		if err != nil {
			b.Failures = append(b.Failures, fmt.Sprintf("fold %d (origin after period %d): %v", k+1, f.TrainEnd, err))
			continue
		}
		point := fit.Forecast(o.Horizon)
		b.Forecasts[k] = point
		t.addPoint(y[f.TestStart:f.TestEnd], point)
		for i, l := range levels {
			lo, hi, err := fit.Interval(o.Horizon, l)
			if errors.Is(err, forecast.ErrNoInterval) {
				break
			}
			if err != nil {
				return nil, err
			}
			t.addInterval(i, y[f.TestStart:f.TestEnd], lo, hi)
		}
	}
	if len(b.Failures) == len(folds) {
		return nil, fmt.Errorf("%s could not be fitted on any of the %d folds; the first failure: %s", b.Method, len(folds), b.Failures[0])
	}
	lag := max(season, 1)
	t.finish(b, accuracy.NaiveScale(y, lag))
	b.Notes = append(b.Notes, intervalNotes(b)...)
	if n := len(b.Failures); n > 0 {
		b.Notes = append(b.Notes, fmt.Sprintf("%s could not be fitted on %d of the %d folds; the scores leave those folds out.", b.Method, n, len(folds)))
	}
	return b, nil
}

// tallies gathers the outcomes of every fold by horizon.
type tallies struct {
	levels    []float64
	point     []accuracy.Tally
	overall   accuracy.Tally
	interval  [][]accuracy.IntervalTally // [horizon][level]
	ivOverall []accuracy.IntervalTally   // [level]
	anyIv     bool
	errs      [][]float64
}

func newTallies(horizon int, levels []float64) *tallies {
	t := &tallies{
		levels:    levels,
		point:     make([]accuracy.Tally, horizon),
		interval:  make([][]accuracy.IntervalTally, horizon),
		ivOverall: make([]accuracy.IntervalTally, len(levels)),
		errs:      make([][]float64, horizon),
	}
	for h := range t.interval {
		t.interval[h] = make([]accuracy.IntervalTally, len(levels))
		for i, l := range levels {
			t.interval[h][i].Level = l
		}
	}
	for i, l := range levels {
		t.ivOverall[i].Level = l
	}
	return t
}

func (t *tallies) addPoint(actual, point []float64) {
	for h, a := range actual {
		t.point[h].Add(a, point[h])
		t.overall.Add(a, point[h])
		t.errs[h] = append(t.errs[h], a-point[h])
	}
}

func (t *tallies) addInterval(level int, actual, lo, hi []float64) {
	t.anyIv = true
	for h, a := range actual {
		t.interval[h][level].Add(a, lo[h], hi[h])
		t.ivOverall[level].Add(a, lo[h], hi[h])
	}
}

func (t *tallies) finish(b *Backtest, scale accuracy.Scale) {
	b.ByHorizon = make([]HorizonScores, len(t.point))
	for h := range t.point {
		hs := HorizonScores{Horizon: h + 1, Scores: t.point[h].Scores(scale)}
		if t.anyIv {
			for i := range t.levels {
				hs.Intervals = append(hs.Intervals, t.interval[h][i].Scores())
			}
		}
		b.ByHorizon[h] = hs
	}
	b.Overall = t.overall.Scores(scale)
	if t.anyIv {
		for i := range t.levels {
			b.Intervals = append(b.Intervals, t.ivOverall[i].Scores())
		}
	}
	b.Errors = NewEmpirical(t.errs)
}
