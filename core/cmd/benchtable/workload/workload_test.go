package workload

import (
	"bytes"
	"fmt"
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"quillcast/core/backtest"
)

// TestPlainSweepMatchesRunningSum checks the O(n·w) baseline against the
// running-sum sweep of package backtest: both score the same forecasts, so
// their errors agree to rounding (common practice: the two are algebraically
// the same mean).
func TestPlainSweepMatchesRunningSum(t *testing.T) {
	tests := []struct {
		name     string
		n, train int
		widths   backtest.Range
	}{
		{"narrow widths, whole series", 300, 300, backtest.Range{From: 1, To: 5}},
		{"wide widths, holdout", 500, 488, backtest.Range{From: 20, To: 40}},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			y := RandomWalk(tc.n, 3)
			plain, err := PlainSweep(y, tc.train, tc.widths)
			if err != nil {
				t.Fatal(err)
			}
			sweep, err := backtest.SweepMovingAverage(y, tc.train, tc.widths)
			if err != nil {
				t.Fatal(err)
			}
			for i, row := range sweep.Rows {
				got, want := plain[i], row.Own
				if got.N != want.N || !scalar.EqualWithinAbsOrRel(got.RMSE, want.RMSE, 1e-9, 1e-9) || !scalar.EqualWithinAbsOrRel(got.MAE, want.MAE, 1e-9, 1e-9) {
					t.Errorf("width %d: plain %+v, running sum %+v", row.Width, got, want)
				}
			}
		})
	}
}

func TestPlainSweepRefusesWidths(t *testing.T) {
	tests := []struct {
		name   string
		widths backtest.Range
	}{
		{"zero width", backtest.Range{From: 0, To: 3}},
		{"reversed", backtest.Range{From: 5, To: 2}},
		{"wider than training", backtest.Range{From: 1, To: 10}},
	}
	y := RandomWalk(10, 1)
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			if _, err := PlainSweep(y, 10, tc.widths); err == nil || !strings.Contains(err.Error(), "widths") {
				t.Errorf("PlainSweep(%v) error %v, want one naming the widths", tc.widths, err)
			}
		})
	}
}

func TestFloatsRoundTrip(t *testing.T) {
	tests := []struct {
		name string
		y    []float64
	}{
		{"empty", nil},
		{"walk", RandomWalk(17, 9)},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			got, err := ParseFloats(Floats(tc.y))
			if err != nil {
				t.Fatal(err)
			}
			if fmt.Sprint(got) != fmt.Sprint(append([]float64{}, tc.y...)) {
				t.Errorf("round trip gave %v, want %v", got, tc.y)
			}
		})
	}
	if _, err := ParseFloats(make([]byte, 9)); err == nil {
		t.Error("9 bytes were read as values")
	}
}

func TestRowsCSV(t *testing.T) {
	got := string(RowsCSV([]float64{1, 2.5}))
	if want := "value\n1.0000\n2.5000\n"; got != want { // hand calculation
		t.Errorf("RowsCSV = %q, want %q", got, want)
	}
}

// FuzzParseFloats: no panic, and whatever decodes encodes back to the same
// bytes.
func FuzzParseFloats(f *testing.F) {
	f.Add(Floats([]float64{1, -2, 3.25}))
	f.Add([]byte{1, 2, 3})
	f.Fuzz(func(t *testing.T, b []byte) {
		y, err := ParseFloats(b)
		if err != nil {
			return
		}
		if !bytes.Equal(Floats(y), b) {
			t.Errorf("%x decoded and encoded gives %x", b, Floats(y))
		}
	})
}
