package chart

import (
	"math"
	"slices"
	"testing"

	"gonum.org/v1/gonum/floats"
)

func TestNiceAxis(t *testing.T) {
	// Expected ticks: hand calculation with steps of 1, 2, 2.5 or 5 times a
	// power of ten (common practice for "nice" axis labels).
	tests := []struct {
		name   string
		values []float64
		want   int
		ticks  []float64
		labels []string
	}{
		{"hundreds", []float64{1030, 2270}, 6, []float64{1000, 1250, 1500, 1750, 2000, 2250, 2500}, []string{"1,000", "1,250", "1,500", "1,750", "2,000", "2,250", "2,500"}},
		{"around zero", []float64{-150, 210}, 5, []float64{-200, -100, 0, 100, 200, 300}, []string{"-200", "-100", "0", "100", "200", "300"}},
		// range 0.95 over 4 gaps: rough step 0.2375 rounds up to 0.25
		{"fractions", []float64{-0.33, 0.62}, 5, []float64{-0.5, -0.25, 0, 0.25, 0.5, 0.75}, []string{"-0.50", "-0.25", "0.00", "0.25", "0.50", "0.75"}},
		{"quarter steps", []float64{0, 0.9}, 5, []float64{0, 0.25, 0.5, 0.75, 1}, []string{"0.00", "0.25", "0.50", "0.75", "1.00"}},
		{"one value", []float64{50}, 3, []float64{45, 50, 55}, []string{"45", "50", "55"}},
		{"zero only", []float64{0}, 3, []float64{-1, 0, 1}, []string{"-1", "0", "1"}},
		{"nothing", nil, 3, []float64{0, 0.5, 1}, []string{"0.0", "0.5", "1.0"}},
		// rough step 4.2e6/4 = 1.05e6 rounds up to 2e6
		{"millions", []float64{0, 4.2e6}, 5, []float64{0, 2e6, 4e6, 6e6}, []string{"0", "2,000,000", "4,000,000", "6,000,000"}},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			var r valueRange
			r.addAll(tc.values)
			a := niceAxis(r, tc.want)
			if !floats.EqualApprox(a.ticks, tc.ticks, 1e-9) || len(a.ticks) != len(tc.ticks) {
				t.Fatalf("ticks = %v, want %v", a.ticks, tc.ticks)
			}
			var labels []string
			for _, v := range a.ticks {
				labels = append(labels, a.label(v))
			}
			if !slices.Equal(labels, tc.labels) {
				t.Errorf("labels = %q, want %q", labels, tc.labels)
			}
		})
	}
}

func TestValueRangeSkipsNonFinite(t *testing.T) {
	var r valueRange
	r.addAll([]float64{math.NaN(), math.Inf(1), 3, math.Inf(-1), -2})
	if !r.ok || r.lo != -2 || r.hi != 3 {
		t.Errorf("range = %v..%v (ok %v), want -2..3", r.lo, r.hi, r.ok)
	}
}

func TestAppendCoord(t *testing.T) {
	tests := []struct {
		in   float64
		want string
	}{
		{12.5, "12.5"}, {12, "12"}, {0.004, "0"}, {-0.004, "0"}, {-3.456, "-3.46"}, {1e6, "1000000"},
		{math.NaN(), "0"}, {math.Inf(1), "0"},
	}
	for _, tc := range tests {
		if got := string(appendCoord(nil, tc.in)); got != tc.want {
			t.Errorf("appendCoord(%v) = %q, want %q", tc.in, got, tc.want)
		}
	}
}
