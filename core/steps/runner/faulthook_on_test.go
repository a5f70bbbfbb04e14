//go:build faulthook

package runner

import (
	"fmt"
	"strings"
	"testing"
)

// TestFaultLabelFaults checks the faulthook build: the forecast labelled
// with the test fault's label stops on an internal fault, the step that
// needs it waits on it, and the others run.
func TestFaultLabelFaults(t *testing.T) {
	t.Parallel()
	doc := stepsDoc(fmt.Sprintf("load orders.csv\nsplit last=12\nforecast naive as=%s\nforecast drift\ncheck %s", faultLabel, faultLabel))
	res := New().Run(t.Context(), doc, testData())
	want := []Status{Done, Done, Failed, Done, Waiting}
	if len(res.Outputs) != len(want) {
		t.Fatalf("%d outputs, want %d", len(res.Outputs), len(want))
	}
	for i, o := range res.Outputs {
		if o.Status != want[i] {
			t.Errorf("step %d (%s): %s, want %s", i+1, o.Text, o.Status, want[i])
		}
	}
	if e := res.Outputs[2].Error; e == nil || !strings.Contains(e.Msg, "internal fault") {
		t.Errorf("step 3 error: %v, want the internal fault", e)
	}
	if o := res.Outputs[4]; o.WaitsOn != 3 {
		t.Errorf("step 5 waits on %d, want 3", o.WaitsOn)
	}
}
