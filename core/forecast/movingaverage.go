package forecast

import (
	"fmt"
	"math"
)

// MovingAverage is the trailing moving average of Width values: the
// forecast for every horizon is the mean of the last Width values up to the
// forecast origin, and fitted[t] = mean(y[t-Width..t-1]) (NaN for
// t < Width). Width 1 is the naive method.
//
// With Width 0 the width is estimated: each width from 1 to
// min(n/2, 24) is scored by the sum of squared one-step errors over the
// periods every candidate can forecast (t >= the largest candidate) and the
// smallest width with the least error wins.
//
// It has no analytic prediction interval (there is no model behind the
// average); use empirical intervals from a backtest.
//
// Source: S. Makridakis, S. C. Wheelwright and R. J. Hyndman, Forecasting:
// Methods and Applications, 3rd ed. (1998), section 4/3 "Averaging
// methods"; the formulas are common practice.
type MovingAverage struct {
	Width int // values averaged; 0 estimates it
}

// Name returns "moving-average".
func (MovingAverage) Name() string { return "moving-average" }

// Fit fits the trailing moving average; it needs at least Width values
// (two when the width is estimated).
func (m MovingAverage) Fit(y []float64, season int) (*Fit, error) {
	if m.Width < 0 {
		return nil, settingError("moving-average width %d is not accepted; write a whole number of periods of at least 1", m.Width)
	}
	w, estimated := m.Width, m.Width == 0
	need := w
	if estimated {
		need = 2
	}
	if err := checkSeries(m.Name(), y, need, fmt.Sprintf("one window of %d values", need)); err != nil {
		return nil, err
	}
	n := len(y)
	if estimated {
		w = bestWidth(y)
	}
	fitted := nanSlice(n)
	sum := 0.0
	for t := range n {
		if t >= w {
			fitted[t] = sum / float64(w)
			sum -= y[t-w]
		}
		sum += y[t]
	}
	last := sum / float64(w)
	f := &Fit{
		Method: m.Name(), N: n, Season: season, Fitted: fitted, Converged: true,
		Params:  []Param{{Name: "width", Value: float64(w), Estimated: estimated}},
		Init:    fmt.Sprintf("no initial states: the first %d periods have no one-step forecast", w),
		Follows: Patterns{Level: true},
		train:   clone(y), path: flat(last),
	}
	if estimated {
		f.Notes = append(f.Notes, fmt.Sprintf("width %d gave the smallest in-sample one-step squared error among widths 1 to %d", w, maxWidth(n)))
	}
	return f, nil
}

// maxWidth is the largest width tried when the width is estimated.
func maxWidth(n int) int { return max(1, min(n/2, 24)) }

// bestWidth returns the width in 1..maxWidth(n) with the least sum of
// squared one-step errors over t >= maxWidth(n), using running sums.
func bestWidth(y []float64) int {
	n := len(y)
	top := maxWidth(n)
	best, bestSSE := 1, math.Inf(1)
	for w := 1; w <= top; w++ {
		sum := 0.0
		for t := top - w; t < top; t++ {
			sum += y[t]
		}
		sse := 0.0
		for t := top; t < n; t++ {
			e := y[t] - sum/float64(w)
			sse += e * e
			sum += y[t] - y[t-w]
		}
		if sse < bestSSE {
			best, bestSSE = w, sse
		}
	}
	return best
}

func movingAverageSpec() Spec {
	return Spec{
		Name: "moving-average", Title: "Trailing moving average",
		Summary: "Every forecast is the mean of the last few values; a wider window smooths more and reacts more slowly.",
		Source:  "S. Makridakis, S. C. Wheelwright and R. J. Hyndman, Forecasting: Methods and Applications, 3rd ed. (1998), section 4/3",
		Assumes: "values vary around a level that changes slowly: no trend and no season",
		Follows: Patterns{Level: true},
		Params: []ParamSpec{{
			Name: "width", Kind: Whole, Min: 1, Max: math.Inf(1),
			Help: "number of latest values averaged; left out, the width with the least in-sample one-step error from 1 to 24 is used",
		}},
		New: func(s Settings) (Method, error) {
			return MovingAverage{Width: s.whole("width")}, nil
		},
	}
}
