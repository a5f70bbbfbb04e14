package memo_test

import (
	"fmt"

	"quillcast/core/memo"
)

// A short memo written as Markdown; the cautions section is required.
func ExampleMarkdown() {
	m := memo.Memo{
		Title: "Lanternfield Candles: orders",
		Date:  "2 December 2026",
		Sections: []memo.Section{
			{Kind: memo.Comparison, Blocks: []memo.Block{memo.Table{
				Caption: "Holdout accuracy",
				Columns: []memo.Column{{Header: "Method"}, {Header: "MASE", Numeric: true}},
				Rows:    [][]string{{"hw", "0.42"}, {"naive | seasonal", "1.00"}},
			}}},
			memo.CautionsSection("A moving average follows no trend."),
		},
	}
	md, err := memo.Markdown(m)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Print(md[:len(md)-len(memo.StandingCaution())-1])
	// Output:
	// # Lanternfield Candles: orders
	//
	// **Date:** 2 December 2026
	//
	// ## How the methods compare
	//
	// **Exhibit 1 — Holdout accuracy**
	//
	// | Method | MASE |
	// | :--- | ---: |
	// | hw | 0.42 |
	// | naive \| seasonal | 1.00 |
	//
	// ## Assumptions and cautions
	//
	// - A moving average follows no trend.
	//
}
