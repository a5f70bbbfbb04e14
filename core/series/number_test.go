package series

import (
	"math"
	"strconv"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

// numberTests pair number cells with their value under a decimal mark.
// Expected values are read off the cell by hand.
var numberTests = []struct {
	name string
	cell string
	dec  byte
	want float64
	ev   evidence // what the cell says about the decimal mark
	bad  string   // the hint when the cell is not a number under dec
}{
	{"plain", "1204", '.', 1204, evNone, ""},
	{"decimal point", "12.5", '.', 12.5, evDot, ""},
	{"decimal comma", "12,5", ',', 12.5, evComma, ""},
	{"grouped by comma", "1,234,567.5", '.', 1234567.5, evDot, ""},
	{"grouped by point", "1.234.567,5", ',', 1234567.5, evComma, ""},
	{"grouped by space", "1 234,5", ',', 1234.5, evComma, ""},
	{"grouped by no-break space", "1\u00a0234,5", ',', 1234.5, evComma, ""},
	{"grouped by narrow no-break space", "1\u202f234.5", '.', 1234.5, evDot, ""},
	{"grouped by apostrophe", "1'234.5", '.', 1234.5, evDot, ""},
	{"ambiguous comma", "1,234", '.', 1234, evAmbiguous, ""},
	{"ambiguous comma as decimal", "1,234", ',', 1.234, evAmbiguous, ""},
	{"leading zero settles it", "0,125", ',', 0.125, evComma, ""},
	{"four leading digits settle it", "1234,567", ',', 1234.567, evComma, ""},
	{"Indian grouping", "12,34,567.5", '.', 1234567.5, evDot, ""},
	{"euro before", "€1.234,50", ',', 1234.5, evComma, ""},
	{"euro after", "1.234,50 €", ',', 1234.5, evComma, ""},
	{"dollar and minus", "-$12.50", '.', -12.5, evDot, ""},
	{"code before", "CHF 1'200.00", '.', 1200, evDot, ""},
	{"percent", "12.5%", '.', 12.5, evDot, ""},
	{"parentheses", "(1,200.00)", '.', -1200, evDot, ""},
	{"parentheses and currency", "($35)", '.', -35, evNone, ""},
	{"unicode minus", "\u221212", '.', -12, evNone, ""},
	{"trailing minus", "12-", '.', -12, evNone, ""},
	{"plus", "+12", '.', 12, evNone, ""},
	{"exponent", "1.5e-3", '.', 0.0015, evDot, ""},
	{"letter O", "12,5O", ',', 0, evNone, "a letter O instead of a zero?"},
	{"letter l", "1l0", '.', 0, evNone, "a letter l instead of a one?"},
	{"spreadsheet error", "#VALUE!", '.', 0, evNone, "a spreadsheet error code; fix the formula in the sheet"},
	{"word", "twelve", '.', 0, evNone, "text"},
	{"two decimal marks", "1.2.3", '.', 0, evComma, "two decimal marks?"},
	{"decimal comma under a point", "12,5", '.', 0, evComma, "digits grouped oddly"},
	{"grouping after the decimal mark", "1.234,5", '.', 0, evComma, "a grouping mark after the decimal mark"},
	{"marks in a row", "1,,5", '.', 0, evNone, "two marks in a row"},
	{"sign alone", "-", '.', 0, evNone, "no digits"},
}

func TestNumber(t *testing.T) {
	t.Parallel()
	for _, tt := range numberTests {
		t.Run(tt.name, func(t *testing.T) {
			nb := scanNumber(trimCell([]byte(tt.cell)))
			if tt.bad == "" || nb.ok {
				if ev := nb.markEvidence(); ev != tt.ev {
					t.Errorf("markEvidence(%q) = %d, want %d", tt.cell, ev, tt.ev)
				}
			}
			v, why := nb.value(tt.dec)
			if why != tt.bad {
				t.Fatalf("value(%q, %q): hint %q, want %q", tt.cell, tt.dec, why, tt.bad)
			}
			if why == "" && !scalar.EqualWithinAbsOrRel(v, tt.want, 1e-12, 1e-12) {
				t.Errorf("value(%q, %q) = %v, want %v", tt.cell, tt.dec, v, tt.want)
			}
			if ev, ok := quickNumber([]byte(tt.cell)); ok && ev != tt.ev {
				t.Errorf("quickNumber(%q) says %d, scanNumber %d", tt.cell, ev, tt.ev)
			}
		})
	}
}

func TestMissingMarkers(t *testing.T) {
	t.Parallel()
	for _, cell := range []string{"", "NA", "na", "N/A", "n/a", "NaN", "null", "NULL", "None", "-", "--", "\u2014", ".", "?", "#N/A", "missing"} {
		if !isMissing([]byte(cell), nil) {
			t.Errorf("%q is not read as missing", cell)
		}
	}
	for _, cell := range []string{"0", "-1", "NAN1", "nano", "n.v."} {
		if isMissing([]byte(cell), nil) {
			t.Errorf("%q is read as missing", cell)
		}
	}
	if !isMissing([]byte("N.V."), []string{"n.v."}) {
		t.Error("an extra marker is not read as missing")
	}
}

// FuzzNumber checks that number cells never panic, and that a value read
// under either decimal mark, written back plainly, reads as the same value.
func FuzzNumber(f *testing.F) {
	for _, tt := range numberTests {
		f.Add(tt.cell)
	}
	f.Fuzz(func(t *testing.T, cell string) {
		nb := scanNumber(trimCell([]byte(cell)))
		_ = nb.markEvidence()
		quickNumber([]byte(cell))
		for _, dec := range []byte{'.', ','} {
			v, why := nb.value(dec)
			if why != "" || math.IsInf(v, 0) || math.IsNaN(v) {
				continue
			}
			text := strconv.FormatFloat(v, 'g', -1, 64)
			back := scanNumber([]byte(text))
			w, why := back.value('.')
			if why != "" || w != v {
				t.Fatalf("%q read as %v under %q, written %q, read back as %v (%s)", cell, v, dec, text, w, why)
			}
		}
	})
}
