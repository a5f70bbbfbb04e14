package forecast

import (
	"math"
	"strings"
	"testing"
)

// TestCompetitionQuarterly runs the seasonal benchmark set on the 756 M3
// quarterly series (season 4, horizon 8) and logs mean sMAPE and MASE
// (lag-4 in-sample scale), for the record; the competition folder
// publishes no quarterly figures to compare with. It requires every method
// to fit every series, finite forecasts, and theta to beat naive2, as in
// the M3 results (S. Makridakis and M. Hibon (2000), International Journal
// of Forecasting 16(4), 451-476; the ordering recalled from memory).
// ses and damped here follow no season (the M3 entries smoothed seasonally
// adjusted data), so they are logged, not ranked.
func TestCompetitionQuarterly(t *testing.T) {
	if testing.Short() {
		t.Skip("quarterly competition run skipped in short mode")
	}
	series := readCompetition(t, "competition/m3-quarterly.csv")
	if len(series) != 756 {
		t.Fatalf("read %d series, want 756", len(series))
	}
	scores := map[string]float64{}
	for _, row := range []string{"naive2", "seasonal-naive", "ses", "damped", "holt-winters", "theta", "holt-winters start=estimated"} {
		name, settings := row, Settings(nil)
		if base, ok := strings.CutSuffix(row, " start=estimated"); ok {
			name, settings = base, Settings{"start": {Word: "estimated"}}
		}
		sp, _ := Lookup(name)
		m, err := sp.New(settings)
		if err != nil {
			t.Fatal(err)
		}
		smape, mase, count, failed := 0.0, 0.0, 0, 0
		for _, s := range series {
			f, err := m.Fit(s.fit, 4)
			if err != nil {
				failed++
				continue
			}
			scale := 0.0
			for i := 4; i < len(s.fit); i++ {
				scale += math.Abs(s.fit[i] - s.fit[i-4])
			}
			scale /= float64(len(s.fit) - 4)
			for i, fc := range f.Forecast(len(s.test)) {
				if math.IsNaN(fc) || math.IsInf(fc, 0) {
					t.Fatalf("%s on %s: forecast %d is %g", name, s.name, i+1, fc)
				}
				a := s.test[i]
				smape += 200 * math.Abs(a-fc) / (math.Abs(a) + math.Abs(fc))
				mase += math.Abs(a-fc) / scale
				count++
			}
		}
		scores[row] = smape / float64(count)
		t.Logf("%-28s sMAPE %.2f  MASE %.3f  (%d series refused)", row, smape/float64(count), mase/float64(count), failed)
		if failed > 0 {
			t.Errorf("%s refused %d series", name, failed)
		}
	}
	if scores["theta"] >= scores["naive2"] {
		t.Errorf("theta sMAPE %.2f does not beat naive2 %.2f", scores["theta"], scores["naive2"])
	}
}
