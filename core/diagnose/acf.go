package diagnose

import "math"

// ACF returns the sample autocorrelations r_0 .. r_maxLag of y (r_0 = 1):
//
//	r_k = sum_{t=0}^{n-k-1} (y_t - ȳ)(y_{t+k} - ȳ) / sum_{t=0}^{n-1} (y_t - ȳ)²
//
// with the mean removed and the full sum of squares (denominator n) at every
// lag, the usual estimator that keeps the autocorrelation matrix positive
// definite. For a chart, bounds of ±[ACFBound](len(y)) mark values that
// white noise would rarely reach.
//
// It returns an [*InputError] when maxLag is below 0 or not below len(y),
// when a value is NaN or infinite, or when y is constant (the
// autocorrelation is then undefined).
//
// Reference: G. E. P. Box, G. M. Jenkins and G. C. Reinsel, Time Series
// Analysis: Forecasting and Control, 4th ed. (2008), Wiley, section 2.1.4.
func ACF(y []float64, maxLag int) ([]float64, error) {
	if maxLag < 0 {
		return nil, inputErr(ErrBadLag, 0, "autocorrelation needs a largest lag of 0 or more; %d was given", maxLag)
	}
	if len(y) <= maxLag {
		return nil, inputErr(ErrTooShort, 0,
			"autocorrelation up to lag %d needs more than %d values; the series has %d", maxLag, maxLag, len(y))
	}
	if err := checkFinite(y); err != nil {
		return nil, err
	}
	r, ok := autocorrelations(y, maxLag)
	if !ok {
		return nil, inputErr(ErrConstant, 0, "the series is constant, so its autocorrelation is undefined")
	}
	return r, nil
}

// z975 is the 97.5% quantile of the standard normal distribution, the
// "1.96" of a 95% band, to full precision (the value of
// distuv.UnitNormal.Quantile(0.975)).
const z975 = 1.959963984540054

// ACFBound returns 1.96/sqrt(n) (with the exact normal quantile), the
// approximate 95% band around zero for the autocorrelations of n values of
// white noise (common practice; Box, Jenkins and Reinsel 2008, section
// 6.2.2). It returns NaN for n below 1.
func ACFBound(n int) float64 {
	if n < 1 {
		return math.NaN()
	}
	return z975 / math.Sqrt(float64(n))
}

// autocorrelations computes r_0..r_maxLag for finite y with
// maxLag < len(y); ok is false when y is constant (zero sum of squares).
func autocorrelations(y []float64, maxLag int) (r []float64, ok bool) {
	n := len(y)
	var mean float64
	for _, v := range y {
		mean += v
	}
	mean /= float64(n)
	dev := make([]float64, n)
	var ss float64
	for i, v := range y {
		dev[i] = v - mean
		ss += dev[i] * dev[i]
	}
	if !(ss > 0) || math.IsInf(ss, 0) {
		return nil, false
	}
	// A series whose spread is below rounding of its mean is constant.
	if math.Sqrt(ss/float64(n)) <= 1e-12*math.Abs(mean) {
		return nil, false
	}
	r = make([]float64, maxLag+1)
	for k := range r {
		var s float64
		for t := 0; t+k < n; t++ {
			s += dev[t] * dev[t+k]
		}
		r[k] = s / ss
	}
	return r, true
}
