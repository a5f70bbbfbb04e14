package browsertest

import (
	"os"
	"path/filepath"
	"strings"
	"testing"
	"time"

	"github.com/chromedp/chromedp"
	"github.com/chromedp/chromedp/kb"
)

// TestPasteAndDrop attaches data the two other ways: cells pasted from a
// spreadsheet (tab-separated text) and a file dropped on the page.
func TestPasteAndDrop(t *testing.T) {
	p := openSite(t)
	ready := p.open("")
	eval[bool](p, `(() => {
		const dt = new DataTransfer();
		dt.setData('text/plain', 'quarter\trevenue\n2023-Q1\t1 204,5\n2023-Q2\t1 310,0\n2023-Q3\t1 288,25\n2023-Q4\t1 502,0\n2024-Q1\t1 250,0\n');
		document.body.dispatchEvent(new ClipboardEvent('paste', { clipboardData: dt, bubbles: true }));
		return true;
	})()`)
	waitFor(p, "the pasted cells in the rail", `[...document.querySelectorAll('#datasets li .link')].some(n => /^pasted-[0-9]+\.tsv$/.test(n.textContent))`)
	waitFor(p, "the preview of the pasted cells", `document.getElementById('preview-dialog').open && document.getElementById('preview-body').textContent.includes('revenue')`)
	p.run("closing the preview", 10*time.Second, chromedp.Click(chromedp.CSS("#preview-dialog button")))

	eval[bool](p, `(() => {
		const dt = new DataTransfer();
		dt.items.add(new File(['day,calls\n2024-03-01,40\n2024-03-02,38\n2024-03-03,45\n2024-03-04,41\n'], 'call-centre.csv', { type: 'text/csv' }));
		document.dispatchEvent(new DragEvent('drop', { dataTransfer: dt, bubbles: true, cancelable: true }));
		return true;
	})()`)
	waitFor(p, "the dropped file in the rail", `[...document.querySelectorAll('#datasets li .link')].some(n => n.textContent === 'call-centre.csv')`)
	waitFor(p, "the preview of the dropped file", `document.getElementById('preview-dialog').open && document.getElementById('preview-body').textContent.includes('calls')`)
	p.checkClean(ready)
}

// TestKeyboard moves between steps, edits one and adds one without a mouse.
func TestKeyboard(t *testing.T) {
	p := openSite(t)
	ready := p.open("")
	first := stepSelector(p, "memo ")
	p.run("focusing the first step", 10*time.Second, chromedp.Focus(chromedp.CSS(first)))
	p.run("moving down", 10*time.Second, chromedp.KeyEvent(kb.ArrowDown))
	if got := eval[string](p, `document.activeElement.textContent`); got != "load wickery-monthly-orders.csv value=units date=month" {
		t.Fatalf("after ↓ the focus is on %q, want the load step", got)
	}
	p.run("editing, then leaving with Escape", 10*time.Second, chromedp.KeyEvent("\r"))
	if tag := eval[string](p, `document.activeElement.tagName + '.' + document.activeElement.className`); tag != "INPUT.line-edit" {
		t.Fatalf("Enter on a step focuses %q, want its edit box", tag)
	}
	p.run("cancelling", 10*time.Second, chromedp.KeyEvent(kb.Escape))
	p.run("adding a step below", 10*time.Second, chromedp.KeyEvent("\r", chromedp.KeyModifiers(chromedp.ModifierCtrl)))
	waitFor(p, "the new step's edit box", `document.activeElement.classList.contains('line-edit') && document.activeElement.value === ''`)
	// Completion: "smo" and Tab give the verb.
	p.run("typing the start of a verb", 10*time.Second, chromedp.SendKeys(chromedp.CSS("input.line-edit"), "smo"))
	waitFor(p, "the completion list", `[...document.querySelectorAll('.suggest li code')].every(c => c.textContent.startsWith('smo')) && document.querySelectorAll('.suggest li').length > 0`)
	p.run("completing", 10*time.Second, chromedp.KeyEvent(kb.Tab))
	waitFor(p, "the completed verb", `document.querySelector('input.line-edit').value.startsWith('smooth')`)
	eval[bool](p, `(() => { document.querySelector('input.line-edit').value = ''; return true; })()`)
	p.run("typing a step", 10*time.Second, chromedp.SendKeys(chromedp.CSS("input.line-edit"), "smooth trailing widht=4\r"))
	waitFor(p, "the error marker", `document.querySelector('#parts mark.error-at') !== null`)
	msg := eval[string](p, `document.querySelector('#parts mark.error-at').closest('.step').querySelector('.msg.error').textContent`)
	if msg == "" {
		t.Error("the misspelt option shows no message under its step")
	}
	t.Logf("message under the misspelt step: %s", msg)
	p.screenshot("error-marker")
	p.checkClean(ready)
}

// TestSessionFileRoundTrip saves the demo session as a file with its data
// inside and opens that file again as a new session whose steps run on
// the embedded data; then undoes an edit with Ctrl+Z.
func TestSessionFileRoundTrip(t *testing.T) {
	p := openSite(t)
	ready := p.open("")
	// Ask the engine for exactly what "Save session file" writes.
	text := eval[string](p, `(async () => {
		const parts = JSON.parse(await globalThis.quillcast.run(JSON.stringify([{kind: "steps", lines: [{text: "load wickery-monthly-orders.csv value=units date=month"}, {text: "split last=12"}]}]))).value.parts;
		return JSON.parse(await globalThis.quillcast.exportSession(JSON.stringify(parts), true)).value;
	})()`)
	if !strings.Contains(text, "```quill-data wickery-monthly-orders.csv") {
		t.Fatalf("the session file lacks its data block:\n%.400s", text)
	}
	file := filepath.Join(t.TempDir(), "orders-review.md")
	if err := os.WriteFile(file, []byte(text), 0o644); err != nil {
		t.Fatal(err)
	}
	p.run("opening the session file", 20*time.Second, chromedp.SetUploadFiles(chromedp.CSS("#import-input"), []string{file}))
	// The title changes before the new session's run ends; its two step
	// lines (the demo has many) tell that the page shows it.
	waitFor(p, "the imported session", `document.getElementById('doc-title').value === 'orders-review' && document.querySelectorAll('#parts code.line').length === 2 && document.querySelectorAll('#parts figure.exhibit').length > 0`)

	// Undo: delete the split step with the Delete key, then Ctrl+Z brings it back.
	sel := stepSelector(p, "split last=12")
	p.run("deleting a step", 10*time.Second, chromedp.Focus(chromedp.CSS(sel)), chromedp.KeyEvent(kb.Delete))
	waitFor(p, "the step gone", `![...document.querySelectorAll('#parts code.line')].some(n => n.textContent === 'split last=12')`)
	p.run("undoing", 10*time.Second, chromedp.KeyEvent("z", chromedp.KeyModifiers(chromedp.ModifierCtrl)))
	waitFor(p, "the step back", `[...document.querySelectorAll('#parts code.line')].some(n => n.textContent === 'split last=12')`)
	p.checkClean(ready)
}
