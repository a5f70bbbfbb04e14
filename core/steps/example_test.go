package steps_test

import (
	"fmt"

	"quillcast/core/steps"
)

func ExampleParseText() {
	doc := "# Orders\n\n```quill\nload orders.csv value=units\nsmooth centered widht=12\nforcast naive\n```\n"
	p := steps.ParseText(doc)
	for _, e := range p.Errors {
		fmt.Println(e)
	}
	// Output:
	// line 5, column 17: unknown option `widht` for `smooth`; did you mean `width`?
	// line 6, column 1: unknown verb `forcast`; did you mean `forecast`?
}

func ExampleComplete() {
	for _, s := range steps.Complete("evaluate by=ma", 15) {
		fmt.Println(s.Text)
	}
	// Output:
	// mae
	// mape
	// mase
}
