package runner

import (
	"regexp"
	"slices"
	"testing"

	"quillcast/core/memo"
)

// TestMemoExhibitsAreTheScreens checks DESIGN §5 on the demo session: every
// exhibit of the memo carries the number it has under its step, with the
// same title and the same cells or the same drawing, so "Exhibit 16" means
// one table on screen and in the memo.
func TestMemoExhibitsAreTheScreens(t *testing.T) {
	t.Parallel()
	res := New().Run(t.Context(), sessionFile(t, "demo.md"), demoData(t))
	shown := map[int]Block{}
	for _, o := range res.Outputs {
		for _, b := range o.Blocks {
			if b.Exhibit > 0 {
				shown[b.Exhibit] = b
			}
		}
	}
	m := res.Memo("test")
	exhibits := m.Exhibits()
	if len(exhibits) < 10 {
		t.Fatalf("the demo memo has %d exhibits; want the tables and charts a reader needs", len(exhibits))
	}
	seen := map[int]bool{}
	for _, ex := range exhibits {
		t.Run(memo.ExhibitTitle(ex.Number, ex.Caption), func(t *testing.T) {
			if seen[ex.Number] {
				t.Fatalf("exhibit number %d appears twice in the memo", ex.Number)
			}
			seen[ex.Number] = true
			b, ok := shown[ex.Number]
			if !ok {
				t.Fatalf("the memo's exhibit %d is not shown under any step", ex.Number)
			}
			if b.Title != ex.Caption {
				t.Errorf("exhibit %d is %q on screen and %q in the memo", ex.Number, b.Title, ex.Caption)
			}
			switch blk := m.Sections[ex.Section].Blocks[ex.Block].(type) {
			case memo.Table:
				if b.Kind != TableBlock || !slices.EqualFunc(b.Table.Rows, blk.Rows, slices.Equal) {
					t.Errorf("exhibit %d: the memo's cells differ from the screen's", ex.Number)
				}
			case memo.Chart:
				if b.Kind != ChartBlock || b.SVG != blk.SVG {
					t.Errorf("exhibit %d: the memo's chart differs from the screen's", ex.Number)
				}
			}
		})
	}
}

// TestMemoNumbersAreTheScreens compares single figures of the memo's prose
// with the cells shown on screen: both come from the same formatting
// functions, so the text must match character for character.
func TestMemoNumbersAreTheScreens(t *testing.T) {
	t.Parallel()
	res := New().Run(t.Context(), sessionFile(t, "demo.md"), demoData(t))
	// cell returns the cell in column col of the row whose first cell is
	// first, in the table on screen whose title matches title.
	cell := func(title *regexp.Regexp, first string, col int) string {
		t.Helper()
		for _, o := range res.Outputs {
			for _, b := range o.Blocks {
				if b.Kind != TableBlock || !title.MatchString(b.Title) {
					continue
				}
				for _, r := range b.Table.Rows {
					if r[0] == first {
						return r[col]
					}
				}
			}
		}
		t.Fatalf("no row %q in a table on screen titled like %s", first, title)
		return ""
	}
	md, err := memo.Markdown(res.Memo("test"))
	if err != nil {
		t.Fatal(err)
	}
	// The hw forecast table's first period: forecast, 80% low, 80% high.
	hwTable := regexp.MustCompile(`^Forecast hw, `)
	first, lo80, hi80 := cell(hwTable, "2025-01", 1), cell(hwTable, "2025-01", 2), cell(hwTable, "2025-01", 3)
	head := "**Headline forecast:** " + first + " for 2025-01 (80% interval " + lo80 + " to " + hi80 + ";"
	if !regexp.MustCompile(regexp.QuoteMeta(head)).MatchString(md) {
		t.Errorf("the memo's headline does not quote the screen's cells; want it to contain %q", head)
	}
	// The evaluate table's row of hw (the recommended forecast); column 3 is
	// its MASE on the validation period.
	mase := cell(regexp.MustCompile(`^Accuracy on the training and validation periods$`), "hw", 3)
	if want := "**Holdout accuracy:** MASE " + mase + " on the validation period"; !regexp.MustCompile(regexp.QuoteMeta(want)).MatchString(md) {
		t.Errorf("the memo's holdout accuracy does not quote the screen's cell; want it to contain %q", want)
	}
}
