package backtest

import (
	"math"
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"quillcast/core/internal/refdata"
)

// maSweepCase is the layout of reference/cases/trailing_ma_sweep_nile.json.
type maSweepCase struct {
	Data struct {
		Y []float64 `json:"y"`
	} `json:"data"`
	Params struct {
		Widths []int `json:"widths"`
	} `json:"params"`
	Expected struct {
		Rows []struct {
			Width  int       `json:"width"`
			Own    refErrors `json:"own_window"`
			Common refErrors `json:"common_window"`
		} `json:"rows"`
		BestOwn    int `json:"best_width_own_window_rmse"`
		BestCommon int `json:"best_width_common_window_rmse"`
	} `json:"expected"`
	Tolerance struct {
		Abs float64 `json:"abs"`
		Rel float64 `json:"rel"`
	} `json:"tolerance"`
}

type refErrors struct {
	N    int     `json:"n"`
	MSE  float64 `json:"mse"`
	RMSE float64 `json:"rmse"`
	MAE  float64 `json:"mae"`
}

// TestMovingAverageSweepNile checks every width against
// reference/cases/trailing_ma_sweep_nile.json (computed with pandas 1.5.3 and
// numpy 1.24.2 on the Nile flow series bundled with statsmodels 0.13.5).
func TestMovingAverageSweepNile(t *testing.T) {
	t.Parallel()
	var c maSweepCase
	refdata.ReadJSON(t, "reference/cases/trailing_ma_sweep_nile.json", &c)
	ws := c.Params.Widths
	got, err := SweepMovingAverage(c.Data.Y, 0, Range{ws[0], ws[len(ws)-1]})
	if err != nil {
		t.Fatal(err)
	}
	if len(got.Rows) != len(c.Expected.Rows) {
		t.Fatalf("got %d rows, want %d", len(got.Rows), len(c.Expected.Rows))
	}
	close := func(g, w float64) bool { return scalar.EqualWithinAbsOrRel(g, w, c.Tolerance.Abs, c.Tolerance.Rel) }
	for i, want := range c.Expected.Rows {
		g := got.Rows[i]
		for _, p := range []struct {
			window string
			g      Errors
			w      refErrors
		}{{"own", g.Own, want.Own}, {"common", g.Common, want.Common}} {
			if g.Width != want.Width || p.g.N != p.w.N || !close(p.g.MSE, p.w.MSE) || !close(p.g.RMSE, p.w.RMSE) || !close(p.g.MAE, p.w.MAE) {
				t.Errorf("width %d %s window: got n=%d mse=%v rmse=%v mae=%v, want n=%d mse=%v rmse=%v mae=%v (trailing_ma_sweep_nile)",
					want.Width, p.window, p.g.N, p.g.MSE, p.g.RMSE, p.g.MAE, p.w.N, p.w.MSE, p.w.RMSE, p.w.MAE)
			}
		}
	}
	// Best widths: trailing_ma_sweep_nile expected.best_width_*_rmse.
	if got.Best != c.Expected.BestCommon || got.BestOwn != c.Expected.BestOwn {
		t.Errorf("best widths: common %d own %d, want %d and %d (trailing_ma_sweep_nile)", got.Best, got.BestOwn, c.Expected.BestCommon, c.Expected.BestOwn)
	}
	if got.BestValidation != 0 {
		t.Errorf("no validation period, but BestValidation = %d", got.BestValidation)
	}
	for _, want := range []string{"width 3", "chase noise", "lag behind a trend", "width 18"} {
		if !strings.Contains(got.Explanation, want) {
			t.Errorf("explanation lacks %q:\n%s", want, got.Explanation)
		}
	}
}

func TestMovingAverageSweepValidation(t *testing.T) {
	t.Parallel()
	y := []float64{1, 2, 3, 4, 10, 12}
	got, err := SweepMovingAverage(y, 4, Range{1, 2})
	if err != nil {
		t.Fatal(err)
	}
	// Hand calculation: width 1 forecasts 4 for both validation periods:
	// errors 6 and 8, MSE (36+64)/2 = 50, MAE 7. Width 2 forecasts 3.5:
	// errors 6.5 and 8.5, MSE (42.25+72.25)/2 = 57.25, MAE 7.5.
	// Training one-step errors on the common window (t = 2, 3): width 1
	// gives 1, 1 (MSE 1); width 2 gives 1.5, 1.5 (MSE 2.25).
	tests := []struct {
		name      string
		got, want float64
	}{
		{"width 1 validation MSE", got.Rows[0].Validation.MSE, 50},
		{"width 1 validation MAE", got.Rows[0].Validation.MAE, 7},
		{"width 2 validation MSE", got.Rows[1].Validation.MSE, 57.25},
		{"width 2 validation MAE", got.Rows[1].Validation.MAE, 7.5},
		{"width 1 common MSE", got.Rows[0].Common.MSE, 1},
		{"width 2 common MSE", got.Rows[1].Common.MSE, 2.25},
		{"best validation width", float64(got.BestValidation), 1},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			if !scalar.EqualWithinAbsOrRel(tt.got, tt.want, 1e-12, 1e-12) {
				t.Errorf("got %v, want %v (hand calculation)", tt.got, tt.want)
			}
		})
	}
	if !strings.Contains(got.Explanation, "uses it up") {
		t.Errorf("explanation does not warn about choosing on validation:\n%s", got.Explanation)
	}
}

func TestMovingAverageSweepErrors(t *testing.T) {
	t.Parallel()
	nan := []float64{1, 2, math.NaN(), 4, 5}
	tests := []struct {
		name     string
		y        []float64
		trainEnd int
		widths   Range
		want     string
	}{
		{"missing value", nan, 0, Range{1, 2}, "period 3 has no usable value"},
		{"width too wide", []float64{1, 2, 3, 4}, 0, Range{1, 4}, "sweep widths up to 3"},
		{"width zero", []float64{1, 2, 3, 4}, 0, Range{0, 2}, "from 1 up"},
		{"reversed", []float64{1, 2, 3, 4}, 0, Range{3, 2}, "from 1 up"},
		{"training past the end", []float64{1, 2, 3, 4}, 9, Range{1, 2}, "outside the 4-period series"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			_, err := SweepMovingAverage(tt.y, tt.trainEnd, tt.widths)
			if err == nil || !strings.Contains(err.Error(), tt.want) {
				t.Errorf("error = %v, want one containing %q", err, tt.want)
			}
		})
	}
}
