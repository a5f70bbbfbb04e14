package chart_test

import (
	"fmt"
	"math"
	"strings"

	"quillcast/core/chart"
)

// A forecast over a six-month holdout, with its 80% interval.
func ExampleLine() {
	nan := math.NaN()
	l := chart.Line{
		Frame:   chart.Frame{Title: "Candle orders", YTitle: "units"},
		Periods: []string{"2024-01", "2024-02", "2024-03", "2024-04", "2024-05", "2024-06"},
		Series: []chart.Series{
			{Name: "orders", Values: []float64{1210, 1185, 1320, 1402, 1388, 1450}},
			{Name: "drift", Role: chart.Forecast, Values: []float64{nan, nan, nan, 1350, 1395, 1440},
				Bands: []chart.Band{{Level: 80, Lower: []float64{nan, nan, nan, 1280, 1300, 1320}, Upper: []float64{nan, nan, nan, 1420, 1490, 1560}}}},
		},
		HoldoutStart: 3,
	}
	for _, line := range strings.Split(l.SVG(), "\n")[1:3] {
		fmt.Println(line)
	}
	// Output:
	// <title>Candle orders</title>
	// <desc>Line chart over 6 periods from 2024-01 to 2024-06. Series: orders (actual); drift (forecast with 80% intervals). The holdout begins at 2024-04. Values range from 1,185 to 1,560.</desc>
}
