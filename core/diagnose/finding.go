package diagnose

import (
	"fmt"
	"math"
	"strconv"
	"strings"
)

// Significance is the p-value below which a test counts as evidence in the
// findings of [Check] and [CheckResiduals] (common practice).
const Significance = 0.05

// Severity says how much a [Finding] matters to the forecast.
type Severity int

// The severities of a finding.
const (
	// Info states a property of the data that the forecast respects or
	// that the reader should know.
	Info Severity = iota + 1
	// Warning says the data contradict what a method assumes, or the
	// residuals show it missed something.
	Warning
)

// String returns "info" or "warning".
func (s Severity) String() string {
	switch s {
	case Info:
		return "info"
	case Warning:
		return "warning"
	}
	return "unknown"
}

// Topics of a finding, for callers that group or filter them.
const (
	TopicGaps      = "gaps"      // missing or infinite values
	TopicConstant  = "constant"  // the series does not vary
	TopicTrend     = "trend"     // trend test
	TopicSeason    = "season"    // seasonality test and seasonal strength
	TopicSign      = "sign"      // zero or negative values
	TopicLength    = "length"    // too short for a check
	TopicResiduals = "residuals" // residual autocorrelation
	TopicBias      = "bias"      // mean of the residuals
)

// Finding is one plain-words statement about a series or a forecast's
// residuals, with the evidence behind it, for the page and the memo.
type Finding struct {
	Severity Severity
	Topic    string // one of the Topic constants
	// Text is one or two sentences for a forecaster's client, e.g. "The
	// series rises by about 2.1% a period (Mann-Kendall p < 0.001): a
	// moving average assumes no trend, lags behind it and will
	// under-forecast."
	Text string
	// Evidence gives the test and its figures, e.g. "Mann-Kendall S = 812,
	// Z = 6.31, p < 0.001, n = 48; Sen's slope 2.4 a period".
	Evidence string
}

// formatP writes a p-value as "p < 0.001" or "p = 0.041".
func formatP(p float64) string {
	if p < 0.001 {
		return "p < 0.001"
	}
	return "p = " + strconv.FormatFloat(p, 'f', 3, 64)
}

// num writes v to three significant figures without an exponent for
// ordinary magnitudes and without trailing zeros: 2.13, 41.2, 812, 0.00521,
// 5, 2.1.
func num(v float64) string {
	if v == 0 || math.IsNaN(v) || math.IsInf(v, 0) {
		return strconv.FormatFloat(v, 'g', -1, 64)
	}
	a := math.Abs(v)
	if a >= 1e15 || a < 1e-6 {
		return strconv.FormatFloat(v, 'g', 3, 64)
	}
	digits := max(0, 2-int(math.Floor(math.Log10(a))))
	out := strconv.FormatFloat(v, 'f', digits, 64)
	if strings.Contains(out, ".") {
		out = strings.TrimRight(strings.TrimRight(out, "0"), ".")
	}
	return out
}

// rough writes v to two significant figures for "about" in a sentence:
// 0.2, 2.1, 41, 810.
func rough(v float64) string {
	if v == 0 || !isFinite(v) {
		return num(v)
	}
	k := math.Pow(10, math.Floor(math.Log10(math.Abs(v)))-1)
	if !(k > 0) || math.IsInf(k, 0) || math.Abs(v) < 1e-6 || math.Abs(v) >= 1e15 {
		return num(v)
	}
	if k >= 1 {
		return strconv.FormatFloat(math.Round(v/k)*k, 'f', 0, 64)
	}
	return num(math.Round(v/k) * k)
}

// percent writes a share of 0..1 as a whole percentage: "64%".
func percent(share float64) string {
	return fmt.Sprintf("%.0f%%", 100*share)
}

// counted writes "1 value" or "3 values".
func counted(n int, one, many string) string {
	return fmt.Sprintf("%d %s", n, plural(n, one, many))
}
