package backtest

import (
	"fmt"
	"math"
	"slices"

	"gonum.org/v1/gonum/stat"
)

// MinErrors is the fewest out-of-sample errors at a horizon from which
// [Empirical.Interval] makes an interval. Below it the quantiles of the
// errors say little about the next error.
const MinErrors = 5

// Empirical holds the out-of-sample errors of a rolling-origin evaluation by
// horizon, from which it makes prediction intervals for any method,
// including those with no analytic formula such as the moving average.
//
// An error is actual - forecast, so a positive error means the forecast was
// too low. The interval at level L around a point forecast f at horizon h
// is [f + q((1-L)/2), f + q((1+L)/2)], where q(p) is the p-quantile of the
// errors seen at horizon h.
//
// # Quantile rule
//
// q(p) follows definition 4 of Hyndman and Fan (1996), "Sample quantiles in
// statistical packages", The American Statistician 50(4), 361-365, as
// computed by gonum's stat.Quantile with stat.LinInterp: of n sorted errors
// e(1) <= ... <= e(n), q(p) is e(np) interpolated linearly between
// neighbours, and e(1) when np <= 1. It never reaches beyond the errors
// seen, so with few errors the interval is too narrow: at least 2/(1-L)
// errors (40 for a 95% interval) put one error in each tail.
type Empirical struct {
	errors [][]float64 // errors[h-1] sorted ascending, finite values only
}

// NewEmpirical gathers errors by horizon: byHorizon[h-1] holds the errors
// at horizon h. Values that are NaN or infinite are left out. The slices
// are copied.
func NewEmpirical(byHorizon [][]float64) Empirical {
	e := Empirical{errors: make([][]float64, len(byHorizon))}
	for i, errs := range byHorizon {
		kept := make([]float64, 0, len(errs))
		for _, v := range errs {
			if !math.IsNaN(v) && !math.IsInf(v, 0) {
				kept = append(kept, v)
			}
		}
		slices.Sort(kept)
		e.errors[i] = kept
	}
	return e
}

// Horizon is the longest horizon with errors.
func (e Empirical) Horizon() int { return len(e.errors) }

// Count returns the number of errors at horizon h (counted from 1), 0
// outside 1..Horizon.
func (e Empirical) Count(h int) int {
	if h < 1 || h > len(e.errors) {
		return 0
	}
	return len(e.errors[h-1])
}

// Quantile returns the p-quantile of the errors at horizon h by the rule in
// the type's comment. It returns an error when p is outside [0, 1] or when
// horizon h has fewer than [MinErrors] errors.
func (e Empirical) Quantile(h int, p float64) (float64, error) {
	if !(p >= 0 && p <= 1) {
		return 0, fmt.Errorf("quantile %g is out of range; give a fraction from 0 to 1", p)
	}
	if err := e.enough(h); err != nil {
		return 0, err
	}
	return stat.Quantile(p, stat.LinInterp, e.errors[h-1], nil), nil
}

// Interval returns the empirical prediction interval at the given level,
// strictly between 0 and 1, around the point forecasts point[0..h-1] for
// horizons 1..h. It returns an error in plain words when the level is out
// of range, when point is longer than the horizons the errors cover, or
// when a horizon has fewer than [MinErrors] errors.
func (e Empirical) Interval(point []float64, level float64) (lo, hi []float64, err error) {
	if !(level > 0 && level < 1) {
		return nil, nil, fmt.Errorf("interval level %g is out of range; write a coverage between 0 and 1 such as 0.8 or 0.95", level)
	}
	if len(point) > len(e.errors) {
		return nil, nil, fmt.Errorf("empirical intervals reach %d periods ahead, the backtest's horizon, but %d were asked for; backtest with a horizon of at least %d", len(e.errors), len(point), len(point))
	}
	lo = make([]float64, len(point))
	hi = make([]float64, len(point))
	for i, f := range point {
		if err := e.enough(i + 1); err != nil {
			return nil, nil, err
		}
		errs := e.errors[i]
		lo[i] = f + stat.Quantile((1-level)/2, stat.LinInterp, errs, nil)
		hi[i] = f + stat.Quantile((1+level)/2, stat.LinInterp, errs, nil)
	}
	return lo, hi, nil
}

// Note returns a plain-words caution when the errors are too few for the
// tails of a level-L interval (fewer than 2/(1-L) at some horizon), or ""
// when there are enough.
func (e Empirical) Note(level float64) string {
	if !(level > 0 && level < 1) || len(e.errors) == 0 {
		return ""
	}
	need := int(math.Ceil(2/(1-level) - 1e-9))
	fewest := len(e.errors[0])
	for _, errs := range e.errors {
		fewest = min(fewest, len(errs))
	}
	if fewest >= need {
		return ""
	}
	return fmt.Sprintf("The %s%% empirical interval rests on as few as %d past errors at a horizon; it cannot reach beyond the largest errors seen, so it is likely too narrow (%d errors per horizon would put one in each tail).", num(100*level), fewest, need)
}

func (e Empirical) enough(h int) error {
	if h < 1 || h > len(e.errors) {
		return fmt.Errorf("no backtest errors at horizon %d; the backtest reached %d periods ahead", h, len(e.errors))
	}
	if n := len(e.errors[h-1]); n < MinErrors {
		return fmt.Errorf("only %d past errors at horizon %d; an empirical interval needs at least %d, so use more rolling origins (a longer series or a smaller step)", n, h, MinErrors)
	}
	return nil
}
