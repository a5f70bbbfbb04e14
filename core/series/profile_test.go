package series

import (
	"math"
	"slices"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

func TestProfile(t *testing.T) {
	t.Parallel()
	nan := math.NaN()
	tests := []struct {
		name                          string
		s                             Series
		count, present, missing, gaps int
		zeros, negatives              int
		min, max, mean                float64
		sentences                     []string
	}{
		{name: "values with a gap, a zero and a negative",
			s:     Series{Name: "units", Start: NewMonth(2024, 1), Values: []float64{4, nan, nan, 0, -2, 10}, Season: 12},
			count: 6, present: 4, missing: 2, gaps: 1, zeros: 1, negatives: 1,
			// Hand calculation: (4 + 0 - 2 + 10) / 4 = 3.
			min: -2, max: 10, mean: 3,
			sentences: []string{
				`Series "units" has 6 months from 2024-01 to 2024-06.`,
				"A seasonal cycle is taken to last 12 months.",
				"2 values are missing, in 1 gap.",
				"Values run from -2 to 10, with a mean of 3.",
				"1 zero and 1 negative values: percentage errors (MAPE) and multiplicative methods do not apply.",
			}},
		{name: "constant index series",
			s:     Series{Name: "v", Start: NewIndex(1), Values: []float64{5, 5, 5}},
			count: 3, present: 3, min: 5, max: 5, mean: 5,
			sentences: []string{
				`Series "v" has 3 positions from 1 to 3.`,
				"No seasonal cycle is assumed.",
				"No value is missing.",
				"Values run from 5 to 5, with a mean of 5.",
			}},
		{name: "all missing",
			s:     Series{Name: "e", Start: NewYear(2020), Values: []float64{nan, nan}},
			count: 2, missing: 2, gaps: 1, min: nan, max: nan, mean: nan,
			sentences: []string{
				`Series "e" has 2 years from 2020 to 2021.`,
				"No seasonal cycle is assumed.",
				"2 values are missing, in 1 gap.",
			}},
	}
	same := func(a, b float64) bool {
		return math.IsNaN(a) && math.IsNaN(b) || scalar.EqualWithinAbsOrRel(a, b, 1e-12, 1e-12)
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			p := ProfileOf(&tt.s)
			if p.Count != tt.count || p.Present != tt.present || p.Missing != tt.missing || p.Gaps != tt.gaps || p.Zeros != tt.zeros || p.Negatives != tt.negatives {
				t.Errorf("counts %+v", p)
			}
			if !same(p.Min, tt.min) || !same(p.Max, tt.max) || !same(p.Mean, tt.mean) {
				t.Errorf("min %v max %v mean %v, want %v %v %v", p.Min, p.Max, p.Mean, tt.min, tt.max, tt.mean)
			}
			if got := p.Sentences(); !slices.Equal(got, tt.sentences) {
				t.Errorf("sentences\n got %q\nwant %q", got, tt.sentences)
			}
		})
	}
}

func TestDatasetProfileCountsDuplicates(t *testing.T) {
	t.Parallel()
	in := "month,units\n2024-01,1\n2024-01,2\n2024-02,3\n2024-02,4\n2024-03,5\n"
	for _, agg := range []Aggregate{KeepDuplicates, Sum} {
		ds, err := Read([]byte(in), "d.csv", ReadOptions{Duplicates: agg})
		if err != nil {
			t.Fatal(err)
		}
		if p := ds.ProfileOf(0); p.Duplicates != 2 {
			t.Errorf("duplicates %q: profile counts %d duplicate periods, want 2", agg, p.Duplicates)
		}
	}
}
