package chart

import (
	"math"
	"regexp"
	"slices"
	"strings"
	"testing"
)

// drawnOf runs drawnPositions over vs, NaN being a gap.
func drawnOf(vs []float64, width float64) []int {
	return drawnPositions(len(vs), width, func(i int) bool { return finite(vs[i]) }, func(i int) float64 { return vs[i] })
}

func TestDrawnPositions(t *testing.T) {
	nan := math.NaN()
	g := gap
	// 40 positions over 2 pixel columns: thinned (40 > 4×2), buckets 0..19
	// and 20..39. long[i] = i mod 7, so in 20..39 the first 0 is at 21 and
	// the first 6 at 20; in 32..39 the values run 4 5 6 0 1 2 3 4.
	long := make([]float64, 40)
	for i := range long {
		long[i] = float64(i % 7)
	}
	long[5], long[6] = 50, -50 // extremes of the first column
	withHole := slices.Clone(long)
	for i := 25; i < 32; i++ { // a hole inside the second column
		withHole[i] = nan
	}
	wideGap := slices.Clone(long)
	for i := 15; i < 40; i++ {
		wideGap[i] = nan
	}
	wideGap[30] = 3 // a lone value in the middle of the gap
	tests := []struct {
		name  string
		vs    []float64
		width float64
		want  []int
	}{
		// Expected lists worked by hand from the rule in decimate.go.
		{"short series keeps every point", []float64{1, 2, 3}, 100, []int{0, 1, 2}},
		{"short series keeps its gaps", []float64{1, nan, nan, 4, 5, nan}, 100, []int{0, g, 3, 4}},
		{"all missing", []float64{nan, nan}, 100, []int{}},
		{"first, lowest, highest, last per column", long, 2, []int{0, 5, 6, 19, 20, 21, 39}},
		{"a hole inside a column lifts the pen", withHole, 2, []int{0, 5, 6, 19, 20, 21, 24, g, 32, 34, 35, 39}},
		{"a gap wider than a column stays a gap", wideGap, 2, []int{0, 5, 6, 14, g, 30}},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			got := drawnOf(tc.vs, tc.width)
			if !slices.Equal(got, tc.want) {
				t.Errorf("drawnPositions(%v) = %v; want %v", tc.vs, got, tc.want)
			}
		})
	}
}

// TestDrawnPositionsBounded checks on a long noisy series with gaps that
// the drawn points are bounded, in time order, keep the series' extremes
// and never join two points across a missing value.
func TestDrawnPositionsBounded(t *testing.T) {
	vs := orders(200000, 4)
	for i := 1000; i < 1400; i++ { // a gap of about two pixel columns
		vs[i] = math.NaN()
	}
	for i := 50000; i < 60000; i += 3 { // scattered sub-pixel gaps
		vs[i] = math.NaN()
	}
	const width = 640.0
	drawn := drawnOf(vs, width)
	if len(drawn) > maxDrawn(len(vs), width) {
		t.Fatalf("%d points drawn, more than the bound %d", len(drawn), maxDrawn(len(vs), width))
	}
	lo, hi := 0, 0
	for i, v := range vs {
		if finite(v) && v < vs[lo] {
			lo = i
		}
		if finite(v) && v > vs[hi] {
			hi = i
		}
	}
	if !slices.Contains(drawn, lo) || !slices.Contains(drawn, hi) {
		t.Errorf("the lowest (%d) or highest (%d) position is not drawn", lo, hi)
	}
	prev := gap
	for _, i := range drawn {
		if i == gap {
			prev = gap
			continue
		}
		if prev != gap {
			if i <= prev {
				t.Fatalf("positions out of order: %d after %d", i, prev)
			}
			// The eye may join sub-pixel pieces within one column, never
			// across a gap spanning a column.
			col := func(j int) int { return j * int(width) / len(vs) }
			for j := prev + 1; j < i; j++ {
				if !finite(vs[j]) && col(prev) != col(i) {
					t.Fatalf("line joins %d and %d across the missing %d", prev, i, j)
				}
			}
		}
		prev = i
	}
}

// divider matches the holdout's divider line.
var divider = regexp.MustCompile(`<line [^>]*qc-divider"/>`)

// TestLongLine checks that a chart of 1,000,000 points stays small,
// well-formed and marks the holdout where a chart of every point would.
func TestLongLine(t *testing.T) {
	const n = 1000000
	act := orders(n, 1)
	fc := nanBefore(scaled(act, 0.97, 40), n-n/10)
	for i := 300000; i < 320000; i++ {
		act[i] = math.NaN()
	}
	l := Line{
		Frame: Frame{Title: "A long series"},
		Series: []Series{
			{Name: "orders", Values: act},
			{Name: "fc", Role: Forecast, Values: fc, Bands: []Band{{Level: 80, Lower: scaled(fc, 0.9, 0), Upper: scaled(fc, 1.1, 0)}}},
		},
		HoldoutStart: n - n/10,
	}
	doc := l.SVG()
	// The bound comes from the task: a chart of a large file under ~200 KB
	// (common practice for an inline figure).
	if len(doc) > 200_000 {
		t.Errorf("SVG of %d points is %d bytes; want at most 200,000", n, len(doc))
	}
	if err := wellFormed(doc); err != nil {
		t.Fatalf("not well-formed XML: %v", err)
	}
	if strings.Contains(doc, "NaN") || strings.Contains(doc, "Inf") {
		t.Errorf("a non-finite number leaked into the drawing")
	}
	if doc != l.SVG() {
		t.Errorf("two drawings of the same chart differ")
	}
	// The same value range over the same positions, drawn from two points
	// only, gives the same axes; the divider must not move.
	lo, hi := math.Inf(1), math.Inf(-1)
	for _, s := range l.Series {
		for _, v := range s.Values {
			if finite(v) {
				lo, hi = min(lo, v), max(hi, v)
			}
		}
		for _, v := range s.Bands[:min(len(s.Bands), 1)] {
			for i := range v.Lower {
				if finite(v.Lower[i]) {
					lo, hi = min(lo, v.Lower[i]), max(hi, v.Upper[i])
				}
			}
		}
	}
	sparse := make([]float64, n)
	for i := range sparse {
		sparse[i] = math.NaN()
	}
	sparse[0], sparse[1] = lo, hi
	ref := Line{Frame: l.Frame, Series: []Series{{Name: "orders", Values: sparse}, {Name: "fc", Role: Forecast}}, HoldoutStart: l.HoldoutStart}
	got, want := divider.FindString(doc), divider.FindString(ref.SVG())
	if got == "" || got != want {
		t.Errorf("holdout divider %q; want %q", got, want)
	}
}

func TestLongBarsAndPanels(t *testing.T) {
	const n = 200000
	errs := scaled(orders(n, 2), 0.1, -120)
	errs[7] = math.NaN()
	for name, c := range map[string]svgChart{
		"bars":   Bars{Series: []Series{{Name: "a", Values: errs}, {Name: "b", Values: scaled(errs, -1, 0)}}, HoldoutStart: n / 2},
		"panels": Panels{Parts: []Panel{{Name: "observed", Values: orders(n, 3)}, {Name: "remainder", Values: errs, Bars: true}}},
	} {
		t.Run(name, func(t *testing.T) {
			doc := c.SVG()
			if len(doc) > 200_000 {
				t.Errorf("SVG of %d points is %d bytes; want at most 200,000", n, len(doc))
			}
			if err := wellFormed(doc); err != nil {
				t.Fatalf("not well-formed XML: %v", err)
			}
		})
	}
}
