package forecast

import (
	"errors"
	"fmt"
	"testing"
)

// TestMovingAverageNile checks trailing moving averages of widths 3, 5 and
// 10 on the Nile flow. Source: case trailing_ma_nile (pandas + numpy,
// common-practice formula).
func TestMovingAverageNile(t *testing.T) {
	var c struct {
		refCase
		Expected map[string]struct {
			OneStepForecast []*float64 `json:"one_step_forecast"`
			Forecast        []float64  `json:"forecast"`
			MSE             float64    `json:"mse"`
		} `json:"expected"`
	}
	readCase(t, "trailing_ma_nile", &c)
	for _, w := range []int{3, 5, 10} {
		t.Run(fmt.Sprintf("width %d", w), func(t *testing.T) {
			want := c.Expected[fmt.Sprintf("w%d", w)]
			f := mustFit(t, MovingAverage{Width: w}, c.Data.Y, 0)
			checkSlice(t, "fitted", f.Fitted, want.OneStepForecast, c.Tolerance.Abs, c.Tolerance.Rel)
			checkFloats(t, "forecast", f.Forecast(5), want.Forecast, c.Tolerance.Abs, c.Tolerance.Rel)
			ss, k := 0.0, 0
			for _, r := range f.Residuals() {
				if r == r { // skip undefined (NaN) positions
					ss += r * r
					k++
				}
			}
			if got := ss / float64(k); !within(got, want.MSE, c.Tolerance.Abs, c.Tolerance.Rel) {
				t.Errorf("MSE = %.12g, want %.12g", got, want.MSE)
			}
			if _, _, err := f.Interval(3, 0.8); !errors.Is(err, ErrNoInterval) {
				t.Errorf("Interval error = %v, want ErrNoInterval", err)
			}
		})
	}
}

// TestMovingAverageEstimatedWidth: with the width left out, the chosen
// width is the best of a direct search (hand check by brute force).
func TestMovingAverageEstimatedWidth(t *testing.T) {
	// A series alternating around a slow level favours width 2
	// (hand calculation: the mean of two neighbours cancels the swing).
	y := []float64{10, 14, 10, 14, 10, 14, 10, 14, 10, 14, 10, 14}
	f := mustFit(t, MovingAverage{}, y, 0)
	if f.Params[0].Value != 2 || !f.Params[0].Estimated {
		t.Errorf("width = %+v, want estimated 2", f.Params[0])
	}
}

func TestMovingAverageTooShort(t *testing.T) {
	_, err := MovingAverage{Width: 5}.Fit([]float64{1, 2, 3}, 0)
	if !errors.Is(err, ErrTooShort) {
		t.Errorf("error %v, want ErrTooShort", err)
	}
}
