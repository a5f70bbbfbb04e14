package backtest

import (
	"context"
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"quillcast/core/accuracy"
	"quillcast/core/forecast"
	"quillcast/core/internal/refdata"
)

type sesByAlphaCase struct {
	Data map[string]struct {
		Y []float64 `json:"y"`
	} `json:"data"`
	Params struct {
		Alphas []float64 `json:"alphas"`
	} `json:"params"`
	Expected struct {
		Rows []struct {
			Dataset string  `json:"dataset"`
			Alpha   float64 `json:"alpha"`
			SSE     float64 `json:"sse"`
		} `json:"rows"`
	} `json:"expected"`
	Tolerance struct {
		Abs float64 `json:"abs"`
		Rel float64 `json:"rel"`
	} `json:"tolerance"`
}

// TestSweepGridSESAlpha sweeps alpha for simple exponential smoothing with
// the initial level fixed at the first value and checks the in-sample SSE
// against reference/cases/ses_mse_by_alpha.json (statsmodels 0.13.5
// SimpleExpSmoothing on the NIST/SEMATECH e-Handbook 6.4.3.1 and 6.4.3.6
// series).
func TestSweepGridSESAlpha(t *testing.T) {
	t.Parallel()
	var c sesByAlphaCase
	refdata.ReadJSON(t, "reference/cases/ses_mse_by_alpha.json", &c)
	for _, name := range []string{"nist_ses", "nist_sales"} {
		t.Run(name, func(t *testing.T) {
			y := c.Data[name].Y
			base := forecast.Settings{"level0": {Number: y[0]}}
			s, err := SweepGrid(context.Background(), y, 0, 0, "ses", base, "alpha", c.Params.Alphas, accuracy.MSE)
			if err != nil {
				t.Fatal(err)
			}
			for _, want := range c.Expected.Rows {
				if want.Dataset != name {
					continue
				}
				var row *GridRow
				for i := range s.Rows {
					if scalar.EqualWithinAbs(s.Rows[i].Value, want.Alpha, 1e-12) {
						row = &s.Rows[i]
					}
				}
				if row == nil || row.Failed != "" {
					t.Fatalf("alpha %v: no row (%v)", want.Alpha, row)
				}
				// Tally MSE is SSE/n over the n one-step errors (the first is 0).
				got := row.Training.Of(accuracy.MSE).Value * float64(row.Training.N)
				if row.Training.N != len(y) || !scalar.EqualWithinAbsOrRel(got, want.SSE, c.Tolerance.Abs, c.Tolerance.Rel) {
					t.Errorf("alpha %v: SSE %v over %d errors, want %v over %d (ses_mse_by_alpha)", want.Alpha, got, row.Training.N, want.SSE, len(y))
				}
			}
			if !strings.Contains(s.Explanation, "chases noise") {
				t.Errorf("explanation lacks the noise lesson: %s", s.Explanation)
			}
		})
	}
}

func TestSweepGridValidation(t *testing.T) {
	t.Parallel()
	// A level shift at the end: the largest alpha follows it best.
	y := []float64{10, 10, 10, 10, 10, 10, 20, 20, 20, 20}
	s, err := SweepGrid(context.Background(), y, 8, 0, "ses", forecast.Settings{"level0": {Number: 10}}, "alpha", []float64{0.1, 0.5, 0.9}, 0)
	if err != nil {
		t.Fatal(err)
	}
	// Hand reasoning: after the shift at period 7 the one-step errors of
	// alpha 0.9 shrink fastest, so it has the lowest training RMSE, and its
	// final level (closest to 20) gives the best validation forecast.
	if !scalar.EqualWithinAbs(s.Best, 0.9, 1e-12) || !scalar.EqualWithinAbs(s.BestValidation, 0.9, 1e-12) || !s.HasValidation {
		t.Errorf("best %v, best on validation %v; want 0.9 and 0.9", s.Best, s.BestValidation)
	}
	if !strings.Contains(s.Explanation, "largest one tried") {
		t.Errorf("explanation does not say the best is on the edge: %s", s.Explanation)
	}
	if s.Rows[0].Validation.N != 2 {
		t.Errorf("validation periods scored: %d, want 2", s.Rows[0].Validation.N)
	}
}

func TestSweepGridErrors(t *testing.T) {
	t.Parallel()
	y := []float64{1, 2, 3, 4, 5, 6}
	tests := []struct {
		name   string
		method string
		param  string
		grid   []float64
		want   string
	}{
		{"unknown method", "crystal-ball", "alpha", []float64{0.5}, "not a method"},
		{"unknown parameter", "ses", "omega", []float64{0.5}, "omega"},
		{"value out of range", "ses", "alpha", []float64{1.5}, "out of range"},
		{"empty grid", "ses", "alpha", nil, "no values"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			_, err := SweepGrid(context.Background(), y, 0, 0, tt.method, nil, tt.param, tt.grid, 0)
			if err == nil || !strings.Contains(err.Error(), tt.want) {
				t.Errorf("error = %v, want one containing %q", err, tt.want)
			}
		})
	}
}
