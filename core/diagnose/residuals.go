package diagnose

import (
	"fmt"
	"math"

	"gonum.org/v1/gonum/stat/distuv"
)

// ResidualLag returns the largest lag at which [CheckResiduals] tests n
// residuals: min(10, n/5) without a season and min(2×season, n/5) with one,
// and at least 1.
//
// Reference: R. J. Hyndman and G. Athanasopoulos, Forecasting: Principles
// and Practice, 2nd ed. (2018), section 3.3 "Residual diagnostics".
func ResidualLag(n, season int) int {
	h := 10
	if season >= 2 {
		h = 2 * season
	}
	return max(1, min(h, n/5))
}

// CheckResiduals looks at the one-step residuals (actual minus fitted) of a
// forecasting method on its training data and returns its findings: whether
// they look like noise ([LjungBox] at lag [ResidualLag]) and whether they
// average zero (a t-test on their mean). fitted is the number of parameters
// the method estimated; when it leaves at least one degree of freedom it is
// subtracted from the Ljung-Box degrees of freedom, otherwise none is.
//
// NaN or infinite residuals (the first periods of a method that needs some
// history, say) are left out and counted in the evidence. Residuals that
// fail a test at [Significance] give a [Warning]: the method leaves a
// pattern unexplained, or runs too high or too low on average.
func CheckResiduals(residuals []float64, season, fitted int) []Finding {
	r := make([]float64, 0, len(residuals))
	for _, v := range residuals {
		if isFinite(v) {
			r = append(r, v)
		}
	}
	left := len(residuals) - len(r)
	skipped := ""
	if left > 0 {
		skipped = fmt.Sprintf("; %s without a residual left out", counted(left, "period", "periods"))
	}
	n := len(r)
	if n < 3 {
		return []Finding{{Severity: Info, Topic: TopicLength,
			Text:     fmt.Sprintf("There are %s, too few to check (at least 3 are needed).", counted(n, "residual", "residuals")),
			Evidence: fmt.Sprintf("n = %d%s", n, skipped)}}
	}
	if c, ok := constantValue(r); ok {
		return []Finding{{Severity: Info, Topic: TopicConstant,
			Text:     fmt.Sprintf("Every residual is %s: the method reproduces the training data exactly, so there is no error left to check.", num(c)),
			Evidence: fmt.Sprintf("n = %d%s", n, skipped)}}
	}
	return []Finding{noiseFinding(r, season, fitted, skipped), biasFinding(r, skipped)}
}

func noiseFinding(r []float64, season, fitted int, skipped string) Finding {
	n := len(r)
	h := ResidualLag(n, season)
	note := ""
	if fitted < 0 || h-fitted < 1 {
		if fitted > 0 {
			note = fmt.Sprintf(" (no correction for the %d fitted parameters: too few lags)", fitted)
		}
		fitted = 0
	}
	lb, err := LjungBox(r, h, fitted)
	if err != nil {
		return Finding{Severity: Info, Topic: TopicResiduals,
			Text:     fmt.Sprintf("The residuals could not be tested for a pattern: %s.", err),
			Evidence: fmt.Sprintf("n = %d%s", n, skipped)}
	}
	acf, _ := ACF(r, h)
	worst := 1
	for k := 2; k <= h; k++ {
		if math.Abs(acf[k]) > math.Abs(acf[worst]) {
			worst = k
		}
	}
	evidence := fmt.Sprintf("Ljung-Box Q = %s with %d degrees of freedom (lag %d, %d fitted %s)%s, %s, n = %d; largest autocorrelation r_%d = %.2f against the 95%% band ±%.2f%s",
		num(lb.Q), lb.DF, h, fitted, plural(fitted, "parameter", "parameters"), note, formatP(lb.P), n,
		worst, acf[worst], ACFBound(n), skipped)
	if lb.P < Significance {
		return Finding{Severity: Warning, Topic: TopicResiduals, Evidence: evidence,
			Text: fmt.Sprintf("The residuals are not like noise (Ljung-Box Q = %s at lag %d, %s): the method leaves a pattern unexplained, and its stated intervals are likely too narrow.",
				num(lb.Q), h, formatP(lb.P))}
	}
	return Finding{Severity: Info, Topic: TopicResiduals, Evidence: evidence,
		Text: fmt.Sprintf("The residuals look like noise (Ljung-Box Q = %s at lag %d, %s): no pattern is left unexplained at these lags.",
			num(lb.Q), h, formatP(lb.P))}
}

// biasFinding tests whether the residuals average zero with a one-sample
// t-test (Student 1908) on n-1 degrees of freedom.
func biasFinding(r []float64, skipped string) Finding {
	n := float64(len(r))
	mean := meanOf(r)
	var ss float64
	for _, v := range r {
		ss += (v - mean) * (v - mean)
	}
	se := math.Sqrt(ss / (n - 1) / n)
	tstat := mean / se
	if !isFinite(tstat) {
		return Finding{Severity: Info, Topic: TopicBias,
			Text:     "The mean of the residuals could not be tested: the residuals are too large to add up.",
			Evidence: fmt.Sprintf("n = %d%s", len(r), skipped)}
	}
	p := 2 * distuv.StudentsT{Mu: 0, Sigma: 1, Nu: n - 1}.Survival(math.Abs(tstat))
	evidence := fmt.Sprintf("mean residual %s, standard error %s, t = %s with %d degrees of freedom, %s%s",
		num(mean), num(se), num(tstat), len(r)-1, formatP(p), skipped)
	if p < Significance {
		way := "too low"
		if mean < 0 {
			way = "too high"
		}
		return Finding{Severity: Warning, Topic: TopicBias, Evidence: evidence,
			Text: fmt.Sprintf("The residuals average %s rather than 0 (t-test %s): the fitted values run %s on average.", num(mean), formatP(p), way)}
	}
	return Finding{Severity: Info, Topic: TopicBias, Evidence: evidence,
		Text: fmt.Sprintf("The residuals average about zero (mean %s, t-test %s): no sign of a bias.", num(mean), formatP(p))}
}
