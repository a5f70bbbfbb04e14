//go:build !faulthook

package runner

import (
	"fmt"
	"testing"
)

// TestFaultLabelIsOrdinary checks that the shipped engine installs no
// fault hook and runs a forecast labelled with the test fault's label like
// any other.
func TestFaultLabelIsOrdinary(t *testing.T) {
	t.Parallel()
	r := New()
	if r.fault != nil {
		t.Fatal("the runner installs a fault hook without the faulthook tag")
	}
	doc := stepsDoc(fmt.Sprintf("load orders.csv\nsplit last=12\nforecast naive as=%s\nforecast drift\ncheck %s", faultLabel, faultLabel))
	res := r.Run(t.Context(), doc, testData())
	for i, o := range res.Outputs {
		if o.Status != Done {
			t.Errorf("step %d (%s): %s %v, want done", i+1, o.Text, o.Status, o.Error)
		}
	}
}
