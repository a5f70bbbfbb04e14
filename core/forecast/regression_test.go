package forecast

import (
	"errors"
	"math"
	"strings"
	"testing"
)

// TestRegressionReference checks OLS on trend and seasonal dummies.
// Sources: cases ols_trend_season_nist_sales and ols_trend_season_elec
// (statsmodels 0.13.5 OLS; NIST/SEMATECH 6.4.3.6 data and the euro-area
// electrical equipment index); tolerance L.
func TestRegressionReference(t *testing.T) {
	for _, file := range []string{"ols_trend_season_nist_sales", "ols_trend_season_elec"} {
		t.Run(file, func(t *testing.T) {
			var c struct {
				refCase
				Params struct {
					Season  int `json:"season_length"`
					Horizon int `json:"horizon"`
				}
				Expected struct {
					Coefficients   []float64 `json:"coefficients"`
					StandardErrors []float64 `json:"standard_errors"`
					ResidualSE     float64   `json:"residual_std_error"`
					R2             float64   `json:"r_squared"`
					AdjR2          float64   `json:"adj_r_squared"`
					Fitted         []float64 `json:"fitted"`
					Residuals      []float64 `json:"residuals"`
					Forecast       []float64 `json:"forecast"`
					Lo95           []float64 `json:"pi95_lower"`
					Hi95           []float64 `json:"pi95_upper"`
					Lo80           []float64 `json:"pi80_lower"`
					Hi80           []float64 `json:"pi80_upper"`
				}
			}
			readCase(t, file, &c)
			abs, rel := c.Tolerance.Abs, c.Tolerance.Rel
			f := mustFit(t, Regression{}, c.Data.Y, c.Params.Season)
			e := c.Expected
			coef := make([]float64, len(f.Params))
			for i, p := range f.Params {
				coef[i] = p.Value
			}
			checkFloats(t, "coefficients", coef, e.Coefficients, abs, rel)
			stats := map[string]float64{}
			for _, s := range f.Stats {
				stats[s.Name] = s.Value
			}
			se := make([]float64, len(f.Params))
			for i, p := range f.Params {
				se[i] = stats["se("+p.Name+")"]
			}
			checkFloats(t, "standard errors", se, e.StandardErrors, abs, rel)
			checkFloats(t, "residual SE, R2, adjusted R2",
				[]float64{stats["residual-se"], stats["r2"], stats["adjusted-r2"]},
				[]float64{e.ResidualSE, e.R2, e.AdjR2}, abs, rel)
			checkFloats(t, "fitted", f.Fitted, e.Fitted, abs, rel)
			checkFloats(t, "residuals", f.Residuals(), e.Residuals, abs, rel)
			h := c.Params.Horizon
			checkFloats(t, "forecast", f.Forecast(h), e.Forecast, abs, rel)
			for _, lv := range []struct {
				p      float64
				lo, hi []float64
			}{{0.8, e.Lo80, e.Hi80}, {0.95, e.Lo95, e.Hi95}} {
				lo, hi, err := f.Interval(h, lv.p)
				if err != nil {
					t.Fatal(err)
				}
				checkFloats(t, "lower", lo, lv.lo, abs, rel)
				checkFloats(t, "upper", hi, lv.hi, abs, rel)
			}
		})
	}
}

// TestRegressionTrends checks exact recovery of noise-free trends (hand
// calculation: the series is built from the coefficients it must return).
func TestRegressionTrends(t *testing.T) {
	n := 20
	tests := []struct {
		name  string
		kind  TrendKind
		gen   func(tt float64) float64
		want  []float64
		h1    float64 // forecast at t = n+1
		scale bool
	}{
		{"linear", Linear, func(tt float64) float64 { return 3 + 2*tt }, []float64{3, 2}, 3 + 2*21, false},
		{"quadratic", Quadratic, func(tt float64) float64 { return 1 - tt + 0.5*tt*tt }, []float64{1, -1, 0.5}, 1 - 21 + 0.5*441, false},
		{"exponential", Exponential, func(tt float64) float64 { return 5 * math.Exp(0.1*tt) }, []float64{math.Log(5), 0.1}, 5 * math.Exp(2.1), true},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			y := make([]float64, n)
			for i := range y {
				y[i] = tt.gen(float64(i + 1))
			}
			f := mustFit(t, Regression{Trend: tt.kind}, y, 0)
			for i, w := range tt.want {
				if !within(f.Params[i].Value, w, 1e-9, 1e-9) {
					t.Errorf("%s = %.12g, want %g", f.Params[i].Name, f.Params[i].Value, w)
				}
			}
			if got := f.Forecast(1)[0]; !within(got, tt.h1, 1e-8, 1e-9) {
				t.Errorf("forecast = %.12g, want %.12g", got, tt.h1)
			}
			lo, hi, err := f.Interval(3, 0.95)
			if err != nil {
				t.Fatal(err)
			}
			if !within(lo[0], tt.h1, 1e-6, 1e-8) || !within(hi[0], tt.h1, 1e-6, 1e-8) {
				t.Errorf("interval [%g, %g] should collapse on %g for a perfect fit", lo[0], hi[0], tt.h1)
			}
		})
	}
}

func TestRegressionErrors(t *testing.T) {
	tests := []struct {
		name   string
		m      Regression
		y      []float64
		season int
		cause  error
		text   string
	}{
		{"too short", Regression{}, []float64{1, 2}, 0, ErrTooShort, "at least 3"},
		{"one season", Regression{}, []float64{1, 2, 3, 4, 5, 6}, 4, ErrTooShort, "two full seasons of 4"},
		{"log of zero", Regression{Trend: Exponential}, []float64{1, 0, 3, 4}, 0, ErrNotPositive, "logarithms"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			_, err := tt.m.Fit(tt.y, tt.season)
			if !errors.Is(err, tt.cause) || !strings.Contains(err.Error(), tt.text) {
				t.Errorf("error %v, want cause %v and text %q", err, tt.cause, tt.text)
			}
		})
	}
}
