package diagnose

import (
	"fmt"
	"math"
	"math/rand/v2"
	"testing"

	"quillcast/core/internal/refdata"
)

type acfCase struct {
	Params struct {
		LjungBoxLags []int `json:"ljung_box_lags"`
	} `json:"params"`
	InputSeries []float64 `json:"input_series"`
	Expected    struct {
		N        int       `json:"n"`
		ACF      []float64 `json:"acf"`
		LjungBox []struct {
			Lag        int     `json:"lag"`
			DF         int     `json:"df"`
			Q          float64 `json:"q"`
			P          float64 `json:"p_value"`
			BoxPierceQ float64 `json:"box_pierce_q"`
			BoxPierceP float64 `json:"box_pierce_p_value"`
		} `json:"ljung_box"`
		Band float64 `json:"white_noise_band_95"`
	} `json:"expected"`
	Tolerance struct {
		ACF tol `json:"acf_and_q"`
		P   tol `json:"p_value"`
	} `json:"tolerance"`
}

// TestSeasonalityTestReference recomputes the M3 test statistic from the
// autocorrelations that statsmodels 0.13.5 acf gives in the reference cases
// acf_ljungbox_* (the formula is applied by hand to the case's r_k) and
// compares it with SeasonalityTest on the same series, for several season
// lengths; tolerance abs 1e-9, rel 1e-9 as for the ACF.
func TestSeasonalityTestReference(t *testing.T) {
	t.Parallel()
	for _, name := range []string{"acf_ljungbox_nile", "acf_ljungbox_elec_diff12_diff1", "acf_ljungbox_nile_diff1"} {
		var c acfCase
		refdata.ReadJSON(t, "reference/cases/"+name+".json", &c)
		for _, m := range []int{4, 7, 12} {
			t.Run(fmt.Sprintf("%s/m%d", name, m), func(t *testing.T) {
				r := c.Expected.ACF
				var sum float64
				for k := 1; k < m; k++ {
					sum += r[k] * r[k]
				}
				limit := 1.645 * math.Sqrt((1+2*sum)/float64(c.Expected.N))
				wantStat := math.Abs(r[m]) / limit
				seasonal, stat := SeasonalityTest(c.InputSeries, m)
				if !c.Tolerance.ACF.near(stat, wantStat) {
					t.Errorf("stat = %.15g, want %.15g", stat, wantStat)
				}
				if seasonal != (wantStat > 1) {
					t.Errorf("seasonal = %v with stat %.6g", seasonal, stat)
				}
			})
		}
	}
}

func TestSeasonalityTestCases(t *testing.T) {
	t.Parallel()
	rng := rand.New(rand.NewPCG(11, 12))
	noise := make([]float64, 120)
	for i := range noise {
		noise[i] = rng.NormFloat64()
	}
	tests := []struct {
		name     string
		y        []float64
		season   int
		seasonal bool
		zeroStat bool
	}{
		{"strong season", seasonalSeries(72, 12, 5), 12, true, false},
		// Gaussian noise with a fixed seed: r_12 is -0.0002, far inside the bound
		// (regression value: our own past output).
		{"noise", noise, 12, false, false},
		{"season one", seasonalSeries(72, 12, 5), 1, false, true},
		{"two seasons only", seasonalSeries(24, 12, 5), 12, false, true},
		{"constant", []float64{3, 3, 3, 3, 3, 3, 3, 3, 3, 3}, 4, false, true},
		{"nan", append([]float64{math.NaN()}, seasonalSeries(40, 4, 1)...), 4, false, true},
		{"inf", append(seasonalSeries(40, 4, 1), math.Inf(1)), 4, false, true},
		{"empty", nil, 4, false, true},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			t.Parallel()
			seasonal, stat := SeasonalityTest(tc.y, tc.season)
			if seasonal != tc.seasonal || !isFinite(stat) || (tc.zeroStat && stat != 0) {
				t.Errorf("SeasonalityTest = %v, %v; want seasonal %v (zero stat %v)", seasonal, stat, tc.seasonal, tc.zeroStat)
			}
		})
	}
}

func BenchmarkSeasonalityTest(b *testing.B) {
	for _, size := range benchSizes {
		y := seasonalSeries(size.n, 12, 1)
		b.Run(size.name, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				SeasonalityTest(y, 12)
			}
		})
	}
}
