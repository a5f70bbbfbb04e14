package runner

import (
	"math"
	"testing"
)

// TestRunProgress runs the demo session with a progress callback: reports
// start at nothing done, never go back, reach the whole run at the end, and
// the backtest reports its forecasts one by one.
func TestRunProgress(t *testing.T) {
	t.Parallel()
	var got []Progress
	res := New().RunWith(t.Context(), sessionFile(t, "demo.md"), demoData(t), Options{Progress: func(p Progress) { got = append(got, p) }})
	steps := len(res.Outputs)
	if len(got) < steps+1 {
		t.Fatalf("%d progress reports for %d steps; want one per step and one at the end at least", len(got), steps)
	}
	if got[0].Done != 0 || got[0].Steps != steps {
		t.Errorf("first report %+v; want 0 of %d done", got[0], steps)
	}
	last := got[len(got)-1]
	if last.Done != steps || last.Verb != "" || last.Fraction() != 1 {
		t.Errorf("last report %+v (fraction %v); want the whole run done", last, last.Fraction())
	}
	parts := 0
	for i, p := range got {
		if i > 0 && p.Fraction() < got[i-1].Fraction() {
			t.Errorf("report %d goes back: %v after %v (%s after %s)", i, p.Fraction(), got[i-1].Fraction(), p, got[i-1])
		}
		if p.Verb == "backtest" && p.Parts == 3 {
			parts++
		}
	}
	if parts != 3 { // 0, 1 and 2 of its 3 forecasts done, as each starts
		t.Errorf("the backtest of 3 forecasts made %d reports with parts; want 3", parts)
	}
}

func TestProgressText(t *testing.T) {
	t.Parallel()
	tests := []struct {
		name     string
		p        Progress
		text     string
		fraction float64 // hand calculation: (done + part/parts) / steps
	}{
		{"start", Progress{Done: 0, Steps: 4, Step: 1, Verb: "load"}, "Step 1 of 4 (load)", 0},
		{"within a step", Progress{Done: 2, Steps: 4, Step: 7, Verb: "backtest", Part: 1, Parts: 2}, "Step 3 of 4 (backtest), part 1 of 2", 0.625},
		{"end", Progress{Done: 4, Steps: 4}, "4 of 4 steps done", 1},
		{"no steps", Progress{}, "0 of 0 steps done", 1},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			t.Parallel()
			if got := tc.p.String(); got != tc.text {
				t.Errorf("%+v.String() = %q, want %q", tc.p, got, tc.text)
			}
			if got := tc.p.Fraction(); math.Abs(got-tc.fraction) > 1e-12 {
				t.Errorf("%+v.Fraction() = %v, want %v", tc.p, got, tc.fraction)
			}
		})
	}
}

// TestBakeoffProgress checks that a bake-off reports its series one by one.
func TestBakeoffProgress(t *testing.T) {
	t.Parallel()
	var parts []int
	New().RunWith(t.Context(), sessionFile(t, "shops-bakeoff.md"), demoData(t), Options{Progress: func(p Progress) {
		if p.Verb == "bakeoff" && p.Parts > 0 {
			parts = append(parts, p.Part)
		}
	}})
	if len(parts) < 2 || parts[len(parts)-1] != len(parts) {
		t.Errorf("the bake-off reported series done %v; want 1, 2, … up to every series", parts)
	}
}
