package forecast

import (
	"fmt"

	"quillcast/core/diagnose"
)

// seasonalAdjustment is the classical multiplicative seasonal adjustment
// used by the Theta method and naive2, applied only when a 90%
// autocorrelation test at the seasonal lag finds a season (the M3
// convention: |r_m| > 1.645*sqrt((1 + 2*sum_{k<m} r_k^2)/n), see
// [diagnose.SeasonalityTest]).
//
// Source: S. Makridakis and M. Hibon (2000), "The M3-Competition: results,
// conclusions and implications", International Journal of Forecasting
// 16(4), 451-476 (benchmark methods); classical decomposition as in
// [diagnose.Decompose].
type seasonalAdjustment struct {
	m       int       // season length; 1 when not adjusted
	indices []float64 // seasonal indices by position from the first value; nil when not adjusted
}

// adjustSeason decides on and applies the adjustment to y. It returns the
// adjusted series (y itself when not adjusted) and a note for the reader.
func adjustSeason(method string, y []float64, m int) (seasonalAdjustment, []float64, string) {
	none := seasonalAdjustment{m: 1}
	if m < 2 {
		return none, y, ""
	}
	if len(y) <= 2*m {
		return none, y, fmt.Sprintf("%s made no seasonal adjustment: the seasonality test needs more than two full seasons (%d values)", method, 2*m)
	}
	for _, v := range y {
		if v <= 0 {
			return none, y, fmt.Sprintf("%s made no seasonal adjustment: a multiplicative adjustment needs positive values", method)
		}
	}
	seasonal, stat := diagnose.SeasonalityTest(y, m)
	if !seasonal {
		return none, y, fmt.Sprintf("%s made no seasonal adjustment: the 90%% seasonality test at lag %d found no season (statistic %.2f, season above 1)", method, m, stat)
	}
	d, err := diagnose.Decompose(y, m, diagnose.Multiplicative)
	if err != nil {
		return none, y, fmt.Sprintf("%s made no seasonal adjustment: %v", method, err)
	}
	return seasonalAdjustment{m: m, indices: clone(d.Indices)}, clone(d.Adjusted),
		fmt.Sprintf("%s adjusted the series by classical multiplicative decomposition: the 90%% seasonality test at lag %d found a season (statistic %.2f, season above 1)", method, m, stat)
}

// index returns the seasonal index of 0-based period t (1 when not adjusted).
func (a seasonalAdjustment) index(t int) float64 {
	if a.indices == nil {
		return 1
	}
	return a.indices[t%a.m]
}

// reseason multiplies v (values for periods from, from+1, ...) by the
// indices in place and returns it.
func (a seasonalAdjustment) reseason(v []float64, from int) []float64 {
	for i := range v {
		v[i] *= a.index(from + i)
	}
	return v
}

// states reports the indices as initial-state entries "index[1]", ... .
func (a seasonalAdjustment) states() []Param {
	var out []Param
	for j, v := range a.indices {
		out = append(out, Param{Name: fmt.Sprintf("index[%d]", j+1), Value: v, Estimated: true})
	}
	return out
}
