package diagnose

import (
	"math"
	"slices"

	"gonum.org/v1/gonum/stat/distuv"
)

// TrendTest is the result of the Mann-Kendall test for a monotonic trend,
// with Sen's estimate of its slope.
type TrendTest struct {
	N     int     // values tested
	S     float64 // Kendall's S: rising pairs minus falling pairs (a whole number)
	VarS  float64 // variance of S under no trend, corrected for tied values
	Z     float64 // normal score of S with continuity correction; positive for a rise
	P     float64 // two-sided p-value of Z: the chance of a trend at least this clear in a series without one
	Slope float64 // Sen's slope: the median of (y_j - y_i)/(j - i) over all pairs i < j, in units per period
	// SlopeEvery is 1 when Slope uses every value. For a series longer
	// than [SlopeValues] it is the k such that Slope is Sen's slope of
	// every k-th value (of every k-th season for a seasonal test), at most
	// SlopeValues of them; S, VarS, Z and P always use every value.
	SlopeEvery int
}

// SlopeValues is the largest number of values whose pairs Sen's slope is
// taken over. A longer series gives the slope of evenly spaced values
// (see [TrendTest.SlopeEvery]). The exact median over all n(n-1)/2 pairs
// takes about 42 counting passes of O(n log n) each: measured on a 2-core
// machine shared with other work, the slope alone took about 0.7 s at
// 100,000 values and 2.9 s at 1,000,000, against about 50 ms for the
// whole test at 20,000 (BenchmarkTrendLong). An exact randomized
// selection of the median slope (sampling a bracket, then counting and
// listing the slopes inside it) was tried and measured only 1.4 times
// faster at 100,000 and slower at 1,000,000, so the long series are
// thinned instead. The thinned slope estimates the same trend from pairs
// further apart; S, Z and P, counted in O(n log n) once, always use every
// value.
const SlopeValues = 20000

// MannKendall tests y for a monotonic trend by the Mann-Kendall rank test
// and estimates the trend's size by Sen's slope.
//
//	S    = sum over pairs i < j of sign(y_j - y_i)
//	VarS = (n(n-1)(2n+5) - sum over tie groups of t(t-1)(2t+5)) / 18
//	Z    = (S - 1)/sqrt(VarS) if S > 0, (S + 1)/sqrt(VarS) if S < 0, 0 otherwise
//
// and P = 2(1 - Φ(|Z|)). The normal approximation is good from about ten
// values; with fewer, treat P as rough. The test assumes independent values:
// strong autocorrelation (a season, say) makes P too small (Hamed and Rao
// 1998), so read a borderline P with care.
//
// S is counted in O(n log n) time with a Fenwick tree over ranks (Knight
// 1966); Sen's slope is the exact median of the n(n-1)/2 pairwise slopes,
// found to within 1e-12 of the series' range by bisection on the slope, the
// pairs below a trial slope being counted as inversions by merge sort
// (about 42 passes of O(n log n) time and O(n) memory). Beyond
// [SlopeValues] values the slope is that of evenly spaced values
// ([TrendTest.SlopeEvery] says so).
//
// It returns an [*InputError] when y has fewer than 3 values, holds a NaN or
// infinite value, or is constant.
//
// References: H. B. Mann (1945), "Nonparametric tests against trend",
// Econometrica 13(3), 245-259; M. G. Kendall (1975), Rank Correlation
// Methods, 4th ed., Griffin, ch. 4 (the variance with ties); K. W. Hipel and
// A. I. McLeod (1994), Time Series Modelling of Water Resources and
// Environmental Systems, Elsevier, section 23.3; P. K. Sen (1968),
// "Estimates of the regression coefficient based on Kendall's tau", Journal
// of the American Statistical Association 63(324), 1379-1389; W. R. Knight
// (1966), "A computer method for calculating Kendall's tau with ungrouped
// data", JASA 61(314), 436-439; K. H. Hamed and A. R. Rao (1998), "A
// modified Mann-Kendall trend test for autocorrelated data", Journal of
// Hydrology 204, 182-196.
func MannKendall(y []float64) (TrendTest, error) {
	if len(y) < 3 {
		return TrendTest{}, inputErr(ErrTooShort, 0, "a trend test needs at least 3 values; the series has %d", len(y))
	}
	return kendall(y, 1)
}

// SeasonalKendall tests y for a monotonic trend by the seasonal Kendall
// test: the Mann-Kendall statistic is computed within each position of the
// season (all Januaries, all Februaries, ...) and summed, S = sum_g S_g with
// VarS = sum_g VarS_g, so that a stable season neither hides nor fakes a
// trend. Z and P follow as in [MannKendall]. Slope is the seasonal Sen's
// slope, the median of (y_j - y_i)/(j - i) over pairs of the same season
// position, in units per period.
//
// Where no two values of the same season position differ, S and VarS are
// 0 and the result is Z = 0, P = 1: no evidence of a trend. A season below
// 2 gives [MannKendall].
//
// It returns an [*InputError] when y holds fewer than two full seasons (or
// 3 values), holds a NaN or infinite value, or is constant.
//
// Reference: R. M. Hirsch, J. R. Slack and R. A. Smith (1982), "Techniques
// of trend analysis for monthly water quality data", Water Resources
// Research 18(1), 107-121.
func SeasonalKendall(y []float64, season int) (TrendTest, error) {
	if season < 2 {
		return MannKendall(y)
	}
	if len(y) < 2*season {
		return TrendTest{}, inputErr(ErrTooShort, 0,
			"a seasonal trend test needs at least two full seasons (%d values for a season of %d); the series has %d",
			2*season, season, len(y))
	}
	return kendall(y, season)
}

// kendall runs the Mann-Kendall test within each of the step interleaved
// subseries y[g], y[g+step], ... and sums the results; step 1 is the
// ordinary test. It requires len(y) >= 2*step and len(y) >= 3.
func kendall(y []float64, step int) (TrendTest, error) {
	return kendallLimit(y, step, SlopeValues)
}

// kendallLimit is kendall taking Sen's slope over at most about maxSlope
// values (a parameter so that tests reach the thinning).
func kendallLimit(y []float64, step, maxSlope int) (TrendTest, error) {
	n := len(y)
	if err := checkFinite(y); err != nil {
		return TrendTest{}, err
	}
	lo, hi := slices.Min(y), slices.Max(y)
	if lo == hi {
		return TrendTest{}, inputErr(ErrConstant, 0, "the series is constant, so it has no trend to test")
	}
	var s int64
	var varS float64
	sub := make([]float64, 0, n/step+1)
	for g := range step {
		sub = sub[:0]
		for i := g; i < n; i += step {
			sub = append(sub, y[i])
		}
		sorted := slices.Clone(sub)
		slices.Sort(sorted)
		s += kendallS(sub, sorted)
		varS += kendallVariance(sorted)
	}
	var z float64
	switch {
	case varS <= 0:
		// No two values of one subseries differ: S is 0 with no spread.
	case s > 0:
		z = (float64(s) - 1) / math.Sqrt(varS)
	case s < 0:
		z = (float64(s) + 1) / math.Sqrt(varS)
	}
	p := 2 * distuv.UnitNormal.Survival(math.Abs(z))
	x, every := thin(y, step, maxSlope)
	return TrendTest{N: n, S: float64(s), VarS: varS, Z: z, P: min(p, 1),
		Slope: scaledSen(x, step) / float64(every), SlopeEvery: every}, nil
}

// thin returns y itself and 1 when it has at most maxValues values.
// Otherwise it returns the values of every k-th season of step periods
// (every k-th value for step 1), in order, and k, the smallest that
// leaves at most maxValues values. In the result, same-season positions
// i < j lie (j-i)*k periods apart in y.
func thin(y []float64, step, maxValues int) ([]float64, int) {
	n := len(y)
	if n <= maxValues {
		return y, 1
	}
	cycles := (n + step - 1) / step
	keep := max(maxValues/step, 2) // seasons kept
	k := (cycles + keep - 1) / keep
	x := make([]float64, 0, keep*step)
	for c := 0; c*step < n; c += k {
		x = append(x, y[c*step:min(c*step+step, n)]...)
	}
	return x, k
}

// scaledSen returns Sen's slope of y over same-season pairs (see
// senSlope), found on y scaled into [-1, 1] so that no sum in the search
// can overflow, and scaled back; 0 when y is constant.
func scaledSen(y []float64, step int) float64 {
	lo, hi := slices.Min(y), slices.Max(y)
	if lo == hi {
		return 0
	}
	c := max(math.Abs(lo), math.Abs(hi))
	scaled := make([]float64, len(y))
	for i, v := range y {
		scaled[i] = v / c
	}
	return c * senSlope(scaled, step, hi/c-lo/c)
}

// kendallVariance returns the variance of Kendall's S for values in
// ascending order, corrected for ties:
// (n(n-1)(2n+5) - sum over tie groups of t(t-1)(2t+5)) / 18.
func kendallVariance(sorted []float64) float64 {
	n := len(sorted)
	nf := float64(n)
	v := nf * (nf - 1) * (2*nf + 5)
	for i := 0; i < n; {
		j := i + 1
		for j < n && sorted[j] == sorted[i] {
			j++
		}
		tf := float64(j - i)
		v -= tf * (tf - 1) * (2*tf + 5)
		i = j
	}
	return v / 18
}

// kendallS returns sum over i < j of sign(y_j - y_i), counting with a
// Fenwick tree over the ranks of y; sorted is y in ascending order.
func kendallS(y, sorted []float64) int64 {
	uniq := slices.Compact(slices.Clone(sorted))
	tree := make([]int64, len(uniq)+1)
	var s int64
	for j, v := range y {
		r, _ := slices.BinarySearch(uniq, v) // 0-based rank; v is present
		var below, atOrBelow int64
		for i := r; i > 0; i -= i & -i {
			below += tree[i]
		}
		for i := r + 1; i > 0; i -= i & -i {
			atOrBelow += tree[i]
		}
		s += below - (int64(j) - atOrBelow)
		for i := r + 1; i < len(tree); i += i & -i {
			tree[i]++
		}
	}
	return s
}
