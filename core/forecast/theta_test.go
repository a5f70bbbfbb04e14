package forecast

import (
	"math"
	"strings"
	"testing"
)

// TestThetaLine: on a straight line y = 10 + 2t the estimated alpha is 1
// (the smoothed level then equals the last value) and the Theta forecast
// is y[n-1] + (b0/2)*h with b0 = 2: the method extends half the slope
// (hand calculation from the Hyndman-Billah formula with alpha = 1).
func TestThetaLine(t *testing.T) {
	y := make([]float64, 20)
	for i := range y {
		y[i] = 10 + 2*float64(i)
	}
	f := mustFit(t, Theta{}, y, 0)
	if a := f.Params[0].Value; !within(a, 1, 1e-6, 0) {
		t.Errorf("alpha = %g, want 1", a)
	}
	for h, got := range f.Forecast(4) {
		want := y[19] + float64(h+1)
		if !within(got, want, 1e-6, 1e-9) {
			t.Errorf("h=%d: %g, want %g", h+1, got, want)
		}
	}
}

// TestThetaFixedAlpha recomputes the Theta forecast with alpha 0.5 by an
// explicit loop: simple exponential smoothing from level0 = y[0], the
// least squares slope b0 of y on t, and forecast h = l_n + (b0/2)(h - 1 +
// (1 - 0.5^n)/0.5) (R. J. Hyndman and B. Billah (2003), IJF 19(2), eq. for
// the SES-with-drift form). Series invented for the test.
func TestThetaFixedAlpha(t *testing.T) {
	y := []float64{12, 15, 14, 18, 21, 19, 24, 26}
	n := float64(len(y))
	l := y[0]
	for _, v := range y {
		l = 0.5*v + 0.5*l
	}
	// slope by the textbook formula sum (t - tbar)(y - ybar) / sum (t - tbar)^2
	tbar, ybar := (n-1)/2, mean(y)
	num, den := 0.0, 0.0
	for i, v := range y {
		num += (float64(i) - tbar) * (v - ybar)
		den += (float64(i) - tbar) * (float64(i) - tbar)
	}
	b0 := num / den
	f := mustFit(t, Theta{Alpha: ptr(0.5)}, y, 0)
	for h, got := range f.Forecast(3) {
		want := l + b0/2*(float64(h)+(1-math.Pow(0.5, n))/0.5)
		if !within(got, want, 1e-12, 1e-12) {
			t.Errorf("h=%d: %.12g, want %.12g", h+1, got, want)
		}
	}
	if _, _, err := f.Interval(3, 0.8); err != nil {
		t.Errorf("interval: %v", err)
	}
}

// TestNaive2Seasonal: on the monthly electrical equipment index the 90%
// test finds a season, so naive2's forecast is the last seasonally
// adjusted value times the index of each future month. Expected indices
// and adjusted values: case decompose_multiplicative_elec (statsmodels
// 0.13.5 seasonal_decompose, period 12).
func TestNaive2Seasonal(t *testing.T) {
	var c struct {
		refCase
		Expected struct {
			Indices  []float64 `json:"indices"`
			Adjusted []float64 `json:"adjusted"`
		}
	}
	readCase(t, "decompose_multiplicative_elec", &c)
	if len(c.Expected.Indices) != 12 || len(c.Expected.Adjusted) != len(c.Data.Y) {
		t.Fatalf("case lacks indices or adjusted values")
	}
	n := len(c.Data.Y)
	f := mustFit(t, Naive2{}, c.Data.Y, 12)
	want := make([]float64, 12)
	for h := range want {
		want[h] = c.Expected.Adjusted[n-1] * c.Expected.Indices[(n+h)%12]
	}
	checkFloats(t, "forecast", f.Forecast(12), want, 1e-9, 1e-9)
	if !f.Follows.Season || len(f.Notes) == 0 || !strings.Contains(f.Notes[0], "found a season") {
		t.Errorf("notes %q, want a seasonal adjustment", f.Notes)
	}
	th := mustFit(t, Theta{}, c.Data.Y, 12)
	if !th.Follows.Season {
		t.Errorf("theta did not adjust for the season: %q", th.Notes)
	}
}

// TestNaive2Plain: without a season naive2 is the naive method.
func TestNaive2Plain(t *testing.T) {
	y := []float64{3, 5, 4, 6, 8, 7, 9, 11, 10, 12}
	a := mustFit(t, Naive2{}, y, 0)
	b := mustFit(t, Naive{}, y, 0)
	checkFloats(t, "forecast", a.Forecast(5), b.Forecast(5), 0, 0)
	la, ha, _ := a.Interval(5, 0.95)
	lb, hb, _ := b.Interval(5, 0.95)
	checkFloats(t, "lower", la, lb, 0, 0)
	checkFloats(t, "upper", ha, hb, 0, 0)
	// A short seasonal series is left unadjusted, with a note saying why.
	s := mustFit(t, Naive2{}, y[:8], 4)
	if s.Follows.Season || len(s.Notes) == 0 || !strings.Contains(s.Notes[0], "more than two full seasons") {
		t.Errorf("notes %q", s.Notes)
	}
}
