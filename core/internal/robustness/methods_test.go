package robustness

import (
	"fmt"
	"math"
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"quillcast/core/forecast"
)

// goWords are words of the programming language that must never reach a
// user's message (STYLE.md §3).
var goWords = []string{"NaN", "Inf", "nil", "float64", "index out of range", "panic", "runtime error"}

// checkMessage fails when an error message is empty or speaks Go.
func checkMessage(t *testing.T, what, msg string) {
	t.Helper()
	if strings.TrimSpace(msg) == "" {
		t.Errorf("%s: the error has no message", what)
	}
	for _, w := range goWords {
		if strings.Contains(msg, w) {
			t.Errorf("%s: the message %q speaks of %q", what, msg, w)
		}
	}
}

// allFinite reports the first value of ys that is NaN or infinite.
func allFinite(ys ...[]float64) (float64, bool) {
	for _, y := range ys {
		for _, v := range y {
			if math.IsNaN(v) || math.IsInf(v, 0) {
				return v, false
			}
		}
	}
	return 0, true
}

// TestMethodsOnHardSeries fits every method of the catalogue, with its
// parameters left to the data, on every hard series: a fit either fails
// with a plain message or gives finite forecasts and, where it has them,
// finite intervals whose lower bound is not above the upper.
func TestMethodsOnHardSeries(t *testing.T) {
	t.Parallel()
	const horizon = 12
	for _, sp := range forecast.Catalog() {
		m, err := sp.New(nil)
		if err != nil {
			t.Fatalf("%s with default settings: %v", sp.Name, err)
		}
		for _, sh := range shapes() {
			t.Run(sp.Name+"/"+sh.name, func(t *testing.T) {
				fit, err := m.Fit(sh.values, 12)
				if err != nil {
					checkMessage(t, "fit", err.Error())
					return
				}
				fc := fit.Forecast(horizon)
				if len(fc) != horizon {
					t.Fatalf("forecast has %d values, want %d", len(fc), horizon)
				}
				if v, ok := allFinite(fc); !ok {
					t.Fatalf("forecast holds %v: %v", v, fc)
				}
				if !fit.HasInterval() {
					return
				}
				lo, hi, err := fit.Interval(horizon, 0.95)
				if err != nil {
					checkMessage(t, "interval", err.Error())
					return
				}
				if v, ok := allFinite(lo, hi); !ok {
					t.Fatalf("interval holds %v:\nlower %v\nupper %v", v, lo, hi)
				}
				for h := range lo {
					if lo[h] > hi[h] {
						t.Errorf("horizon %d: lower bound %g above upper %g", h+1, lo[h], hi[h])
					}
				}
			})
		}
	}
}

// TestMethodsScaleFree checks that multiplying a series by 1e-11 or 1e10
// multiplies every forecast by the same factor: forecasting methods are
// equivariant to the unit of measure (common practice: a forecast of
// sales in cents is 100 times the forecast in dollars). A method whose
// estimation depends on absolute tolerances breaks this at the extremes.
func TestMethodsScaleFree(t *testing.T) {
	t.Parallel()
	y := base(48)
	for _, sp := range forecast.Catalog() {
		m, err := sp.New(nil)
		if err != nil {
			t.Fatalf("%s with default settings: %v", sp.Name, err)
		}
		fit, err := m.Fit(y, 12)
		if err != nil {
			t.Fatalf("%s on the ordinary series: %v", sp.Name, err)
		}
		want := fit.Forecast(12)
		for _, k := range []float64{1e-11, 1e10} {
			t.Run(fmt.Sprintf("%s/times %g", sp.Name, k), func(t *testing.T) {
				fit, err := m.Fit(scaled(y, k), 12)
				if err != nil {
					t.Fatalf("fit on the series times %g: %v", k, err)
				}
				got := fit.Forecast(12)
				for h := range want {
					// The tolerance allows estimates that stop a little
					// apart: 0.5% of the series' level of about 100.
					if !scalar.EqualWithinAbs(got[h]/k, want[h], 0.5) {
						t.Errorf("horizon %d: forecast/%g = %g, want %g as on the unscaled series", h+1, k, got[h]/k, want[h])
					}
				}
			})
		}
	}
}
