package series

import (
	"errors"
	"math"
	"strings"
	"testing"
)

// cleanTests check what Read reports and changes for gaps, duplicates and
// rows out of order, with and without the cleaning options. Expected
// values are hand calculations from the input shown.
var cleanTests = []struct {
	name     string
	in       string
	opt      ReadOptions
	want     string   // dump of the dataset
	problems []string // every problem, as Problem.String
	changes  []string // every change, as Change.String
	ready    bool     // the first series is ready for use
}{
	{name: "gap reported",
		in:       "month,units\n2024-01,1\n2024-02,2\n2024-05,5\n",
		want:     "wide month\nunits 2024-01 [1 2 missing missing 5]",
		problems: []string{`series "units" has no rows for 2024-03 to 2024-04 (2 months), between line 3 and line 4; add the missing rows, or set fill to carry forward, linear or seasonal`},
		ready:    true},
	{name: "missing cell reported",
		in:       "month,units\n2024-01,1\n2024-02,NA\n2024-03,3\n",
		want:     "wide month\nunits 2024-01 [1 missing 3]",
		problems: []string{`line 3, column "units": series "units" has no value for 2024-02 (the cell holds "NA"); fill in the value, or set fill to carry forward, linear or seasonal`},
		ready:    true},
	{name: "gap filled by carrying forward",
		in:      "month,units\n2024-01,1\n2024-02,2\n2024-05,5\n",
		opt:     ReadOptions{Fill: CarryForward},
		want:    "wide month\nunits 2024-01 [1 2 2 2 5]",
		changes: []string{`2024-03 in series "units": missing, filled with 2 by carrying forward 2024-02`, `2024-04 in series "units": missing, filled with 2 by carrying forward 2024-02`},
		ready:   true},
	{name: "gap filled linearly", // 2 + (5-2)*1/3 = 3, 2 + (5-2)*2/3 = 4
		in:      "month,units\n2024-01,1\n2024-02,2\n2024-05,5\n",
		opt:     ReadOptions{Fill: Linear},
		want:    "wide month\nunits 2024-01 [1 2 3 4 5]",
		changes: []string{`2024-03 in series "units": missing, filled with 3 by a straight line from 2024-02 to 2024-05`, `2024-04 in series "units": missing, filled with 4 by a straight line from 2024-02 to 2024-05`},
		ready:   true},
	{name: "gap filled seasonally",
		in:      "quarter,units\n2023-Q1,10\n2023-Q2,20\n2023-Q3,30\n2023-Q4,40\n2024-Q1,11\n2024-Q3,33\n",
		opt:     ReadOptions{Fill: Seasonal},
		want:    "wide quarter\nunits 2023-Q1 [10 20 30 40 11 20 33]",
		changes: []string{`2024-Q2 in series "units": missing, filled with 20 by taking the value one season away, 2023-Q2`},
		ready:   true},
	{name: "seasonal fill at the start takes the next season",
		in:      "quarter,units\n2023-Q1,10\n2023-Q2,NA\n2023-Q3,30\n2023-Q4,40\n2024-Q1,11\n2024-Q2,22\n",
		opt:     ReadOptions{Fill: Seasonal},
		want:    "wide quarter\nunits 2023-Q1 [10 22 30 40 11 22]",
		changes: []string{`2023-Q2 in series "units": missing, filled with 22 by taking the value one season away, 2024-Q2`},
		ready:   true},
	{name: "duplicates reported and left missing",
		in:       "month,units\n2024-01,1\n2024-02,2\n2024-02,3\n2024-03,4\n",
		want:     "wide month\nunits 2024-01 [1 missing 4]",
		problems: []string{`line 4: 2024-02 appears again in series "units" (first on line 3); the values are 2 and 3; delete the extra rows, or set duplicates to sum or mean`},
		ready:    false},
	{name: "duplicates summed", // 2 + 3 = 5
		in:      "month,units\n2024-01,1\n2024-02,2\n2024-02,3\n2024-03,4\n",
		opt:     ReadOptions{Duplicates: Sum},
		want:    "wide month\nunits 2024-01 [1 5 4]",
		changes: []string{`2024-02 in series "units": lines 3 and 4 (2 and 3) combined by sum into 5`},
		ready:   true},
	{name: "duplicates averaged", // (2 + 3 + 4) / 3 = 3
		in:      "month,units\n2024-01,1\n2024-02,2\n2024-02,3\n2024-02,4\n",
		opt:     ReadOptions{Duplicates: Mean},
		want:    "wide month\nunits 2024-01 [1 3]",
		changes: []string{`2024-02 in series "units": lines 3, 4 and 5 (2, 3 and 4) combined by mean into 3`},
		ready:   true},
	{name: "out of order reported",
		in:       "month,units\n2024-01,1\n2024-03,3\n2024-02,2\n",
		want:     "wide month\nunits 2024-01 [1 2 3]",
		problems: []string{`line 4: 2024-02 comes after 2024-03 (line 3) in series "units"; sort the rows by period, or set sort to place each row at its period`},
		ready:    false},
	{name: "out of order sorted",
		in:      "month,units\n2024-01,1\n2024-03,3\n2024-02,2\n",
		opt:     ReadOptions{Sort: true},
		want:    "wide month\nunits 2024-01 [1 2 3]",
		changes: []string{`line 4 (2024-02) placed at its period in series "units", before line 3 (2024-03)`},
		ready:   true},
	{name: "newest first sorted",
		in:      "month,units\n2024-03,3\n2024-02,2\n2024-01,1\n",
		opt:     ReadOptions{Sort: true},
		want:    "wide month\nunits 2024-01 [1 2 3]",
		changes: []string{`series "units" ran newest first, from 2024-03 on line 2 down to 2024-01 on line 4; its rows are read in reverse order`},
		ready:   true},
	{name: "newest first reported once",
		in:       "month,units\n2024-04,4\n2024-03,3\n2024-02,2\n2024-01,1\n",
		want:     "wide month\nunits 2024-01 [1 2 3 4]",
		problems: []string{`line 3: series "units" runs newest first, from 2024-04 on line 2 down to 2024-01 on line 5; sort the rows by period, or set sort to read them oldest first`},
		ready:    false},
	{name: "two rows swapped are not a reversal",
		in:      "month,units\n2024-02,2\n2024-01,1\n",
		opt:     ReadOptions{Sort: true},
		want:    "wide month\nunits 2024-01 [1 2]",
		changes: []string{`line 3 (2024-01) placed at its period in series "units", before line 2 (2024-02)`},
		ready:   true},
	{name: "long layout problems name the series",
		in:       "shop,month,units\nA,2024-01,1\nA,2024-03,3\nB,2024-01,5\nB,2024-01,6\n",
		want:     "long month\nA 2024-01 [1 missing 3]\nB 2024-01 [missing]",
		problems: []string{`series "A" has no row for 2024-02, between line 2 and line 3; add the missing rows, or set fill to carry forward, linear or seasonal`, `line 5: 2024-01 appears again in series "B" (first on line 4); the values are 5 and 6; delete the extra rows, or set duplicates to sum or mean`},
		ready:    true},
}

func TestClean(t *testing.T) {
	t.Parallel()
	for _, tt := range cleanTests {
		t.Run(tt.name, func(t *testing.T) {
			t.Parallel()
			ds, err := Read([]byte(tt.in), "test.csv", tt.opt)
			if err != nil {
				t.Fatalf("Read(%q): %v", tt.in, err)
			}
			if got := dump(ds); got != tt.want {
				t.Errorf("Read(%q)\n got %s\nwant %s", tt.in, got, tt.want)
			}
			var problems, changes []string
			for _, p := range ds.Problems {
				problems = append(problems, p.String())
			}
			for _, c := range ds.Changes {
				changes = append(changes, c.String())
			}
			if strings.Join(problems, "\n") != strings.Join(tt.problems, "\n") {
				t.Errorf("problems\n got %q\nwant %q", problems, tt.problems)
			}
			if strings.Join(changes, "\n") != strings.Join(tt.changes, "\n") {
				t.Errorf("changes\n got %q\nwant %q", changes, tt.changes)
			}
			if got := ds.Ready(0); got != tt.ready {
				t.Errorf("Ready(0) = %v, want %v", got, tt.ready)
			}
			_, err = ds.Lookup(ds.Series[0].Name)
			if (err == nil) != tt.ready {
				t.Errorf("Lookup(%q) error = %v, want ready %v", ds.Series[0].Name, err, tt.ready)
			}
		})
	}
}

func TestLookup(t *testing.T) {
	t.Parallel()
	ds, err := Read([]byte("month,units\n2024-01,1\n2024-01,2\n"), "orders.csv", ReadOptions{})
	if err != nil {
		t.Fatal(err)
	}
	_, err = ds.Lookup("UNITS ")
	want := `series "units" is not ready: line 3: 2024-01 appears again in series "units" (first on line 2); the values are 1 and 2; delete the extra rows, or set duplicates to sum or mean`
	if err == nil || err.Error() != want || !errors.Is(err, ErrDuplicate) {
		t.Errorf("Lookup of a series with duplicates:\n got %v\nwant %s", err, want)
	}
	_, err = ds.Lookup("returns")
	want = `orders.csv has no series "returns"; the series found are "units"`
	if err == nil || err.Error() != want || !errors.Is(err, ErrColumn) {
		t.Errorf("Lookup of a missing series:\n got %v\nwant %s", err, want)
	}
}

func TestFillDirect(t *testing.T) {
	t.Parallel()
	nan := math.NaN()
	s := &Series{Name: "x", Start: NewMonth(2024, 1), Values: []float64{nan, 1, nan, nan, 4, nan}, Season: 12}
	changes, err := Fill(s, Linear)
	if err != nil {
		t.Fatal(err)
	}
	// Hand calculation: 1 + (4-1)/3 = 2 and 1 + 2(4-1)/3 = 3; the ends stay missing.
	want := []float64{nan, 1, 2, 3, 4, nan}
	for i := range want {
		if math.IsNaN(want[i]) != math.IsNaN(s.Values[i]) || !math.IsNaN(want[i]) && math.Abs(want[i]-s.Values[i]) > 1e-12 {
			t.Errorf("Values[%d] = %v, want %v", i, s.Values[i], want[i])
		}
	}
	if len(changes) != 2 {
		t.Errorf("%d changes, want 2", len(changes))
	}
	if _, err := Fill(&Series{Name: "y", Values: []float64{nan}}, Seasonal); !errors.Is(err, ErrOption) {
		t.Errorf("seasonal fill without a season: %v, want ErrOption", err)
	}
}
