package backtest

import (
	"context"
	"errors"
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"quillcast/core/accuracy"
	"quillcast/core/forecast"
)

// method builds a catalogue method with default settings.
func method(t testing.TB, name string) forecast.Method {
	t.Helper()
	sp, ok := forecast.Lookup(name)
	if !ok {
		t.Fatalf("method %q is not in the catalogue", name)
	}
	m, err := sp.New(nil)
	if err != nil {
		t.Fatal(err)
	}
	return m
}

// TestRunHandMade scores the naive forecast on six hand-made values with
// two one-step folds, one inside its interval and one far above it.
func TestRunHandMade(t *testing.T) {
	t.Parallel()
	y := []float64{10, 12, 10, 12, 10, 30}
	b, err := Run(context.Background(), y, 1, method(t, "naive"), Origins{Initial: 4, Horizon: 1}, 0.8)
	if err != nil {
		t.Fatal(err)
	}
	// Hand calculation. Fold 1 trains on 10,12,10,12: forecast 12; the
	// naive interval variance is the mean squared first difference, 4, so
	// the 80% interval is 12 -/+ z*2 with z = 1.2815515655446004 (standard
	// normal 0.9 quantile, statistical tables): [9.4369, 14.5631], and the
	// actual 10 lies inside. Fold 2 trains on 10,12,10,12,10: forecast 10,
	// interval [7.4369, 12.5631], actual 30 lies above.
	const z = 1.2815515655446004
	width := 2 * z * 2
	winkler1 := width                       // inside: the width alone
	winkler2 := width + 2/0.2*(30-(10+z*2)) // above: width + (2/alpha)(actual - upper)
	iv := b.ByHorizon[0].Intervals[0]
	s := b.ByHorizon[0].Scores
	tests := []struct {
		name      string
		got, want float64
	}{
		{"coverage", iv.Coverage.Value, 0.5},                     // 1 of 2 inside
		{"Winkler", iv.Winkler.Value, (winkler1 + winkler2) / 2}, // mean of the two
		{"width", iv.Width.Value, width},                         // both widths equal
		{"above", float64(iv.Above), 1},                          // fold 2
		{"MAE", s.Of(accuracy.MAE).Value, 11},                    // (|10-12| + |30-10|)/2
		{"sMAPE", s.Of(accuracy.SMAPE).Value, (200*2.0/22 + 200*20.0/40) / 2},
		{"MASE", s.Of(accuracy.MASE).Value, 11 / (28.0 / 5)}, // scale: mean |diff| of y = (2+2+2+2+20)/5
		{"fold 1 forecast", b.Forecasts[0][0], 12},
		{"fold 2 forecast", b.Forecasts[1][0], 10},
		{"overall coverage", b.Intervals[0].Coverage.Value, 0.5},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			if !scalar.EqualWithinAbsOrRel(tt.got, tt.want, 1e-9, 1e-9) {
				t.Errorf("got %v, want %v (hand calculation)", tt.got, tt.want)
			}
		})
	}
	if got := b.Errors.Count(1); got != 2 {
		t.Errorf("empirical errors at horizon 1: %d, want 2", got)
	}
	if len(b.Notes) == 0 || !strings.Contains(b.Notes[0], "covered 50% of 2") || !strings.Contains(b.Notes[0], "too narrow") {
		t.Errorf("notes do not report the shortfall: %q", b.Notes)
	}
}

// TestRunRandomWalkCoverage checks that naive intervals on a seeded random
// walk cover about as often as stated: the naive forecast is the right
// model there, so 95% intervals should cover close to 95%.
func TestRunRandomWalkCoverage(t *testing.T) {
	t.Parallel()
	y := randomWalk(1500, 3)
	b, err := Run(context.Background(), y, 0, method(t, "naive"), Origins{Initial: 100, Step: 2, Horizon: 3}, 0.95)
	if err != nil {
		t.Fatal(err)
	}
	for _, hs := range b.ByHorizon {
		got := hs.Intervals[0].Coverage.Value
		// 700 folds: two binomial standard errors are about 0.016.
		if got < 0.92 || got > 0.98 {
			t.Errorf("horizon %d: 95%% coverage %v, want within 0.92..0.98 (random walk, common practice)", hs.Horizon, got)
		}
	}
	lo, hi, err := b.Errors.Interval([]float64{0, 0, 0}, 0.95)
	if err != nil {
		t.Fatal(err)
	}
	for h := range 3 {
		if lo[h] > -1.5 || hi[h] < 1.5 {
			t.Errorf("horizon %d empirical interval [%v, %v] narrower than the one-step 95%% range", h+1, lo[h], hi[h])
		}
	}
}

func TestRunErrors(t *testing.T) {
	t.Parallel()
	cancelled, cancel := context.WithCancel(context.Background())
	cancel()
	y := randomWalk(40, 1)
	_, err := Run(cancelled, y, 0, method(t, "naive"), Origins{Initial: 20})
	if !errors.Is(err, context.Canceled) {
		t.Errorf("cancelled run: error %v, want one wrapping context.Canceled", err)
	}
	tests := []struct {
		name   string
		o      Origins
		levels []float64
		want   string
	}{
		{"no fold", Origins{Initial: 39, Horizon: 5}, nil, "needs at least 44 periods"},
		{"level as percent", Origins{Initial: 20}, []float64{80}, "between 0 and 1"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			_, err := Run(context.Background(), y, 0, method(t, "naive"), tt.o, tt.levels...)
			if err == nil || !strings.Contains(err.Error(), tt.want) {
				t.Errorf("error = %v, want one containing %q", err, tt.want)
			}
		})
	}
}
