package backtest

import (
	"fmt"
	"math"
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

func TestEmpiricalQuantile(t *testing.T) {
	t.Parallel()
	// Errors 10, 9, ..., 1 at horizon 1 (sorted inside: 1..10).
	e := NewEmpirical([][]float64{{10, 9, 8, 7, 6, 5, 4, 3, 2, 1, math.NaN()}})
	tests := []struct {
		name string
		p    float64
		want float64
	}{
		// Hand calculation, Hyndman-Fan definition 4: q(p) = e(np) interpolated.
		{"p 0.1 is the smallest", 0.1, 1},         // np = 1
		{"p 0.05 stays at the smallest", 0.05, 1}, // np = 0.5 <= 1
		{"p 0.25 interpolates", 0.25, 2.5},        // np = 2.5, halfway between 2 and 3
		{"p 0.5", 0.5, 5},                         // np = 5
		{"p 0.9", 0.9, 9},                         // np = 9
		{"p 0.975", 0.975, 9.75},                  // np = 9.75
		{"p 1 is the largest", 1, 10},             // np = 10
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			got, err := e.Quantile(1, tt.p)
			if err != nil {
				t.Fatal(err)
			}
			if !scalar.EqualWithinAbsOrRel(got, tt.want, 1e-12, 1e-12) {
				t.Errorf("Quantile(1, %v) = %v, want %v (hand calculation)", tt.p, got, tt.want)
			}
		})
	}
	if e.Count(1) != 10 {
		t.Errorf("Count(1) = %d, want 10 (the NaN left out)", e.Count(1))
	}
	// Hand calculation: 80% interval around 100 is 100 + q(0.1) = 101 and
	// 100 + q(0.9) = 109.
	lo, hi, err := e.Interval([]float64{100}, 0.8)
	if err != nil {
		t.Fatal(err)
	}
	if !scalar.EqualWithinAbsOrRel(lo[0], 101, 1e-12, 0) || !scalar.EqualWithinAbsOrRel(hi[0], 109, 1e-12, 0) {
		t.Errorf("80%% interval around 100 = [%v, %v], want [101, 109] (hand calculation)", lo[0], hi[0])
	}
	// 10 errors are fewer than 2/(1-0.95) = 40.
	if note := e.Note(0.95); !strings.Contains(note, "likely too narrow") || !strings.Contains(note, "40 errors") {
		t.Errorf("Note(0.95) = %q, want a caution naming 40 errors", note)
	}
	// 10 errors are exactly 2/(1-0.8) = 10.
	if note := e.Note(0.8); note != "" {
		t.Errorf("Note(0.8) = %q, want none", note)
	}
}

// TestEmpiricalRandomWalk checks intervals from the naive forecast's
// rolling-origin errors on a seeded random walk with standard normal steps.
// The h-step error of the naive forecast is then a sum of h steps, normal
// with variance h, so the 95% interval half-width is 1.959964*sqrt(h)
// (normal quantile, common practice) and the interval is centred on the
// forecast.
func TestEmpiricalRandomWalk(t *testing.T) {
	t.Parallel()
	const n, horizon = 6000, 4
	y := randomWalk(n, 42)
	folds, err := Folds(n, Origins{Initial: 100, Horizon: horizon})
	if err != nil {
		t.Fatal(err)
	}
	byH := make([][]float64, horizon)
	for _, f := range folds {
		last := y[f.TrainEnd-1] // the naive forecast
		for h := range horizon {
			byH[h] = append(byH[h], y[f.TestStart+h]-last)
		}
	}
	e := NewEmpirical(byH)
	point := []float64{0, 0, 0, 0}
	lo, hi, err := e.Interval(point, 0.95)
	if err != nil {
		t.Fatal(err)
	}
	for h := 1; h <= horizon; h++ {
		t.Run(fmt.Sprintf("horizon %d", h), func(t *testing.T) {
			want := 1.959964 * math.Sqrt(float64(h))
			half := (hi[h-1] - lo[h-1]) / 2
			// Overlapping folds make the errors correlated: allow 10%.
			if !scalar.EqualWithinRel(half, want, 0.10) {
				t.Errorf("half-width %v, want %v within 10%% (normal quantile, common practice)", half, want)
			}
			if mid := (hi[h-1] + lo[h-1]) / 2; math.Abs(mid) > 0.25*want {
				t.Errorf("interval centre %v, want near 0 (errors of an unbiased forecast)", mid)
			}
		})
	}
}

func TestEmpiricalErrors(t *testing.T) {
	t.Parallel()
	few := NewEmpirical([][]float64{{1, 2, 3, 4, 5}, {1, 2, 3}})
	tests := []struct {
		name  string
		point []float64
		level float64
		want  string
	}{
		{"too few at horizon 2", []float64{0, 0}, 0.8, "only 3 past errors at horizon 2"},
		{"past the horizon", []float64{0, 0, 0}, 0.8, "backtest with a horizon of at least 3"},
		{"level 95 written as percent", []float64{0}, 95, "between 0 and 1"},
		{"level zero", []float64{0}, 0, "between 0 and 1"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			_, _, err := few.Interval(tt.point, tt.level)
			if err == nil || !strings.Contains(err.Error(), tt.want) {
				t.Errorf("error = %v, want one containing %q", err, tt.want)
			}
		})
	}
	if _, err := few.Quantile(1, 1.5); err == nil {
		t.Error("Quantile with p 1.5: no error")
	}
}
