package forecast

import (
	"fmt"
	"math"
)

// maxMagnitude is the largest absolute value accepted in a series: squares
// and sums of squares of larger values could overflow.
const maxMagnitude = 1e100

// checkSeries returns an error when y holds a value that is not a finite
// number (or is larger in size than 1e100, whose squares could overflow)
// or has fewer than min values; need says why, in words ("two values",
// "two full seasons of 12 periods").
func checkSeries(method string, y []float64, min int, need string) error {
	for t, v := range y {
		if math.IsNaN(v) || math.IsInf(v, 0) {
			return &Error{Cause: ErrBadValue, Msg: fmt.Sprintf("%s: value %d of the training period is missing or not a finite number; fill or remove it first", method, t+1)}
		}
		if math.Abs(v) > maxMagnitude {
			return &Error{Cause: ErrBadValue, Msg: fmt.Sprintf("%s: value %d of the training period, %g, is too large to compute with; rescale the series (for example, count in millions)", method, t+1, v)}
		}
	}
	if len(y) < min {
		return &Error{Cause: ErrTooShort, Msg: fmt.Sprintf("%s needs at least %d values (%s) but the training period has %d", method, min, need, len(y))}
	}
	return nil
}

// checkPositive returns an error when y has a zero or negative value.
func checkPositive(method, why string, y []float64) error {
	for t, v := range y {
		if v <= 0 {
			return &Error{Cause: ErrNotPositive, Msg: fmt.Sprintf("%s needs positive values because %s, but value %d of the training period is %s", method, why, t+1, fmtNum(v))}
		}
	}
	return nil
}

// seasonLength picks the cycle: the method's own when set, else the series'.
func seasonLength(own, series int) int {
	if own > 0 {
		return own
	}
	return series
}

// nanSlice returns a slice of n NaN values.
func nanSlice(n int) []float64 {
	s := make([]float64, n)
	for i := range s {
		s[i] = math.NaN()
	}
	return s
}

// flat returns a path function that repeats v for every horizon.
func flat(v float64) func(h int) []float64 {
	return func(h int) []float64 {
		out := make([]float64, h)
		for i := range out {
			out[i] = v
		}
		return out
	}
}

// mean returns the arithmetic mean of y (which must not be empty).
func mean(y []float64) float64 {
	s := 0.0
	for _, v := range y {
		s += v
	}
	return s / float64(len(y))
}
