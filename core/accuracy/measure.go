package accuracy

import (
	"fmt"
	"strings"
)

// Measure names one point-forecast accuracy measure.
type Measure int

// The accuracy measures, in the order tables show them.
const (
	ME    Measure = iota + 1 // mean error
	MAE                      // mean absolute error
	MSE                      // mean squared error
	RMSE                     // root mean squared error
	MAPE                     // mean absolute percentage error
	MPE                      // mean percentage error
	SMAPE                    // symmetric mean absolute percentage error
	MASE                     // mean absolute scaled error
)

// numMeasures is one more than the largest Measure.
const numMeasures = int(MASE) + 1

// measureInfo is the read-only description of each measure.
var measureInfo = [numMeasures]struct {
	name, title, definition string
	percent, signed         bool
}{
	ME: {"me", "Mean error (ME)",
		"The mean error is the average of the errors e = actual - forecast over the periods scored: ME = mean(e). " +
			"It measures bias: a positive ME means the forecasts were too low on average, a negative one too high. " +
			"Errors of opposite sign cancel, so a small ME does not mean small errors. It is in the units of the series.",
		false, true},
	MAE: {"mae", "Mean absolute error (MAE)",
		"The mean absolute error is the average size of the errors, ignoring their sign: MAE = mean(|e|), with e = actual - forecast. " +
			"It is in the units of the series and treats every unit of error alike. It is also called the mean absolute deviation (MAD).",
		false, false},
	MSE: {"mse", "Mean squared error (MSE)",
		"The mean squared error is the average of the squared errors: MSE = mean(e²), with e = actual - forecast. " +
			"Squaring weighs large errors much more than small ones. It is in squared units of the series.",
		false, false},
	RMSE: {"rmse", "Root mean squared error (RMSE)",
		"The root mean squared error is the square root of the mean squared error: RMSE = sqrt(mean(e²)), with e = actual - forecast. " +
			"It is in the units of the series, like MAE, but weighs large errors more; it is never below the MAE.",
		false, false},
	MAPE: {"mape", "Mean absolute percentage error (MAPE)",
		"The mean absolute percentage error is the average size of the errors relative to the actual values, in percent: " +
			"MAPE = 100 × mean(|e| / |actual|), with e = actual - forecast. It compares series of different sizes, " +
			"but it is undefined when an actual value is zero and grows very large when actual values are near zero.",
		true, false},
	MPE: {"mpe", "Mean percentage error (MPE)",
		"The mean percentage error is the average error relative to the actual values, in percent: " +
			"MPE = 100 × mean(e / actual), with e = actual - forecast. Like ME it measures bias (positive means the forecasts were too low), " +
			"and like MAPE it is undefined when an actual value is zero.",
		true, true},
	SMAPE: {"smape", "Symmetric mean absolute percentage error (sMAPE)",
		"The symmetric mean absolute percentage error divides each absolute error by the average size of the actual value and the forecast, in percent: " +
			"sMAPE = 100 × mean(2|e| / (|actual| + |forecast|)), with e = actual - forecast. It lies between 0 and 200 " +
			"and is undefined only where the actual value and the forecast are both zero. This is the form used to score the M3 and M4 forecasting competitions.",
		true, false},
	MASE: {"mase", "Mean absolute scaled error (MASE)",
		"The mean absolute scaled error divides the MAE by the mean absolute error that the naive method (repeat the last value) made one step ahead on the training series, " +
			"or, for seasonal data, the seasonal naive method (repeat the value one season back): MASE = MAE / mean(|y_t - y_{t-m}|) over the training periods, " +
			"with m = 1 or the season length. Below 1, the forecasts beat that in-sample benchmark; above 1, they did worse. " +
			"It compares series of any size and is undefined only when the training series gives that benchmark no error (a constant series). " +
			"Source: R. J. Hyndman and A. B. Koehler (2006), International Journal of Forecasting 22(4), 679-688.",
		false, false},
}

// Measures returns every measure in table order.
func Measures() []Measure {
	return []Measure{ME, MAE, MSE, RMSE, MAPE, MPE, SMAPE, MASE}
}

// Valid reports whether m is one of the measures of this package.
func (m Measure) Valid() bool { return m >= ME && m <= MASE }

// String returns the measure's name as written in steps, in lower case:
// "me", "mae", "mse", "rmse", "mape", "mpe", "smape" or "mase".
func (m Measure) String() string {
	if !m.Valid() {
		return fmt.Sprintf("measure(%d)", int(m))
	}
	return measureInfo[m].name
}

// Label returns the measure's abbreviation as printed in table headings
// and reasons: "ME", "RMSE", "sMAPE", "MASE".
func (m Measure) Label() string {
	if !m.Valid() {
		return m.String()
	}
	return label(m)
}

// Title returns the measure's full name with its abbreviation, for table
// headings: "Root mean squared error (RMSE)".
func (m Measure) Title() string {
	if !m.Valid() {
		return m.String()
	}
	return measureInfo[m].title
}

// Definition returns a paragraph defining the measure in plain words with
// its formula, for the page and the memo.
func (m Measure) Definition() string {
	if !m.Valid() {
		return ""
	}
	return measureInfo[m].definition
}

// Percent reports whether the measure is expressed in percent (MAPE, MPE,
// sMAPE).
func (m Measure) Percent() bool { return m.Valid() && measureInfo[m].percent }

// Signed reports whether the measure keeps the sign of the errors (ME, MPE):
// its best value is 0, not the smallest.
func (m Measure) Signed() bool { return m.Valid() && measureInfo[m].signed }

// Better reports whether value a is better than value b on this measure:
// closer to zero for the signed measures (ME, MPE), smaller for the others.
// Undefined results are never better than defined ones; see [Result.Better].
func (m Measure) Better(a, b float64) bool {
	if m.Signed() {
		return abs(a) < abs(b)
	}
	return a < b
}

// ParseMeasure returns the measure named name, ignoring case and surrounding
// spaces ("RMSE", "smape"). For an unknown name the error suggests the
// closest measure name.
func ParseMeasure(name string) (Measure, error) {
	key := strings.ToLower(strings.TrimSpace(name))
	for _, m := range Measures() {
		if measureInfo[m].name == key {
			return m, nil
		}
	}
	if key == "mad" {
		return MAE, nil
	}
	best, bestDist := Measure(0), 1<<30
	for _, m := range Measures() {
		if d := editDistance(key, measureInfo[m].name); d < bestDist {
			best, bestDist = m, d
		}
	}
	names := make([]string, 0, numMeasures)
	for _, m := range Measures() {
		names = append(names, measureInfo[m].name)
	}
	if bestDist <= 2 && key != "" {
		return 0, fmt.Errorf("unknown accuracy measure %q; did you mean %q? The measures are %s",
			name, best.String(), strings.Join(names, ", "))
	}
	return 0, fmt.Errorf("unknown accuracy measure %q; write one of %s", name, strings.Join(names, ", "))
}

// editDistance returns the optimal string alignment distance between a and
// b: the fewest insertions, deletions, substitutions and swaps of two
// neighbouring bytes that turn one into the other (measure names are ASCII).
func editDistance(a, b string) int {
	prev2 := make([]int, len(b)+1)
	prev := make([]int, len(b)+1)
	cur := make([]int, len(b)+1)
	for j := range prev {
		prev[j] = j
	}
	for i := 1; i <= len(a); i++ {
		cur[0] = i
		for j := 1; j <= len(b); j++ {
			cost := 1
			if a[i-1] == b[j-1] {
				cost = 0
			}
			cur[j] = min(prev[j]+1, cur[j-1]+1, prev[j-1]+cost)
			if i > 1 && j > 1 && a[i-1] == b[j-2] && a[i-2] == b[j-1] {
				cur[j] = min(cur[j], prev2[j-2]+1)
			}
		}
		prev2, prev, cur = prev, cur, prev2
	}
	return prev[len(b)]
}
