package series

import (
	"os"
	"path/filepath"
	"testing"
)

// TestDemoData loads every committed demo file (testdata/demo at the
// repository root) and checks that it reads cleanly with the counts and
// periods its README states.
func TestDemoData(t *testing.T) {
	t.Parallel()
	tests := []struct {
		file        string
		layout      Layout
		freq        Frequency
		series      []string
		n           int // values per series
		first, last string
	}{
		// README: 96 months, 2017-01 to 2024-12.
		{"wickery-monthly-orders.csv", Wide, Month, []string{"units"}, 96, "2017-01", "2024-12"},
		// README: 157 ISO weeks, 2020-W01 to 2022-W52 (2020 has a week 53).
		{"wickery-weekly-online.csv", Wide, Week, []string{"online_orders"}, 157, "2020-W01", "2022-W52"},
		// README: 40 quarters, 2015-Q1 to 2024-Q4.
		{"wickery-quarterly-revenue.csv", Wide, Quarter, []string{"revenue_eur"}, 40, "2015-Q1", "2024-Q4"},
		// README: five shops, 60 months each, 2020-01 to 2024-12.
		{"wickery-shops-monthly.csv", Long, Month, []string{"Harbour Row", "Old Mill", "Station Arcade", "Linden Square", "Quayside"}, 60, "2020-01", "2024-12"},
	}
	files, err := filepath.Glob(filepath.Join("..", "..", "testdata", "demo", "*.csv"))
	if err != nil {
		t.Fatal(err)
	}
	if len(files) != len(tests) {
		t.Errorf("%d demo files, %d checked here: add a case for each new file", len(files), len(tests))
	}
	for _, tt := range tests {
		t.Run(tt.file, func(t *testing.T) {
			t.Parallel()
			data, err := os.ReadFile(filepath.Join("..", "..", "testdata", "demo", tt.file))
			if err != nil {
				t.Fatal(err)
			}
			ds, err := Read(data, tt.file, ReadOptions{})
			if err != nil {
				t.Fatal(err)
			}
			if ds.Layout != tt.layout || ds.Frequency != tt.freq || len(ds.Series) != len(tt.series) {
				t.Fatalf("%s %s with %d series, want %s %s with %d", ds.Layout, ds.Frequency, len(ds.Series), tt.layout, tt.freq, len(tt.series))
			}
			if len(ds.Problems) > 0 || len(ds.Changes) > 0 {
				t.Errorf("problems %v, changes %v", ds.Problems, ds.Changes)
			}
			for i, s := range ds.Series {
				p := ds.ProfileOf(i)
				if s.Name != tt.series[i] || p.Count != tt.n || p.Present != tt.n || p.First.String() != tt.first || p.Last.String() != tt.last {
					t.Errorf("series %q: %d values (%d present) from %s to %s; want %q, %d from %s to %s",
						s.Name, p.Count, p.Present, p.First, p.Last, tt.series[i], tt.n, tt.first, tt.last)
				}
				if p.Season != tt.freq.DefaultSeason() || p.Zeros > 0 || p.Negatives > 0 || !(p.Min > 0) {
					t.Errorf("series %q: season %d, %d zeros, %d negatives, minimum %v", s.Name, p.Season, p.Zeros, p.Negatives, p.Min)
				}
			}
		})
	}
}
