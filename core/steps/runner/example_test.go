package runner_test

import (
	"context"
	"fmt"

	"quillcast/core/session"
	"quillcast/core/steps/runner"
)

func ExampleRunner_Run() {
	data := runner.Data{Files: map[string][]byte{
		"sales.csv": []byte("quarter,sales\n2022-Q1,100\n2022-Q2,120\n2022-Q3,90\n2022-Q4,140\n" +
			"2023-Q1,104\n2023-Q2,125\n2023-Q3,93\n2023-Q4,146\n2024-Q1,108\n2024-Q2,129\n2024-Q3,97\n2024-Q4,151\n"),
	}}
	doc := session.Parse("```quill\nload sales.csv\nsplit last=4\nforecast seasonal-naive as=sn\nevaluate by=mae\ncheck nope\n```\n")
	res := runner.New().Run(context.Background(), doc, data)
	for _, o := range res.Outputs {
		fmt.Printf("step %d %s: %s\n", o.Step, o.Verb, o.Status)
	}
	fmt.Println(res.Errors[0])
	// Output:
	// step 1 load: done
	// step 2 split: done
	// step 3 forecast: done
	// step 4 evaluate: done
	// step 5 check: failed
	// line 6, column 7: no forecast is labelled `nope` yet; the forecasts so far are sn
}
