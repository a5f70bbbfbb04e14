package format

import (
	"fmt"
	"math"
	"testing"
)

func TestNumber(t *testing.T) {
	// Expected strings: hand calculation (comma every three digits, halves
	// away from zero; 1.005 is stored as 1.00499… so it rounds down).
	tests := []struct {
		name     string
		v        float64
		decimals int
		want     string
	}{
		{"thousands", 1234.5, 1, "1,234.5"},
		{"half away from zero", 41.25, 1, "41.3"},
		{"negative half away from zero", -2.5, 0, "-3"},
		{"binary value just under a half", 1.005, 2, "1.00"},
		{"millions", -1234567.891, 2, "-1,234,567.89"},
		{"under a thousand", 999, 0, "999"},
		{"rounds up to a thousand", 999.6, 0, "1,000"},
		{"no negative zero", -0.004, 2, "0.00"},
		{"zero", 0, 0, "0"},
		{"negative decimals clamp", 12.7, -3, "13"},
		{"many decimals clamp", 1.5, 40, "1.500000000000"},
		{"NaN", math.NaN(), 2, Missing},
		{"plus infinity", math.Inf(1), 2, "∞"},
		{"minus infinity", math.Inf(-1), 2, "-∞"},
		{"huge", 1e21, 0, "1,000,000,000,000,000,000,000"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			if got := Number(tc.v, tc.decimals); got != tc.want {
				t.Errorf("Number(%v, %d) = %q, want %q", tc.v, tc.decimals, got, tc.want)
			}
		})
	}
}

func TestPlain(t *testing.T) {
	tests := []struct {
		v        float64
		decimals int
		want     string
	}{
		{1234.5, 2, "1234.50"}, {-12.5, 1, "-12.5"}, {-0.001, 2, "0.00"}, {math.NaN(), 2, ""},
		{math.Inf(1), 0, "Inf"}, {math.Inf(-1), 0, "-Inf"},
	}
	for _, tc := range tests {
		t.Run(fmt.Sprint(tc.v), func(t *testing.T) {
			if got := Plain(tc.v, tc.decimals); got != tc.want {
				t.Errorf("Plain(%v, %d) = %q, want %q", tc.v, tc.decimals, got, tc.want)
			}
		})
	}
}

func TestAutoAndPercent(t *testing.T) {
	// Expected: the size rule in Decimals' doc comment, worked by hand.
	tests := []struct {
		name string
		got  string
		want string
	}{
		{"large", Auto(98765.4), "98,765"},
		{"tens", Auto(12.345), "12.3"},
		{"ones", Auto(1.2345), "1.23"},
		{"small keeps three significant digits", Auto(0.012345), "0.0123"},
		{"tiny keeps three significant digits", Auto(0.0000001234), "0.000000123"},
		{"a billionth keeps three significant digits", Auto(1.234e-9), "0.00000000123"},
		{"below the cap stops at twelve decimals", Auto(1.234e-13), "0.000000000000"},
		{"just under ten rounds into the tens rule", Auto(9.96), "10.0"},
		{"negative", Auto(-2500.4), "-2,500"},
		{"zero", Auto(0), "0.00"},
		{"percent", Percent(12.345, 1), "12.3%"},
		{"percent missing", Percent(math.NaN(), 1), Missing},
		{"int", Int(-1234567), "-1,234,567"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			if tc.got != tc.want {
				t.Errorf("got %q, want %q", tc.got, tc.want)
			}
		})
	}
}

func TestColumnDecimals(t *testing.T) {
	tests := []struct {
		name   string
		values []float64
		want   int
	}{
		{"median in the thousands", []float64{900, 1200, 1500}, 0},
		{"median in the tens", []float64{3, 12, 45, 1e6, math.NaN()}, 1},
		{"zeros and gaps ignored", []float64{0, math.NaN(), 0.5, 0.7, math.Inf(1)}, 3},
		{"nothing usable", []float64{0, math.NaN()}, 2},
		{"empty", nil, 2},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			if got := ColumnDecimals(tc.values); got != tc.want {
				t.Errorf("ColumnDecimals(%v) = %d, want %d", tc.values, got, tc.want)
			}
		})
	}
}

func BenchmarkNumber(b *testing.B) {
	for _, n := range []int{10, 1000, 100000} {
		values := make([]float64, n)
		for i := range values {
			values[i] = float64(i)*137.29 - 5000
		}
		b.Run(fmt.Sprintf("n=%d", n), func(b *testing.B) {
			b.ReportAllocs()
			var buf []byte
			for b.Loop() {
				for _, v := range values {
					buf = AppendNumber(buf[:0], v, 2)
				}
			}
		})
	}
}
