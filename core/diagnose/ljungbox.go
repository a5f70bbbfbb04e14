package diagnose

import (
	"math"

	"gonum.org/v1/gonum/stat/distuv"
)

// Portmanteau is the result of a test that the autocorrelations of a series
// up to some lag are all zero, as they are for white noise.
type Portmanteau struct {
	Lag int     // largest lag tested, in periods
	DF  int     // degrees of freedom of the chi-square reference: Lag minus the fitted parameters
	Q   float64 // the test statistic
	P   float64 // probability of a Q at least this large if the series were white noise
}

// LjungBox tests whether y looks like white noise from its
// autocorrelations r_1 .. r_lag (see [ACF]):
//
//	Q = n(n+2) × sum_{k=1}^{lag} r_k² / (n-k)
//
// compared with a chi-square distribution with lag - fitted degrees of
// freedom. Use fitted = 0 for a series itself; for the residuals of a fitted
// model some texts subtract the number of estimated parameters (fitted), a
// correction that is exact for ARMA models only. A small P (below 0.05, say)
// says the series is not white noise: a forecasting method whose residuals
// fail the test leaves a pattern unexplained.
//
// It returns an [*InputError] when lag is below 1 or not below len(y), when
// lag - fitted is below 1, when fitted is negative, when a value is NaN or
// infinite, or when y is constant.
//
// Reference: G. M. Ljung and G. E. P. Box (1978), "On a measure of lack of
// fit in time series models", Biometrika 65(2), 297-303.
func LjungBox(y []float64, lag, fitted int) (Portmanteau, error) {
	return portmanteau(y, lag, fitted, func(n, k int) float64 {
		return float64(n) * float64(n+2) / float64(n-k)
	})
}

// BoxPierce is the earlier form of [LjungBox], Q = n × sum_{k=1}^{lag} r_k²,
// whose chi-square approximation is poorer in short series; it is given for
// comparison and has the same arguments and errors.
//
// Reference: G. E. P. Box and D. A. Pierce (1970), "Distribution of residual
// autocorrelations in autoregressive-integrated moving average time series
// models", Journal of the American Statistical Association 65(332),
// 1509-1526.
func BoxPierce(y []float64, lag, fitted int) (Portmanteau, error) {
	return portmanteau(y, lag, fitted, func(n, _ int) float64 { return float64(n) })
}

func portmanteau(y []float64, lag, fitted int, weight func(n, k int) float64) (Portmanteau, error) {
	if lag < 1 {
		return Portmanteau{}, inputErr(ErrBadLag, 0, "a white-noise test needs a largest lag of at least 1; %d was given", lag)
	}
	if fitted < 0 || lag-fitted < 1 {
		return Portmanteau{}, inputErr(ErrBadLag, 0,
			"a white-noise test at lag %d with %d fitted parameters leaves no degrees of freedom; test at a lag above %d",
			lag, fitted, fitted)
	}
	r, err := ACF(y, lag)
	if err != nil {
		return Portmanteau{}, err
	}
	n := len(y)
	var q float64
	for k := 1; k <= lag; k++ {
		q += weight(n, k) * r[k] * r[k]
	}
	df := lag - fitted
	p := distuv.ChiSquared{K: float64(df)}.Survival(q)
	if math.IsNaN(p) {
		p = 0
	}
	return Portmanteau{Lag: lag, DF: df, Q: q, P: p}, nil
}
