package diagnose_test

import (
	"fmt"

	"quillcast/core/diagnose"
)

// Decompose three years of an invented shop's quarterly orders.
func ExampleDecompose() {
	orders := []float64{120, 135, 160, 110, 128, 141, 171, 118, 133, 150, 180, 126}
	d, err := diagnose.Decompose(orders, 4, diagnose.Multiplicative)
	if err != nil {
		fmt.Println(err)
		return
	}
	for q, idx := range d.Indices {
		fmt.Printf("Q%d index %.3f\n", q+1, idx)
	}
	// Hand check: the 2×4 average centred on period 5 is
	// (160/2 + 110 + 128 + 141 + 171/2)/4 = 136.125.
	fmt.Printf("trend at the start of year 2: %.2f\n", d.Trend[4])
	// Output:
	// Q1 index 0.933
	// Q2 index 1.023
	// Q3 index 1.217
	// Q4 index 0.827
	// trend at the start of year 2: 136.12
}

// Check an invented monthly series under a trailing moving average, which
// can follow neither a trend nor a season.
func ExampleCheck() {
	var y []float64
	season := []float64{-30, -22, -8, 4, 15, 24, 30, 22, 10, -4, -16, -25}
	for t := range 48 {
		y = append(y, 400+2*float64(t)+season[t%12]+3*float64((t*37)%11-5))
	}
	assumes := diagnose.Assumes{Name: "a moving average", NoTrend: true, NoSeason: true}
	for _, f := range diagnose.Check(y, 12, assumes) {
		fmt.Printf("%s: %s\n", f.Severity, f.Text)
	}
	// Output:
	// warning: The series rises by about 0.47% a period (seasonal Kendall test p < 0.001): a moving average assumes no trend, lags behind it and will under-forecast.
	// warning: A pattern repeating every 12 periods accounts for 86% of the variation around the trend (seasonal strength 0.86): a moving average cannot follow a season and will miss its peaks and troughs.
}

func ExampleDecompose_error() {
	_, err := diagnose.Decompose([]float64{5, 0, 7, 9, 6, 2, 8, 9}, 4, diagnose.Multiplicative)
	fmt.Println(err)
	// Output: a multiplicative decomposition needs values above zero, but 1 value is zero or negative (the first at period 2)
}
