package forecast

// etsVariance returns the forecast-error variance function of the
// state-space form of exponential smoothing with additive errors, or nil
// for a multiplicative season, which has no closed form here.
//
// The weighted-average recursion equals the innovations form with
// alpha_ETS = alpha, beta_ETS = alpha*beta and gamma_ETS = gamma (the level
// moves by alpha*e_t, the trend by alpha*beta*e_t and the seasonal state by
// gamma*e_t). The h-step variance is
//
//	sigma^2 * (1 + sum_{j=1}^{h-1} c_j^2),
//	c_j = alpha + alpha*beta*(phi + ... + phi^j) + gamma*[j is a multiple of m]
//
// with sigma^2 = SSE/n over all n one-step errors. Source: R. J. Hyndman,
// A. B. Koehler, J. K. Ord and R. D. Snyder, Forecasting with Exponential
// Smoothing: The State Space Approach (2008), chapter 6, section 6.1 and
// table 6.1 (class 1 models).
func etsVariance(form esForm, p [nConst]float64, sigma2 float64) func(h int) ([]float64, bool) {
	if form.season == Multiplicative {
		return nil
	}
	alpha, beta, gamma, phi := p[iAlpha], p[iBeta], p[iGamma], p[iPhi]
	return func(h int) ([]float64, bool) {
		v := make([]float64, h)
		sum, trendSum, pk := 0.0, 0.0, 1.0
		for i := range v {
			v[i] = sigma2 * (1 + sum)
			j := i + 1 // c_j for the next horizon
			c := alpha
			if form.trend {
				pk *= phi
				trendSum += pk
				c += alpha * beta * trendSum
			}
			if form.season != NoSeason && j%form.m == 0 {
				c += gamma
			}
			sum += c * c
		}
		return v, true
	}
}
