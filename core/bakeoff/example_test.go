package bakeoff_test

import (
	"context"
	"fmt"
	"os"
	"strings"

	"quillcast/core/bakeoff"
)

// Two invented quarterly series of a small chain of candle shops, each
// with its last two quarters held out, forecast by three methods. Naive by
// hand: north forecasts 138 against 142 and 149, south 81 against 82 and
// 80; sMAPE (2.857 + 7.666 + 1.227 + 1.242)/4 = 3.25; MASE with scales 6
// and 3: (4/6 + 11/6 + 1/3 + 1/3)/4 = 0.792.
func ExampleRun() {
	const file = `series,category,period,value,role
north,shops,2024-Q1,120,fit
north,shops,2024-Q2,126,fit
north,shops,2024-Q3,131,fit
north,shops,2024-Q4,138,fit
north,shops,2025-Q1,142,test
north,shops,2025-Q2,149,test
south,shops,2024-Q1,80,fit
south,shops,2024-Q2,78,fit
south,shops,2024-Q3,83,fit
south,shops,2024-Q4,81,fit
south,shops,2025-Q1,82,test
south,shops,2025-Q2,80,test
`
	data, err := bakeoff.Read(strings.NewReader(file))
	if err != nil {
		fmt.Println(err)
		return
	}
	res, err := bakeoff.Run(context.Background(), data, bakeoff.Options{Season: 1, Methods: []string{"naive", "drift", "mean"}})
	if err != nil {
		fmt.Println(err)
		return
	}
	if err := res.WriteTable(os.Stdout); err != nil {
		fmt.Println(err)
	}
	// Output:
	// method  series  sMAPE   MASE
	//    drift       2   1.24  0.319
	//    naive       2   3.25  0.792
	//     mean       2   6.71  1.562
}
