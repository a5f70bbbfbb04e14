package backtest

import (
	"fmt"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

// TestWidthRowsMatchOneWidthAtATime checks that scoring four widths per
// pass gives what scoring them one by one gives (regression value: our own
// one-width loop, widthRow), for ranges that do and do not fill whole
// blocks, with and without a holdout.
func TestWidthRowsMatchOneWidthAtATime(t *testing.T) {
	tests := []struct {
		name     string
		n, train int
		widths   Range
	}{
		{"one block", 40, 40, Range{From: 1, To: 4}},
		{"blocks and a tail", 300, 288, Range{From: 2, To: 24}},
		{"fewer widths than a block", 50, 45, Range{From: 3, To: 5}},
		{"wide widths, short training", 60, 48, Range{From: 40, To: 47}},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			y := randomWalk(tc.n, 5)
			got := widthRows(y, tc.train, tc.widths)
			if len(got) != tc.widths.To-tc.widths.From+1 {
				t.Fatalf("%d rows for widths %v", len(got), tc.widths)
			}
			for i, g := range got {
				w := tc.widths.From + i
				want := widthRow(y, tc.train, w, tc.widths.To)
				if g.Width != w || !sameErrors(g.Own, want.Own) || !sameErrors(g.Common, want.Common) || !sameErrors(g.Validation, want.Validation) {
					t.Errorf("width %d: blocked %+v, one at a time %+v", w, g, want)
				}
			}
		})
	}
}

func sameErrors(a, b Errors) bool {
	eq := func(x, y float64) bool { return scalar.EqualWithinAbsOrRel(x, y, 1e-12, 1e-12) }
	return a.N == b.N && eq(a.MSE, b.MSE) && eq(a.RMSE, b.RMSE) && eq(a.MAE, b.MAE)
}

// BenchmarkWidthRows compares four widths per pass with one width per
// pass on 1..200 widths.
func BenchmarkWidthRows(b *testing.B) {
	for _, n := range sweepSizes {
		y := randomWalk(n, 7)
		b.Run(fmt.Sprintf("blocked/n=%d", n), func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				widthRows(y, n-12, Range{From: 1, To: 200})
			}
		})
		b.Run(fmt.Sprintf("one-at-a-time/n=%d", n), func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				for w := 1; w <= 200; w++ {
					widthRow(y, n-12, w, 200)
				}
			}
		})
	}
}
