package diagnose

import "math"

// seasonalityCritical is the one-sided 90% normal quantile used by the
// seasonality test (common practice in the M3 and M4 benchmark code).
const seasonalityCritical = 1.645

// SeasonalityTest reports whether y has a season of the given length by the
// 90% autocorrelation test used to decide on seasonal adjustment in the M3
// competition benchmarks: a season is present when
//
//	|r_m| > 1.645 × sqrt((1 + 2 × sum_{k=1}^{m-1} r_k²) / n)
//
// where r_k is the sample autocorrelation at lag k (see [ACF]) and m the
// season. stat is |r_m| divided by that bound, so stat > 1 means seasonal.
//
// The test is not made, and the result is (false, 0), when season is below
// 2, when y has no more than two full seasons (n <= 2m), when y is constant
// or when it holds a NaN or infinite value.
//
// References: S. Makridakis and M. Hibon (2000), "The M3-Competition:
// results, conclusions and implications", International Journal of
// Forecasting 16(4), 451-476; V. Assimakopoulos and K. Nikolopoulos (2000),
// "The theta model: a decomposition approach to forecasting", International
// Journal of Forecasting 16(4), 521-530. The bound is the large-lag standard
// error of Bartlett (1946).
func SeasonalityTest(y []float64, season int) (seasonal bool, stat float64) {
	n := len(y)
	if season < 2 || n <= 2*season || checkFinite(y) != nil {
		return false, 0
	}
	r, ok := autocorrelations(y, season)
	if !ok {
		return false, 0
	}
	var sum float64
	for k := 1; k < season; k++ {
		sum += r[k] * r[k]
	}
	limit := seasonalityCritical * math.Sqrt((1+2*sum)/float64(n))
	stat = math.Abs(r[season]) / limit
	return stat > 1, stat
}
