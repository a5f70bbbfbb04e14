package steps

import (
	"encoding/json"
	"strings"
	"testing"
)

var completeTests = []struct {
	name string
	line string // the marker § stands for the cursor
	want []string
	not  []string
}{
	{"verbs at the start", "fo§", []string{"forecast"}, []string{"load"}},
	{"all verbs on an empty line", "§", []string{"memo", "load", "split", "bakeoff"}, nil},
	{"methods after forecast", "forecast mov§", []string{"moving-average"}, []string{"naive"}},
	{"smooth kinds", "smooth §", []string{"centered", "trailing"}, nil},
	{"method options", "forecast moving-average w§", []string{"width="}, []string{"horizon="}},
	{"verb options", "forecast naive §", []string{"horizon=", "as=", "interval="}, nil},
	{"used options are not offered again", "forecast naive as=x §", []string{"horizon="}, []string{"as="}},
	{"measures after by=", "evaluate by=ma§", []string{"mae", "mape", "mase"}, []string{"rmse"}},
	{"nothing inside a comment", "load a.csv # va§", nil, []string{"value="}},
	{"unknown verb offers nothing", "frob §", nil, []string{"as="}},
}

func TestComplete(t *testing.T) {
	t.Parallel()
	for _, tc := range completeTests {
		t.Run(tc.name, func(t *testing.T) {
			line, _, col := stripMarker(tc.line)
			got := Complete(line, col)
			texts := map[string]bool{}
			for _, s := range got {
				texts[s.Text] = true
				if s.From < 1 || s.To < s.From || s.To > len([]rune(line))+1 {
					t.Errorf("%q: suggestion %q replaces columns %d..%d", tc.line, s.Text, s.From, s.To)
				}
			}
			for _, w := range tc.want {
				if !texts[w] {
					t.Errorf("%q: %q not offered; got %v", tc.line, w, got)
				}
			}
			for _, w := range tc.not {
				if texts[w] {
					t.Errorf("%q: %q offered but should not be", tc.line, w)
				}
			}
		})
	}
}

func TestCompleteAgreesWithParser(t *testing.T) {
	t.Parallel()
	// Every option completion for every verb, written with its example,
	// parses without an option error: completion and parser share one table.
	for _, v := range Verbs() {
		for _, o := range v.Options {
			line := v.Example
			if _, given := parseLine(line, newLang(DefaultCatalog())).Option(o.Name); given {
				continue
			}
			line += " " + o.Name + "=" + o.Example
			if s := parseLine(line, newLang(DefaultCatalog())); s.Err != nil && s.Err.Cause != ErrOption {
				t.Errorf("%s: %q: %v", v.Name, line, s.Err)
			}
		}
	}
}

func TestHelp(t *testing.T) {
	t.Parallel()
	h := Help()
	if _, err := json.Marshal(h); err != nil {
		t.Fatalf("the help page does not encode as JSON: %v", err)
	}
	if len(h.Verbs) != len(Verbs()) {
		t.Fatalf("help lists %d verbs, the language has %d", len(h.Verbs), len(Verbs()))
	}
	md := h.Markdown()
	for _, v := range Verbs() {
		if !strings.Contains(md, "### `"+v.Name) {
			t.Errorf("help markdown lacks verb %s", v.Name)
		}
		for _, o := range v.Options {
			if !strings.Contains(md, "`"+o.Name+"=") {
				t.Errorf("help markdown lacks option %s of %s", o.Name, v.Name)
			}
		}
		// Each verb's example is a valid step in the help's own words.
		if s := parseLine(v.Example, newLang(DefaultCatalog())); s.Err != nil {
			t.Errorf("example of %s does not parse: %v", v.Name, s.Err)
		}
	}
	for _, m := range DefaultCatalog() {
		if !strings.Contains(md, "### `"+m.Name+"`") {
			t.Errorf("help markdown lacks method %s", m.Name)
		}
	}
}

func TestCompleteAt(t *testing.T) {
	t.Parallel()
	p := ParseText(docOf("load a.csv\nsplit last=4\nforecast naive as=nv\nforecast holt-winters as=hw\nevaluate"))
	tests := []struct {
		name string
		n    int
		line string
		want []string
		from int
	}{
		{"labels after check, then options", 6, "check §", []string{"nv", "hw", "lags="}, 7},
		{"labels filtered by prefix", 6, "check h§", []string{"hw"}, 7},
		{"labels in a list", 6, "combine of=nv,§", []string{"hw"}, 15},
		{"only labels made before the step", 4, "check §", []string{"nv", "lags="}, 7},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			line, _, col := stripMarker(tc.line)
			got := p.CompleteAt(tc.n, line, col)
			if len(got) != len(tc.want) {
				t.Fatalf("%q: got %v, want %v", tc.line, got, tc.want)
			}
			for i, s := range got {
				if s.Text != tc.want[i] || s.From != tc.from {
					t.Errorf("%q: suggestion %d is %q from column %d, want %q from %d", tc.line, i, s.Text, s.From, tc.want[i], tc.from)
				}
			}
		})
	}
}

func BenchmarkComplete(b *testing.B) {
	p := ParseText(docOf("load a.csv\nsplit last=4\nforecast naive as=nv\nforecast holt-winters as=hw"))
	for _, line := range []string{"fo", "forecast holt-winters ", "evaluate by=m", "check "} {
		b.Run(line, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				p.CompleteAt(5, line, len(line)+1)
			}
		})
	}
}
