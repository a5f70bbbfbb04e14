package diagnose

import (
	"errors"
	"fmt"
	"math"
	"testing"

	"gonum.org/v1/gonum/stat/distuv"

	"quillcast/core/internal/refdata"
)

var acfCases = []string{
	"acf_ljungbox_nile",
	"acf_ljungbox_nile_diff1",
	"acf_ljungbox_nile_ses_residuals",
	"acf_ljungbox_elec_diff12_diff1",
}

// TestACFReference checks the autocorrelations and the 95% band against the
// reference cases acf_ljungbox_* (statsmodels 0.13.5 acf on the Nile flow,
// its differences, SES residuals, and the differenced Eurostat electrical
// equipment index); tolerance abs 1e-9, rel 1e-9.
func TestACFReference(t *testing.T) {
	t.Parallel()
	for _, name := range acfCases {
		t.Run(name, func(t *testing.T) {
			t.Parallel()
			var c acfCase
			refdata.ReadJSON(t, "reference/cases/"+name+".json", &c)
			if len(c.InputSeries) != c.Expected.N {
				t.Fatalf("input has %d values, case says %d", len(c.InputSeries), c.Expected.N)
			}
			got, err := ACF(c.InputSeries, len(c.Expected.ACF)-1)
			if err != nil {
				t.Fatal(err)
			}
			compareSlice(t, "acf", got, c.Expected.ACF, c.Tolerance.ACF)
			if b := ACFBound(c.Expected.N); !c.Tolerance.ACF.near(b, c.Expected.Band) {
				t.Errorf("band = %.15g, want %.15g", b, c.Expected.Band)
			}
		})
	}
}

// TestLjungBoxReference checks Q and its chi-square p-value (h degrees of
// freedom) against the reference cases acf_ljungbox_* (statsmodels 0.13.5
// acorr_ljungbox, model_df = 0, with Box-Pierce as an extra); tolerance
// abs 1e-9, rel 1e-9 for Q and abs 1e-8, rel 1e-7 for p.
func TestLjungBoxReference(t *testing.T) {
	t.Parallel()
	for _, name := range acfCases {
		var c acfCase
		refdata.ReadJSON(t, "reference/cases/"+name+".json", &c)
		for _, want := range c.Expected.LjungBox {
			t.Run(fmt.Sprintf("%s/lag%d", name, want.Lag), func(t *testing.T) {
				lb, err := LjungBox(c.InputSeries, want.Lag, 0)
				if err != nil {
					t.Fatal(err)
				}
				if lb.Lag != want.Lag || lb.DF != want.DF || !c.Tolerance.ACF.near(lb.Q, want.Q) || !c.Tolerance.P.near(lb.P, want.P) {
					t.Errorf("LjungBox = %+v, want Q %.15g p %.15g df %d", lb, want.Q, want.P, want.DF)
				}
				bp, err := BoxPierce(c.InputSeries, want.Lag, 0)
				if err != nil {
					t.Fatal(err)
				}
				if !c.Tolerance.ACF.near(bp.Q, want.BoxPierceQ) || !c.Tolerance.P.near(bp.P, want.BoxPierceP) {
					t.Errorf("BoxPierce = %+v, want Q %.15g p %.15g", bp, want.BoxPierceQ, want.BoxPierceP)
				}
			})
		}
	}
}

func TestLjungBoxFittedCorrection(t *testing.T) {
	t.Parallel()
	y := seasonalSeries(60, 12, 2)
	plain, err := LjungBox(y, 10, 0)
	if err != nil {
		t.Fatal(err)
	}
	corrected, err := LjungBox(y, 10, 2)
	if err != nil {
		t.Fatal(err)
	}
	// The statistic does not change; only the degrees of freedom do, and
	// fewer degrees of freedom give a smaller p-value for the same Q.
	if corrected.DF != 8 || math.Abs(corrected.Q-plain.Q) > 0 || !(corrected.P <= plain.P) {
		t.Errorf("corrected %+v against plain %+v", corrected, plain)
	}
}

func TestACFHand(t *testing.T) {
	t.Parallel()
	// Hand calculation: y = 1,2,3,4, mean 2.5, deviations -1.5,-0.5,0.5,1.5,
	// sum of squares 5; lag 1: (0.75-0.25+0.75)/5 = 0.25;
	// lag 2: (-0.75-0.75)/5 = -0.3; lag 3: -2.25/5 = -0.45.
	got, err := ACF([]float64{1, 2, 3, 4}, 3)
	if err != nil {
		t.Fatal(err)
	}
	compareSlice(t, "acf", got, []float64{1, 0.25, -0.3, -0.45}, tol{Abs: 1e-12})
	if !math.IsNaN(ACFBound(0)) {
		t.Error("ACFBound(0) should be NaN")
	}
}

func TestACFErrors(t *testing.T) {
	t.Parallel()
	tests := []struct {
		name   string
		y      []float64
		lag    int
		fitted int
		cause  error
	}{
		{"empty", nil, 1, 0, ErrTooShort},
		{"lag too large", []float64{1, 2, 3}, 3, 0, ErrTooShort},
		{"lag zero", []float64{1, 2, 3}, 0, 0, ErrBadLag},
		{"no degrees of freedom", []float64{1, 2, 3, 4, 5}, 2, 2, ErrBadLag},
		{"negative fitted", []float64{1, 2, 3, 4, 5}, 2, -1, ErrBadLag},
		{"constant", []float64{2, 2, 2, 2}, 2, 0, ErrConstant},
		{"nan", []float64{1, math.NaN(), 3, 4}, 2, 0, ErrNotFinite},
		{"inf", []float64{1, 2, math.Inf(-1), 4}, 2, 0, ErrNotFinite},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			t.Parallel()
			if _, err := LjungBox(tc.y, tc.lag, tc.fitted); !errors.Is(err, tc.cause) {
				t.Errorf("LjungBox: error %v, want %v", err, tc.cause)
			}
			if _, err := BoxPierce(tc.y, tc.lag, tc.fitted); !errors.Is(err, tc.cause) {
				t.Errorf("BoxPierce: error %v, want %v", err, tc.cause)
			}
		})
	}
	if _, err := ACF([]float64{1, 2}, -1); !errors.Is(err, ErrBadLag) {
		t.Errorf("ACF with lag -1: error %v, want %v", err, ErrBadLag)
	}
}

func BenchmarkACF(b *testing.B) {
	for _, size := range benchSizes {
		y := seasonalSeries(size.n, 12, 1)
		b.Run(size.name, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				if _, err := ACF(y, 24); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}

func BenchmarkLjungBox(b *testing.B) {
	for _, size := range benchSizes {
		y := seasonalSeries(size.n, 12, 1)
		b.Run(size.name, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				if _, err := LjungBox(y, 24, 0); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}

func TestZ975(t *testing.T) {
	t.Parallel()
	if got := distuv.UnitNormal.Quantile(0.975); math.Abs(got-z975) > 1e-14 {
		t.Errorf("z975 = %.17g, gonum gives %.17g", z975, got)
	}
}

func BenchmarkBoxPierce(b *testing.B) {
	for _, size := range benchSizes {
		y := seasonalSeries(size.n, 12, 1)
		b.Run(size.name, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				if _, err := BoxPierce(y, 24, 0); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}
