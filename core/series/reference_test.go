package series

import (
	"os"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"quillcast/core/internal/refdata"
)

// TestReferenceData reads the open datasets kept beside the repository and
// checks counts, periods and first and last values against the figures
// their README states (shared/reference/README.md, "Datasets") and against
// the copies of each series held in the case files (data.labels, data.y),
// written by an independent program (the reference folder's generate.py
// with pandas 1.5.3).
func TestReferenceData(t *testing.T) {
	t.Parallel()
	tests := []struct {
		name        string
		file        string
		caseFile    string // a case file holding the same series
		column      string
		freq        Frequency
		n           int
		first, last string
		y0, yn      float64
	}{
		// README: Nile at Aswan, 1871-1970, 100 values; statsmodels' bundled nile dataset (Cobb 1978).
		{"nile", "reference/data/nile.csv", "reference/cases/trailing_ma_nile.json", "volume", Year, 100, "1871", "1970", 1120, 740},
		// README: euro-area electrical equipment turnover index, 1996-01 to 2015-12, 240 months (Eurostat via statsmodels' elec_equip).
		{"elec", "reference/data/elec_equip_monthly.csv", "reference/cases/centered_ma_elec.json", "turnover_index", Month, 240, "1996-01", "2015-12", 68.06, 111.03},
		// README: NIST/SEMATECH e-Handbook 6.4.3.6 quarterly sales, 1990 Q1 to 1995 Q4, 24 quarters.
		{"nist sales", "reference/data/nist_quarterly_sales.csv", "reference/cases/simple_methods_nist_sales.json", "sales", Quarter, 24, "1990-Q1", "1995-Q4", 362, 661},
		// README: NIST/SEMATECH e-Handbook 6.4.3.1, 12 observations; last value 70 per 6.4.3.2.
		{"nist ses", "reference/data/nist_ses_example.csv", "reference/cases/ses_fixed_nist_example.json", "value", Index, 12, "1", "12", 71, 70},
		// README: NIST/SEMATECH e-Handbook 6.4.3.3, 10 observations.
		{"nist double", "reference/data/nist_double_example.csv", "reference/cases/holt_fixed_nist_double.json", "value", Index, 10, "1", "10", 6.4, 22.4},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			t.Parallel()
			data, err := os.ReadFile(refdata.Path(t, tt.file))
			if err != nil {
				t.Fatal(err)
			}
			ds, err := Read(data, tt.file, ReadOptions{})
			if err != nil {
				t.Fatal(err)
			}
			if len(ds.Problems) > 0 {
				t.Errorf("problems: %v", ds.Problems)
			}
			s, err := ds.Lookup(tt.column)
			if err != nil {
				t.Fatal(err)
			}
			if len(ds.Series) != 1 || s.Len() != tt.n || s.Frequency() != tt.freq || s.Start.String() != tt.first || s.End().String() != tt.last {
				t.Errorf("got %d series, %q with %d %s from %s to %s; want 1 series of %d %s from %s to %s",
					len(ds.Series), s.Name, s.Len(), s.Frequency(), s.Start, s.End(), tt.n, tt.freq, tt.first, tt.last)
			}
			if !scalar.EqualWithinAbsOrRel(s.Values[0], tt.y0, 1e-12, 1e-12) || !scalar.EqualWithinAbsOrRel(s.Values[s.Len()-1], tt.yn, 1e-12, 1e-12) {
				t.Errorf("first and last values %v and %v, want %v and %v", s.Values[0], s.Values[s.Len()-1], tt.y0, tt.yn)
			}
			var c struct {
				Data struct {
					Labels []string
					Y      []float64
				}
			}
			refdata.ReadJSON(t, tt.caseFile, &c)
			if len(c.Data.Y) != s.Len() {
				t.Fatalf("case file holds %d values, the loader %d", len(c.Data.Y), s.Len())
			}
			for i, y := range c.Data.Y {
				if !scalar.EqualWithinAbsOrRel(s.Values[i], y, 1e-12, 1e-12) || s.PeriodAt(i).String() != c.Data.Labels[i] {
					t.Errorf("position %d: %s %v, case file %s %v", i, s.PeriodAt(i), s.Values[i], c.Data.Labels[i], y)
				}
			}
		})
	}
}

// TestCompetitionData reads the M3 files in the long layout. Counts from
// shared/competition/README.md: 174 "other" series and 756 quarterly
// series, the last 8 values of each held out (role = test). First and last
// rows as they stand in the files.
func TestCompetitionData(t *testing.T) {
	t.Parallel()
	tests := []struct {
		name      string
		file      string
		freq      Frequency
		series    int
		firstName string
		first     string // first period of the first series
		y0        float64
		lastName  string
		last      string // last period of the last series
		yn        float64
	}{
		// README: 174 "other" series, periods as plain positions.
		{"m3 other", "competition/m3-other.csv", Index, 174, "O1", "1", 3060.42, "O174", "71", 3354},
		// README: 756 quarterly series (period 4).
		{"m3 quarterly", "competition/m3-quarterly.csv", Quarter, 756, "Q1", "1984-Q1", 3142.63, "Q756", "1975-Q4", 1650},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			t.Parallel()
			data, err := os.ReadFile(refdata.Path(t, tt.file))
			if err != nil {
				t.Fatal(err)
			}
			ds, err := Read(data, tt.file, ReadOptions{})
			if err != nil {
				t.Fatal(err)
			}
			if ds.Layout != Long || ds.SeriesKey != "series" || ds.Frequency != tt.freq || len(ds.Series) != tt.series {
				t.Fatalf("got %s layout keyed by %q, %s, %d series; want long, \"series\", %s, %d", ds.Layout, ds.SeriesKey, ds.Frequency, len(ds.Series), tt.freq, tt.series)
			}
			if len(ds.Problems) > 0 {
				t.Errorf("%d problems, the first: %s", len(ds.Problems), ds.Problems[0])
			}
			first, last := ds.Series[0], ds.Series[len(ds.Series)-1]
			if first.Name != tt.firstName || first.Start.String() != tt.first || !scalar.EqualWithinAbsOrRel(first.Values[0], tt.y0, 1e-12, 1e-12) {
				t.Errorf("first series %s starts %s with %v, want %s %s %v", first.Name, first.Start, first.Values[0], tt.firstName, tt.first, tt.y0)
			}
			if last.Name != tt.lastName || last.End().String() != tt.last || !scalar.EqualWithinAbsOrRel(last.Values[last.Len()-1], tt.yn, 1e-12, 1e-12) {
				t.Errorf("last series %s ends %s with %v, want %s %s %v", last.Name, last.End(), last.Values[last.Len()-1], tt.lastName, tt.last, tt.yn)
			}
			// README: the last 8 values of each series are the test periods.
			for i, s := range ds.Series {
				roles := ds.LabelsOf(i, "role")
				if len(roles) != s.Len() {
					t.Fatalf("series %s: %d roles for %d values", s.Name, len(roles), s.Len())
				}
				tests := 0
				for j, role := range roles {
					if role == "test" {
						tests++
						if j < s.Len()-8 {
							t.Errorf("series %s: a test value at position %d of %d", s.Name, j+1, s.Len())
						}
					}
				}
				if tests != 8 {
					t.Errorf("series %s: %d test values, want 8", s.Name, tests)
				}
			}
			// Keeping only the fit rows shortens every series by 8.
			fit, err := Read(data, tt.file, ReadOptions{Only: Match{Column: "role", Value: "fit"}})
			if err != nil {
				t.Fatal(err)
			}
			if len(fit.Series) != tt.series {
				t.Fatalf("fit rows hold %d series, want %d", len(fit.Series), tt.series)
			}
			for i, s := range fit.Series {
				if s.Name != ds.Series[i].Name || s.Len() != ds.Series[i].Len()-8 || s.Start != ds.Series[i].Start {
					t.Errorf("fit series %s: %d values from %s, want %d from %s", s.Name, s.Len(), s.Start, ds.Series[i].Len()-8, ds.Series[i].Start)
				}
			}
		})
	}
}
