package accuracy

import (
	"math"
	"strings"
	"testing"
)

func TestWinkler(t *testing.T) {
	t.Parallel()
	tests := []struct {
		name                      string
		actual, lower, upper, lvl float64
		want                      float64
	}{
		// Hand calculations from the definition in Winkler (1972):
		// width, plus 2/α times the distance outside the interval.
		{"inside", 5, 4, 8, 0.8, 4},
		{"on the lower bound", 4, 4, 8, 0.8, 4},
		{"below at 80%", 2, 4, 8, 0.8, 4 + 2/0.2*2},   // 24
		{"above at 95%", 9, 4, 8, 0.95, 4 + 2/0.05*1}, // 44
		{"zero width", 3, 3, 3, 0.5, 0},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			t.Parallel()
			if got := Winkler(tc.actual, tc.lower, tc.upper, tc.lvl); math.Abs(got-tc.want) > 1e-9 {
				t.Errorf("Winkler(%v, %v, %v, %v) = %v, want %v", tc.actual, tc.lower, tc.upper, tc.lvl, got, tc.want)
			}
		})
	}
	for _, bad := range [][4]float64{{1, 0, 2, 0}, {1, 0, 2, 1}, {1, 3, 2, 0.8}, {1, 0, 2, math.NaN()}} {
		if got := Winkler(bad[0], bad[1], bad[2], bad[3]); !math.IsNaN(got) {
			t.Errorf("Winkler(%v) = %v, want NaN for a broken rule", bad, got)
		}
	}
}

func TestScoreIntervals(t *testing.T) {
	t.Parallel()
	nan, inf := math.NaN(), math.Inf(1)
	tests := []struct {
		name                 string
		actual, lower, upper []float64
		level                float64
		n, skipped           int
		below, above         int
		coverage, winkler    float64
		width                float64
		reason               string
	}{
		{
			// Hand calculation: widths 4, 4, 2, 2; period 2 misses 2 below
			// (penalty 2/0.2*2 = 20), period 4 misses 1 above (penalty 10):
			// Winkler (4+24+2+12)/4 = 10.5, coverage 2/4, width 3.
			name:   "hand",
			actual: []float64{5, 2, 7, 9}, lower: []float64{4, 4, 6, 6}, upper: []float64{8, 8, 8, 8},
			level: 0.8, n: 4, below: 1, above: 1, coverage: 0.5, winkler: 10.5, width: 3,
		},
		{
			name:   "gaps skipped",
			actual: []float64{5, nan, 7, 1}, lower: []float64{4, 4, 6, -inf}, upper: []float64{8, 8, 8, 2},
			level: 0.95, n: 2, skipped: 2, coverage: 1, winkler: 3, width: 3,
		},
		{
			name: "empty", level: 0.8, reason: "undefined: there is no period to score",
		},
		{
			name:   "all missing",
			actual: []float64{nan}, lower: []float64{1}, upper: []float64{2}, level: 0.8, skipped: 1,
			reason: "no period has both an actual value and an interval (1 period has a missing value)",
		},
		{
			name:   "reversed bounds",
			actual: []float64{1, 2}, lower: []float64{0, 3}, upper: []float64{2, 1}, level: 0.8,
			reason: "in 1 period the lower bound lies above the upper bound",
		},
		{
			name:   "level in percent",
			actual: []float64{1}, lower: []float64{0}, upper: []float64{2}, level: 80,
			reason: "the interval level 80 is out of range; give a coverage between 0 and 1 such as 0.8 or 0.95",
		},
		{
			name:   "lengths differ",
			actual: []float64{1, 2}, lower: []float64{0}, upper: []float64{2, 3}, level: 0.8,
			reason: "there are 2 actual values but 1 lower and 2 upper bounds",
		},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			t.Parallel()
			s := ScoreIntervals(tc.actual, tc.lower, tc.upper, tc.level)
			if s.N != tc.n || s.Skipped != tc.skipped || s.Below != tc.below || s.Above != tc.above || s.Level != tc.level {
				t.Errorf("counts = %+v; want N %d, Skipped %d, Below %d, Above %d", s, tc.n, tc.skipped, tc.below, tc.above)
			}
			results := []Result{s.Coverage, s.Winkler, s.Width}
			if tc.reason != "" {
				for _, r := range results {
					if r.Defined || !strings.Contains(r.Reason, tc.reason) {
						t.Errorf("result %+v, want undefined with %q", r, tc.reason)
					}
				}
				return
			}
			for i, want := range []float64{tc.coverage, tc.winkler, tc.width} {
				if r := results[i]; !r.Defined || math.Abs(r.Value-want) > 1e-12 {
					t.Errorf("result %d = %+v, want %v", i, r, want)
				}
			}
		})
	}
}

func BenchmarkScoreIntervals(b *testing.B) {
	for _, size := range benchSizes {
		actual := series(size.n, 1)
		mid := series(size.n, 2)
		lower, upper := make([]float64, size.n), make([]float64, size.n)
		for i, v := range mid {
			lower[i], upper[i] = v-12.8, v+12.8
		}
		b.Run(size.name, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				ScoreIntervals(actual, lower, upper, 0.8)
			}
		})
	}
}
