package forecast

import (
	"errors"
	"testing"
)

// recorder is a test method that keeps the series it was fitted to and
// forecasts with the naive method.
type recorder struct{ got *[]float64 }

func (recorder) Name() string { return "recorder" }

func (r recorder) Fit(y []float64, season int) (*Fit, error) {
	*r.got = clone(y)
	return Naive{}.Fit(y, season)
}

// TestDifferencedSeries checks the differences handed to the inner
// method. Source: case differences_nist_sales (numpy diff on the
// NIST/SEMATECH 6.4.3.6 quarterly sales).
func TestDifferencedSeries(t *testing.T) {
	var c struct {
		refCase
		Expected map[string][]float64
	}
	readCase(t, "differences_nist_sales", &c)
	var got []float64
	tests := []struct {
		key string
		m   Method
	}{
		{"lag1", Differenced{Lag: 1, Inner: recorder{&got}}},
		{"lag4", Differenced{Lag: 4, Inner: recorder{&got}}},
		{"lag4_then_lag1", Differenced{Lag: 4, Inner: Differenced{Lag: 1, Inner: recorder{&got}}}},
	}
	for _, tt := range tests {
		t.Run(tt.key, func(t *testing.T) {
			mustFit(t, tt.m, c.Data.Y, 4)
			if len(got) != len(c.Expected[tt.key]) {
				t.Fatalf("inner series has %d values, want %d", len(got), len(c.Expected[tt.key]))
			}
			checkFloats(t, tt.key, got, c.Expected[tt.key], c.Tolerance.Abs, c.Tolerance.Rel)
		})
	}
}

// TestDifferencedIntegration: the mean of the lag-1 differences is the
// drift slope (y[n-1]-y[0])/(n-1), so mean-on-differences must equal the
// drift method in fitted values and forecasts (hand derivation); and
// naive on lag-4 differences repeats last year's change on top of last
// year's values (hand calculation below).
func TestDifferencedIntegration(t *testing.T) {
	y := []float64{362, 385, 432, 341, 382, 409, 498, 387, 473, 513, 582, 474}
	a := mustFit(t, Differenced{Lag: 1, Inner: Mean{}}, y, 0)
	b := mustFit(t, Drift{}, y, 0)
	checkFloats(t, "forecast", a.Forecast(6), b.Forecast(6), 1e-9, 1e-12)
	checkSlice(t, "fitted", a.Fitted, floatPtrs(b.Fitted), 1e-9, 1e-12)

	s := mustFit(t, Differenced{Lag: 4, Inner: Naive{}}, y, 4)
	// last year's changes: 473-382=91, 513-409=104, 582-498=84, 474-387=87;
	// naive on differences repeats the last change, 87, at every horizon.
	want := []float64{473 + 87, 513 + 87, 582 + 87, 474 + 87, 473 + 174, 513 + 174}
	checkFloats(t, "seasonal forecast", s.Forecast(6), want, 1e-9, 0)
	if _, _, err := s.Interval(3, 0.8); !errors.Is(err, ErrNoInterval) {
		t.Errorf("interval error %v, want ErrNoInterval", err)
	}
	if _, err := (Differenced{Lag: 12, Inner: Naive{}}).Fit(y, 0); !errors.Is(err, ErrTooShort) {
		t.Errorf("lag 12 on 12 values: error %v, want ErrTooShort", err)
	}
}

func floatPtrs(v []float64) []*float64 {
	out := make([]*float64, len(v))
	for i := range v {
		if v[i] == v[i] {
			out[i] = &v[i]
		}
	}
	return out
}

// TestCombination: the equal-weight average of naive and mean (hand
// calculation) and the catalogue's default members.
func TestCombination(t *testing.T) {
	y := []float64{4, 8, 6, 10}
	f := mustFit(t, Combination{Methods: []Method{Naive{}, Mean{}}}, y, 0)
	checkFloats(t, "forecast", f.Forecast(2), []float64{(10 + 7) / 2.0, (10 + 7) / 2.0}, 1e-12, 0)
	checkSlice(t, "fitted", f.Fitted, floatPtrs([]float64{nanSlice(1)[0], (4 + 7) / 2.0, (8 + 7) / 2.0, (6 + 7) / 2.0}), 1e-12, 0)
	if _, _, err := f.Interval(2, 0.8); !errors.Is(err, ErrNoInterval) {
		t.Errorf("interval error %v, want ErrNoInterval", err)
	}
	sp, ok := Lookup("combination")
	if !ok {
		t.Fatal("combination not in the catalogue")
	}
	m, err := sp.New(nil)
	if err != nil {
		t.Fatal(err)
	}
	if m.Name() != "comb-ses-holt-damped" {
		t.Errorf("default combination %q", m.Name())
	}
	if _, err := sp.New(Settings{"of": {Word: "ses,combination"}}); !errors.Is(err, ErrSetting) {
		t.Errorf("nested combination: error %v, want ErrSetting", err)
	}
}
