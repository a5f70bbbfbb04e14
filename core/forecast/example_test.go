package forecast_test

import (
	"fmt"

	"quillcast/core/forecast"
)

// Quarterly orders of an invented candle shop, three years.
var orders = []float64{120, 150, 135, 210, 128, 161, 140, 226, 137, 170, 152, 241}

func ExampleLookup() {
	spec, ok := forecast.Lookup("holt-winters")
	if !ok {
		return
	}
	method, err := spec.New(forecast.Settings{
		"alpha": {Number: 0.3}, "beta": {Number: 0.1}, "gamma": {Number: 0.2},
	})
	if err != nil {
		fmt.Println(err)
		return
	}
	fit, err := method.Fit(orders, 4)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println(fit.Method, fit.Init)
	lo, hi, _ := fit.Interval(4, 0.8)
	for h, f := range fit.Forecast(4) {
		fmt.Printf("h=%d %.1f (80%%: %.1f to %.1f)\n", h+1, f, lo[h], hi[h])
	}
	// Output:
	// holt-winters level0 is the mean of the first season (4 periods), trend0 the mean change per period from the first to the second season, and each season0 the first season's value minus that level
	// h=1 147.9 (80%: 142.1 to 153.6)
	// h=2 180.2 (80%: 174.1 to 186.2)
	// h=3 164.9 (80%: 158.5 to 171.2)
	// h=4 246.4 (80%: 239.6 to 253.2)
}

// The output lines are regression values (our own past output); the
// recursion behind them is checked against reference cases in the tests.

func ExampleSmoothing() {
	// With alpha left out it is estimated; on this short, jumpy series the
	// in-sample error is least when each forecast follows the last value.
	fit, err := forecast.Smoothing{}.Fit([]float64{71, 70, 69, 68, 64, 65, 72, 78, 75, 75, 75, 70}, 0)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("%s alpha %.3f converged %v\n", fit.Method, fit.Params[0].Value, fit.Converged)
	fmt.Printf("next %.2f\n", fit.Forecast(1)[0])
	// Output:
	// ses alpha 1.000 converged true
	// next 70.00
}
