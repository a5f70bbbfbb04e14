package runner

import (
	"fmt"
	"strings"
	"testing"
)

// TestEvaluateSaysWhyNoMeasure checks that when no forecast has a defined
// value of the chosen measure, the note under evaluate gives the reason in
// the measure's own words instead of leaving the reader guessing.
func TestEvaluateSaysWhyNoMeasure(t *testing.T) {
	t.Parallel()
	var csv strings.Builder
	csv.WriteString("month,units\n")
	for i := range 36 {
		v := 10 + i%5
		if i >= 30 && i%2 == 0 {
			v = 0 // zero actual values in the validation period make MAPE undefined
		}
		fmt.Fprintf(&csv, "%d-%02d,%d\n", 2022+i/12, i%12+1, v)
	}
	res := run("load units.csv value=units date=month\nsplit last=6\nforecast naive as=n\nevaluate by=mape",
		Data{Files: map[string][]byte{"units.csv": []byte(csv.String())}})
	out := res.Outputs[len(res.Outputs)-1]
	text := blockTexts(out)
	for _, want := range []string{"No forecast has a defined MAPE", "MAPE undefined", "zero"} {
		if !strings.Contains(text, want) {
			t.Errorf("evaluate note lacks %q; got:\n%s", want, text)
		}
	}
}
