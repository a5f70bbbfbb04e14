package diagnose

import (
	"errors"
	"math"
	"testing"

	"quillcast/core/internal/refdata"
)

// TestDifferenceReference checks lag differences against the reference
// cases differences_* (numpy diff on the NIST/SEMATECH e-Handbook 6.4.3.6
// quarterly sales, the Nile flow and the Eurostat electrical equipment
// index); tolerance abs 1e-9, rel 1e-9.
func TestDifferenceReference(t *testing.T) {
	t.Parallel()
	tests := []struct {
		file string
		key  string
		lags []int
	}{
		{"differences_nist_sales", "lag1", []int{1}},
		{"differences_nist_sales", "lag4", []int{4}},
		{"differences_nist_sales", "lag4_then_lag1", []int{4, 1}},
		{"differences_nile", "lag1", []int{1}},
		{"differences_nile", "lag1_twice", []int{1, 1}},
		{"differences_elec", "lag1", []int{1}},
		{"differences_elec", "lag12", []int{12}},
		{"differences_elec", "lag12_then_lag1", []int{12, 1}},
	}
	for _, tc := range tests {
		t.Run(tc.file+"/"+tc.key, func(t *testing.T) {
			t.Parallel()
			var c struct {
				Data struct {
					Y []float64 `json:"y"`
				} `json:"data"`
				Expected  map[string][]float64 `json:"expected"`
				Tolerance tol                  `json:"tolerance"`
			}
			refdata.ReadJSON(t, "reference/cases/"+tc.file+".json", &c)
			want, ok := c.Expected[tc.key]
			if !ok {
				t.Fatalf("case has no %q", tc.key)
			}
			got := c.Data.Y
			for _, lag := range tc.lags {
				var err error
				if got, err = Difference(got, lag); err != nil {
					t.Fatal(err)
				}
			}
			compareSlice(t, tc.key, got, want, c.Tolerance)
		})
	}
}

func TestDifferenceEdges(t *testing.T) {
	t.Parallel()
	nan, inf := math.NaN(), math.Inf(1)
	tests := []struct {
		name  string
		y     []float64
		lag   int
		want  []*float64
		cause error
	}{
		// Hand calculation: 3-1, 6-3, 10-6.
		{"lag one", []float64{1, 3, 6, 10}, 1, nullable(2, 3, 4), nil},
		{"lag two", []float64{1, 3, 6, 10}, 2, nullable(5, 7), nil},
		{"constant", []float64{4, 4, 4}, 1, nullable(0, 0), nil},
		{"nan stays visible", []float64{1, nan, 6, 10}, 1, nullable(nan, nan, 4), nil},
		{"inf becomes a gap", []float64{1, inf, 6, -inf}, 2, nullable(5, nan), nil},
		{"empty", nil, 1, nil, ErrTooShort},
		{"lag as long as series", []float64{1, 2}, 2, nil, ErrTooShort},
		{"lag zero", []float64{1, 2}, 0, nil, ErrBadLag},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			t.Parallel()
			got, err := Difference(tc.y, tc.lag)
			if tc.cause != nil {
				if !errors.Is(err, tc.cause) {
					t.Fatalf("Difference(%v, %d): error %v, want %v", tc.y, tc.lag, err, tc.cause)
				}
				return
			}
			if err != nil {
				t.Fatal(err)
			}
			compareNullable(t, "difference", got, tc.want, tol{Abs: 1e-12})
		})
	}
}

func BenchmarkDifference(b *testing.B) {
	for _, size := range benchSizes {
		y := seasonalSeries(size.n, 12, 1)
		b.Run(size.name, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				if _, err := Difference(y, 12); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}
