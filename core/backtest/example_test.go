package backtest_test

import (
	"fmt"

	"quillcast/core/backtest"
)

// Rolling origin on ten periods: the first fold trains on four periods
// and each later origin moves two periods on, forecasting two ahead.
func ExampleFolds() {
	for _, w := range []backtest.Window{backtest.Expanding, backtest.Sliding} {
		folds, err := backtest.Folds(10, backtest.Origins{Window: w, Initial: 4, Step: 2, Horizon: 2})
		if err != nil {
			fmt.Println(err)
			return
		}
		fmt.Println(w)
		for _, f := range folds {
			fmt.Printf("  train [%d, %d)  test [%d, %d)\n", f.TrainStart, f.TrainEnd, f.TestStart, f.TestEnd)
		}
	}
	// Output:
	// expanding
	//   train [0, 4)  test [4, 6)
	//   train [0, 6)  test [6, 8)
	//   train [0, 8)  test [8, 10)
	// sliding
	//   train [0, 4)  test [4, 6)
	//   train [2, 6)  test [6, 8)
	//   train [4, 8)  test [8, 10)
}

// A width sweep of the trailing moving average on twelve invented weekly
// order counts, the last four held out. Width 1 by hand: training errors
// on the common window (periods 5-8) are -11, -3, 11, 5, RMSE
// sqrt(276/4) = 8.31; the validation forecast 63 misses by -12, -9, -3,
// -6, RMSE sqrt(270/4) = 8.22.
func ExampleSweepMovingAverage() {
	orders := []float64{52, 49, 55, 61, 50, 47, 58, 63, 51, 54, 60, 57}
	s, err := backtest.SweepMovingAverage(orders, 8, backtest.Range{From: 1, To: 4})
	if err != nil {
		fmt.Println(err)
		return
	}
	for _, r := range s.Rows {
		fmt.Printf("width %d: training RMSE %.2f, validation RMSE %.2f\n", r.Width, r.Common.RMSE, r.Validation.RMSE)
	}
	fmt.Println("best width:", s.Best)
	// Output:
	// width 1: training RMSE 8.31, validation RMSE 8.22
	// width 2: training RMSE 9.18, validation RMSE 6.02
	// width 3: training RMSE 7.93, validation RMSE 3.39
	// width 4: training RMSE 6.47, validation RMSE 3.50
	// best width: 4
}
