package runner

import (
	"context"
	"encoding/json"
	"strings"
	"testing"

	"quillcast/core/forecast"
	"quillcast/core/session"
	"quillcast/core/steps"
)

var incrementalTests = []struct {
	name     string
	edit     func(text string) string
	computed int // steps run again after the edit
}{
	{"no edit", func(s string) string { return s }, 0},
	{"edit the last step", func(s string) string { return strings.Replace(s, "pick by=mase", "pick by=rmse", 1) }, 1},
	{"edit a middle step", func(s string) string {
		return strings.Replace(s, "forecast ses as=ses", "forecast ses alpha=0.3 as=ses", 1)
	}, 8}, // step 9 of 16 and the 7 after it
	{"edit a comment only", func(s string) string { return strings.Replace(s, "check hw", "check hw # residuals", 1) }, 0},
	{"edit the prose only", func(s string) string {
		return strings.Replace(s, "## Patterns", "## Patterns\n\nA new line of prose.", 1)
	}, 0},
	{"edit a step that only shows something", func(s string) string {
		return strings.Replace(s, "smooth centered width=12", "smooth centered width=4", 1)
	}, 1}, // the smoothed line changes no result the later steps read
	{"edit a step that only shows something into a failure", func(s string) string {
		return strings.Replace(s, "smooth centered width=12", "smooth centered width=1000", 1)
	}, 14}, // it numbers no exhibit, so every later exhibit's number changes
}

// TestIncremental counts the steps run again after an edit: earlier
// results are reused and only the edited step and those after it run.
func TestIncremental(t *testing.T) {
	t.Parallel()
	data := demoData(t)
	text := sessionFile(t, "demo.md").String()
	for _, tc := range incrementalTests {
		t.Run(tc.name, func(t *testing.T) {
			t.Parallel()
			r := New()
			first := r.Run(t.Context(), session.Parse(text), data)
			if first.Reused != 0 || first.Computed != len(first.Outputs) {
				t.Fatalf("first run: computed %d, reused %d of %d", first.Computed, first.Reused, len(first.Outputs))
			}
			edited := tc.edit(text)
			res := r.Run(t.Context(), session.Parse(edited), data)
			if res.Computed != tc.computed || res.Reused != len(res.Outputs)-tc.computed {
				t.Errorf("computed %d and reused %d steps, want %d and %d", res.Computed, res.Reused, tc.computed, len(res.Outputs)-tc.computed)
			}
			// Reused or not, the outputs equal those of a fresh run.
			fresh := New().Run(t.Context(), session.Parse(edited), data)
			for i := range fresh.Outputs {
				if got, want := blockTexts(res.Outputs[i]), blockTexts(fresh.Outputs[i]); got != want || res.Outputs[i].Line != fresh.Outputs[i].Line {
					t.Errorf("step %d differs from a fresh run", i+1)
				}
			}
		})
	}
}

// TestNewDataRecomputes checks that a changed file is not served from the
// snapshots of the old one.
func TestNewDataRecomputes(t *testing.T) {
	t.Parallel()
	r := New()
	doc := stepsDoc("load orders.csv\nsplit last=12\nforecast naive")
	r.Run(t.Context(), doc, testData())
	changed := testData()
	changed.Files["orders.csv"] = synthetic(72, 900, 4, 80)
	res := r.Run(t.Context(), doc, changed)
	if res.Computed != 3 {
		t.Errorf("computed %d steps after the data changed, want 3", res.Computed)
	}
}

// boom is a method whose fit panics, standing in for a fault in the engine.
type boom struct{}

func (boom) Name() string { return "boom" }
func (boom) Fit(y []float64, season int) (*forecast.Fit, error) {
	panic("index out of range [7] with length 3")
}

// TestPanicIsolated injects a panicking method through a test catalogue:
// the runner turns the panic into that step's error, later steps that need
// its forecast wait on it, and the other steps are unaffected.
func TestPanicIsolated(t *testing.T) {
	t.Parallel()
	cat := append(steps.DefaultCatalog(), forecast.Spec{Name: "boom", Title: "Faulty method",
		New: func(forecast.Settings) (forecast.Method, error) { return boom{}, nil }})
	r := &Runner{cat: cat, cache: map[string]cached{}}
	res := r.Run(t.Context(), stepsDoc("load orders.csv\nsplit last=12\nforecast boom\nforecast naive\nevaluate\ncheck boom"), testData())
	want := []Status{Done, Done, Failed, Done, Done, Waiting}
	for i, o := range res.Outputs {
		if o.Status != want[i] {
			t.Errorf("step %d (%s): %s, want %s", i+1, o.Text, o.Status, want[i])
		}
	}
	e := res.Outputs[2].Error
	if e == nil || !strings.Contains(e.Msg, "internal fault") || e.Line != 4 {
		t.Errorf("step 3 error: %v", e)
	}
	if e != nil && strings.Contains(e.Msg, "index out of range") {
		t.Errorf("step 3 error shows the runtime detail to the reader: %q", e.Msg)
	}
	if f := res.Outputs[2].Fault; !strings.Contains(f, "index out of range") {
		t.Errorf("step 3 fault detail %q does not keep the runtime value for a report", f)
	}
	if o := res.Outputs[5]; o.WaitsOn != 3 {
		t.Errorf("step 6 waits on %d, want 3", o.WaitsOn)
	}
	if !strings.Contains(blockTexts(res.Outputs[4]), "boom is missing from this comparison") {
		t.Error("evaluate does not say that the failed forecast is missing")
	}
}

// TestFaultHook checks the recovery around a step through the runner's
// own hook, whatever the step.
func TestFaultHook(t *testing.T) {
	t.Parallel()
	r := New()
	r.fault = func(s *steps.Step) {
		if s.Verb == "split" {
			var m map[string]int
			m["x"]++ // a nil-map write: a runtime fault
		}
	}
	res := r.Run(t.Context(), stepsDoc("load orders.csv\nsplit last=12\nforecast naive\nsmooth centered width=3"), testData())
	got := []Status{res.Outputs[0].Status, res.Outputs[1].Status, res.Outputs[2].Status, res.Outputs[3].Status}
	want := []Status{Done, Failed, Waiting, Done}
	for i := range want {
		if got[i] != want[i] {
			t.Errorf("step %d: %s, want %s", i+1, got[i], want[i])
		}
	}
}

// TestCancelled checks that a cancelled run says so on every step and that
// nothing it left unfinished is reused by the next run.
func TestCancelled(t *testing.T) {
	t.Parallel()
	r := New()
	ctx, cancel := context.WithCancel(t.Context())
	cancel()
	doc := stepsDoc("load orders.csv\nsplit last=12")
	res := r.Run(ctx, doc, testData())
	for _, o := range res.Outputs {
		if o.Status == Done {
			t.Errorf("step %d ran although the run was stopped", o.Step)
		}
	}
	if e := res.Outputs[0].Error; e == nil || !strings.Contains(e.Msg, "stopped") {
		t.Errorf("step 1: %v", e)
	}
	again := r.Run(t.Context(), doc, testData())
	if again.Computed != 2 || again.Outputs[1].Status != Done {
		t.Errorf("after the stop: computed %d, step 2 %s", again.Computed, again.Outputs[1].Status)
	}
}

// TestOutputKeys checks that two outputs have the same key exactly when
// they show the same thing, whether a step was reused or run again, and
// that an edit changes no more keys than the steps it runs again.
func TestOutputKeys(t *testing.T) {
	t.Parallel()
	data := demoData(t)
	text := sessionFile(t, "demo.md").String()
	first := New().Run(t.Context(), session.Parse(text), data)
	seen := map[string]bool{}
	for _, o := range first.Outputs {
		if len(o.Key) != 32 || seen[o.Key] {
			t.Fatalf("step %d: key %q is not 32 digits or is repeated", o.Step, o.Key)
		}
		seen[o.Key] = true
	}
	for _, tc := range incrementalTests {
		t.Run(tc.name, func(t *testing.T) {
			r := New()
			r.Run(t.Context(), session.Parse(text), data)
			res := r.Run(t.Context(), session.Parse(tc.edit(text)), data)
			changed := 0
			for i, o := range res.Outputs {
				same := shown(t, o) == shown(t, first.Outputs[i])
				if same != (o.Key == first.Outputs[i].Key) {
					t.Errorf("step %d: shows the same %v, but keys %q and %q", i+1, same, o.Key, first.Outputs[i].Key)
				}
				if !same {
					changed++
				}
			}
			if changed > tc.computed {
				t.Errorf("%d outputs changed, more than the %d steps run again", changed, tc.computed)
			}
		})
	}
}

// shown is the JSON of what a reader of o sees: o without its document
// line, text and key.
func shown(t *testing.T, o Output) string {
	t.Helper()
	o.Line, o.Text, o.Key = 0, "", ""
	if o.Error != nil {
		e := *o.Error
		e.Line = 0
		o.Error = &e
	}
	b, err := json.Marshal(o)
	if err != nil {
		t.Fatal(err)
	}
	return string(b)
}
