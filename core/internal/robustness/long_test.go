package robustness

import (
	"math"
	"testing"

	"quillcast/core/accuracy"
	"quillcast/core/diagnose"
	"quillcast/core/forecast"
)

// longLength is the length of the long series: 1,000,000 points, or
// 100,000 under -short. Only the paths whose cost grows with n alone run
// on it (measures, the ACF at a few lags, differencing and the methods
// with nothing to estimate), so the test stays well under a second.
func longLength() int {
	if testing.Short() {
		return 100_000
	}
	return 1_000_000
}

// TestLongSeries runs the linear-time paths on a very long series of
// large values and checks that each answer is finite and right: the
// naive forecast repeats the last value, the mean forecast is the mean,
// the lag-1 difference of a line is its slope, and the measures of a
// forecast that is off by exactly 1 everywhere are 1 (hand calculation:
// MAE = mean |1| = 1, RMSE = sqrt(mean 1²) = 1, ME = -1 since error is
// actual minus forecast).
func TestLongSeries(t *testing.T) {
	t.Parallel()
	n := longLength()
	y := make([]float64, n)
	off := make([]float64, n)
	for i := range y {
		y[i] = 1e9 + 3*float64(i)
		off[i] = y[i] + 1
	}

	scores := accuracy.Evaluate(y, off, accuracy.NaiveScale(y, 1))
	for _, c := range []struct {
		m    string
		want float64
	}{{"mae", 1}, {"rmse", 1}, {"me", -1}} {
		m, err := accuracy.ParseMeasure(c.m)
		if err != nil {
			t.Fatal(err)
		}
		r := scores.Of(m)
		if !r.Defined || math.Abs(r.Value-c.want) > 1e-6 {
			t.Errorf("%s over %d points = %+v, want %g", c.m, n, r, c.want)
		}
	}

	d, err := diagnose.Difference(y, 1)
	if err != nil {
		t.Fatal(err)
	}
	for i, v := range d {
		if math.Abs(v-3) > 1e-6 {
			t.Fatalf("difference %d = %g, want the slope 3", i+1, v)
		}
	}

	acf, err := diagnose.ACF(y, 3)
	if err != nil {
		t.Fatal(err)
	}
	if v, ok := allFinite(acf); !ok {
		t.Errorf("ACF holds %v", v)
	}

	for _, c := range []struct {
		method string
		want   float64
	}{
		{"naive", y[n-1]},                // hand calculation: the last value
		{"mean", 1e9 + 3*float64(n-1)/2}, // hand calculation: mean of a line is its midpoint
		{"drift", y[n-1] + 3},            // hand calculation: slope (y[n-1]-y[0])/(n-1) = 3
		{"seasonal-naive", y[n-12]},      // hand calculation: the value one season back
	} {
		sp, ok := forecast.Lookup(c.method)
		if !ok {
			t.Fatalf("no method %q", c.method)
		}
		m, err := sp.New(nil)
		if err != nil {
			t.Fatal(err)
		}
		fit, err := m.Fit(y, 12)
		if err != nil {
			t.Fatalf("%s on %d points: %v", c.method, n, err)
		}
		got := fit.Forecast(1)[0]
		if math.Abs(got-c.want) > 1e-6*c.want {
			t.Errorf("%s on %d points forecasts %g, want %g", c.method, n, got, c.want)
		}
	}
}
