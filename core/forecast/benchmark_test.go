package forecast

import (
	"errors"
	"math"
	"strings"
	"testing"
)

// TestBenchmarksNISTSales checks the four benchmarks on the first 20
// quarters of the NIST quarterly sales. Source: case
// simple_methods_nist_sales (numpy, common-practice formulas, NIST/SEMATECH
// e-Handbook 6.4.3.6 data).
func TestBenchmarksNISTSales(t *testing.T) {
	var c refCase
	readCase(t, "simple_methods_nist_sales", &c)
	var raw struct {
		Expected map[string]any `json:"expected"`
	}
	readCase(t, "simple_methods_nist_sales", &raw)
	y := c.Data.Y[:20]
	abs, rel := c.Tolerance.Abs, c.Tolerance.Rel
	tests := []struct {
		name    string
		m       Method
		fc, fit string
	}{
		{"naive", Naive{}, "naive", "naive_fitted"},
		{"seasonal naive", SeasonalNaive{}, "seasonal_naive", "seasonal_naive_fitted"},
		{"drift", Drift{}, "drift", "drift_fitted"},
		{"mean", Mean{}, "mean", "mean_fitted"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			f := mustFit(t, tt.m, y, 4)
			checkSlice(t, "forecast", f.Forecast(8), anyFloats(raw.Expected[tt.fc]), abs, rel)
			checkSlice(t, "fitted", f.Fitted, anyFloats(raw.Expected[tt.fit]), abs, rel)
		})
	}
}

// TestBenchmarksNile checks naive, drift and mean on all 100 years of the
// Nile flow. Source: case simple_methods_nile (numpy, common practice).
func TestBenchmarksNile(t *testing.T) {
	var c refCase
	readCase(t, "simple_methods_nile", &c)
	var raw struct {
		Expected map[string]any `json:"expected"`
	}
	readCase(t, "simple_methods_nile", &raw)
	for _, tt := range []struct {
		name string
		m    Method
	}{{"naive", Naive{}}, {"drift", Drift{}}, {"mean", Mean{}}} {
		t.Run(tt.name, func(t *testing.T) {
			f := mustFit(t, tt.m, c.Data.Y, 0)
			checkSlice(t, "forecast", f.Forecast(10), anyFloats(raw.Expected[tt.name]), c.Tolerance.Abs, c.Tolerance.Rel)
			if fit, ok := raw.Expected[tt.name+"_fitted"]; ok {
				checkSlice(t, "fitted", f.Fitted, anyFloats(fit), c.Tolerance.Abs, c.Tolerance.Rel)
			}
		})
	}
}

// anyFloats turns a decoded JSON array (numbers and nulls) into []*float64.
func anyFloats(v any) []*float64 {
	arr, _ := v.([]any)
	out := make([]*float64, len(arr))
	for i, x := range arr {
		if f, ok := x.(float64); ok {
			out[i] = &f
		}
	}
	return out
}

// TestBenchmarkIntervals checks the closed-form benchmark intervals.
// Sources: cases pi_naive_nile, pi_seasonal_naive_nist_sales, pi_mean_nile
// (numpy closed forms and statsmodels 0.13.5 OLS on a constant).
func TestBenchmarkIntervals(t *testing.T) {
	tests := []struct {
		name   string
		file   string
		m      Method
		season int
		h      int
		train  int // 0 = whole series
	}{
		{"naive nile", "pi_naive_nile", Naive{}, 0, 10, 0},
		{"seasonal naive nist sales", "pi_seasonal_naive_nist_sales", SeasonalNaive{}, 4, 8, 0},
		{"mean nile", "pi_mean_nile", Mean{}, 0, 1, 0},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			var c refCase
			readCase(t, tt.file, &c)
			var raw struct {
				Expected map[string]any `json:"expected"`
			}
			readCase(t, tt.file, &raw)
			f := mustFit(t, tt.m, c.Data.Y, tt.season)
			for _, level := range []struct {
				key string
				p   float64
			}{{"half_width_80", 0.8}, {"half_width_95", 0.95}} {
				want := anyFloats(raw.Expected[level.key])
				if len(want) == 0 {
					if x, ok := raw.Expected[level.key].(float64); ok {
						want = []*float64{&x}
					}
				}
				if len(want) == 0 {
					t.Fatalf("%s missing from the case file", level.key)
				}
				lo, hi, err := f.Interval(len(want), level.p)
				if err != nil {
					t.Fatal(err)
				}
				half := make([]float64, len(lo))
				for i := range lo {
					half[i] = (hi[i] - lo[i]) / 2
				}
				checkSlice(t, level.key, half, want, c.Tolerance.Abs, c.Tolerance.Rel)
			}
		})
	}
}

// TestDriftInterval checks the drift variance against a hand calculation:
// y = 0, 1, 3, 4 has differences 1, 2, 1, slope 4/3, squared deviations
// 1/9 + 4/9 + 1/9 = 2/3 over n-2 = 2 gives sigma^2 = 1/3; at h = 2 the
// variance is (1/3)*2*(1+2/3) = 10/9.
func TestDriftInterval(t *testing.T) {
	f := mustFit(t, Drift{}, []float64{0, 1, 3, 4}, 0)
	lo, hi, err := f.Interval(2, 0.95)
	if err != nil {
		t.Fatal(err)
	}
	want := 1.959963984540054 * math.Sqrt(10.0/9) // z(0.975): common practice
	if got := (hi[1] - lo[1]) / 2; !within(got, want, 1e-12, 1e-12) {
		t.Errorf("half-width at h=2 = %.15g, want %.15g", got, want)
	}
}

func TestBenchmarkErrors(t *testing.T) {
	tests := []struct {
		name   string
		m      Method
		y      []float64
		season int
		cause  error
		text   string
	}{
		{"empty naive", Naive{}, nil, 0, ErrTooShort, "at least 1"},
		{"one value drift", Drift{}, []float64{3}, 0, ErrTooShort, "at least 2"},
		{"no season", SeasonalNaive{}, []float64{1, 2, 3}, 1, ErrSeason, "season of at least 2"},
		{"short season", SeasonalNaive{}, []float64{1, 2, 3}, 4, ErrTooShort, "full season of 4"},
		{"nan", Mean{}, []float64{1, math.NaN()}, 0, ErrBadValue, "value 2"},
		{"inf", Naive{}, []float64{math.Inf(1)}, 0, ErrBadValue, "value 1"},
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

// TestBenchmarksConstant: a constant series gives constant forecasts and
// zero-width intervals, never NaN.
func TestBenchmarksConstant(t *testing.T) {
	y := []float64{5, 5, 5, 5, 5, 5, 5, 5}
	for _, m := range []Method{Naive{}, SeasonalNaive{Cycle: 4}, Drift{}, Mean{}, MovingAverage{}} {
		t.Run(m.Name(), func(t *testing.T) {
			f := mustFit(t, m, y, 4)
			for i, v := range f.Forecast(6) {
				if !within(v, 5, 1e-12, 0) {
					t.Errorf("forecast %d = %g, want 5", i+1, v)
				}
			}
			if !f.HasInterval() {
				return
			}
			lo, hi, err := f.Interval(6, 0.8)
			if err != nil {
				t.Fatal(err)
			}
			for i := range lo {
				if math.IsNaN(lo[i]) || math.IsNaN(hi[i]) {
					t.Errorf("interval %d is NaN", i+1)
				}
			}
		})
	}
}
