package forecast

import (
	"errors"
	"math"
	"strings"
	"testing"
)

// TestCatalog: every entry is complete, builds with default settings, and
// the labels the bake-off needs are present.
func TestCatalog(t *testing.T) {
	seen := map[string]bool{}
	for _, sp := range Catalog() {
		t.Run(sp.Name, func(t *testing.T) {
			if seen[sp.Name] {
				t.Errorf("duplicate name")
			}
			seen[sp.Name] = true
			if sp.Title == "" || sp.Summary == "" || sp.Source == "" || sp.Assumes == "" {
				t.Errorf("incomplete entry: %+v", sp)
			}
			m, err := sp.New(nil)
			if err != nil {
				t.Fatal(err)
			}
			if sp.Name != "combination" && m.Name() != sp.Name {
				t.Errorf("method name %q, want %q", m.Name(), sp.Name)
			}
			for _, p := range sp.Params {
				if p.Help == "" {
					t.Errorf("parameter %s has no help", p.Name)
				}
				if p.Kind == Choice && !containsWord(p.Choices, p.Default) {
					t.Errorf("parameter %s: default %q not among %v", p.Name, p.Default, p.Choices)
				}
			}
			f := mustFit(t, m, benchSeries(60), 12)
			for i, v := range f.Forecast(12) {
				if math.IsNaN(v) || math.IsInf(v, 0) {
					t.Errorf("forecast %d = %g", i+1, v)
				}
			}
		})
	}
	for _, name := range []string{"naive", "seasonal-naive", "drift", "mean", "moving-average", "ses", "holt", "damped", "holt-winters", "regression", "theta", "naive2"} {
		if _, ok := Lookup(name); !ok {
			t.Errorf("Lookup(%q) found nothing", name)
		}
	}
	if _, ok := Lookup("auto"); ok {
		t.Error(`"auto" belongs to the backtest package, not the catalogue`)
	}
}

func containsWord(list []string, w string) bool {
	for _, v := range list {
		if v == w {
			return true
		}
	}
	return false
}

// TestCatalogSettings: settings are applied, and bad ones are refused with
// a message naming the parameter and what is accepted.
func TestCatalogSettings(t *testing.T) {
	tests := []struct {
		method string
		s      Settings
		text   string // "" = accepted
	}{
		{"moving-average", Settings{"width": {Number: 4}}, ""},
		{"moving-average", Settings{"widht": {Number: 4}}, `no parameter "widht"; it accepts width`},
		{"moving-average", Settings{"width": {Number: 2.5}}, "width=2.5 for moving-average is not a whole number"},
		{"moving-average", Settings{"width": {Number: 0}}, "of at least 1"},
		{"ses", Settings{"alpha": {Number: 1.2}}, "alpha=1.2 for ses is out of range; write a value from 0 to 1"},
		{"ses", Settings{"alpha": {Number: math.NaN()}}, "not a number"},
		{"holt-winters", Settings{"season": {Word: "multiplicativ"}}, "write one of additive, multiplicative"},
		{"holt-winters", Settings{"season": {Word: "multiplicative"}, "phi": {Number: 0.9}}, ""},
		{"holt-winters", Settings{"season0": {Word: "1,x,3"}}, `entry 2 of the list, "x"`},
		{"regression", Settings{"trend": {Word: "exponential"}, "cycle": {Number: 4}}, ""},
		{"combination", Settings{"of": {Word: "ses,nope"}}, `"nope" is not a method`},
		{"naive", Settings{"alpha": {Number: 0.3}}, "naive has no parameter \"alpha\"; it accepts no parameters"},
	}
	for _, tt := range tests {
		t.Run(tt.method+" "+tt.text, func(t *testing.T) {
			sp, _ := Lookup(tt.method)
			m, err := sp.New(tt.s)
			if tt.text == "" {
				if err != nil {
					t.Fatalf("refused: %v", err)
				}
				return
			}
			if err == nil || !errors.Is(err, ErrSetting) || !strings.Contains(err.Error(), tt.text) {
				t.Errorf("got %v (method %v), want a setting error containing %q", err, m, tt.text)
			}
		})
	}
	sp, _ := Lookup("holt-winters")
	m, _ := sp.New(Settings{"season": {Word: "multiplicative"}, "phi": {Number: 0.9}, "alpha": {Number: 0.3}})
	hw := m.(Smoothing)
	if hw.Season != Multiplicative || !hw.Damped || *hw.Phi != 0.9 || *hw.Alpha != 0.3 {
		t.Errorf("settings not applied: %+v", hw)
	}
}

// FuzzParseNumbers: the list reader never panics, and on success the
// numbers written back with commas read the same.
func FuzzParseNumbers(f *testing.F) {
	for _, s := range []string{"-18,5,52,-39", "1", " 0.9 , 1.1", "", "1,,2", "x", "1e400", "NaN"} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		v, err := ParseNumbers(s)
		if err != nil {
			return
		}
		parts := make([]string, len(v))
		for i, x := range v {
			if math.IsNaN(x) || math.IsInf(x, 0) {
				t.Fatalf("%q gave %g", s, x)
			}
			parts[i] = fmtNum(x)
		}
		w, err := ParseNumbers(strings.Join(parts, ","))
		if err != nil || len(w) != len(v) {
			t.Fatalf("round trip of %q: %v %v", s, w, err)
		}
	})
}

// TestDeterministic: fitting twice gives identical parameters and
// forecasts (bit for bit, so == is meant here).
func TestDeterministic(t *testing.T) {
	y := benchSeries(72)
	for _, sp := range Catalog() {
		m, _ := sp.New(nil)
		a, b := mustFit(t, m, y, 12), mustFit(t, m, y, 12)
		fa, fb := a.Forecast(12), b.Forecast(12)
		for i := range fa {
			if math.Float64bits(fa[i]) != math.Float64bits(fb[i]) {
				t.Errorf("%s: forecast %d differs between runs: %v and %v", sp.Name, i+1, fa[i], fb[i])
			}
		}
		for i := range a.Params {
			if math.Float64bits(a.Params[i].Value) != math.Float64bits(b.Params[i].Value) {
				t.Errorf("%s: %s differs between runs", sp.Name, a.Params[i].Name)
			}
		}
	}
}
