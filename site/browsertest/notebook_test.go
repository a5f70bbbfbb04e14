package browsertest

import (
	"context"
	"fmt"
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"
	"time"

	"github.com/chromedp/chromedp"
)

// stepSelector finds the first step line starting with prefix and returns
// the CSS selector of its code element.
func stepSelector(p *page, prefix string) string {
	p.t.Helper()
	sel := eval[string](p, fmt.Sprintf(`(() => {
		const c = [...document.querySelectorAll('#parts code.line')].find(n => n.textContent.startsWith(%q));
		return c ? 'code.line[data-part="' + c.dataset.part + '"][data-line="' + c.dataset.line + '"]' : '';
	})()`, prefix))
	if sel == "" {
		p.fail("finding the step "+prefix, fmt.Errorf("no step line starts with %q", prefix))
	}
	return sel
}

// outputText returns the text of the output under a step line.
func outputText(p *page, sel string) string {
	return eval[string](p, fmt.Sprintf(`(() => { const c = document.querySelector(%q); const o = c && c.closest('.step').querySelector('.output'); return o ? o.textContent : ''; })()`, sel))
}

// waitFor polls a JavaScript condition until it holds.
func waitFor(p *page, what, cond string) {
	p.t.Helper()
	ctx, cancel := context.WithTimeout(p.ctx, 30*time.Second)
	defer cancel()
	if _, err := chromedp.Run(ctx, chromedp.Poll[bool](cond, chromedp.WithPollingInterval(50*time.Millisecond))); err != nil {
		p.fail("waiting for "+what, err)
	}
}

// TestNotebook walks through a working day: edit a step and see its output
// change, find the session again after a reload, attach a file through the
// picker, and open a link that carries the steps.
func TestNotebook(t *testing.T) {
	p := openSite(t)
	ready := p.open("")

	// Edit a step: its output must change and the session must be saved.
	sel := stepSelector(p, "smooth centered width=12")
	before := outputText(p, sel)
	if before == "" {
		t.Fatal("the smoothing step shows no output")
	}
	p.run("editing the smoothing step", 20*time.Second,
		chromedp.Click(chromedp.CSS(sel)),
		chromedp.WaitVisible(chromedp.CSS("input.line-edit")),
		chromedp.SetValue(chromedp.CSS("input.line-edit"), "smooth centered width=4"),
		chromedp.KeyEvent("\r"),
	)
	waitFor(p, "the edited step's output", `[...document.querySelectorAll('#parts code.line')].some(n => n.textContent === 'smooth centered width=4')`)
	sel = stepSelector(p, "smooth centered width=4")
	waitFor(p, "the new output", fmt.Sprintf(`(() => { const c = document.querySelector(%q); const o = c && c.closest('.step').querySelector('.output'); return o && o.textContent !== %q; })()`, sel, before))
	waitFor(p, "the autosave", `/^[0-9]+$/.test(document.documentElement.dataset.saved || '') && Number(document.documentElement.dataset.saved) >= 2`)
	p.screenshot("edited-step")
	p.checkClean(ready)

	// Reload: the edited session comes back, outputs included.
	ready = p.open("")
	sel = stepSelector(p, "smooth centered width=4")
	if outputText(p, sel) == "" {
		t.Error("after a reload the edited step shows no output")
	}
	p.checkClean(ready)

	// Attach a file through the picker: it is listed and previewed.
	csv := filepath.Join(t.TempDir(), "harbour-weekly.csv")
	var b strings.Builder
	b.WriteString("week;orders\n")
	for w := 1; w <= 30; w++ {
		fmt.Fprintf(&b, "2024-W%02d;%d,5\n", w, 100+w*3%17)
	}
	if err := os.WriteFile(csv, []byte(b.String()), 0o644); err != nil {
		t.Fatal(err)
	}
	p.run("attaching a file", 20*time.Second, chromedp.SetUploadFiles(chromedp.CSS("#file-input"), []string{csv}))
	waitFor(p, "the attached dataset in the rail", `[...document.querySelectorAll('#datasets li .link')].some(n => n.textContent === 'harbour-weekly.csv')`)
	waitFor(p, "the preview", `document.getElementById('preview-dialog').open && document.querySelectorAll('#preview-body svg.qc').length > 0`)
	p.screenshot("attached-file")
	// The preview offers the load step for the series; using it adds the
	// step to the session and runs it.
	p.run("adding the load step", 10*time.Second, chromedp.Click(chromedp.CSS("#preview-body button")))
	waitFor(p, "the new load step", `[...document.querySelectorAll('#parts code.line')].some(n => n.textContent === 'load harbour-weekly.csv value=orders date=week')`)
	p.checkClean(ready)

	// Share: the link carries the steps only and opens as a new session.
	p.run("making a share link", 10*time.Second, chromedp.Click(chromedp.CSS("#share")))
	link := eval[string](p, `document.getElementById('share-link').value`)
	if !strings.Contains(link, "#steps=") || strings.Contains(link, "2017-01") {
		t.Fatalf("share link %q should carry steps and no data", link)
	}
	ready = p.open(link[strings.Index(link, "#"):])
	if got := eval[string](p, `document.getElementById('doc-title').value`); got != "Shared steps" {
		t.Errorf("a share link opened the session %q, want a new one titled %q", got, "Shared steps")
	}
	if n := eval[int](p, `document.querySelectorAll('#parts code.line .verb').length`); n < 5 {
		t.Errorf("the shared session shows %d steps, want the demo's steps", n)
	}
	if loc := eval[string](p, `location.hash`); loc != "" {
		t.Errorf("after opening, the link's steps stay in the address (%q)", loc)
	}
	p.screenshot("shared-link")
	p.checkClean(ready)
}

// TestMemo writes the memo of the demo session: the preview shows the
// holdout accuracy table, and the markdown and zip downloads carry it too.
func TestMemo(t *testing.T) {
	p := openSite(t)
	ready := p.open("")
	p.run("opening the memo preview", 30*time.Second, chromedp.Click(chromedp.CSS("#memo-preview")))
	waitFor(p, "the memo preview", `document.getElementById('memo-dialog').open && document.querySelectorAll('#memo-body table').length > 0`)
	p.screenshot("memo-preview")
	preview := eval[string](p, `document.getElementById('memo-body').textContent`)
	for _, want := range []string{"MASE", "holdout", "estimates"} {
		if !strings.Contains(strings.ToLower(preview), strings.ToLower(want)) {
			t.Errorf("the memo preview does not mention %q", want)
		}
	}
	if n := eval[int](p, `document.querySelectorAll('#memo-body svg.qc').length`); n == 0 {
		t.Error("the memo preview shows no chart")
	}
	md := eval[string](p, `globalThis.quillcast.memo("md").then(t => JSON.parse(t).value.text)`)
	if !strings.Contains(md, "| ") || !strings.Contains(md, "MASE") {
		t.Errorf("the markdown memo lacks the accuracy table:\n%.600s", md)
	}
	zipHead := eval[string](p, `globalThis.quillcast.memo("zip").then(t => atob(JSON.parse(t).value.bytes).slice(0, 2))`)
	if zipHead != "PK" {
		t.Errorf("the zip memo starts with %q, want a zip archive (PK)", zipHead)
	}
	p.checkClean(ready)
}

// editStep replaces the text of the step line starting with prefix and
// runs it.
func editStep(p *page, prefix, text string) {
	p.t.Helper()
	sel := stepSelector(p, prefix)
	p.run("editing "+prefix, 20*time.Second,
		chromedp.Click(chromedp.CSS(sel)),
		chromedp.WaitVisible(chromedp.CSS("input.line-edit")),
		chromedp.SetValue(chromedp.CSS("input.line-edit"), text),
		chromedp.KeyEvent("\r"),
	)
	waitFor(p, "the edited line", fmt.Sprintf(`[...document.querySelectorAll('#parts code.line')].some(n => n.textContent === %q)`, text))
}

// TestAnotherTabsSave opens the same session in two tabs: the second tab's
// save must not overwrite the first one's silently.
func TestAnotherTabsSave(t *testing.T) {
	a := openSite(t)
	readyA := a.open("")
	b := a.newTab()
	readyB := b.open("")

	editStep(a, "split last=12", "split last=6")
	waitFor(a, "tab A's save", `document.documentElement.dataset.saved && /^[0-9]+$/.test(document.documentElement.dataset.saved)`)

	editStep(b, "evaluate by=mase", "evaluate by=rmse")
	waitFor(b, "the warning about the other tab", `!document.getElementById('banner').hidden && document.getElementById('banner').textContent.includes('another tab')`)
	b.screenshot("conflict-banner")
	if got := eval[string](b, `document.documentElement.dataset.saved`); got != "failed" {
		t.Errorf("tab B's save state is %q, want failed", got)
	}

	// Tab B takes the other tab's version: tab A's edit appears, tab B's
	// unsaved edit is dropped only on this explicit choice.
	b.run("loading the other tab's version", 10*time.Second, chromedp.Click(chromedp.CSS("#banner button")))
	waitFor(b, "tab A's edit in tab B", `[...document.querySelectorAll('#parts code.line')].some(n => n.textContent === 'split last=6')`)
	a.checkClean(readyA)
	b.checkClean(readyB)
}

// TestStopRun stops a run under way: the page says so, keeps the steps, and
// the fresh engine runs them again on request.
func TestStopRun(t *testing.T) {
	p := openSite(t)
	ready := p.open("")
	eval[bool](p, `(() => { document.getElementById('run-all').click(); document.getElementById('stop').click(); return true; })()`)
	waitFor(p, "the stopped message", `document.getElementById('status').textContent.startsWith('Stopped')`)
	waitFor(p, "the fresh engine", `globalThis.quillcast && globalThis.quillcast.ready === true`)
	p.run("running again", 10*time.Second, chromedp.Click(chromedp.CSS("#run-all")))
	waitFor(p, "the steps to run again", `document.getElementById('status').textContent.startsWith('All steps ran')`)
	if n := eval[int](p, `document.querySelectorAll('#parts svg.qc').length`); n == 0 {
		t.Error("after the restart no chart is drawn")
	}
	p.checkClean(ready)
}

// TestStopKeepsPreviousResults stops a run as soon as it reports progress:
// the page keeps the previous run's outputs, the stored session is not
// written, and a reload shows the same session. A run to the end then fills
// the progress bar step by step, from the engine's own reports.
func TestStopKeepsPreviousResults(t *testing.T) {
	p := openSite(t)
	ready := p.open("")
	outputs := `[...document.querySelectorAll('#parts .output')].map(n => n.textContent).join('\n')`
	before := eval[string](p, outputs)
	saved := eval[string](p, `document.documentElement.dataset.saved`)
	if before == "" || saved == "" {
		t.Fatalf("the demo has outputs %q and save state %q before the stop; want both", before[:min(len(before), 40)], saved)
	}
	stopped := eval[bool](p, `new Promise((resolve) => {
		globalThis.addEventListener('quillcast-progress', () => { document.getElementById('stop').click(); resolve(true); }, { once: true });
		document.getElementById('run-all').click();
	})`)
	if !stopped {
		t.Fatal("the run reported no progress")
	}
	waitFor(p, "the stopped message", `document.getElementById('status').textContent.startsWith('Stopped')`)
	waitFor(p, "the fresh engine", `globalThis.quillcast && globalThis.quillcast.ready === true`)
	if after := eval[string](p, outputs); after != before {
		t.Errorf("the outputs changed when the run was stopped")
	}
	if got := eval[string](p, `document.documentElement.dataset.saved`); got != saved {
		t.Errorf("save state %q after the stop, want %q (nothing written)", got, saved)
	}

	// A whole run on the fresh engine (nothing cached): every report's
	// fraction lies in [0, 1], never goes back, and the last one is 1.
	eval[bool](p, `(() => { globalThis.seen = []; globalThis.addEventListener('quillcast-progress', (e) => globalThis.seen.push(e.detail.fraction)); return true; })()`)
	p.run("running again", 10*time.Second, chromedp.Click(chromedp.CSS("#run-all")))
	waitFor(p, "the steps to run again", `document.getElementById('status').textContent.startsWith('All steps ran')`)
	seen := eval[[]float64](p, `globalThis.seen`)
	if len(seen) < 3 {
		t.Fatalf("%d progress reports in a whole run; want one per step", len(seen))
	}
	for i, f := range seen {
		if f < 0 || f > 1 || (i > 0 && f < seen[i-1]) {
			t.Errorf("progress reports %v: report %d is out of order or range", seen, i)
			break
		}
	}
	if last := seen[len(seen)-1]; math.Abs(last-1) > 1e-9 {
		t.Errorf("the last progress report is %v, want 1", last)
	}
	if got := eval[string](p, outputs); got != before {
		t.Errorf("the outputs of the run again differ from those before the stop")
	}

	ready = p.open("")
	waitFor(p, "the restored outputs", outputs+` === `+fmt.Sprintf("%q", before))
	p.checkClean(ready)
}

// TestForgetAllLocalData removes every session and dataset after the
// confirmation, and a reload finds none of them.
func TestForgetAllLocalData(t *testing.T) {
	p := openSite(t)
	ready := p.open("")
	p.run("asking to forget", 10*time.Second, chromedp.Click(chromedp.CSS("#forget")))
	waitFor(p, "the confirmation", `document.getElementById('forget-dialog').open`)
	p.run("confirming", 10*time.Second, chromedp.Click(chromedp.CSS(`#forget-dialog button[value="forget"]`)))
	waitFor(p, "the page to forget", `document.getElementById('status').textContent.startsWith('Every session and dataset was removed')`)
	if n := eval[int](p, `document.querySelectorAll('#datasets li').length`); n != 0 {
		t.Errorf("%d datasets still listed after forgetting", n)
	}
	if got := eval[string](p, `[...document.querySelectorAll('#sessions li')].map(n => n.textContent).join('|')`); got != "Untitled session" {
		t.Errorf("sessions after forgetting: %q, want only the new empty session", got)
	}
	p.checkClean(ready)
}
