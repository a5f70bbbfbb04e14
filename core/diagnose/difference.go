package diagnose

import "math"

// Difference returns the lag differences of y: out[i] = y[i+lag] - y[i],
// len(y)-lag values with no leading gap. Lag 1 removes a changing level;
// lag m (the season length) removes a stable season. A NaN or infinite
// value makes the differences that use it NaN, so that a gap stays visible.
//
// It returns an error when lag is below 1 or when y has no more than lag
// values.
func Difference(y []float64, lag int) ([]float64, error) {
	if lag < 1 {
		return nil, inputErr(ErrBadLag, 0, "differencing needs a lag of at least 1 period; %d was given", lag)
	}
	if len(y) <= lag {
		return nil, inputErr(ErrTooShort, 0,
			"differencing at lag %d needs more than %d values; the series has %d", lag, lag, len(y))
	}
	out := make([]float64, len(y)-lag)
	for i := range out {
		d := y[i+lag] - y[i]
		if !isFinite(d) {
			d = math.NaN()
		}
		out[i] = d
	}
	return out, nil
}
