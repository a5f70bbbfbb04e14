package diagnose

import "math"

// This file holds the moving averages drawn over a series for display.
// Forecasting with a trailing moving average lives with the methods.

// CenteredMovingAverage returns the centred moving average of y of the given
// width, aligned with y.
//
// An odd width w averages y[t-(w-1)/2 .. t+(w-1)/2]. An even width w uses the
// two-step (2×w) centred average: weights 1/(2w), 1/w, ..., 1/w, 1/(2w) over
// y[t-w/2 .. t+w/2], which is the mean of two neighbouring w-averages, so
// that the result sits on a period rather than between two. Positions too
// near either end to have a full window are NaN, as is any position whose
// window holds a NaN or infinite value or whose sum is too large to hold.
//
// It returns an error when width is below 1 or the series is shorter than
// the window (w values for odd w, w+1 for even w). Width 1 returns a copy.
//
// Reference: R. J. Hyndman and G. Athanasopoulos, Forecasting: Principles
// and Practice, 2nd ed. (2018), section 6.2 "Moving averages" (the 2×m-MA).
func CenteredMovingAverage(y []float64, width int) ([]float64, error) {
	if width < 1 {
		return nil, inputErr(ErrBadWidth, 0, "a moving average needs a width of at least 1 period; %d was given", width)
	}
	span := width
	if width%2 == 0 {
		span = width + 1
	}
	if len(y) < span {
		return nil, inputErr(ErrTooShort, 0,
			"a centred moving average of width %d needs at least %d values; the series has %d",
			width, span, len(y))
	}
	means := windowMeans(y, width)
	out := make([]float64, len(y))
	for i := range out {
		out[i] = math.NaN()
	}
	if width%2 == 1 {
		half := (width - 1) / 2
		copy(out[half:], means)
		return out, nil
	}
	half := width / 2
	for i := 0; i+1 < len(means); i++ {
		out[i+half] = (means[i] + means[i+1]) / 2
	}
	return out, nil
}

// TrailingMovingAverage returns the trailing moving average of y of the
// given width for display, aligned with y: the value at t is the mean of
// y[t-w+1 .. t], the last w values up to and including t. The first w-1
// positions are NaN, as is any position whose window holds a NaN or infinite
// value.
//
// This is a smoothed line, not a forecast: the one-step forecast of a
// trailing moving average for period t is the mean of y[t-w .. t-1], the
// value of this line at t-1.
//
// It returns an error when width is below 1 or above the length of y.
func TrailingMovingAverage(y []float64, width int) ([]float64, error) {
	if width < 1 {
		return nil, inputErr(ErrBadWidth, 0, "a moving average needs a width of at least 1 period; %d was given", width)
	}
	if len(y) < width {
		return nil, inputErr(ErrTooShort, 0,
			"a trailing moving average of width %d needs at least %d values; the series has %d",
			width, width, len(y))
	}
	out := make([]float64, len(y))
	for i := 0; i < width-1; i++ {
		out[i] = math.NaN()
	}
	copy(out[width-1:], windowMeans(y, width))
	return out, nil
}

// windowMeans returns the len(y)-w+1 means of y[i .. i+w-1]. It keeps a
// running sum of the finite values (compensated, after Neumaier 1974, so
// that long series do not drift) and a count of non-finite values in the
// window; a window holding any non-finite value has mean NaN.
// It requires 1 <= w <= len(y).
func windowMeans(y []float64, w int) []float64 {
	out := make([]float64, len(y)-w+1)
	var sum, comp float64
	bad := 0
	add := func(v float64) {
		t := sum + v
		if math.Abs(sum) >= math.Abs(v) {
			comp += (sum - t) + v
		} else {
			comp += (v - t) + sum
		}
		sum = t
	}
	for i, v := range y {
		if isFinite(v) {
			add(v)
		} else {
			bad++
		}
		if i >= w {
			old := y[i-w]
			if isFinite(old) {
				add(-old)
			} else {
				bad--
			}
		}
		if i >= w-1 {
			m := (sum + comp) / float64(w)
			if bad > 0 || !isFinite(m) {
				m = math.NaN() // a gap in the window, or a sum too large to hold
			}
			out[i-w+1] = m
		}
	}
	return out
}

func isFinite(v float64) bool { return !math.IsNaN(v) && !math.IsInf(v, 0) }
