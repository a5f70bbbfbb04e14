package backtest

import (
	"context"
	"math"
	"strings"
	"testing"

	"quillcast/core/accuracy"
)

// TestEdgeSeries covers constant, empty and non-finite series across the
// package's entry points: each either works or says why in plain words,
// and no NaN or infinity reaches a score.
func TestEdgeSeries(t *testing.T) {
	t.Parallel()
	constant := make([]float64, 30)
	for i := range constant {
		constant[i] = 7
	}
	withInf := append(append([]float64{}, constant...), math.Inf(1))
	ctx := context.Background()

	t.Run("auto on a constant series ranks by MAE", func(t *testing.T) {
		r, err := Auto{Horizon: 4}.Rank(ctx, constant, 0)
		if err != nil {
			t.Fatal(err)
		}
		if r.By != accuracy.MAE {
			t.Errorf("ranked by %v, want MAE (MASE has no scale on a constant series)", r.By)
		}
		for _, e := range r.Entries {
			if e.Score.Defined && (math.IsNaN(e.Score.Value) || math.IsInf(e.Score.Value, 0)) {
				t.Errorf("%s scored %v", e.Label, e.Score.Value)
			}
			if e.MASE.Defined {
				t.Errorf("%s: MASE defined on a constant series", e.Label)
			}
		}
	})
	t.Run("run on a constant series", func(t *testing.T) {
		b, err := Run(ctx, constant, 0, method(t, "naive"), Origins{Horizon: 2})
		if err != nil {
			t.Fatal(err)
		}
		if m := b.Overall.Of(accuracy.MASE); m.Defined || !strings.Contains(m.Reason, "constant") {
			t.Errorf("MASE %+v, want undefined because the series is constant", m)
		}
		if got := b.Overall.Of(accuracy.MAE); !got.Defined || got.Value > 1e-12 {
			t.Errorf("MAE %+v, want 0", got)
		}
	})
	tests := []struct {
		name string
		call func() error
		want string
	}{
		{"run with an infinite value", func() error {
			_, err := Run(ctx, withInf, 0, method(t, "naive"), Origins{})
			return err
		}, "period 31 has no usable value"},
		{"auto with an infinite value", func() error {
			_, err := Auto{}.Rank(ctx, withInf, 0)
			return err
		}, "period 31 has no usable value"},
		{"grid with an infinite value", func() error {
			_, err := SweepGrid(ctx, withInf, 0, 0, "ses", nil, "alpha", []float64{0.5}, 0)
			return err
		}, "period 31 has no usable value"},
		{"run on an empty series", func() error {
			_, err := Run(ctx, nil, 0, method(t, "naive"), Origins{})
			return err
		}, "the series has 0"},
		{"sweep on an empty series", func() error {
			_, err := SweepMovingAverage(nil, 0, Range{1, 2})
			return err
		}, "training has 0"},
		{"auto on an empty series", func() error {
			_, err := Auto{}.Rank(ctx, nil, 0)
			return err
		}, "the series has 0"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			err := tt.call()
			if err == nil || !strings.Contains(err.Error(), tt.want) {
				t.Errorf("error = %v, want one containing %q", err, tt.want)
			}
		})
	}
}
