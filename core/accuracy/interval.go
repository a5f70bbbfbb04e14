package accuracy

import (
	"fmt"
	"math"
)

// IntervalScores describes how prediction intervals of one level fared
// against the actual values.
type IntervalScores struct {
	Level   float64 // nominal coverage, strictly between 0 and 1 (0.8 for an 80% interval)
	N       int     // periods scored
	Skipped int     // periods left out because a value or a bound was NaN or infinite
	Below   int     // actual values below the lower bound
	Above   int     // actual values above the upper bound
	// Coverage is the share of actual values inside their interval,
	// bounds included, from 0 to 1. Compare it with Level: intervals stated
	// by a model tend to cover less often than they claim.
	Coverage Result
	// Winkler is the mean Winkler score, in the units of the series; lower
	// is better. See [Winkler].
	Winkler Result
	// Width is the mean width of the intervals, in the units of the series.
	Width Result
}

// ScoreIntervals scores the intervals [lower[i], upper[i]] of nominal
// coverage level (strictly between 0 and 1) against actual[i]: their
// coverage, mean Winkler score and mean width.
//
// A period where the actual value or a bound is NaN or infinite is left out
// and counted in Skipped. Every result is undefined, with the reason, when
// the three slices differ in length, when level is out of range, when a
// lower bound lies above its upper bound, or when no period is left.
func ScoreIntervals(actual, lower, upper []float64, level float64) IntervalScores {
	if len(lower) != len(actual) || len(upper) != len(actual) {
		return intervalFailed(level, 0, fmt.Sprintf(
			"there are %d actual values but %d lower and %d upper bounds", len(actual), len(lower), len(upper)))
	}
	t := IntervalTally{Level: level}
	for i := range actual {
		t.Add(actual[i], lower[i], upper[i])
	}
	return t.Scores()
}

// Winkler returns the Winkler score of one interval [lower, upper] of
// nominal coverage level for the actual value:
//
//	(upper - lower) + (2/α)(lower - actual)   when actual < lower
//	(upper - lower)                           when lower <= actual <= upper
//	(upper - lower) + (2/α)(actual - upper)   when actual > upper
//
// with α = 1 - level. It rewards narrow intervals and penalises misses in
// proportion to their distance, more heavily the higher the level. The
// caller ensures 0 < level < 1 and lower <= upper; otherwise the result is
// NaN.
//
// Reference: R. L. Winkler (1972), "A decision-theoretic approach to
// interval estimation", Journal of the American Statistical Association
// 67(337), 187-191.
func Winkler(actual, lower, upper, level float64) float64 {
	if !(level > 0 && level < 1) || lower > upper {
		return math.NaN()
	}
	alpha := 1 - level
	w := upper - lower
	switch {
	case actual < lower:
		w += 2 / alpha * (lower - actual)
	case actual > upper:
		w += 2 / alpha * (actual - upper)
	}
	return w
}

// IntervalTally gathers interval outcomes one period at a time, for
// rolling-origin evaluation by horizon. Set Level before adding; the zero
// Level is out of range and leaves every result undefined.
type IntervalTally struct {
	Level      float64 // nominal coverage, strictly between 0 and 1
	n, skipped int
	below      int
	above      int
	reversed   int
	sumWinkler float64
	sumWidth   float64
}

// Add records one period's actual value and interval bounds.
func (t *IntervalTally) Add(actual, lower, upper float64) {
	if !finite(actual) || !finite(lower) || !finite(upper) {
		t.skipped++
		return
	}
	if lower > upper {
		t.reversed++
		return
	}
	t.n++
	switch {
	case actual < lower:
		t.below++
	case actual > upper:
		t.above++
	}
	t.sumWidth += upper - lower
	if t.Level > 0 && t.Level < 1 {
		t.sumWinkler += Winkler(actual, lower, upper, t.Level)
	}
}

// Scores returns the interval scores of the periods recorded so far.
func (t *IntervalTally) Scores() IntervalScores {
	switch {
	case !(t.Level > 0 && t.Level < 1):
		return intervalFailed(t.Level, t.skipped, fmt.Sprintf(
			"the interval level %g is out of range; give a coverage between 0 and 1 such as 0.8 or 0.95", t.Level))
	case t.reversed > 0:
		return intervalFailed(t.Level, t.skipped, fmt.Sprintf(
			"in %d %s the lower bound lies above the upper bound", t.reversed, plural(t.reversed, "period", "periods")))
	case t.n == 0:
		why := "there is no period to score"
		if t.skipped > 0 {
			why = fmt.Sprintf("no period has both an actual value and an interval (%d %s a missing value)",
				t.skipped, plural(t.skipped, "period has", "periods have"))
		}
		return intervalFailed(t.Level, t.skipped, why)
	}
	n := float64(t.n)
	s := IntervalScores{Level: t.Level, N: t.n, Skipped: t.skipped, Below: t.below, Above: t.above}
	s.Coverage = Result{Value: float64(t.n-t.below-t.above) / n, Defined: true}
	s.Winkler = intervalValue("Winkler score", t.sumWinkler/n)
	s.Width = intervalValue("interval width", t.sumWidth/n)
	return s
}

func intervalValue(name string, v float64) Result {
	if !finite(v) {
		return Result{Reason: name + " undefined: the bounds are too large to add up"}
	}
	return Result{Value: v, Defined: true}
}

func intervalFailed(level float64, skipped int, why string) IntervalScores {
	return IntervalScores{
		Level: level, Skipped: skipped,
		Coverage: Result{Reason: "coverage undefined: " + why},
		Winkler:  Result{Reason: "Winkler score undefined: " + why},
		Width:    Result{Reason: "interval width undefined: " + why},
	}
}
