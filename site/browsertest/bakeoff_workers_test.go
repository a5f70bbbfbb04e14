package browsertest

import (
	"context"
	"encoding/json"
	"fmt"
	"os"
	"path/filepath"
	"reflect"
	"regexp"
	"strconv"
	"strings"
	"testing"

	"github.com/chromedp/cdproto/emulation"
	"github.com/chromedp/chromedp"

	"quillcast/core/session"
	"quillcast/core/steps/runner"
)

// shopsFile is the demo file with one monthly series per shop.
const shopsFile = "wickery-shops-monthly.csv"

// shopsBakeoff are the steps of a bake-off over every shop.
var shopsBakeoff = []string{
	"load " + shopsFile + " value=units date=month",
	"bakeoff methods=naive,seasonal-naive,ses,holt-winters,theta,auto last=12 by=mase",
}

// sharedAmong finds the bake-off's note on how many workers shared it.
var sharedAmong = regexp.MustCompile(`The bake-off was shared among (\d+) workers\.`)

// TestBakeoffWorkers runs a bake-off over the demo's shops in the page,
// which shares it among further workers: Stop during the bake-off ends the
// run, and the next run on the fresh engine shows the table a run in one
// engine shows (the native runner, as the page's single worker runs it)
// and says it was shared among more than one worker.
func TestBakeoffWorkers(t *testing.T) {
	data, err := os.ReadFile(filepath.Join(moduleRoot(t), "testdata", "demo", shopsFile))
	if err != nil {
		t.Fatal(err)
	}
	p := openSite(t)
	// Three cores, whatever the machine has, so that the page may start
	// three further workers.
	if _, err := chromedp.Call(p.ctx, emulation.SetHardwareConcurrencyOverride, emulation.SetHardwareConcurrencyOverrideParams{HardwareConcurrency: 3}); err != nil {
		t.Fatalf("reporting three cores: %v", err)
	}
	ready := p.open("")
	if a := attachBytes(p, data, shopsFile); !a.OK {
		t.Fatalf("attaching %s: %s", shopsFile, a.errorText())
	}
	parts := stepsParts(shopsBakeoff)

	// Stop as soon as the first part of the bake-off is done: the run ends
	// with the "stopped" failure.
	ended := eval[string](p, fmt.Sprintf(`new Promise((resolve) => {
		const heard = (e) => {
			if (!/\(bakeoff\), part [1-9]/.test(e.detail.text)) return;
			globalThis.removeEventListener('quillcast-progress', heard);
			document.getElementById('stop').click();
		};
		globalThis.addEventListener('quillcast-progress', heard);
		globalThis.quillcast.run(%q).then(() => resolve('finished'), (e) => resolve(e.failure ? e.failure.code || e.message : String(e)));
	})`, parts))
	if ended != "stopped" {
		t.Fatalf("the bake-off stopped by Stop ended with %q, want stopped", ended)
	}
	waitFor(p, "the fresh engine", `globalThis.quillcast && globalThis.quillcast.ready === true`)

	a := callAPI(p, "run", fmt.Sprintf("%q", parts))
	if !a.OK {
		t.Fatalf("the bake-off run failed: %s", a.errorText())
	}
	var ran struct {
		Result struct {
			Outputs []runner.Output `json:"outputs"`
		} `json:"result"`
	}
	if err := json.Unmarshal(a.Value, &ran); err != nil {
		t.Fatal(err)
	}
	if n := len(ran.Result.Outputs); n != 2 {
		t.Fatalf("%d outputs, want 2", n)
	}
	got := ran.Result.Outputs[1]

	doc := session.Parse("```quill\n" + strings.Join(shopsBakeoff, "\n") + "\n```\n")
	native := runner.New().Run(context.Background(), doc, runner.Data{Files: map[string][]byte{shopsFile: data}})
	want := native.Outputs[1]
	if got.Status != runner.Done || want.Status != runner.Done {
		t.Fatalf("bake-off status %q in the page and %q natively, want done", got.Status, want.Status)
	}
	if g, w := tableBlocks(got), tableBlocks(want); len(w) != 1 || !reflect.DeepEqual(g, w) {
		t.Errorf("the page's bake-off table\n%v\ndiffers from a single engine's\n%v", g, w)
	}
	m := sharedAmong.FindStringSubmatch(messageTexts(got))
	if m == nil {
		t.Fatalf("the bake-off does not say it was shared among workers:\n%s", messageTexts(got))
	}
	if n, _ := strconv.Atoi(m[1]); n < 2 {
		t.Errorf("the bake-off was shared among %d workers, want more than one", n)
	}
	p.checkClean(ready)
}

// stepsParts is the JSON text of a session of one steps part.
func stepsParts(lines []string) string {
	type line struct {
		Text string `json:"text"`
		Line int    `json:"line"`
	}
	part := struct {
		Kind  string `json:"kind"`
		Lines []line `json:"lines"`
	}{Kind: "steps"}
	for i, l := range lines {
		part.Lines = append(part.Lines, line{l, i + 2})
	}
	b, _ := json.Marshal([]any{part})
	return string(b)
}

// tableBlocks returns the tables of an output.
func tableBlocks(o runner.Output) []runner.Table {
	var out []runner.Table
	for _, b := range o.Blocks {
		if b.Kind == "table" && b.Table != nil {
			out = append(out, *b.Table)
		}
	}
	return out
}

// messageTexts joins the messages of an output, one a line.
func messageTexts(o runner.Output) string {
	var b strings.Builder
	for _, bl := range o.Blocks {
		if bl.Kind == "message" {
			b.WriteString(bl.Text + "\n")
		}
	}
	return b.String()
}
