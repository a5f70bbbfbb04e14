package chart

import (
	"bytes"
	"encoding/xml"
	"errors"
	"flag"
	"io"
	"math"
	"os"
	"path/filepath"
	"regexp"
	"strings"
	"testing"
)

var update = flag.Bool("update", false, "rewrite the golden files in testdata")

// svgChart is what every chart type has in common.
type svgChart interface{ SVG() string }

// goldenCases are drawn and compared byte for byte with testdata/NAME.svg.
// Expected output is a regression value: our own past output, checked by eye
// when written.
func goldenCases() []struct {
	name  string
	chart svgChart
} {
	nan := math.NaN()
	quarters := []string{"2022-Q1", "2022-Q2", "2022-Q3", "2022-Q4", "2023-Q1", "2023-Q2", "2023-Q3", "2023-Q4"}
	weeks := []string{"2024-W01", "2024-W02", "2024-W03", "2024-W04", "2024-W05", "2024-W06", "2024-W07", "2024-W08", "2024-W09", "2024-W10"}
	act := orders(48, 3)
	trend := centred(act)
	season := make([]float64, 48)
	rem := make([]float64, 48)
	for i := range season {
		season[i] = 260 * math.Sin(2*math.Pi*float64(i)/12)
		rem[i] = act[i] - trend[i] - season[i]
	}
	return []struct {
		name  string
		chart svgChart
	}{
		{"line-forecast", forecastLine(60)},
		{"line-holdout-then-future", func() Line { l := forecastLine(48); l.HoldoutStart, l.HoldoutEnd = 30, 42; return l }()},
		{"line-errors-quarterly", Line{
			Frame:   Frame{Title: "Forecast errors by quarter", YTitle: "actual − forecast"},
			Periods: quarters, ZeroLine: true, HoldoutStart: 6, HoldoutLabel: "validation",
			Series: []Series{
				{Name: "ma4", Role: Forecast, Values: []float64{120, -80, 45, 30, -150, 60, 210, -40}},
				{Name: "drift", Role: Forecast, Values: []float64{-20, 35, -60, 10, 80, -95, 140, 20}},
			}}},
		{"line-gaps-weekly", Line{
			Frame:   Frame{Title: "Weekly calls with gaps", Width: 480, Height: 240, FixedSize: true},
			Periods: weeks,
			Series:  []Series{{Name: "calls", Values: []float64{310, 325, nan, 298, nan, nan, 340, 352, 1e12, 361}}},
		}},
		{"line-empty", Line{Frame: Frame{Title: "Nothing yet"}}},
		{"bars-errors", Bars{
			Frame:  Frame{Title: "Holdout errors", XTitle: "month", YTitle: "units"},
			Labels: monthLabels(2023, 24), HoldoutStart: 12,
			Series: []Series{{Name: "hw", Values: scaled(orders(24, 5), 0.2, -260)}},
		}},
		{"bars-horizon", Bars{
			Frame:     Frame{Title: "Accuracy by horizon", XTitle: "periods ahead", YTitle: "MAE"},
			Labels:    []string{"1", "2", "3", "4", "5", "6"},
			Frequency: Unlabelled,
			Series: []Series{
				{Name: "ma12", Values: []float64{210, 230, 260, 300, 320, 355}},
				{Name: "seasonal naive", Values: []float64{150, 152, 149, 160, 158, 161}},
				{Name: "hw", Values: []float64{95, 110, 118, 131, nan, 150}},
			}}},
		{"sweep-width", Sweep{
			Frame: Frame{Title: "Window width against RMSE"}, Param: "width", Measure: "RMSE",
			Values:     []float64{2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12},
			Training:   []float64{150, 170, 186, 199, 210, 221, 230, 238, 244, 251, 255},
			Validation: []float64{265, 241, 226, 219, 214, 217, 225, 236, 249, 262, 270},
		}},
		{"acf", ACF{
			Frame:  Frame{Title: "Autocorrelation of the remainder"},
			Values: []float64{0.62, 0.35, 0.12, -0.05, -0.21, -0.33, -0.2, -0.04, 0.1, 0.28, 0.41, 0.55},
			Bound:  0.283,
		}},
		{"acf-empty", ACF{}},
		{"panels-decomposition", Panels{
			Frame:   Frame{Title: "Orders in four parts", XTitle: "month"},
			Periods: monthLabels(2020, 48),
			Parts: []Panel{
				{Name: "observed", Values: act},
				{Name: "trend", Values: trend},
				{Name: "seasonal", Values: season},
				{Name: "remainder", Values: rem, Bars: true},
			}}},
	}
}

func TestGolden(t *testing.T) {
	for _, tc := range goldenCases() {
		t.Run(tc.name, func(t *testing.T) {
			got := tc.chart.SVG()
			path := filepath.Join("testdata", tc.name+".svg")
			if *update {
				if err := os.WriteFile(path, []byte(got), 0o644); err != nil {
					t.Fatal(err)
				}
				return
			}
			want, err := os.ReadFile(path)
			if err != nil {
				t.Fatalf("%v (run go test -update to write it)", err)
			}
			if got != string(want) {
				t.Errorf("%s differs from its golden file; run go test -update and inspect the diff", path)
			}
			if again := tc.chart.SVG(); again != got {
				t.Errorf("two drawings of the same chart differ")
			}
		})
	}
}

// wellFormed decodes the whole document with encoding/xml and returns the
// first error, or an error when the root is not an svg element.
func wellFormed(doc string) error {
	d := xml.NewDecoder(strings.NewReader(doc))
	d.Strict = true
	root := ""
	for {
		tok, err := d.Token()
		if errors.Is(err, io.EOF) {
			break
		}
		if err != nil {
			return err
		}
		if se, ok := tok.(xml.StartElement); ok && root == "" {
			root = se.Name.Local
		}
	}
	if root != "svg" {
		return errors.New("root element is " + root + ", want svg")
	}
	return nil
}

func TestWellFormed(t *testing.T) {
	for _, tc := range goldenCases() {
		t.Run(tc.name, func(t *testing.T) {
			doc := tc.chart.SVG()
			if err := wellFormed(doc); err != nil {
				t.Fatalf("not well-formed XML: %v", err)
			}
			for _, must := range []string{`role="img"`, `viewBox="`, "<title>", "<desc>", "prefers-color-scheme:dark"} {
				if !strings.Contains(doc, must) {
					t.Errorf("missing %q", must)
				}
			}
			if strings.Contains(doc, "NaN") || strings.Contains(doc, "Inf") {
				t.Errorf("a non-finite number leaked into the drawing")
			}
		})
	}
}

// coordAttr matches the attributes that carry coordinates.
var coordAttr = regexp.MustCompile(`\s(?:x|y|x1|y1|x2|y2|cx|cy|r|width|height|d|transform)="([^"]*)"`)

// tooPrecise matches a number with three or more decimals.
var tooPrecise = regexp.MustCompile(`\d\.\d{3}`)

// TestFixedPrecision checks that no coordinate has more than two decimals.
func TestFixedPrecision(t *testing.T) {
	for _, tc := range goldenCases() {
		for _, m := range coordAttr.FindAllStringSubmatch(tc.chart.SVG(), -1) {
			if tooPrecise.MatchString(m[1]) {
				t.Fatalf("%s: coordinate with more than two decimals in %q", tc.name, m[0])
			}
		}
	}
}

func TestHostileText(t *testing.T) {
	payloads := []string{
		`<script>alert(1)</script>`,
		`"><svg onload=alert(1)>`,
		`a & b; &amp; &#60;`,
		`]]><x/><![CDATA[`,
		"bell\x07 and nul\x00 and \xff broken",
		"it's \u0085 \ufffe",
	}
	for _, p := range payloads {
		frame := Frame{Title: p, Desc: "", XTitle: p, YTitle: p}
		series := []Series{{Name: p, Values: []float64{1, 2, 3}}, {Name: p, Role: Forecast, Values: []float64{1, 2, 4},
			Bands: []Band{{Level: 80, Lower: []float64{0, 1, 3}, Upper: []float64{2, 3, 5}}}}}
		labels := []string{p, p + "2", p + "3"}
		charts := map[string]svgChart{
			"line":   Line{Frame: frame, Periods: labels, Series: series, HoldoutStart: 2, HoldoutLabel: p},
			"bars":   Bars{Frame: frame, Labels: labels, Series: series, HoldoutStart: 1, HoldoutLabel: p},
			"sweep":  Sweep{Frame: frame, Param: p, Measure: p, LowSide: p, HighSide: p, Values: []float64{1, 2, 3}, Validation: []float64{3, 1, 2}},
			"acf":    ACF{Frame: frame, Values: []float64{0.5, -0.2}, Bound: 0.3},
			"panels": Panels{Frame: frame, Periods: labels, Parts: []Panel{{Name: p, Values: []float64{1, 2, 3}}}},
			"desc":   Line{Frame: Frame{Title: "t", Desc: p}},
		}
		for name, c := range charts {
			doc := c.SVG()
			if err := wellFormed(doc); err != nil {
				t.Errorf("%s with %q: not well-formed: %v", name, p, err)
			}
			for _, raw := range []string{"<script", "<x/>", "<svg onload", "]]>", "\x00", "\x07", `"><`, "<![CDATA"} {
				if strings.Contains(doc, raw) {
					t.Errorf("%s with %q: raw %q survived", name, p, raw)
				}
			}
			if !bytes.Equal([]byte(doc), []byte(strings.ToValidUTF8(doc, "?"))) {
				t.Errorf("%s with %q: output is not valid UTF-8", name, p)
			}
		}
	}
}

func TestSweepBest(t *testing.T) {
	nan := math.NaN()
	tests := []struct {
		name   string
		sweep  Sweep
		want   int
		wantOK bool
	}{
		{"validation decides", Sweep{Values: []float64{1, 2, 3}, Training: []float64{1, 2, 3}, Validation: []float64{5, 4, 6}}, 1, true},
		{"first of a tie", Sweep{Values: []float64{1, 2, 3}, Validation: []float64{4, 4, 6}}, 0, true},
		{"training when no validation", Sweep{Values: []float64{1, 2, 3}, Training: []float64{3, 2, 1}}, 2, true},
		{"gaps skipped", Sweep{Values: []float64{1, 2, 3}, Validation: []float64{nan, 7, nan}}, 1, true},
		{"short measure", Sweep{Values: []float64{1, 2, 3}, Validation: []float64{9}}, 0, true},
		{"nothing finite", Sweep{Values: []float64{1, 2}, Validation: []float64{nan, nan}}, -1, false},
		{"empty", Sweep{}, -1, false},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			got, ok := tc.sweep.Best()
			if got != tc.want || ok != tc.wantOK {
				t.Errorf("Best() = %d, %v; want %d, %v", got, ok, tc.want, tc.wantOK)
			}
		})
	}
}

// TestStyleSheetIsEmbedded checks that every chart embeds exactly
// [StyleSheet] as its one <style> element, so a hash of the constant
// allows every chart under a Content-Security-Policy.
func TestStyleSheetIsEmbedded(t *testing.T) {
	t.Parallel()
	want := "<style>" + StyleSheet + "</style>"
	for _, c := range goldenCases() {
		t.Run(c.name, func(t *testing.T) {
			svg := c.chart.SVG()
			if strings.Count(svg, "<style>") != 1 || !strings.Contains(svg, want) {
				t.Errorf("the chart does not embed StyleSheet as its one style element")
			}
		})
	}
}
