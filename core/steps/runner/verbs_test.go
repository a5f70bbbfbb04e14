package runner

import (
	"fmt"
	"strings"
	"testing"

	"quillcast/core/series"
)

// testData are small invented files: a monthly series with trend and
// season, a flat one, one with a gap and a file of three shops in the long
// layout.
func testData() Data {
	var shops strings.Builder
	shops.WriteString("shop,month,units\n")
	for k, name := range []string{"North", "South", "East"} {
		for i := range 48 {
			v := 100 + 20*k + i + 15*((i%12)/6)
			fmt.Fprintf(&shops, "%s,%d-%02d,%d\n", name, 2021+i/12, i%12+1, v)
		}
	}
	lines := strings.Split(string(synthetic(36, 200, 1, 10)), "\n")
	lines[15] = "2021-03,NA" // the 15th month has no value
	gap := strings.Join(lines, "\n")
	return Data{Files: map[string][]byte{
		"orders.csv": synthetic(72, 500, 4, 80),
		"flat.csv":   synthetic(48, 100, 0, 0),
		"gaps.csv":   []byte(gap),
		"shops.csv":  []byte(shops.String()),
	}}
}

const base = "load orders.csv value=units date=month\nsplit last=12\n"

var verbTests = []struct {
	name     string
	body     string // steps; the last one is checked
	status   Status
	tables   int      // table exhibits expected
	charts   int      // chart exhibits expected
	contains []string // text the output must contain
}{
	{"memo sets the heading", `memo title="Orders" client="Wickery & Co."`, Done, 0, 0, []string{"title and client are set"}},
	{"load shows the data", "load orders.csv value=units date=month", Done, 1, 1, []string{"2020-01 to 2025-12", "72", "12 periods", "fingerprint"}},
	{"load names a missing file", "load nothing.csv", Failed, 0, 0, []string{`no file named "nothing.csv"`, "flat.csv, gaps.csv, orders.csv, shops.csv"}},
	{"load refuses gaps", "load gaps.csv", Failed, 0, 0, []string{"missing value", "fill=linear"}},
	{"load fills gaps on request", "load gaps.csv fill=linear", Done, 1, 1, []string{"Changed:"}},
	{"load picks a series of a long file", `load shops.csv series=South`, Done, 1, 1, []string{"series in the file | 3"}},
	{"split holds out the last year", base, Done, 0, 1, []string{"Training: 2020-01 to 2024-12 (60 periods)", "Validation (holdout): 2025-01 to 2025-12 (12 periods)"}},
	{"split from a period", "load orders.csv\nsplit from=2025-01", Done, 0, 1, []string{"Validation (holdout): 2025-01 to 2025-12"}},
	{"split sets earlier forecasts aside", "load orders.csv\nforecast naive horizon=3\nsplit last=12", Done, 0, 1, []string{"The 1 forecast made before this split is set aside"}},
	{"split too long", "load orders.csv\nsplit last=100", Failed, 0, 0, []string{"cannot hold out the last 100 periods"}},
	{"split from outside the series", "load orders.csv\nsplit from=2030-01", Failed, 0, 0, []string{"is not a period of the series"}},
	{"smooth centred over a season", "load orders.csv\nsmooth centered width=12", Done, 0, 1, []string{"season averages out"}},
	{"smooth trailing", "load orders.csv\nsmooth trailing width=3", Done, 0, 1, []string{"trailing average, width 3"}},
	{"smooth wider than the series", "load orders.csv\nsmooth centered width=500", Failed, 0, 0, []string{"longer than the series"}},
	{"moving average on trend and season", base + "forecast moving-average width=12 as=ma", Done, 2, 1, []string{"assumes no trend", "cannot follow a season", "Evidence:", "no formula for prediction intervals"}},
	{"holt-winters estimates its constants", base + "forecast holt-winters as=hw", Done, 2, 1, []string{"alpha", "estimated on the training period", "80% low", "95% high"}},
	{"forecast past the end without a split", "load orders.csv\nforecast naive horizon=6", Done, 1, 1, []string{"2026-01 to 2026-06"}},
	{"forecast on differences", base + "forecast ses difference=12 as=d12", Done, 2, 1, []string{"Forecast d12"}},
	{"forecast that cannot fit", "load flat.csv\nsplit last=40\nforecast holt-winters", Failed, 0, 0, []string{"could not be fitted on the training period"}},
	{"combine averages forecasts", base + "forecast naive\nforecast seasonal-naive\ncombine of=naive,seasonal-naive as=both", Done, 1, 1, []string{"both averages naive and seasonal-naive"}},
	{"evaluate with benchmarks", base + "forecast holt-winters as=hw\nevaluate by=mase", Done, 1, 2, []string{"MASE training", "MASE validation", "naive (benchmark)", "seasonal-naive (benchmark)", "Best on the validation period by MASE"}},
	{"sweep the moving-average width", base + "sweep moving-average width=2..12", Done, 1, 1, []string{"best on training", "chase noise"}},
	{"sweep a smoothing constant", base + "sweep ses alpha=0.1..0.9 step=0.2 by=mae", Done, 1, 1, []string{"0.900", "MAE training"}},
	{"backtest by horizon", base + "forecast seasonal-naive as=sn\nforecast moving-average width=3 as=ma\nbacktest origins=6 horizon=12", Done, 3, 2, []string{"Accuracy by horizon", "coverage", "too narrow", "empirical"}},
	{"difference twice", "load orders.csv\ndifference lag=12,1", Done, 0, 2, []string{"lag 12 and lag 1", "Ljung-Box"}},
	{"decompose multiplicative", "load orders.csv\ndecompose multiplicative", Done, 1, 1, []string{"Seasonal strength", "average 1"}},
	{"check the series", "load orders.csv\ncheck", Done, 0, 0, []string{"rises", "Kendall", "Evidence:"}},
	{"check a forecast's residuals", base + "forecast seasonal-naive as=sn\ncheck sn", Done, 0, 2, []string{"residuals"}},
	{"pick the best", base + "forecast naive\nforecast holt-winters as=hw\npick by=rmse", Done, 0, 0, []string{"Recommended: hw has the best RMSE"}},
	{"bake-off across shops", "load shops.csv\nbakeoff methods=naive,seasonal-naive,ses last=12", Done, 1, 0, []string{"Bake-off over 3 series", "wins by MASE"}},
	{"a step waits on a failed load", "load nothing.csv\nsplit last=3", Waiting, 0, 0, []string{"Waits on step 1, which failed"}},
	{"evaluate waits on a failed forecast", "load flat.csv\nsplit last=40\nforecast holt-winters as=hw\nevaluate", Waiting, 0, 0, []string{"Waits on step 3"}},
}

func TestVerbs(t *testing.T) {
	t.Parallel()
	data := testData()
	for _, tc := range verbTests {
		t.Run(tc.name, func(t *testing.T) {
			t.Parallel()
			res := run(tc.body, data)
			o := res.Outputs[len(res.Outputs)-1]
			text := blockTexts(o)
			if o.Error != nil {
				text += o.Error.Msg
			}
			if o.Status != tc.status {
				t.Fatalf("%q: status %s, want %s\n%s", tc.body, o.Status, tc.status, text)
			}
			tables, charts := 0, 0
			for _, b := range o.Blocks {
				switch b.Kind {
				case TableBlock:
					tables++
				case ChartBlock:
					charts++
					if !strings.HasPrefix(b.SVG, "<svg") || !strings.HasSuffix(b.File, ".svg") {
						t.Errorf("chart %q: not an SVG document with a file name", b.Title)
					}
				}
			}
			if tables != tc.tables || charts != tc.charts {
				t.Errorf("%q: %d tables and %d charts, want %d and %d\n%s", tc.body, tables, charts, tc.tables, tc.charts, text)
			}
			for _, want := range tc.contains {
				if !strings.Contains(text, want) {
					t.Errorf("%q: output lacks %q\n%s", tc.body, want, text)
				}
			}
			// Earlier steps of every case succeed.
			for _, e := range res.Outputs[:len(res.Outputs)-1] {
				if e.Status == Failed && tc.status != Waiting {
					t.Errorf("step %d (%s) failed: %v", e.Step, e.Text, e.Error)
				}
			}
		})
	}
}

func TestRunErrorPositions(t *testing.T) {
	t.Parallel()
	// Prose above the steps: positions count in the whole document.
	doc := "# Orders\n\nSome words.\n\n```quill\nload orders.csv\n  split last=100\n```\n"
	res := New().Run(t.Context(), sessionOf(doc), testData())
	if len(res.Errors) != 1 {
		t.Fatalf("got %d errors, want 1: %v", len(res.Errors), res.Errors)
	}
	e := res.Errors[0]
	if e.Step != 2 || e.Line != 7 || e.Column != 3 {
		t.Errorf("error at step %d, line %d, column %d; want step 2, line 7, column 3 (%v)", e.Step, e.Line, e.Column, e)
	}
	if !strings.HasPrefix(e.Error(), "line 7, column 3: ") {
		t.Errorf("message %q does not start with the position", e.Error())
	}
}

var placedErrorTests = []struct {
	name string
	body string // the marker § stands where the error must point
	want string
}{
	{"missing file at the subject", "load §nothing.csv", "no file named"},
	{"period outside the series at the value", "load orders.csv\nsplit from=§2031-05", "not a period of the series"},
	{"first period at the value", "load orders.csv\nsplit from=§2020-01", "first period"},
	{"width at the value", "load orders.csv\nsmooth centered width=§999", "longer than the series"},
	{"fit failure at the verb", "load flat.csv\nsplit last=40\n§forecast holt-winters", "could not be fitted"},
}

func TestPlacedErrors(t *testing.T) {
	t.Parallel()
	for _, tc := range placedErrorTests {
		t.Run(tc.name, func(t *testing.T) {
			text, line, col := markerPos("```quill\n" + tc.body + "\n```\n")
			res := New().Run(t.Context(), sessionOf(text), testData())
			if len(res.Errors) == 0 {
				t.Fatalf("%q: no error", tc.body)
			}
			e := res.Errors[0]
			if e.Line != line || e.Column != col || !strings.Contains(e.Msg, tc.want) {
				t.Errorf("%q: got %v; want line %d, column %d, containing %q", tc.body, e, line, col, tc.want)
			}
		})
	}
}

// markerPos removes the § marker and returns where it stood (1-based line
// and column in characters).
func markerPos(text string) (string, int, int) {
	i := strings.Index(text, "§")
	before := text[:i]
	line := strings.Count(before, "\n") + 1
	col := len([]rune(before[strings.LastIndex(before, "\n")+1:])) + 1
	return before + text[i+len("§"):], line, col
}

// TestDatasetAttached runs on a dataset read beforehand, as the page does
// after its preview.
func TestDatasetAttached(t *testing.T) {
	t.Parallel()
	ds, err := series.Read(synthetic(36, 100, 1, 5), "pre.csv", series.ReadOptions{})
	if err != nil {
		t.Fatal(err)
	}
	res := run("load pre.csv\nsplit last=6\nforecast naive", Data{Sets: map[string]*series.Dataset{"pre.csv": ds}})
	for _, o := range res.Outputs {
		if o.Status != Done {
			t.Errorf("step %d: %s %v", o.Step, o.Status, o.Error)
		}
	}
}

// TestEmbeddedData runs a session that carries its data in a data block,
// as when the user asks for it; an attached file of the same name wins.
func TestEmbeddedData(t *testing.T) {
	t.Parallel()
	text := "```quill-data tiny.csv\n" + string(synthetic(30, 50, 1, 5)) + "```\n\n```quill\nload tiny.csv\nsplit last=6\nforecast naive\n```\n"
	res := New().Run(t.Context(), sessionOf(text), Data{})
	for _, o := range res.Outputs {
		if o.Status != Done {
			t.Fatalf("step %d: %s %v", o.Step, o.Status, o.Error)
		}
	}
	if !strings.Contains(blockTexts(res.Outputs[0]), "2020-01 to 2022-06") {
		t.Errorf("embedded data not used:\n%s", blockTexts(res.Outputs[0]))
	}
	attached := New().Run(t.Context(), sessionOf(text), Data{Files: map[string][]byte{"tiny.csv": synthetic(40, 50, 1, 5)}})
	if !strings.Contains(blockTexts(attached.Outputs[0]), "2020-01 to 2023-04") {
		t.Errorf("attached file did not win:\n%s", blockTexts(attached.Outputs[0]))
	}
}
