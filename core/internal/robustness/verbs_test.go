package robustness

import (
	"context"
	"strings"
	"testing"

	"quillcast/core/forecast"
	"quillcast/core/session"
	"quillcast/core/steps"
	"quillcast/core/steps/runner"
)

// sessionOf wraps step lines in a session document.
func sessionOf(lines []string) *session.Document {
	return session.Parse("```quill\n" + strings.Join(lines, "\n") + "\n```\n")
}

// everyVerb is a session using every verb of the step language after the
// load step, with each method of the catalogue forecast once.
func everyVerb() []string {
	lines := []string{
		`memo title="Robustness" client="Test" by="Test" date=2026-01-01`,
		"load data.csv value=units date=month",
		"split last=6",
		"smooth centered width=12",
		"smooth trailing width=3",
	}
	for _, sp := range forecast.Catalog() {
		lines = append(lines, "forecast "+sp.Name+" as=m-"+sp.Name)
	}
	return append(lines,
		"combine of=m-ses,m-holt as=both",
		"evaluate",
		"evaluate by=mape",
		"sweep moving-average width=1..6",
		"backtest origins=3 horizon=2",
		"difference lag=1",
		"difference lag=12",
		"decompose",
		"decompose multiplicative",
		"check",
		"check m-holt-winters",
		"pick by=rmse",
		"bakeoff last=3",
	)
}

// TestEveryVerbCovered fails when a verb is added to the language without
// being added to [everyVerb].
func TestEveryVerbCovered(t *testing.T) {
	t.Parallel()
	used := map[string]bool{}
	for _, l := range everyVerb() {
		used[strings.Fields(l)[0]] = true
	}
	for _, v := range steps.Verbs() {
		if !used[v.Name] {
			t.Errorf("the verb %q is not in the robustness session", v.Name)
		}
	}
}

// TestEveryVerbOnHardSeries runs every verb on every hard series. A step
// either runs or fails with a message that names no programming term; no
// step faults; no table cell, message or chart shows NaN or infinity; the
// memo still passes its own checks.
func TestEveryVerbOnHardSeries(t *testing.T) {
	t.Parallel()
	lines := everyVerb()
	for _, sh := range shapes() {
		t.Run(sh.name, func(t *testing.T) {
			t.Parallel()
			data := runner.Data{Files: map[string][]byte{"data.csv": monthlyCSV(sh.values)}}
			res := runner.New().Run(context.Background(), sessionOf(lines), data)
			if len(res.Outputs) != len(lines) {
				t.Fatalf("%d outputs for %d steps", len(res.Outputs), len(lines))
			}
			// A series too short to forecast is refused by the load step,
			// which says so; every later step then waits on it.
			if load := res.Outputs[1]; load.Status != runner.Done && len(sh.values) >= 3 {
				t.Fatalf("the load step did not run: %v", load.Error)
			}
			count := map[runner.Status]int{}
			for _, o := range res.Outputs {
				checkOutput(t, o)
				count[o.Status]++
				if o.Status == runner.Failed {
					t.Logf("%s: %s", o.Text, o.Error.Msg)
				}
			}
			if sh.name == "ordinary" && count[runner.Done] != len(lines) {
				t.Errorf("on an ordinary series %d of %d steps ran", count[runner.Done], len(lines))
			}
			if err := res.Memo("robustness").Check(); err != nil {
				t.Errorf("memo: %v", err)
			}
		})
	}
}

// checkOutput fails on a faulted step, a failure without a message and a
// non-finite number anywhere in the output.
func checkOutput(t *testing.T, o runner.Output) {
	t.Helper()
	switch o.Status {
	case runner.Failed:
		if o.Error == nil {
			t.Errorf("step %q failed without an error", o.Text)
			return
		}
		if strings.Contains(o.Error.Msg, "internal fault") {
			t.Errorf("step %q faulted: %s", o.Text, o.Error.Msg)
		}
		checkMessage(t, o.Text, o.Error.Msg)
	case runner.Waiting:
		if o.WaitsOn == 0 {
			t.Errorf("step %q waits without naming the step it waits on", o.Text)
		}
	case runner.Done:
	default:
		t.Errorf("step %q has the status %q", o.Text, o.Status)
	}
	for _, b := range o.Blocks {
		if bad := nonFinite(b); bad != "" {
			t.Errorf("step %q shows a number that is not finite: %.200q", o.Text, bad)
		}
	}
}

// nonFinite returns the piece of a block's text that shows NaN or an
// infinity, or "".
func nonFinite(b runner.Block) string {
	texts := []string{b.Text, b.Title, b.SVG}
	if b.Table != nil {
		texts = append(texts, b.Table.Headers...)
		for _, r := range b.Table.Rows {
			texts = append(texts, r...)
		}
	}
	for _, s := range texts {
		for _, bad := range []string{"NaN", "Inf", "∞"} {
			if i := strings.Index(s, bad); i >= 0 {
				return s[max(0, i-60):min(len(s), i+20)]
			}
		}
	}
	return ""
}
