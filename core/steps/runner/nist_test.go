package runner

import (
	"math"
	"os"
	"strconv"
	"strings"
	"testing"

	"quillcast/core/internal/refdata"
	"quillcast/core/memo"
)

// TestNISTSales runs testdata/sessions/nist-sales.md on the NIST/SEMATECH
// e-Handbook 6.4.3.6 quarterly sales and checks that the memo's comparison
// table shows the reference figures of the case accuracy_nist_sales_last4:
// MAE, ME, RMSE, MAPE and MASE (lag 4, the season) of the naive, seasonal
// naive, drift and mean forecasts of the last four quarters, computed with
// numpy and cross-checked with statsmodels 0.13.5 tools.eval_measures.
func TestNISTSales(t *testing.T) {
	t.Parallel()
	csv, err := os.ReadFile(refdata.Path(t, "reference/data/nist_quarterly_sales.csv"))
	if err != nil {
		t.Fatal(err)
	}
	var ref struct {
		Expected map[string]map[string]any `json:"expected"`
	}
	refdata.ReadJSON(t, "reference/cases/accuracy_nist_sales_last4.json", &ref)
	res := New().Run(t.Context(), sessionFile(t, "nist-sales.md"), Data{Files: map[string][]byte{"nist_quarterly_sales.csv": csv}})
	for _, e := range res.Errors {
		t.Fatalf("step failed: %v", e)
	}
	m := res.Memo("test")
	var table *memo.Table
	for _, s := range m.Sections {
		if s.Kind != memo.Comparison {
			continue
		}
		for _, b := range s.Blocks {
			if tb, ok := b.(memo.Table); ok && table == nil {
				table = &tb
			}
		}
	}
	if table == nil {
		t.Fatal("the memo has no comparison table")
	}
	// Column header in the memo → key in the case file (tolerance R of the
	// reference README for the unrounded values).
	columns := map[string]string{"MAE validation": "mae", "ME validation": "me", "RMSE validation": "rmse", "MAPE % validation": "mape", "MASE validation": "mase_lag4"}
	checked := 0
	for _, row := range table.Rows {
		want, ok := ref.Expected[strings.ReplaceAll(row[0], "-", "_")]
		if !ok {
			continue
		}
		for j, col := range table.Columns {
			key, ok := columns[col.Header]
			if !ok {
				continue
			}
			w, ok := want[key].(float64)
			if !ok {
				t.Fatalf("case file lacks %s for %s", key, row[0])
			}
			got, dec := parseCell(t, row[j])
			// The cell is the reference value rounded to the digits shown.
			if math.Abs(got-w) > 0.5*math.Pow(10, -float64(dec))+1e-9 {
				t.Errorf("%s %s: memo shows %s, reference %v", row[0], col.Header, row[j], w)
			}
			checked++
		}
	}
	if checked != 4*len(columns) {
		t.Errorf("checked %d cells, want %d", checked, 4*len(columns))
	}
	// The unrounded scores behind the table agree to the reference's
	// tolerance (abs 1e-9, rel 1e-9).
	for _, r := range res.final.eval.rows {
		want, ok := ref.Expected[strings.ReplaceAll(r.method, "-", "_")]
		if !ok || r.benchmark {
			continue
		}
		for key, measure := range map[string]string{"mae": "mae", "rmse": "rmse", "mse": "mse", "smape": "smape", "mase_lag4": "mase", "mpe": "mpe"} {
			w := want[key].(float64)
			if g := r.valid[measure]; math.Abs(g-w) > 1e-9+1e-9*math.Abs(w) {
				t.Errorf("%s %s: %v, reference %v", r.label, measure, g, w)
			}
		}
	}
}

// parseCell reads a formatted number ("1,234.5", "16.3") and its decimals.
func parseCell(t *testing.T, cell string) (float64, int) {
	t.Helper()
	s := strings.ReplaceAll(strings.TrimSuffix(cell, "%"), ",", "")
	v, err := strconv.ParseFloat(s, 64)
	if err != nil {
		t.Fatalf("cell %q is not a number", cell)
	}
	dec := 0
	if i := strings.IndexByte(s, '.'); i >= 0 {
		dec = len(s) - i - 1
	}
	return v, dec
}
