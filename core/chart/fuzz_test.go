package chart

import (
	"math"
	"strings"
	"testing"
)

// FuzzLineText draws charts whose every piece of text is fuzzed and whose
// values come from the fuzzed floats: the output must always be well-formed
// XML with no raw markup from the input.
func FuzzLineText(f *testing.F) {
	f.Add("orders", "2024-03", 1.0, 2.0)
	f.Add("<script>alert(1)</script>", "]]>", math.NaN(), math.Inf(1))
	f.Add("a & b \"q\" 'p'", "2024-Q1", -1e300, 1e300)
	f.Add("\x00\x01\xff\xfe", "2024-W05", 0.0, 0.0)
	f.Fuzz(func(t *testing.T, name, label string, v1, v2 float64) {
		series := []Series{{Name: name, Values: []float64{v1, v2, v1}},
			{Name: name, Role: Forecast, Values: []float64{v2, v1, v2}, Bands: []Band{{Level: v1, Lower: []float64{v1}, Upper: []float64{v2}}}}}
		labels := []string{label, label, label}
		frame := Frame{Title: name, XTitle: label, YTitle: name, Width: int(v1), Height: int(v2)}
		for _, c := range []svgChart{
			Line{Frame: frame, Periods: labels, Series: series, HoldoutStart: 1, HoldoutLabel: name, ZeroLine: true},
			Bars{Frame: frame, Labels: labels, Series: series, HoldoutStart: 2},
			Sweep{Frame: frame, Param: name, Measure: label, Values: []float64{v1, v2}, Training: []float64{v2, v1}, Validation: []float64{v1, v2}},
			ACF{Frame: frame, Values: []float64{v1, v2}, Bound: v1},
			Panels{Frame: frame, Periods: labels, Parts: []Panel{{Name: name, Values: []float64{v1, v2}}, {Name: label, Values: []float64{v2}, Bars: true}}},
		} {
			doc := c.SVG()
			if err := wellFormed(doc); err != nil {
				t.Fatalf("not well-formed: %v", err)
			}
			if strings.Contains(doc, "NaN") || strings.Contains(doc, "Inf") {
				t.Fatalf("non-finite number in the drawing")
			}
		}
	})
}
