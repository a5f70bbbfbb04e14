package diagnose

import (
	"flag"
	"fmt"
	"math"
	"math/rand/v2"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"quillcast/core/internal/refdata"
)

var update = flag.Bool("update", false, "rewrite the golden files in testdata")

// movingAverage is what a trailing moving average assumes.
var movingAverage = Assumes{Name: "a moving average", NoTrend: true, NoSeason: true}

func noiseSeries(n int, level float64, seed uint64) []float64 {
	rng := rand.New(rand.NewPCG(seed, 3))
	y := make([]float64, n)
	for i := range y {
		y[i] = level + 10*rng.NormFloat64()
	}
	return y
}

// loadCaseSeries reads data.y of a reference case.
func loadCaseSeries(t *testing.T, name string) []float64 {
	t.Helper()
	var c struct {
		Data struct {
			Y []float64 `json:"y"`
		} `json:"data"`
	}
	refdata.ReadJSON(t, "reference/cases/"+name+".json", &c)
	return c.Data.Y
}

type checkCase struct {
	name    string
	y       []float64
	season  int
	assumes Assumes
	want    []string // "severity topic: text fragment", in order
}

func checkCases() []checkCase {
	falling := seasonalSeries(60, 1, 4)
	for i := range falling {
		falling[i] = 500 - 3*float64(i) + falling[i] - 200
	}
	zeros := noiseSeries(40, 60, 6)
	zeros[3], zeros[17], zeros[30] = 0, 0, 0
	gaps := seasonalSeries(48, 12, 8)
	gaps[6], gaps[20] = math.NaN(), math.Inf(1)
	return []checkCase{
		{"rising seasonal under a moving average", seasonalSeries(96, 12, 2), 12, movingAverage, []string{
			"warning trend: The series rises by about", "(seasonal Kendall test p < 0.001)",
			"a moving average assumes no trend, lags behind it and will under-forecast.",
			"warning season: A pattern repeating every 12 periods accounts for", "a moving average cannot follow a season"}},
		{"rising seasonal, method follows both", seasonalSeries(96, 12, 2), 12, Assumes{Name: "Holt-Winters"}, []string{
			"info trend: The series rises by about", "info season: A pattern repeating every 12 periods"}},
		{"noise", noiseSeries(80, 100, 1), 12, movingAverage, []string{
			"info trend: The series shows no clear trend", "info season: The series shows no clear pattern repeating every 12 periods"}},
		{"falling", falling, 0, Assumes{NoTrend: true}, []string{
			"warning trend: The series falls by about", "this method assumes no trend, lags behind it and will over-forecast."}},
		{"zeros under a positive method", zeros, 0, Assumes{Name: "multiplicative Holt-Winters", Positive: true}, []string{
			"warning sign: The series has 3 zero values: multiplicative Holt-Winters needs values above zero",
			"MAPE and MPE are undefined", "info trend:"}},
		{"negative values", []float64{-2, 3, 0, 5, 4, 6, 5, 8}, 0, Assumes{}, []string{
			"info sign: The series has 1 negative value and 1 zero value: a multiplicative season cannot be used.",
			"info trend: The series rises by about", "Sen's slope", "the p-value is rough"}},
		{"constant", []float64{5, 5, 5, 5, 5, 5}, 4, movingAverage, []string{
			"info constant: The series is constant (every value is 5)"}},
		{"gaps", gaps, 12, movingAverage, []string{
			"warning gaps: The series has 2 periods with no usable number (the first at period 7)", "trend:"}},
		{"empty", nil, 12, movingAverage, []string{"info length: The series has no values to check."}},
		{"all zero under a positive method", []float64{0, 0, 0, 0, 0}, 0, Assumes{Positive: true}, []string{
			"warning sign: The series has 5 zero values: this method needs values above zero",
			"info constant: The series is constant (every value is 0)"}},
		{"gap without a season", []float64{1, 2, math.NaN(), 4, 5}, 0, Assumes{}, []string{
			"warning gaps: The series has 1 period with no usable number (the first at period 3): the checks below leave it out.",
			"info trend:"}},
		{"two values", []float64{1, 2}, 0, movingAverage, []string{
			"info trend: The trend could not be tested: a trend test needs at least 3 values; the series has 2."}},
		{"three seasons of noise", noiseSeries(36, 100, 3), 12, movingAverage, []string{
			"info season: The series shows no clear pattern repeating every 12 periods.",
			"not used with fewer than 4 full seasons or 20 values"}},
		{"too short for the season", noiseSeries(20, 50, 2), 12, movingAverage, []string{
			"info trend:", "info season: The series is too short to check a season of 12 periods: that needs more than two full seasons (25 values); it has 20."}},
	}
}

// render writes findings one per line for comparison and golden files.
func render(fs []Finding) string {
	var b strings.Builder
	for _, f := range fs {
		fmt.Fprintf(&b, "%s %s: %s\n    evidence: %s\n", f.Severity, f.Topic, f.Text, f.Evidence)
	}
	return b.String()
}

// requireInOrder checks that each fragment appears in text after the
// previous one.
func requireInOrder(t *testing.T, text string, want []string) {
	t.Helper()
	rest := text
	for _, w := range want {
		i := strings.Index(rest, w)
		if i < 0 {
			t.Errorf("findings lack %q (in order); got:\n%s", w, text)
			return
		}
		rest = rest[i+len(w):]
	}
}

func TestCheck(t *testing.T) {
	t.Parallel()
	for _, tc := range checkCases() {
		t.Run(tc.name, func(t *testing.T) {
			t.Parallel()
			requireInOrder(t, render(Check(tc.y, tc.season, tc.assumes)), tc.want)
		})
	}
}

// TestCheckReferenceData runs the checks on two published series whose
// patterns are well known: the Eurostat electrical equipment turnover index
// (monthly, not seasonally adjusted, so seasonal by construction: common
// practice) and the Nile flow at Aswan, whose level dropped around 1898
// (Cobb 1978, Biometrika 65(2), 243-251), so that it falls overall.
func TestCheckReferenceData(t *testing.T) {
	t.Parallel()
	elec := loadCaseSeries(t, "decompose_additive_elec")
	requireInOrder(t, render(Check(elec, 12, movingAverage)), []string{
		"warning season: A pattern repeating every 12 periods", "a moving average cannot follow a season"})
	nile := loadCaseSeries(t, "acf_ljungbox_nile")
	requireInOrder(t, render(Check(nile, 0, movingAverage)), []string{
		"warning trend: The series falls by about", "will over-forecast"})
}

type residualCase struct {
	name   string
	r      []float64
	season int
	fitted int
	want   []string
}

func residualCases(t *testing.T) []residualCase {
	var ses, diff acfCase
	refdata.ReadJSON(t, "reference/cases/acf_ljungbox_nile_ses_residuals.json", &ses)
	refdata.ReadJSON(t, "reference/cases/acf_ljungbox_nile_diff1.json", &diff)
	biased := noiseSeries(60, 5, 9)
	leading := append([]float64{math.NaN(), math.NaN()}, noiseSeries(40, 0, 10)...)
	return []residualCase{
		// statsmodels 0.13.5 acorr_ljungbox in acf_ljungbox_nile_ses_residuals:
		// Q = 13.378, p = 0.2033 at lag 10 (n = 99 gives lag min(10, 19) = 10).
		{"nile ses residuals", ses.InputSeries, 0, 0, []string{
			"info residuals: The residuals look like noise (Ljung-Box Q = 13.4 at lag 10, p = 0.203)", "info bias:"}},
		// The same case file's series for the first differences, the naive
		// method's residuals: p = 0.0008 at lag 10.
		{"nile naive residuals", diff.InputSeries, 0, 0, []string{
			"warning residuals: The residuals are not like noise (Ljung-Box Q = ", "at lag 10, p < 0.001): the method leaves a pattern unexplained"}},
		{"biased", biased, 0, 1, []string{"info residuals:", "warning bias: The residuals average 5.", "run too low on average"}},
		{"leading gaps", leading, 12, 2, []string{"lag 8, 2 fitted parameters", "2 periods without a residual left out"}},
		{"no degrees of freedom left", noiseSeries(10, 0, 11), 0, 5, []string{"(lag 2, 0 fitted parameters) (no correction for the 5 fitted parameters: too few lags)"}},
		{"constant", []float64{0, 0, 0, 0}, 0, 0, []string{"info constant: Every residual is 0"}},
		{"too few", []float64{math.NaN(), 1, 2}, 0, 0, []string{"info length: There are 2 residuals, too few to check"}},
		{"empty", nil, 4, 0, []string{"There are 0 residuals"}},
	}
}

func TestCheckResiduals(t *testing.T) {
	t.Parallel()
	for _, tc := range residualCases(t) {
		t.Run(tc.name, func(t *testing.T) {
			requireInOrder(t, render(CheckResiduals(tc.r, tc.season, tc.fitted)), tc.want)
		})
	}
}

func TestResidualLag(t *testing.T) {
	t.Parallel()
	// Rule of Hyndman and Athanasopoulos (2018), section 3.3.
	for _, tc := range []struct{ n, season, want int }{
		{100, 0, 10}, {30, 1, 6}, {100, 12, 20}, {200, 12, 24}, {3, 4, 1},
	} {
		if got := ResidualLag(tc.n, tc.season); got != tc.want {
			t.Errorf("ResidualLag(%d, %d) = %d, want %d", tc.n, tc.season, got, tc.want)
		}
	}
}

// TestFindingsGolden keeps the full text of every finding above in
// testdata/findings.golden (regression values: our own past output,
// rewritten with go test -update).
func TestFindingsGolden(t *testing.T) {
	var b strings.Builder
	for _, tc := range checkCases() {
		fmt.Fprintf(&b, "## Check: %s\n%s\n", tc.name, render(Check(tc.y, tc.season, tc.assumes)))
	}
	for _, tc := range residualCases(t) {
		fmt.Fprintf(&b, "## CheckResiduals: %s\n%s\n", tc.name, render(CheckResiduals(tc.r, tc.season, tc.fitted)))
	}
	got := b.String()
	path := filepath.Join("testdata", "findings.golden")
	if *update {
		if err := os.WriteFile(path, []byte(got), 0o644); err != nil {
			t.Fatal(err)
		}
	}
	want, err := os.ReadFile(path)
	if err != nil {
		t.Fatalf("%v (run go test -update to create it)", err)
	}
	if got != string(want) {
		t.Errorf("findings differ from %s (run go test -update after checking the change):\n%s", path, got)
	}
}

func TestSeverityString(t *testing.T) {
	t.Parallel()
	for s, want := range map[Severity]string{Info: "info", Warning: "warning", Severity(0): "unknown"} {
		if got := s.String(); got != want {
			t.Errorf("Severity(%d) = %q, want %q", int(s), got, want)
		}
	}
}

func TestNum(t *testing.T) {
	t.Parallel()
	for _, tc := range []struct {
		v    float64
		want string
	}{{2.134, "2.13"}, {41.23, "41.2"}, {812.4, "812"}, {12345.6, "12346"}, {0.005214, "0.00521"}, {-6.314, "-6.31"}, {0, "0"}, {3e-9, "3e-09"}, {5, "5"}, {2.1, "2.1"}, {-0.0920, "-0.092"}, {100, "100"}} {
		if got := num(tc.v); got != tc.want {
			t.Errorf("num(%v) = %q, want %q", tc.v, got, tc.want)
		}
	}
	for _, tc := range []struct {
		v    float64
		want string
	}{{0.196, "0.2"}, {2.134, "2.1"}, {41.23, "41"}, {812.4, "810"}, {-0.0575, "-0.058"}, {0, "0"}, {99.7, "100"}, {5e-324, "4.94e-324"}, {3e20, "3e+20"}} {
		if got := rough(tc.v); got != tc.want {
			t.Errorf("rough(%v) = %q, want %q", tc.v, got, tc.want)
		}
	}
	if formatP(0.0004) != "p < 0.001" || formatP(0.0412) != "p = 0.041" {
		t.Errorf("formatP: %q, %q", formatP(0.0004), formatP(0.0412))
	}
}

func BenchmarkCheck(b *testing.B) {
	for _, size := range benchSizes {
		y := seasonalSeries(size.n, 12, 1)
		b.Run(size.name, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				Check(y, 12, movingAverage)
			}
		})
	}
}

func BenchmarkCheckResiduals(b *testing.B) {
	for _, size := range benchSizes {
		r := noiseSeries(size.n, 0, 1)
		b.Run(size.name, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				CheckResiduals(r, 12, 3)
			}
		})
	}
}
