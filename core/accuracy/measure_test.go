package accuracy

import (
	"strings"
	"testing"
)

func TestMeasureNames(t *testing.T) {
	t.Parallel()
	tests := []struct {
		m      Measure
		name   string
		label  string
		title  string
		signed bool
		pct    bool
	}{
		{ME, "me", "ME", "Mean error (ME)", true, false},
		{MAE, "mae", "MAE", "Mean absolute error (MAE)", false, false},
		{MSE, "mse", "MSE", "Mean squared error (MSE)", false, false},
		{RMSE, "rmse", "RMSE", "Root mean squared error (RMSE)", false, false},
		{MAPE, "mape", "MAPE", "Mean absolute percentage error (MAPE)", false, true},
		{MPE, "mpe", "MPE", "Mean percentage error (MPE)", true, true},
		{SMAPE, "smape", "sMAPE", "Symmetric mean absolute percentage error (sMAPE)", false, true},
		{MASE, "mase", "MASE", "Mean absolute scaled error (MASE)", false, false},
	}
	if len(tests) != len(Measures()) {
		t.Fatalf("%d measures tested, %d exist", len(tests), len(Measures()))
	}
	for i, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			t.Parallel()
			if Measures()[i] != tc.m {
				t.Errorf("Measures()[%d] = %v, want %v", i, Measures()[i], tc.m)
			}
			if tc.m.Label() != tc.label {
				t.Errorf("Label() = %q, want %q", tc.m.Label(), tc.label)
			}
			if tc.m.String() != tc.name || tc.m.Title() != tc.title || tc.m.Signed() != tc.signed || tc.m.Percent() != tc.pct {
				t.Errorf("%d: got %q %q signed %v percent %v", int(tc.m), tc.m.String(), tc.m.Title(), tc.m.Signed(), tc.m.Percent())
			}
			def := tc.m.Definition()
			if !strings.Contains(def, "=") || !strings.Contains(strings.ToLower(def), tc.name) || len(def) < 100 {
				t.Errorf("definition of %v lacks a formula or is too short: %q", tc.m, def)
			}
			got, err := ParseMeasure(strings.ToUpper(tc.name))
			if err != nil || got != tc.m {
				t.Errorf("ParseMeasure(%q) = %v, %v", strings.ToUpper(tc.name), got, err)
			}
		})
	}
	bad := Measure(42)
	if bad.Valid() || bad.String() != "measure(42)" || bad.Title() != "measure(42)" || bad.Label() != "measure(42)" || bad.Definition() != "" || bad.Percent() {
		t.Errorf("invalid measure: %q %q %q", bad.String(), bad.Title(), bad.Definition())
	}
}

func TestParseMeasureErrors(t *testing.T) {
	t.Parallel()
	tests := []struct {
		in   string
		want Measure
		err  string
	}{
		{" rmse ", RMSE, ""},
		{"MAD", MAE, ""},
		{"rmes", 0, `unknown accuracy measure "rmes"; did you mean "rmse"?`},
		{"smap", 0, `did you mean "smape"?`},
		{"masse", 0, `did you mean "mase"?`},
		{"accuracy", 0, `unknown accuracy measure "accuracy"; write one of me, mae, mse, rmse, mape, mpe, smape, mase`},
		{"", 0, `unknown accuracy measure ""; write one of`},
	}
	for _, tc := range tests {
		t.Run(tc.in, func(t *testing.T) {
			t.Parallel()
			got, err := ParseMeasure(tc.in)
			if tc.err == "" {
				if err != nil || got != tc.want {
					t.Errorf("ParseMeasure(%q) = %v, %v; want %v", tc.in, got, err, tc.want)
				}
				return
			}
			if err == nil || !strings.Contains(err.Error(), tc.err) {
				t.Errorf("ParseMeasure(%q) error = %v, want it to contain %q", tc.in, err, tc.err)
			}
		})
	}
}

func TestBetter(t *testing.T) {
	t.Parallel()
	def := func(v float64) Result { return Result{Value: v, Defined: true} }
	undef := Result{Reason: "MAPE undefined: 1 actual value is zero"}
	tests := []struct {
		name string
		m    Measure
		a, b Result
		want bool
	}{
		{"smaller rmse", RMSE, def(1), def(2), true},
		{"larger rmse", RMSE, def(3), def(2), false},
		{"me closer to zero", ME, def(-1), def(2), true},
		{"me further from zero", ME, def(-3), def(2), false},
		{"mpe closer to zero", MPE, def(0.5), def(-0.6), true},
		{"defined beats undefined", MAPE, def(90), undef, true},
		{"undefined never better", MAPE, undef, def(90), false},
		{"two undefined", MAPE, undef, undef, false},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			t.Parallel()
			if got := tc.a.Better(tc.m, tc.b); got != tc.want {
				t.Errorf("%+v.Better(%v, %+v) = %v, want %v", tc.a, tc.m, tc.b, got, tc.want)
			}
		})
	}
}

func FuzzParseMeasure(f *testing.F) {
	for _, s := range []string{"rmse", "MASE", " smape", "rmes", "", "mad", "ü", "m\x00e"} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		m, err := ParseMeasure(s)
		if err == nil {
			if !m.Valid() {
				t.Fatalf("ParseMeasure(%q) = %v without error", s, m)
			}
			return
		}
		if m != 0 || !strings.Contains(err.Error(), "unknown accuracy measure") {
			t.Fatalf("ParseMeasure(%q) = %v, %v", s, m, err)
		}
	})
}

func BenchmarkParseMeasure(b *testing.B) {
	for _, in := range []string{"rmse", "mase", "masse"} {
		b.Run(in, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				_, _ = ParseMeasure(in)
			}
		})
	}
}
