package accuracy

import "fmt"

// Scale is the denominator of MASE: the mean absolute error of the naive
// (lag 1) or seasonal naive (lag m) method on the training series.
// The zero Scale is undefined, so MASE without a scale is reported as
// undefined rather than guessed.
type Scale struct {
	Lag     int     // lag of the differences, in periods: 1 for naive, the season length for seasonal naive
	Value   float64 // mean absolute lag difference; positive when Defined
	N       int     // number of differences averaged
	Defined bool
	Reason  string // why MASE cannot be scaled, in plain words; empty when Defined
}

// NaiveScale returns the MASE scale of a training series: the mean of
// |train[t] - train[t-lag]| over t = lag .. len(train)-1 (0-based). A
// difference that involves a NaN or infinite value is left out.
//
// The scale is undefined, with the reason, when lag is below 1, when fewer
// than lag+1 values are available, or when every difference is zero (a
// constant series for lag 1, an exactly repeating one for a seasonal lag).
//
// Reference: R. J. Hyndman and A. B. Koehler (2006), "Another look at
// measures of forecast accuracy", International Journal of Forecasting
// 22(4), 679-688, section 3.4.
func NaiveScale(train []float64, lag int) Scale {
	s := Scale{Lag: lag}
	if lag < 1 {
		s.Reason = fmt.Sprintf("MASE undefined: the scaling lag must be at least 1 period; %d was given", lag)
		return s
	}
	var sum float64
	for t := lag; t < len(train); t++ {
		d := train[t] - train[t-lag]
		if !finite(d) {
			continue
		}
		sum += abs(d)
		s.N++
	}
	switch {
	case s.N == 0 && len(train) <= lag:
		s.Reason = fmt.Sprintf("MASE undefined: the training series has %d %s; scaling at lag %d needs at least %d",
			len(train), plural(len(train), "value", "values"), lag, lag+1)
	case s.N == 0:
		s.Reason = fmt.Sprintf("MASE undefined: the training series has no two values %d %s apart to scale by",
			lag, plural(lag, "period", "periods"))
	case !finite(sum):
		s.Reason = "MASE undefined: the training values are too large to add up"
	case !(sum > 0):
		if lag == 1 {
			s.Reason = "MASE undefined: the training series is constant"
		} else {
			s.Reason = fmt.Sprintf("MASE undefined: the training series repeats exactly every %d periods, so the seasonal naive method makes no error to scale by", lag)
		}
	default:
		s.Value = sum / float64(s.N)
		s.Defined = true
	}
	return s
}
