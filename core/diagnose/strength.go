package diagnose

import "math"

// SeasonalStrength returns how much of the variation of a series around its
// trend the season accounts for, from 0 (none) to 1 (all):
//
//	F_s = max(0, 1 - Var(R) / Var(S + R))
//
// where S and R are the seasonal and remainder components of d over the
// periods where the remainder is defined. For a multiplicative
// decomposition the logarithms of S and R are used, so that the components
// add. It returns 0 when d is nil or has fewer than two defined remainders,
// or when S + R does not vary.
//
// Reference: X. Wang, K. Smith and R. J. Hyndman (2006),
// "Characteristic-based clustering for time series data", Data Mining and
// Knowledge Discovery 13(3), 335-364; R. J. Hyndman and G. Athanasopoulos,
// Forecasting: Principles and Practice, 3rd ed. (2021), section 4.3. Those
// use an STL decomposition; here the classical one is used.
func SeasonalStrength(d *Decomposition) float64 {
	if d == nil {
		return 0
	}
	return strength(d, d.Seasonal)
}

// TrendStrength returns how much of the variation of the deseasonalised
// series the trend accounts for, from 0 to 1:
//
//	F_t = max(0, 1 - Var(R) / Var(T + R))
//
// with the same conventions and reference as [SeasonalStrength].
func TrendStrength(d *Decomposition) float64 {
	if d == nil {
		return 0
	}
	return strength(d, d.Trend)
}

// strength computes max(0, 1 - Var(R)/Var(C+R)) for component c of d.
func strength(d *Decomposition, c []float64) float64 {
	var rem, sum []float64
	for t, r := range d.Remainder {
		if t >= len(c) || math.IsNaN(r) || math.IsNaN(c[t]) {
			continue
		}
		v := c[t]
		if d.Kind == Multiplicative {
			if !(r > 0 && v > 0) {
				continue
			}
			r, v = math.Log(r), math.Log(v)
		}
		rem = append(rem, r)
		sum = append(sum, v+r)
	}
	if len(rem) < 2 {
		return 0
	}
	// The ratio does not depend on the unit: scale both into [-1, 1] so
	// that the squares cannot overflow.
	var big float64
	for i := range rem {
		big = max(big, math.Abs(rem[i]), math.Abs(sum[i]))
	}
	if !(big > 0) || math.IsInf(big, 0) {
		return 0
	}
	for i := range rem {
		rem[i] /= big
		sum[i] /= big
	}
	vs := variance(sum)
	if !(vs > 0) {
		return 0
	}
	f := 1 - variance(rem)/vs
	if !(f > 0) {
		return 0
	}
	return min(f, 1)
}

// variance returns the population variance of x (the ratio of two
// variances does not depend on the divisor).
func variance(x []float64) float64 {
	var mean float64
	for _, v := range x {
		mean += v
	}
	mean /= float64(len(x))
	var ss float64
	for _, v := range x {
		ss += (v - mean) * (v - mean)
	}
	return ss / float64(len(x))
}
