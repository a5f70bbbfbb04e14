package diagnose

import "math"

// This file finds Sen's slope, the median of pairwise slopes, without
// listing the pairs.

// senSlope returns the median of the slopes (y_j - y_i)/(j - i) over the
// pairs i < j with j - i a multiple of step (every pair for step 1).
// spread is max(y) - min(y), a bound on the size of every slope.
func senSlope(y []float64, step int, spread float64) float64 {
	n := len(y)
	var pairs int64
	for g := range step {
		m := int64((n - g + step - 1) / step)
		pairs += m * (m - 1) / 2
	}
	if pairs == 0 {
		return 0
	}
	z := make([]float64, n)
	buf := make([]float64, n)
	// below(t) counts pairs with slope <= t, that is with
	// y_j - t·j <= y_i - t·i, subseries by subseries.
	below := func(t float64) int64 {
		var count int64
		k := 0
		for g := range step {
			start := k
			for i := g; i < n; i += step {
				z[k] = y[i] - t*float64(i)
				k++
			}
			count += countNotAbove(z[start:k], buf[start:k])
		}
		return count
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
