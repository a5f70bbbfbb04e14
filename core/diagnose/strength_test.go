package diagnose

import (
	"math"
	"testing"

	"quillcast/core/internal/refdata"
)

// TestStrengthReference applies the strength formulas of Wang, Smith and
// Hyndman (2006) by hand to the components that statsmodels 0.13.5
// seasonal_decompose gives in the reference cases decompose_* and compares
// the result with SeasonalStrength and TrendStrength on our own
// decomposition of the same series; tolerance 1e-9 (the components match
// to that).
func TestStrengthReference(t *testing.T) {
	t.Parallel()
	for _, name := range []string{
		"decompose_additive_nist_sales", "decompose_multiplicative_nist_sales",
		"decompose_additive_elec", "decompose_multiplicative_elec",
	} {
		t.Run(name, func(t *testing.T) {
			t.Parallel()
			var c decomposeCase
			refdata.ReadJSON(t, "reference/cases/"+name+".json", &c)
			kind := Additive
			if c.Params.Model == "multiplicative" {
				kind = Multiplicative
			}
			d, err := Decompose(c.Data.Y, c.Params.Period, kind)
			if err != nil {
				t.Fatal(err)
			}
			var rem, seas, trend []float64
			for i, r := range c.Expected.Resid {
				if r == nil {
					continue
				}
				rv, sv, tv := *r, *c.Expected.Seasonal[i], *c.Expected.Trend[i]
				if kind == Multiplicative {
					rv, sv, tv = math.Log(rv), math.Log(sv), math.Log(tv)
				}
				rem = append(rem, rv)
				seas = append(seas, sv+rv)
				trend = append(trend, tv+rv)
			}
			wantS := max(0, 1-variance(rem)/variance(seas))
			wantT := max(0, 1-variance(rem)/variance(trend))
			c9 := tol{Abs: 1e-9, Rel: 1e-9}
			if got := SeasonalStrength(d); !c9.near(got, wantS) {
				t.Errorf("SeasonalStrength = %.12g, want %.12g", got, wantS)
			}
			if got := TrendStrength(d); !c9.near(got, wantT) {
				t.Errorf("TrendStrength = %.12g, want %.12g", got, wantT)
			}
		})
	}
}

func TestStrengthEdges(t *testing.T) {
	t.Parallel()
	if SeasonalStrength(nil) != 0 || TrendStrength(nil) != 0 {
		t.Error("a nil decomposition should give strength 0")
	}
	// Hand calculation: a pure repeating pattern has zero remainder, so
	// F_s = 1 - 0/Var(S) = 1; a straight line has no season: F_s = 0.
	pure := []float64{1, 5, 3, 1, 5, 3, 1, 5, 3, 1, 5, 3}
	d, err := Decompose(pure, 3, Additive)
	if err != nil {
		t.Fatal(err)
	}
	if got := SeasonalStrength(d); math.Abs(got-1) > 1e-12 {
		t.Errorf("pure season: strength %v, want 1", got)
	}
	line := []float64{1, 2, 3, 4, 5, 6, 7, 8}
	d, err = Decompose(line, 4, Additive)
	if err != nil {
		t.Fatal(err)
	}
	if got := SeasonalStrength(d); got != 0 {
		t.Errorf("straight line: strength %v, want 0", got)
	}
	// A constant series: nothing varies, so both strengths are 0.
	d, err = Decompose([]float64{2, 2, 2, 2, 2, 2}, 2, Multiplicative)
	if err != nil {
		t.Fatal(err)
	}
	if SeasonalStrength(d) != 0 || TrendStrength(d) != 0 {
		t.Errorf("constant series: strengths %v, %v; want 0", SeasonalStrength(d), TrendStrength(d))
	}
}

func BenchmarkSeasonalStrength(b *testing.B) {
	for _, size := range benchSizes {
		y := seasonalSeries(size.n, 12, 1)
		b.Run(size.name, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				d, err := Decompose(y, 12, Additive)
				if err != nil {
					b.Fatal(err)
				}
				SeasonalStrength(d)
			}
		})
	}
}

func BenchmarkTrendStrength(b *testing.B) {
	for _, size := range benchSizes {
		y := seasonalSeries(size.n, 12, 1)
		d, err := Decompose(y, 12, Additive)
		if err != nil {
			b.Fatal(err)
		}
		b.Run(size.name, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				TrendStrength(d)
			}
		})
	}
}
