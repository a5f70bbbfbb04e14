package session_test

import (
	"fmt"

	"quillcast/core/session"
)

func ExampleParse() {
	text := "# Orders\n\nProse stays prose.\n\n```quill\nload orders.csv\nsplit last=12\n```\n"
	doc := session.Parse(text)
	for _, p := range doc.Parts {
		fmt.Printf("%s at line %d\n", p.Kind, p.Line)
	}
	for _, l := range doc.StepLines() {
		fmt.Printf("line %d: %s\n", l.Line, l.Text)
	}
	fmt.Println(doc.String() == text)
	// Output:
	// prose at line 1
	// steps at line 5
	// line 6: load orders.csv
	// line 7: split last=12
	// true
}
