package forecast

import (
	"fmt"
	"math"

	"gonum.org/v1/gonum/stat/distuv"
)

// Forecast returns the point forecasts for horizons 1..h, oldest first.
// It returns nil when h is less than 1.
func (f *Fit) Forecast(h int) []float64 {
	if h < 1 || f.path == nil {
		return nil
	}
	return f.path(h)
}

// Residuals returns the in-sample one-step errors y[t] - Fitted[t] of the
// training series, length N. A position where the method has no fitted
// value yet is NaN.
func (f *Fit) Residuals() []float64 {
	if len(f.train) != f.N || len(f.Fitted) != f.N {
		return nil
	}
	r := make([]float64, f.N)
	for t, v := range f.train {
		r[t] = v - f.Fitted[t]
	}
	return r
}

// Sigma2 returns the one-step error variance behind the analytic
// prediction intervals and whether the method estimated one. Its divisor
// follows each method's convention (stated on the method's type). For
// Holt-Winters with a multiplicative season it is still SSE/n, but the
// interval uses the relative variance in Stats ("relative-sigma2").
func (f *Fit) Sigma2() (float64, bool) {
	return f.sigma2, f.hasSigma2
}

// HasInterval reports whether the fit has an analytic prediction interval.
func (f *Fit) HasInterval() bool {
	if f.bounds != nil {
		return true
	}
	if f.variance == nil {
		return false
	}
	_, ok := f.variance(1)
	return ok
}

// Interval returns the analytic prediction interval for horizons 1..h at
// the given coverage level, strictly between 0 and 1 (0.8 or 0.95, say).
//
// The bounds are point forecast -/+ q times the forecast standard error,
// where q is the standard normal quantile at (1+level)/2, or the Student t
// quantile for the mean and regression methods. It returns an error when
// the level or horizon is out of range, and an error wrapping
// [ErrNoInterval] when the method has no analytic formula (the moving
// average, combinations, differenced series): the caller then uses
// empirical intervals from rolling-origin errors.
func (f *Fit) Interval(h int, level float64) (lo, hi []float64, err error) {
	if !(level > 0 && level < 1) {
		return nil, nil, fmt.Errorf("interval level %g is out of range; write a coverage between 0 and 1 such as 0.8 or 0.95", level)
	}
	if h < 1 {
		return nil, nil, fmt.Errorf("interval horizon %d is too short; ask for at least 1 period", h)
	}
	none := &Error{Cause: ErrNoInterval, Msg: fmt.Sprintf("%s has no analytic prediction interval; use empirical intervals from a backtest instead", f.Method)}
	if f.bounds != nil {
		lo, hi, ok := f.bounds(h, level)
		if !ok || !allFinite(lo) || !allFinite(hi) {
			return nil, nil, none
		}
		return lo, hi, nil
	}
	if f.variance == nil {
		return nil, nil, none
	}
	v, ok := f.variance(h)
	if !ok {
		return nil, nil, none
	}
	q := quantile(level, f.df)
	point := f.Forecast(h)
	lo = make([]float64, h)
	hi = make([]float64, h)
	for i := range h {
		w := q * math.Sqrt(math.Max(v[i], 0))
		lo[i] = point[i] - w
		hi[i] = point[i] + w
		if math.IsNaN(lo[i]) || math.IsInf(lo[i], 0) || math.IsNaN(hi[i]) || math.IsInf(hi[i], 0) {
			return nil, nil, none
		}
	}
	return lo, hi, nil
}

// quantile returns the upper (1+level)/2 quantile of the standard normal
// distribution, or of Student's t with df degrees of freedom when df > 0.
func quantile(level, df float64) float64 {
	p := (1 + level) / 2
	if df > 0 {
		return distuv.StudentsT{Mu: 0, Sigma: 1, Nu: df}.Quantile(p)
	}
	return distuv.UnitNormal.Quantile(p)
}

// allFinite reports whether every value of v is a finite number.
func allFinite(v []float64) bool {
	for _, x := range v {
		if math.IsNaN(x) || math.IsInf(x, 0) {
			return false
		}
	}
	return true
}
