package diagnose

import (
	"fmt"
	"math"
	"strings"
)

// Assumes states what a forecasting method takes for granted about a
// series, so that [Check] can say when the data contradict it. The zero
// value assumes nothing.
type Assumes struct {
	// Name is the method as the reader should meet it mid-sentence, for
	// example "a moving average" or "simple exponential smoothing"; empty
	// means "this method".
	Name     string
	NoTrend  bool // the method cannot follow a trend (mean, naive, moving average, simple smoothing)
	NoSeason bool // the method cannot follow a season
	Positive bool // the method needs values above zero (a multiplicative season, a log scale)
}

func (a Assumes) name() string {
	if a.Name == "" {
		return "this method"
	}
	return a.Name
}

// StrongSeason is the seasonal strength (see [SeasonalStrength]) from which
// [Check] counts a series as seasonal even when the autocorrelation test of
// [SeasonalityTest] does not (it has little power on short series with a
// smooth season or a strong trend). The value 0.64 is the threshold for a
// seasonal difference in R. J. Hyndman and G. Athanasopoulos, Forecasting:
// Principles and Practice, 3rd ed. (2021), section 9.1 (from memory).
const StrongSeason = 0.64

// strengthEnough reports whether n values with the given season are enough
// for [Check] to use the seasonal strength as evidence: at least 4 full
// seasons and at least 20 values. On fewer, the classical indices absorb
// much of the noise. In 400 seeded series of Gaussian noise (regression
// values: our own simulation) the strength read 0.64 or more at this
// minimum in 7 (season 2, 20 values), 9 (season 4, 20 values), 11 (season
// 7, 28 values) and 1 (season 12, 48 values) of them; with 3 full seasons
// of 12, in 74.
func strengthEnough(n, season int) bool {
	return n >= 4*season && n >= 20
}

// Check tests a series for what forecasting methods commonly assume and
// returns its findings in a fixed order: gaps, zero or negative values, a
// constant series (after which nothing else is tested), trend, season. A
// finding is a [Warning] when the data contradict assumes, an [Info]
// otherwise.
//
// The trend test is [MannKendall] on the finite values, or
// [SeasonalKendall] when a season is found; the season checks
// (for season of 2 or more, on more than two full seasons without gaps) are
// [SeasonalityTest] at lag season and [SeasonalStrength] of the additive
// [Decompose]; either the test, or a strength of at least [StrongSeason] on
// four full seasons and 20 values or more, counts as a season. A test counts as evidence when its p-value is below
// [Significance]. Check never fails: what it cannot test it says, with the
// reason.
func Check(y []float64, season int, assumes Assumes) []Finding {
	var out []Finding
	finite := make([]float64, 0, len(y))
	gaps, firstGap := 0, 0
	for i, v := range y {
		if isFinite(v) {
			finite = append(finite, v)
			continue
		}
		if gaps == 0 {
			firstGap = i + 1
		}
		gaps++
	}
	if gaps > 0 {
		unchecked := ""
		if season >= 2 {
			unchecked = ", and the season is not checked"
		}
		out = append(out, Finding{Severity: Warning, Topic: TopicGaps,
			Text: fmt.Sprintf("The series has %s with no usable number (the first at period %d): the checks below leave %s out%s.",
				counted(gaps, "period", "periods"), firstGap, plural(gaps, "it", "them"), unchecked),
			Evidence: fmt.Sprintf("%d of %d periods %s missing or infinite", gaps, len(y), plural(gaps, "is", "are"))})
	}
	if len(finite) == 0 {
		return append(out, Finding{Severity: Info, Topic: TopicLength,
			Text:     "The series has no values to check.",
			Evidence: fmt.Sprintf("n = %d", len(y))})
	}
	if f, ok := signFinding(finite, assumes); ok {
		out = append(out, f)
	}
	if c, ok := constantValue(finite); ok {
		return append(out, Finding{Severity: Info, Topic: TopicConstant,
			Text:     fmt.Sprintf("The series is constant (every value is %s): it has no trend or season to follow, and MASE cannot be scaled on it.", num(c)),
			Evidence: fmt.Sprintf("n = %d, all values equal", len(finite))})
	}
	var seasonal Finding
	step := 1
	if season >= 2 && gaps == 0 {
		var found bool
		seasonal, found = seasonFinding(y, season, assumes)
		if found {
			step = season
		}
	}
	out = append(out, trendFinding(finite, step, assumes))
	if seasonal.Text != "" {
		out = append(out, seasonal)
	}
	return out
}

// constantValue reports whether every value of y equals the first.
func constantValue(y []float64) (float64, bool) {
	for _, v := range y[1:] {
		if v != y[0] {
			return 0, false
		}
	}
	return y[0], true
}

func signFinding(y []float64, assumes Assumes) (Finding, bool) {
	zeros, negatives := 0, 0
	for _, v := range y {
		switch {
		case v == 0:
			zeros++
		case v < 0:
			negatives++
		}
	}
	if zeros+negatives == 0 {
		return Finding{}, false
	}
	var parts []string
	if negatives > 0 {
		parts = append(parts, counted(negatives, "negative value", "negative values"))
	}
	if zeros > 0 {
		parts = append(parts, counted(zeros, "zero value", "zero values"))
	}
	what := strings.Join(parts, " and ")
	f := Finding{Severity: Info, Topic: TopicSign,
		Evidence: fmt.Sprintf("%d zero and %d negative of %d values", zeros, negatives, len(y))}
	mape := ""
	if zeros > 0 {
		mape = " MAPE and MPE are undefined for any period whose actual value is zero."
	}
	if assumes.Positive {
		f.Severity = Warning
		f.Text = fmt.Sprintf("The series has %s: %s needs values above zero and cannot be used on it.%s", what, assumes.name(), mape)
	} else {
		f.Text = fmt.Sprintf("The series has %s: a multiplicative season cannot be used.%s", what, mape)
	}
	return f, true
}

// trendFinding tests y for a trend: by the seasonal Kendall test within
// each of step season positions when step > 1, by Mann-Kendall otherwise.
func trendFinding(y []float64, step int, assumes Assumes) Finding {
	test := "Mann-Kendall"
	mk, err := MannKendall(y)
	if step > 1 {
		test = "seasonal Kendall test"
		mk, err = SeasonalKendall(y, step)
	}
	if err != nil {
		return Finding{Severity: Info, Topic: TopicTrend,
			Text:     fmt.Sprintf("The trend could not be tested: %s.", strings.TrimSuffix(err.Error(), ".")),
			Evidence: fmt.Sprintf("n = %d", len(y))}
	}
	evidence := fmt.Sprintf("Mann-Kendall S = %.0f, Z = %s, %s, n = %d; Sen's slope %s a period",
		mk.S, num(mk.Z), formatP(mk.P), mk.N, num(mk.Slope))
	if step > 1 {
		evidence = fmt.Sprintf("seasonal Kendall test within each of the %d season positions (the season makes the plain test unreliable): S = %.0f, Z = %s, %s, n = %d; seasonal Sen's slope %s a period",
			step, mk.S, num(mk.Z), formatP(mk.P), mk.N, num(mk.Slope))
	}
	if mk.N < 10 {
		evidence += " (fewer than 10 values: the p-value is rough)"
	}
	if !(mk.P < Significance) || mk.Slope == 0 {
		return Finding{Severity: Info, Topic: TopicTrend,
			Text:     fmt.Sprintf("The series shows no clear trend (%s %s).", test, formatP(mk.P)),
			Evidence: evidence}
	}
	verb, miss := "rises", "under-forecast"
	if mk.Slope < 0 {
		verb, miss = "falls", "over-forecast"
	}
	size := rough(math.Abs(mk.Slope))
	if level := meanOf(y); allPositive(y) && level > 0 {
		size = rough(100*math.Abs(mk.Slope)/level) + "%"
	}
	text := fmt.Sprintf("The series %s by about %s a period (%s %s)", verb, size, test, formatP(mk.P))
	if assumes.NoTrend {
		return Finding{Severity: Warning, Topic: TopicTrend, Evidence: evidence,
			Text: fmt.Sprintf("%s: %s assumes no trend, lags behind it and will %s.", text, assumes.name(), miss)}
	}
	return Finding{Severity: Info, Topic: TopicTrend, Text: text + ".", Evidence: evidence}
}

// seasonFinding checks y for a season and reports whether it found one.
func seasonFinding(y []float64, season int, assumes Assumes) (Finding, bool) {
	if len(y) <= 2*season {
		return Finding{Severity: Info, Topic: TopicSeason,
			Text: fmt.Sprintf("The series is too short to check a season of %d periods: that needs more than two full seasons (%d values); it has %d.",
				season, 2*season+1, len(y)),
			Evidence: fmt.Sprintf("n = %d, season %d", len(y), season)}, false
	}
	tested, stat := SeasonalityTest(y, season)
	var strength float64
	if d, err := Decompose(y, season, Additive); err == nil {
		strength = SeasonalStrength(d)
	}
	rule := fmt.Sprintf("%.2f or more counts as seasonal", StrongSeason)
	enough := strengthEnough(len(y), season)
	if !enough {
		rule = "not used with fewer than 4 full seasons or 20 values, where it reads high even on noise"
	}
	seasonal := tested || (enough && strength >= StrongSeason)
	evidence := fmt.Sprintf("seasonality test at lag %d: |r_%d| is %s times its 90%% bound; seasonal strength %.2f (classical additive decomposition; %s), n = %d",
		season, season, num(stat), strength, rule, len(y))
	if !seasonal {
		return Finding{Severity: Info, Topic: TopicSeason, Evidence: evidence,
			Text: fmt.Sprintf("The series shows no clear pattern repeating every %d periods.", season)}, false
	}
	text := fmt.Sprintf("A pattern repeating every %d periods accounts for %s of the variation around the trend (seasonal strength %.2f)",
		season, percent(strength), strength)
	if assumes.NoSeason {
		return Finding{Severity: Warning, Topic: TopicSeason, Evidence: evidence,
			Text: fmt.Sprintf("%s: %s cannot follow a season and will miss its peaks and troughs.", text, assumes.name())}, true
	}
	return Finding{Severity: Info, Topic: TopicSeason, Text: text + ".", Evidence: evidence}, true
}

func meanOf(y []float64) float64 {
	var s float64
	for _, v := range y {
		s += v
	}
	return s / float64(len(y))
}

func allPositive(y []float64) bool {
	for _, v := range y {
		if !(v > 0) {
			return false
		}
	}
	return true
}
