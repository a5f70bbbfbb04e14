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
}

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
// (about 42 passes of O(n log n) time and O(n) memory).
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
	n := len(y)
	if n < 3 {
		return TrendTest{}, inputErr(ErrTooShort, 0, "a trend test needs at least 3 values; the series has %d", n)
	}
	if err := checkFinite(y); err != nil {
		return TrendTest{}, err
	}
	sorted := slices.Clone(y)
	slices.Sort(sorted)
	if sorted[0] == sorted[n-1] {
		return TrendTest{}, inputErr(ErrConstant, 0, "the series is constant, so it has no trend to test")
	}
	nf := float64(n)
	varS := nf * (nf - 1) * (2*nf + 5)
	for i := 0; i < n; {
		j := i + 1
		for j < n && sorted[j] == sorted[i] {
			j++
		}
		tf := float64(j - i)
		varS -= tf * (tf - 1) * (2*tf + 5)
		i = j
	}
	varS /= 18
	s := float64(kendallS(y, sorted))
	var z float64
	switch {
	case s > 0:
		z = (s - 1) / math.Sqrt(varS)
	case s < 0:
		z = (s + 1) / math.Sqrt(varS)
	}
	p := 2 * distuv.UnitNormal.Survival(math.Abs(z))
	// Sen's slope is found on y scaled into [-1, 1], so that no sum in the
	// search can overflow, and scaled back.
	c := max(math.Abs(sorted[0]), math.Abs(sorted[n-1]))
	scaled := make([]float64, n)
	for i, v := range y {
		scaled[i] = v / c
	}
	slope := c * senSlope(scaled, sorted[n-1]/c-sorted[0]/c)
	return TrendTest{N: n, S: s, VarS: varS, Z: z, P: min(p, 1), Slope: slope}, nil
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

// senSlope returns the median of the pairwise slopes of y. spread is
// max(y) - min(y), a bound on the size of every slope.
func senSlope(y []float64, spread float64) float64 {
	n := len(y)
	pairs := int64(n) * int64(n-1) / 2
	z := make([]float64, n)
	buf := make([]float64, n)
	// below(t) counts pairs i < j with slope (y_j-y_i)/(j-i) <= t, that is
	// with y_j - t·j <= y_i - t·i.
	below := func(t float64) int64 {
		for i, v := range y {
			z[i] = v - t*float64(i)
		}
		return countNotAbove(z, buf)
	}
	// Bisection stops when the bracket is narrower than tiny; the k-th
	// slope lies in (lo, hi], so hi is within tiny of it.
	tiny := 1e-12 * spread
	kth := func(k int64, lo float64) float64 {
		hi := spread * 1.5 // below(lo) < k <= pairs = below(hi)
		for i := 0; i < 200 && hi-lo > tiny; i++ {
			mid := lo + (hi-lo)/2
			if below(mid) >= k {
				hi = mid
			} else {
				lo = mid
			}
		}
		return hi
	}
	var slope float64
	if pairs%2 == 1 {
		slope = kth((pairs+1)/2, -spread*1.5)
	} else {
		low := kth(pairs/2, -spread*1.5)
		high := low
		if below(low) < pairs/2+1 {
			// The next slope lies above low: search only above it.
			high = kth(pairs/2+1, low)
		}
		slope = (low + high) / 2
	}
	if math.Abs(slope) <= tiny {
		return 0 // a flat median slope, up to the bisection's resolution
	}
	return slope
}

// countNotAbove sorts z and returns the number of pairs i < j (positions
// before sorting) with z[j] <= z[i]. buf is scratch space as long as z.
func countNotAbove(z, buf []float64) int64 {
	n := len(z)
	if n < 2 {
		return 0
	}
	var count int64
	for width := 1; width < n; width *= 2 {
		for lo := 0; lo < n-width; lo += 2 * width {
			mid, hi := lo+width, min(lo+2*width, n)
			i, j, k := lo, mid, lo
			for i < mid && j < hi {
				if z[j] <= z[i] {
					count += int64(mid - i)
					buf[k] = z[j]
					j++
				} else {
					buf[k] = z[i]
					i++
				}
				k++
			}
			k += copy(buf[k:], z[i:mid])
			copy(buf[k:], z[j:hi])
			copy(z[lo:hi], buf[lo:hi])
		}
	}
	return count
}
