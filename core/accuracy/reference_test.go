package accuracy

import (
	"encoding/json"
	"fmt"
	"math"
	"sort"
	"strings"
	"testing"

	"quillcast/core/internal/refdata"
)

// tol is a reference case tolerance: pass when |got-want| <= Abs + Rel*|want|.
type tol struct{ Abs, Rel float64 }

func (c tol) near(got, want float64) bool {
	return math.Abs(got-want) <= c.Abs+c.Rel*math.Abs(want)
}

// expectedScores is one forecast's expected block in an accuracy_* case.
type expectedScores map[string]any

// num returns the number under key, or nil for JSON null or a missing key.
func (e expectedScores) num(key string) *float64 {
	if v, ok := e[key].(float64); ok {
		return &v
	}
	return nil
}

// checkScores compares s with the expected block, for every measure and for
// the MASE scales named mase_lagL / mase_lagL_scale.
func checkScores(t *testing.T, train []float64, actual, forecast []float64, want expectedScores, c tol) {
	t.Helper()
	keys := make([]string, 0, len(want))
	for k := range want {
		keys = append(keys, k)
	}
	sort.Strings(keys)
	lags := 0
	for _, k := range keys {
		var lag int
		if _, err := fmt.Sscanf(k, "mase_lag%d", &lag); err != nil || strings.HasSuffix(k, "_scale") {
			continue
		}
		lags++
		scale := NaiveScale(train, lag)
		if ws := want.num(fmt.Sprintf("mase_lag%d_scale", lag)); ws == nil || !scale.Defined || !c.near(scale.Value, *ws) {
			t.Errorf("scale at lag %d = %+v, want %v", lag, scale, ws)
		}
		s := Evaluate(actual, forecast, scale)
		checkResult(t, fmt.Sprintf("MASE lag %d", lag), s.Of(MASE), want.num(k), c)
		if s.N != len(actual) || s.Skipped != 0 {
			t.Errorf("N, Skipped = %d, %d; want %d, 0", s.N, s.Skipped, len(actual))
		}
		for _, m := range []Measure{ME, MAE, MSE, RMSE, MAPE, MPE, SMAPE} {
			if _, ok := want[m.String()]; !ok {
				t.Fatalf("case has no %q", m)
			}
			checkResult(t, m.String(), s.Of(m), want.num(m.String()), c)
		}
		// MAD in the case files is the mean absolute deviation of the
		// errors, identical to MAE.
		checkResult(t, "mad", s.Of(MAE), want.num("mad"), c)
	}
	if lags == 0 {
		t.Fatal("case has no MASE entries")
	}
}

func checkResult(t *testing.T, name string, got Result, want *float64, c tol) {
	t.Helper()
	switch {
	case want == nil && got.Defined:
		t.Errorf("%s = %v, want undefined", name, got.Value)
	case want == nil && got.Reason == "":
		t.Errorf("%s undefined without a reason", name)
	case want != nil && !got.Defined:
		t.Errorf("%s undefined (%s), want %.15g", name, got.Reason, *want)
	case want != nil && !c.near(got.Value, *want):
		t.Errorf("%s = %.15g, want %.15g", name, got.Value, *want)
	}
}

// TestEvaluateReference checks every measure against the reference cases
// accuracy_nist_sales_last4, accuracy_nile_last10 and accuracy_elec_2015:
// numpy, cross-checked with statsmodels 0.13.5 eval_measures, on the
// NIST/SEMATECH e-Handbook 6.4.3.6 quarterly sales, the Nile flow and the
// Eurostat electrical equipment index; MASE after Hyndman and Koehler
// (2006). Tolerance abs 1e-9, rel 1e-9 as the case files state.
func TestEvaluateReference(t *testing.T) {
	t.Parallel()
	for _, name := range []string{"accuracy_nist_sales_last4", "accuracy_nile_last10", "accuracy_elec_2015"} {
		var c struct {
			Data struct {
				Y []float64 `json:"y"`
			} `json:"data"`
			Params struct {
				Train     string                     `json:"train"`
				Test      string                     `json:"test"`
				Forecasts map[string]json.RawMessage `json:"forecasts"`
			} `json:"params"`
			Expected  map[string]expectedScores `json:"expected"`
			Tolerance tol                       `json:"tolerance"`
		}
		refdata.ReadJSON(t, "reference/cases/"+name+".json", &c)
		var a, b, ta, tb int
		if _, err := fmt.Sscanf(c.Params.Train, "y[%d..%d]", &a, &b); err != nil {
			t.Fatalf("%s: reading train range %q: %v", name, c.Params.Train, err)
		}
		if _, err := fmt.Sscanf(c.Params.Test, "y[%d..%d]", &ta, &tb); err != nil {
			t.Fatalf("%s: reading test range %q: %v", name, c.Params.Test, err)
		}
		train, actual := c.Data.Y[a:b+1], c.Data.Y[ta:tb+1]
		for method, want := range c.Expected {
			t.Run(name+"/"+method, func(t *testing.T) {
				var forecast []float64
				if err := json.Unmarshal(c.Params.Forecasts[method], &forecast); err != nil {
					t.Fatalf("forecast %q: %v", method, err)
				}
				checkScores(t, train, actual, forecast, want, c.Tolerance)
			})
		}
	}
}

// TestEvaluateZeroActual checks the reference case accuracy_zero_actual
// (hand-made numbers, measures computed with numpy): with one zero actual
// value MAPE and MPE are undefined with a reason, the rest are numbers.
func TestEvaluateZeroActual(t *testing.T) {
	t.Parallel()
	var c struct {
		Data struct {
			Train    []float64 `json:"train"`
			Actual   []float64 `json:"actual"`
			Forecast []float64 `json:"forecast"`
		} `json:"data"`
		Expected  expectedScores `json:"expected"`
		Tolerance tol            `json:"tolerance"`
	}
	refdata.ReadJSON(t, "reference/cases/accuracy_zero_actual.json", &c)
	checkScores(t, c.Data.Train, c.Data.Actual, c.Data.Forecast, c.Expected, c.Tolerance)
	s := Evaluate(c.Data.Actual, c.Data.Forecast, NaiveScale(c.Data.Train, 1))
	if got, want := s.Of(MAPE).Reason, "MAPE undefined: 1 actual value is zero"; got != want {
		t.Errorf("MAPE reason = %q, want %q", got, want)
	}
	if got, want := s.Of(MPE).Reason, "MPE undefined: 1 actual value is zero"; got != want {
		t.Errorf("MPE reason = %q, want %q", got, want)
	}
}
