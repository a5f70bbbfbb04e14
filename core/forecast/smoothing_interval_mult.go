package forecast

import (
	"fmt"
	"math"
)

// This file holds the forecast variance of Holt-Winters with a
// multiplicative season, read as the state-space model with multiplicative
// errors (class 3 of R. J. Hyndman, A. B. Koehler, J. K. Ord and R. D.
// Snyder, Forecasting with Exponential Smoothing (2008), chapter 6;
// R. J. Hyndman, A. B. Koehler, J. K. Ord and R. D. Snyder (2005),
// "Prediction intervals for exponential smoothing using two new classes of
// state space models", Journal of Forecasting 24(1), 17-37):
//
//	y_t = a_t s_{t-m} (1 + e_t),   a_t = l_{t-1} + phi*b_{t-1}
//	l_t = a_t (1 + alpha*e_t)
//	b_t = phi*b_{t-1} + alpha*beta*a_t*e_t
//	s_t = s_{t-m} (1 + gamma*e_t)
//
// with e_t independent, mean 0 and variance sigma^2. Its point forecasts
// are those of the weighted-average recursion (smoothing_recursion.go), so
// the fitted constants carry over; sigma^2 is estimated as the mean
// squared relative one-step error ((y_t - fitted_t)/fitted_t)^2 over the n
// training periods. This is an approximation: the constants were chosen by
// least squares, not by the likelihood of this model.
//
// The variance is derived here as follows (checked against a seeded
// simulation of the model in smoothing_interval_mult_test.go). Write
// mu_j = l_n + (phi + ... + phi^j) b_n for the non-seasonal j-step
// forecast and c_i = alpha + alpha*beta*(phi + ... + phi^i). Then exactly
// a_{n+h} = mu_h + sum_{j<h} c_{h-j} a_{n+j} e_{n+j}, so the second moment
// theta_h = E[a_{n+h}^2] follows the recursion of the non-seasonal class
// (the book's class 2):
//
//	theta_1 = mu_1^2,  theta_h = mu_h^2 + sigma^2 sum_{j=1}^{h-1} c_j^2 theta_{h-j}
//
// For h <= m the seasonal factor s is a known final state and
// v_h = s^2 [(1 + sigma^2) theta_h - mu_h^2] is exact. Further ahead the
// seasonal factor has been updated k = floor((h-1)/m) times by errors
// that also moved the level; the class 3 form
// s^2 [(1 + sigma^2)(1 + gamma^2 sigma^2)^k theta_h - mu_h^2] leaves out
// that covariance, which is of the same order as the variance itself, so
// its leading term is added:
//
//	v_h = s^2 [(1 + sigma^2)(1 + gamma^2 sigma^2)^k theta_h - mu_h^2
//	           + 2 gamma sigma^2 mu_h sum_{i=1}^{k} c_{im} mu_{h-im}]
//
// Terms of order sigma^4 in the covariance are left out; the simulation
// check holds the standard error within 3% for sigma up to 0.1.
func multSeasonVariance(form esForm, p [nConst]float64, last esStates, n int, rel2 float64) func(h int) ([]float64, bool) {
	alpha, gamma, phi := p[iAlpha], p[iGamma], p[iPhi]
	trendGain, b0 := alpha*p[iBeta], last.trend
	if !form.trend {
		trendGain, b0, phi = 0, 0, 1
	}
	m := form.m
	season := clone(last.season)
	return func(h int) ([]float64, bool) {
		mu := make([]float64, h+1)    // mu[j], j = 1..h
		c := make([]float64, h+1)     // c[i], i = 1..h
		theta := make([]float64, h+1) // theta[j], j = 1..h
		phiSum, pk := 0.0, 1.0
		for j := 1; j <= h; j++ {
			pk *= phi
			phiSum += pk
			mu[j] = last.level + phiSum*b0
			c[j] = alpha + trendGain*phiSum
		}
		v := make([]float64, h)
		for j := 1; j <= h; j++ {
			sum := 0.0
			for i := 1; i < j; i++ {
				sum += c[i] * c[i] * theta[j-i]
			}
			theta[j] = mu[j]*mu[j] + rel2*sum
			k := (j - 1) / m
			cross := 0.0
			for i := 1; i <= k; i++ {
				cross += c[i*m] * mu[j-i*m]
			}
			s := season[(n+j-1)%m]
			v[j-1] = s * s * ((1+rel2)*math.Pow(1+gamma*gamma*rel2, float64(k))*theta[j] - mu[j]*mu[j] + 2*gamma*rel2*mu[j]*cross)
		}
		return v, true
	}
}

// relativeSigma2 returns the mean squared relative one-step error
// ((y_t - fitted_t)/fitted_t)^2 over the n periods, and false when a
// fitted value is zero or the mean is not finite.
func relativeSigma2(y, fitted []float64) (float64, bool) {
	s := 0.0
	for t, v := range y {
		if fitted[t] == 0 {
			return 0, false
		}
		r := (v - fitted[t]) / fitted[t]
		s += r * r
	}
	s /= float64(len(y))
	return s, !math.IsNaN(s) && !math.IsInf(s, 0)
}

// multSeasonInterval sets the approximate interval of a multiplicative
// season (smoothing_interval_mult.go) and returns a note on it.
func multSeasonInterval(f *Fit, form esForm, p [nConst]float64, tr esTrace) string {
	rel2, ok := relativeSigma2(f.train, tr.fitted)
	if !ok {
		return "no analytic prediction interval: a fitted value is zero, so the relative errors cannot be formed; use empirical intervals from a backtest"
	}
	f.variance = multSeasonVariance(form, p, tr.last, f.N, rel2)
	f.Stats = append(f.Stats, Param{Name: "relative-sigma2", Value: rel2, Estimated: true})
	return fmt.Sprintf("the prediction interval is approximate: it treats each one-step error as a share of the forecast (relative standard error %.1f%%), so it widens with the level and the season", 100*math.Sqrt(rel2))
}
