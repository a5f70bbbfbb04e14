package diagnose

import (
	"errors"
	"fmt"
	"math"
	"math/rand/v2"
	"slices"
	"testing"

	"gonum.org/v1/gonum/stat/distuv"
)

func TestMannKendallHand(t *testing.T) {
	t.Parallel()
	tests := []struct {
		name    string
		y       []float64
		s, varS float64
		z       float64
		slope   float64
	}{
		// Hand calculation: of the 10 pairs of 1,3,2,5,4, 8 rise and 2 fall,
		// S = 6; VarS = 5·4·15/18 = 16.667; Z = (6-1)/sqrt(16.667) = 1.2247.
		// The pairwise slopes sorted are -1,-1,1/3,0.5,0.75,1,1,4/3,2,3:
		// Sen's slope = (0.75+1)/2 = 0.875.
		{"no ties", []float64{1, 3, 2, 5, 4}, 6, 300.0 / 18, 5 / math.Sqrt(300.0/18), 0.875},
		// Hand calculation: 1,2,2,3 has 5 rising pairs and one tie, S = 5;
		// one tie group of 2 takes 2·1·9 = 18 off 4·3·13 = 156: VarS = 138/18;
		// Z = 4/sqrt(138/18). Slopes 1, 1/2, 2/3, 0, 1/2, 1 sorted:
		// 0, 1/2, 1/2, 2/3, 1, 1; median (1/2+2/3)/2 = 7/12.
		{"tied values", []float64{1, 2, 2, 3}, 5, 138.0 / 18, 4 / math.Sqrt(138.0/18), 7.0 / 12},
		// Hand calculation: a falling line, every pair falls: S = -10,
		// Z = (-10+1)/sqrt(16.667), slope -2.
		{"falling", []float64{10, 8, 6, 4, 2}, -10, 300.0 / 18, -9 / math.Sqrt(300.0/18), -2},
		// Hand calculation: 1,2,1,2,1,2: rising pairs 6, falling 3, ties 6;
		// S = 3; VarS = (6·5·17 - 2·(3·2·11))/18 = (510-132)/18 = 21;
		// Z = 2/sqrt(21). Slopes: 0 six times, ±1/1, ±1/3, ±1/5 give a median of 0.
		{"flat median slope", []float64{1, 2, 1, 2, 1, 2}, 3, 21, 2 / math.Sqrt(21), 0},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			t.Parallel()
			got, err := MannKendall(tc.y)
			if err != nil {
				t.Fatal(err)
			}
			wantP := 2 * distuv.UnitNormal.Survival(math.Abs(tc.z))
			c := tol{Abs: 1e-9, Rel: 1e-9}
			if got.N != len(tc.y) || !c.near(got.S, tc.s) || !c.near(got.VarS, tc.varS) || !c.near(got.Z, tc.z) ||
				!c.near(got.P, wantP) || !c.near(got.Slope, tc.slope) {
				t.Errorf("MannKendall(%v) = %+v; want S %v, VarS %v, Z %v, P %v, slope %v",
					tc.y, got, tc.s, tc.varS, tc.z, wantP, tc.slope)
			}
		})
	}
}

// bruteMannKendall computes S and Sen's slope from every pair, the direct
// O(n²) definition.
func bruteMannKendall(y []float64) (s, slope float64) {
	var slopes []float64
	for i := range y {
		for j := i + 1; j < len(y); j++ {
			switch {
			case y[j] > y[i]:
				s++
			case y[j] < y[i]:
				s--
			}
			slopes = append(slopes, (y[j]-y[i])/float64(j-i))
		}
	}
	slices.Sort(slopes)
	m := len(slopes)
	if m%2 == 1 {
		return s, slopes[m/2]
	}
	return s, (slopes[m/2-1] + slopes[m/2]) / 2
}

// TestMannKendallAgainstPairs compares the fast counting with the direct
// definition on random series from a fixed seed, with and without ties.
func TestMannKendallAgainstPairs(t *testing.T) {
	t.Parallel()
	rng := rand.New(rand.NewPCG(5, 6))
	for trial := range 30 {
		n := 3 + rng.IntN(120)
		y := make([]float64, n)
		for i := range y {
			y[i] = 0.3*float64(i)*rng.Float64() + 20*rng.NormFloat64()
			if trial%3 == 0 {
				y[i] = math.Round(y[i] / 10) // many ties
			}
		}
		t.Run(fmt.Sprintf("trial%d/n%d", trial, n), func(t *testing.T) {
			got, err := MannKendall(y)
			if errors.Is(err, ErrConstant) {
				return
			}
			if err != nil {
				t.Fatal(err)
			}
			s, slope := bruteMannKendall(y)
			spread := slices.Max(y) - slices.Min(y)
			if got.S != s || math.Abs(got.Slope-slope) > 1e-9*spread {
				t.Errorf("S, slope = %v, %.12g; pairs give %v, %.12g", got.S, got.Slope, s, slope)
			}
		})
	}
}

func TestMannKendallErrors(t *testing.T) {
	t.Parallel()
	tests := []struct {
		name  string
		y     []float64
		cause error
	}{
		{"empty", nil, ErrTooShort},
		{"two values", []float64{1, 2}, ErrTooShort},
		{"constant", []float64{4, 4, 4, 4}, ErrConstant},
		{"nan", []float64{1, 2, math.NaN(), 4}, ErrNotFinite},
		{"inf", []float64{1, 2, 3, math.Inf(1)}, ErrNotFinite},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			t.Parallel()
			if _, err := MannKendall(tc.y); !errors.Is(err, tc.cause) {
				t.Errorf("MannKendall(%v): error %v, want %v", tc.y, err, tc.cause)
			}
		})
	}
}

func TestMannKendallHugeValues(t *testing.T) {
	t.Parallel()
	// The range of these values overflows; the slope must still be right,
	// to the search's resolution of 1e-12 of the range (4e307): every
	// pairwise slope of this line is 1e307.
	y := make([]float64, 5)
	for i := range y {
		y[i] = -1.5e308 + float64(i)*1e307
	}
	got, err := MannKendall(y)
	if err != nil {
		t.Fatal(err)
	}
	if math.Abs(got.Slope-1e307) > 4e295 || got.S != 10 {
		t.Errorf("MannKendall = %+v, want slope 1e307 and S 10", got)
	}
}

func BenchmarkMannKendall(b *testing.B) {
	for _, size := range benchSizes {
		y := seasonalSeries(size.n, 12, 1)
		b.Run(size.name, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				if _, err := MannKendall(y); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}

func TestSeasonalKendallHand(t *testing.T) {
	t.Parallel()
	tests := []struct {
		name    string
		y       []float64
		season  int
		s, varS float64
		z       float64
		slope   float64
	}{
		// Hand calculation: season 2 splits 1,10,2,12,3,11 into 1,2,3
		// (S = 3) and 10,12,11 (S = 2-1 = 1); each VarS = 3·2·11/18, so
		// S = 4, VarS = 132/18, Z = 3/sqrt(132/18). Same-season slopes
		// 0.5, 0.5, 0.5 and 1, 0.25, -0.5 have median 0.5.
		{"two seasons", []float64{1, 10, 2, 12, 3, 11}, 2, 4, 132.0 / 18, 3 / math.Sqrt(132.0/18), 0.5},
		// Hand calculation: a season repeated exactly has no same-season
		// pair that differs: S = VarS = 0, Z = 0, slope 0.
		{"pure season", []float64{1, 5, 1, 5, 1, 5}, 2, 0, 0, 0, 0},
		// Season 1 is the ordinary test: the first hand case of MannKendall.
		{"no season", []float64{1, 3, 2, 5, 4}, 1, 6, 300.0 / 18, 5 / math.Sqrt(300.0/18), 0.875},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			t.Parallel()
			got, err := SeasonalKendall(tc.y, tc.season)
			if err != nil {
				t.Fatal(err)
			}
			wantP := 2 * distuv.UnitNormal.Survival(math.Abs(tc.z))
			c := tol{Abs: 1e-9, Rel: 1e-9}
			if !c.near(got.S, tc.s) || !c.near(got.VarS, tc.varS) || !c.near(got.Z, tc.z) ||
				!c.near(got.P, wantP) || !c.near(got.Slope, tc.slope) {
				t.Errorf("SeasonalKendall(%v, %d) = %+v; want S %v, VarS %v, Z %v, P %v, slope %v",
					tc.y, tc.season, got, tc.s, tc.varS, tc.z, wantP, tc.slope)
			}
		})
	}
}

// TestSeasonalKendallAgainstPairs compares with the direct definition over
// same-season pairs on random series from a fixed seed.
func TestSeasonalKendallAgainstPairs(t *testing.T) {
	t.Parallel()
	rng := rand.New(rand.NewPCG(8, 9))
	for trial := range 20 {
		m := 2 + rng.IntN(11)
		n := 2*m + rng.IntN(60)
		y := make([]float64, n)
		for i := range y {
			y[i] = 0.2*float64(i) + 10*math.Sin(float64(i%m)) + 5*rng.NormFloat64()
			if trial%4 == 0 {
				y[i] = math.Round(y[i] / 5)
			}
		}
		t.Run(fmt.Sprintf("trial%d/m%d/n%d", trial, m, n), func(t *testing.T) {
			got, err := SeasonalKendall(y, m)
			if err != nil {
				t.Fatal(err)
			}
			var s float64
			var slopes []float64
			for i := range y {
				for j := i + m; j < n; j += m {
					switch {
					case y[j] > y[i]:
						s++
					case y[j] < y[i]:
						s--
					}
					slopes = append(slopes, (y[j]-y[i])/float64(j-i))
				}
			}
			slices.Sort(slopes)
			k := len(slopes)
			slope := slopes[k/2]
			if k%2 == 0 {
				slope = (slopes[k/2-1] + slopes[k/2]) / 2
			}
			spread := slices.Max(y) - slices.Min(y)
			if got.S != s || math.Abs(got.Slope-slope) > 1e-9*spread {
				t.Errorf("S, slope = %v, %.12g; pairs give %v, %.12g", got.S, got.Slope, s, slope)
			}
		})
	}
}

func TestSeasonalKendallErrors(t *testing.T) {
	t.Parallel()
	tests := []struct {
		name   string
		y      []float64
		season int
		cause  error
	}{
		{"short", []float64{1, 2, 3, 4, 5}, 3, ErrTooShort},
		{"empty", nil, 4, ErrTooShort},
		{"no season and short", []float64{1, 2}, 0, ErrTooShort},
		{"constant", []float64{3, 3, 3, 3}, 2, ErrConstant},
		{"nan", []float64{1, 2, math.NaN(), 4}, 2, ErrNotFinite},
		{"inf", []float64{1, 2, 3, math.Inf(-1)}, 2, ErrNotFinite},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			t.Parallel()
			if _, err := SeasonalKendall(tc.y, tc.season); !errors.Is(err, tc.cause) {
				t.Errorf("SeasonalKendall(%v, %d): error %v, want %v", tc.y, tc.season, err, tc.cause)
			}
		})
	}
}

func BenchmarkSeasonalKendall(b *testing.B) {
	for _, size := range benchSizes {
		y := seasonalSeries(size.n, 12, 1)
		b.Run(size.name, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				if _, err := SeasonalKendall(y, 12); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}

// bruteSen returns the median of the slopes (y_j - y_i)/(j - i) over the
// pairs i < j of the listed positions with j - i a multiple of step, from
// the list of every such pair (the definition).
func bruteSen(y []float64, positions []int, step int) float64 {
	var slopes []float64
	for a, i := range positions {
		for _, j := range positions[a+1:] {
			if (j-i)%step == 0 {
				slopes = append(slopes, (y[j]-y[i])/float64(j-i))
			}
		}
	}
	slices.Sort(slopes)
	k := len(slopes)
	if k%2 == 1 {
		return slopes[k/2]
	}
	return (slopes[k/2-1] + slopes[k/2]) / 2
}

// TestTrendThinnedSlope: above the value limit Sen's slope is taken over
// every k-th value (every k-th season), with S, VarS, Z and P unchanged.
// The limit is lowered to reach the thinning on series short enough to
// check by listing every pair of the kept positions (the definition).
func TestTrendThinnedSlope(t *testing.T) {
	t.Parallel()
	rng := rand.New(rand.NewPCG(11, 12))
	tests := []struct {
		name      string
		n, step   int
		limit     int
		wantEvery int // hand calculation below
	}{
		// 300 values, at most 50: k = ceil(300/50) = 6, 50 values kept.
		{"plain", 300, 1, 50, 6},
		// 301 values, at most 50: k = 7, positions 0, 7, ..., 294 (43 values).
		{"plain uneven", 301, 1, 50, 7},
		// 26 seasons of 12 (312 values), at most 60 values = 5 seasons:
		// k = ceil(26/5) = 6, seasons 0, 6, 12, 18, 24 kept.
		{"seasonal", 312, 12, 60, 6},
		// 317 values = 26 seasons and a part: 27 started seasons, k = 6,
		// seasons 0, 6, ..., 24 kept.
		{"seasonal uneven", 317, 12, 60, 6},
		// At or under the limit nothing is thinned.
		{"under the limit", 60, 4, 60, 1},
	}
	for _, tc := range tests {
		y := make([]float64, tc.n)
		for i := range y {
			y[i] = 0.2*float64(i) + 10*math.Sin(float64(i%12)) + 6*rng.NormFloat64()
		}
		t.Run(tc.name, func(t *testing.T) {
			got, err := kendallLimit(y, tc.step, tc.limit)
			if err != nil {
				t.Fatal(err)
			}
			full, err := kendallLimit(y, tc.step, tc.n)
			if err != nil {
				t.Fatal(err)
			}
			if got.SlopeEvery != tc.wantEvery {
				t.Errorf("SlopeEvery %d, want %d", got.SlopeEvery, tc.wantEvery)
			}
			if got.S != full.S || got.VarS != full.VarS || got.Z != full.Z || got.P != full.P {
				t.Errorf("thinning changed the test: %+v, every value gives %+v", got, full)
			}
			var kept []int
			for i := range y {
				if (i/tc.step)%tc.wantEvery == 0 {
					kept = append(kept, i)
				}
			}
			if len(kept) > tc.limit {
				t.Errorf("%d values kept, limit %d", len(kept), tc.limit)
			}
			want := bruteSen(y, kept, tc.step)
			spread := slices.Max(y) - slices.Min(y)
			if math.Abs(got.Slope-want) > 1e-9*spread {
				t.Errorf("slope %.12g, the kept pairs give %.12g", got.Slope, want)
			}
		})
	}
}

// trendBenchSizes are the series lengths of the long-series benchmarks of
// the trend test, up to the longest series the page accepts.
var trendBenchSizes = []struct {
	name string
	n    int
}{{"n=20000", 20000}, {"n=100000", 100000}, {"n=1000000", 1000000}}

// BenchmarkTrendLong measures the plain and seasonal trend tests on long
// series, where Sen's slope is taken over at most SlopeValues values, and
// the exact slope over every pair for comparison.
func BenchmarkTrendLong(b *testing.B) {
	for _, size := range trendBenchSizes {
		y := seasonalSeries(size.n, 12, 1)
		b.Run("MannKendall/"+size.name, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				if _, err := MannKendall(y); err != nil {
					b.Fatal(err)
				}
			}
		})
		b.Run("SeasonalKendall/"+size.name, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				if _, err := SeasonalKendall(y, 12); err != nil {
					b.Fatal(err)
				}
			}
		})
		if size.n > 100000 {
			continue // the exact slope over every pair takes seconds here
		}
		b.Run("every-pair/"+size.name, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				if _, err := kendallLimit(y, 1, size.n); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}
