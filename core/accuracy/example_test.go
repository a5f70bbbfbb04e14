package accuracy_test

import (
	"fmt"

	"quillcast/core/accuracy"
)

// Score a forecast of four quarters of an invented shop's orders against
// what happened, with MASE scaled by the seasonal naive method (season 4) on
// the training quarters.
//
// Hand check: the errors are 2, -152, 9 and 2; the lag-4 differences of
// the training quarters average 64/8 = 8, so MASE = 41.25/8 = 5.156.
func ExampleEvaluate() {
	train := []float64{120, 135, 160, 110, 128, 141, 171, 118, 133, 150, 180, 126}
	actual := []float64{140, 0, 188, 131}
	forecast := []float64{138, 152, 179, 129}
	s := accuracy.Evaluate(actual, forecast, accuracy.NaiveScale(train, 4))
	for _, m := range accuracy.Measures() {
		r := s.Of(m)
		if !r.Defined {
			fmt.Printf("%-5s %s\n", m, r.Reason)
			continue
		}
		fmt.Printf("%-5s %.3f\n", m, r.Value)
	}
	// Output:
	// me    -34.750
	// mae   41.250
	// mse   5798.250
	// rmse  76.146
	// mape  MAPE undefined: 1 actual value is zero
	// mpe   MPE undefined: 1 actual value is zero
	// smape 51.970
	// mase  5.156
}
