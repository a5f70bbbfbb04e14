package diagnose

import (
	"errors"
	"fmt"
	"math"
	"testing"

	"quillcast/core/internal/refdata"
)

// TestCenteredMovingAverageReference checks the centred averages against
// the reference cases centred_ma_*: pandas rolling() cross-checked with an
// explicit weighted sum (2×w weights for even w) on the Nile flow and the
// Eurostat electrical equipment index; tolerance abs 1e-9, rel 1e-9.
func TestCenteredMovingAverageReference(t *testing.T) {
	t.Parallel()
	for _, name := range []string{"centered_ma_nile", "centered_ma_elec"} {
		var c struct {
			Data struct {
				Y []float64 `json:"y"`
			} `json:"data"`
			Params struct {
				Widths []int `json:"widths"`
			} `json:"params"`
			Expected  map[string][]*float64 `json:"expected"`
			Tolerance tol                   `json:"tolerance"`
		}
		refdata.ReadJSON(t, "reference/cases/"+name+".json", &c)
		for _, w := range c.Params.Widths {
			t.Run(fmt.Sprintf("%s/w%d", name, w), func(t *testing.T) {
				want, ok := c.Expected[fmt.Sprintf("w%d", w)]
				if !ok {
					t.Fatalf("case has no expected values for width %d", w)
				}
				got, err := CenteredMovingAverage(c.Data.Y, w)
				if err != nil {
					t.Fatal(err)
				}
				compareNullable(t, "centred average", got, want, c.Tolerance)
			})
		}
	}
}

func nullable(v ...float64) []*float64 {
	out := make([]*float64, len(v))
	for i := range v {
		if !math.IsNaN(v[i]) {
			out[i] = &v[i]
		}
	}
	return out
}

func TestMovingAverageHand(t *testing.T) {
	t.Parallel()
	nan := math.NaN()
	inf := math.Inf(1)
	tests := []struct {
		name     string
		centred  bool
		y        []float64
		width    int
		want     []*float64
		wantCode error
	}{
		// Hand calculation: (1+2+4)/3 = 7/3, (2+4+8)/3 = 14/3.
		{"centred odd", true, []float64{1, 2, 4, 8}, 3, nullable(nan, 7.0/3, 14.0/3, nan), nil},
		// Hand calculation: 2×2 at t=1 is (1/2·1 + 2 + 1/2·4)/2 = 2.25; at t=2 (1 + 4 + 4)/2 = 4.5.
		{"centred even", true, []float64{1, 2, 4, 8}, 2, nullable(nan, 2.25, 4.5, nan), nil},
		{"centred width one", true, []float64{3, 1}, 1, nullable(3, 1), nil},
		{"centred constant", true, []float64{7, 7, 7, 7, 7}, 4, nullable(nan, nan, 7, nan, nan), nil},
		// A NaN or Inf spoils only the windows that hold it.
		{"centred nan", true, []float64{1, 2, nan, 4, 5, 6, 7}, 3, nullable(nan, nan, nan, nan, 5, 6, nan), nil},
		{"centred inf", true, []float64{1, 2, 3, 4, 5, 6, -inf}, 3, nullable(nan, 2, 3, 4, 5, nan, nan), nil},
		{"centred too short even", true, []float64{1, 2, 3, 4}, 4, nil, ErrTooShort},
		{"centred empty", true, nil, 3, nil, ErrTooShort},
		{"centred width zero", true, []float64{1, 2}, 0, nil, ErrBadWidth},
		// Hand calculation: trailing width 2 of 1,2,4,8 is NaN, 1.5, 3, 6.
		{"trailing", false, []float64{1, 2, 4, 8}, 2, nullable(nan, 1.5, 3, 6), nil},
		{"trailing full width", false, []float64{1, 2, 6}, 3, nullable(nan, nan, 3), nil},
		{"trailing inf", false, []float64{1, inf, 3, 5, 7}, 2, nullable(nan, nan, nan, 4, 6), nil},
		{"trailing too short", false, []float64{1, 2}, 3, nil, ErrTooShort},
		{"trailing width negative", false, []float64{1, 2}, -1, nil, ErrBadWidth},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			t.Parallel()
			f := TrailingMovingAverage
			if tc.centred {
				f = CenteredMovingAverage
			}
			got, err := f(tc.y, tc.width)
			if tc.wantCode != nil {
				if !errors.Is(err, tc.wantCode) {
					t.Fatalf("width %d on %v: error %v, want %v", tc.width, tc.y, err, tc.wantCode)
				}
				return
			}
			if err != nil {
				t.Fatal(err)
			}
			compareNullable(t, "average", got, tc.want, tol{Abs: 1e-12, Rel: 1e-12})
		})
	}
}

// TestMovingAverageLongSeries compares the running sum with a direct sum on
// a long series with a large level, where an uncompensated running sum would
// drift.
func TestMovingAverageLongSeries(t *testing.T) {
	t.Parallel()
	y := seasonalSeries(20000, 12, 3)
	for i := range y {
		y[i] += 1e9
	}
	got, err := TrailingMovingAverage(y, 7)
	if err != nil {
		t.Fatal(err)
	}
	for _, i := range []int{6, 999, 19999} {
		var s float64
		for _, v := range y[i-6 : i+1] {
			s += v - 1e9
		}
		want := 1e9 + s/7
		if math.Abs(got[i]-want) > 1e-6 {
			t.Errorf("average at %d = %.10f, want %.10f (direct sum)", i, got[i], want)
		}
	}
}

func BenchmarkCenteredMovingAverage(b *testing.B) {
	for _, size := range benchSizes {
		y := seasonalSeries(size.n, 12, 1)
		b.Run(size.name, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				if _, err := CenteredMovingAverage(y, 12); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}

func BenchmarkTrailingMovingAverage(b *testing.B) {
	for _, size := range benchSizes {
		y := seasonalSeries(size.n, 12, 1)
		b.Run(size.name, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				if _, err := TrailingMovingAverage(y, 12); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}
