package accuracy

import (
	"math"
	"testing"
)

// TestTallyMatchesEvaluate adds the same periods one at a time and checks
// the tally gives what Evaluate gives on the slices.
func TestTallyMatchesEvaluate(t *testing.T) {
	t.Parallel()
	actual, forecast := series(40, 4), series(40, 5)
	actual[7], forecast[12] = math.NaN(), math.Inf(-1)
	scale := NaiveScale(series(60, 6), 1)
	var tally Tally
	for i := range actual {
		tally.Add(actual[i], forecast[i])
	}
	got, want := tally.Scores(scale), Evaluate(actual, forecast, scale)
	if tally.N() != 38 || got.N != want.N || got.Skipped != 2 {
		t.Errorf("N %d, Skipped %d; want 38 and 2", got.N, got.Skipped)
	}
	for _, m := range Measures() {
		if got.Of(m) != want.Of(m) {
			t.Errorf("%v: tally %+v, Evaluate %+v", m, got.Of(m), want.Of(m))
		}
	}
}

func TestIntervalTallyMatchesScoreIntervals(t *testing.T) {
	t.Parallel()
	actual, mid := series(30, 7), series(30, 8)
	lower, upper := make([]float64, 30), make([]float64, 30)
	for i, v := range mid {
		lower[i], upper[i] = v-9, v+9
	}
	tally := IntervalTally{Level: 0.95}
	for i := range actual {
		tally.Add(actual[i], lower[i], upper[i])
	}
	if got, want := tally.Scores(), ScoreIntervals(actual, lower, upper, 0.95); got != want {
		t.Errorf("tally %+v, ScoreIntervals %+v", got, want)
	}
	var zero IntervalTally
	zero.Add(1, 0, 2)
	if s := zero.Scores(); s.Coverage.Defined || s.Winkler.Defined {
		t.Errorf("a tally without a level scored %+v", s)
	}
}
