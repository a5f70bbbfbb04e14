package browsertest

import (
	"fmt"
	"strings"
	"testing"
	"time"

	cdppage "github.com/chromedp/cdproto/page"
	"github.com/chromedp/chromedp"
)

// onNewDocument runs script in every document p opens from now on, before
// the page's own scripts.
func onNewDocument(t *testing.T, p *page, script string) {
	t.Helper()
	if _, err := chromedp.Call(p.ctx, cdppage.AddScriptToEvaluateOnNewDocument, cdppage.AddScriptToEvaluateOnNewDocumentParams{Source: script}); err != nil {
		t.Fatalf("adding a script to the page: %v", err)
	}
}

// withoutWorkers makes the page run its engine on the page itself, where a
// test can reach the engine's storage calls.
const withoutWorkers = `delete globalThis.Worker;`

// checkWorksInMemory asserts that the page runs steps, offers the session
// file, and that the engine writes it.
func checkWorksInMemory(t *testing.T, p *page) {
	t.Helper()
	p.run("running every step", 20*time.Second, chromedp.Click(chromedp.CSS("#run-all")))
	waitFor(p, "every step to run", `document.getElementById('status').textContent.startsWith('All steps ran')`)
	if n := eval[int](p, `document.querySelectorAll('#parts svg.qc').length`); n == 0 {
		t.Error("no chart drawn while working in memory")
	}
	if !eval[bool](p, `(() => { const b = document.getElementById('export-session'); return !!b && !b.disabled && b.offsetParent !== null; })()`) {
		t.Error("the session file button is not offered")
	}
	text := eval[string](p, `(async () => {
		const parts = JSON.parse(await globalThis.quillcast.run(JSON.stringify([{kind: "steps", lines: [{text: "load wickery-monthly-orders.csv value=units date=month", line: 2}]}]))).value.parts;
		return JSON.parse(await globalThis.quillcast.exportSession(JSON.stringify(parts), true)).value;
	})()`)
	if !strings.Contains(text, "```quill-data wickery-monthly-orders.csv") {
		t.Errorf("the session file written in memory lacks its data:\n%.300s", text)
	}
}

// TestStorageUnavailable opens the page where the browser offers no
// IndexedDB: the page says nothing is kept, and works in memory.
func TestStorageUnavailable(t *testing.T) {
	p := openSite(t)
	onNewDocument(t, p, withoutWorkers+`Object.defineProperty(globalThis, "indexedDB", {value: undefined, configurable: true});`)
	ready := p.open("")
	note := eval[string](p, `document.getElementById('storage-note').textContent`)
	if !strings.Contains(note, "Nothing is kept after this page closes") || !strings.Contains(note, "no lasting storage") {
		t.Errorf("storage note %q does not say that nothing is kept", note)
	}
	checkWorksInMemory(t, p)
	p.checkClean(ready)
}

// TestStorageBlocked opens the page while another tab holds the database
// open with an older layout and will not let go (the page asks for a newer
// layout than the one stored): the page says so, and works in memory.
func TestStorageBlocked(t *testing.T) {
	p := openSite(t)
	p.open("") // creates the database at the page's layout

	// A second tab of the site's origin holds the database open and
	// ignores the request to close it.
	holder := p.newTab()
	holder.run("opening a page of the same origin", 20*time.Second, chromedp.Navigate(p.base.String()+"style.css"))
	if v := eval[int](holder, `new Promise((ok, fail) => { const r = indexedDB.open("quillcast"); r.onsuccess = () => { window.__held = r.result; ok(r.result.version); }; r.onerror = () => fail(r.error); })`); v < 1 {
		t.Fatalf("the holding tab opened version %d", v)
	}

	onNewDocument(t, p, withoutWorkers+`{
		const open = IDBFactory.prototype.open;
		IDBFactory.prototype.open = function (name, version) {
			return name === "quillcast" ? open.call(this, name, (version || 1) + 1) : open.apply(this, arguments);
		};
	}`)
	ready := p.open("")
	note := eval[string](p, `document.getElementById('storage-note').textContent`)
	if !strings.Contains(note, "another Quillcast tab keeps the stored sessions open") {
		t.Errorf("storage note %q does not say another tab blocks the storage", note)
	}
	checkWorksInMemory(t, p)
	p.checkClean(ready)
}

// fullDisk makes every IndexedDB write fail the way a full disk does in
// the browser: the write's transaction aborts, and the request and the
// transaction carry a QuotaExceededError.
const fullDisk = `(() => {
	const quota = () => new DOMException("The quota has been exceeded.", "QuotaExceededError");
	for (const m of ["put", "add"]) {
		const real = IDBObjectStore.prototype[m];
		IDBObjectStore.prototype[m] = function (...args) {
			const req = real.apply(this, args);
			Object.defineProperty(req, "error", { get: quota });
			Object.defineProperty(this.transaction, "error", { get: quota });
			this.transaction.abort();
			return req;
		};
	}
	return true;
})()`

// TestStorageQuota fills the disk once the page is ready (the engine runs
// on the page, so the test reaches its storage): an edit's save says the
// storage is full and offers the session file, the edit stays on the page,
// and a newly attached file is kept for the page's life while the preview
// says it was not stored.
func TestStorageQuota(t *testing.T) {
	p := openSite(t)
	onNewDocument(t, p, withoutWorkers)
	ready := p.open("")
	eval[bool](p, fullDisk)
	editStep(p, "split last=12", "split last=6")
	waitFor(p, "the failed save", `document.documentElement.dataset.saved === 'failed'`)
	banner := eval[string](p, `document.getElementById('banner').hidden ? '' : document.getElementById('banner').textContent`)
	if !strings.Contains(banner, "storage for this page is full") || !strings.Contains(banner, "Save the session as a file") {
		t.Errorf("after a full disk the banner reads %q (status %q); want the quota message and the session file offered", banner, p.statusText())
	}
	if !eval[bool](p, `[...document.querySelectorAll('#parts code.line')].some(n => n.textContent === 'split last=6')`) {
		t.Error("the edit that could not be saved is gone from the page")
	}
	a := attachBytes(p, monthRows(repeated(36, "12345")...), "after-the-disk-filled.csv")
	if !a.OK || !strings.Contains(string(a.Value), "was not stored in the browser") {
		t.Errorf("attaching on a full disk answered ok=%v %.300s %s; want the preview to say the file was not stored", a.OK, a.Value, a.errorText())
	}
	checkWorksInMemory(t, p)
	p.checkClean(ready)
}

// storedSession reads the page's only stored session as "version|text".
func storedSession(p *page) string {
	return eval[string](p, `(async () => {
		const list = JSON.parse(await globalThis.quillcast.sessions()).value;
		if (list.length !== 1) return "sessions: " + list.length;
		const s = JSON.parse(await globalThis.quillcast.openSession(list[0].id)).value;
		return s.version + "|" + s.text;
	})()`)
}

// TestReloadDuringSave reloads the page while a large save is under way,
// at several moments: afterwards the stored session is either the last
// good version or the new one, whole, never a mix or nothing.
func TestReloadDuringSave(t *testing.T) {
	p := openSite(t)
	p.open("")
	for _, delay := range []int{0, 5, 40} {
		t.Run(fmt.Sprintf("after %d ms", delay), func(t *testing.T) {
			before := storedSession(p)
			version, text, _ := strings.Cut(before, "|")
			big := text + "\n" + strings.Repeat("A note written just before the reload. ", 60000) + "\n"
			eval[bool](p, fmt.Sprintf(`(async () => {
				const list = JSON.parse(await globalThis.quillcast.sessions()).value;
				const s = JSON.parse(await globalThis.quillcast.openSession(list[0].id)).value;
				s.text = %q;
				globalThis.quillcast.saveSession(JSON.stringify(s));
				await new Promise(r => setTimeout(r, %d));
				return true;
			})()`, big, delay))
			p.open("")
			after := storedSession(p)
			gotVersion, gotText, _ := strings.Cut(after, "|")
			switch {
			case after == before:
			case gotText == big && gotVersion != version:
			default:
				t.Errorf("after a reload during the save the stored session is version %s with %d characters; want version %s with %d or the new text with %d", gotVersion, len(gotText), version, len(text), len(big))
			}
		})
	}
}

// TestStoppedRunLeavesNothingHalfDone stops a long run midway: the stored
// session is unchanged, and running again gives exactly the outputs of a
// run that was never stopped.
func TestStoppedRunLeavesNothingHalfDone(t *testing.T) {
	p := openSite(t)
	ready := p.open("")
	outputs := `[...document.querySelectorAll('#parts .output')].map(o => o.textContent).join('\n----\n')`
	want := eval[string](p, outputs)
	stored := storedSession(p)

	eval[bool](p, `(() => { document.getElementById('run-all').click(); document.getElementById('stop').click(); return true; })()`)
	waitFor(p, "the stopped message", `document.getElementById('status').textContent.startsWith('Stopped')`)
	waitFor(p, "the fresh engine", `globalThis.quillcast && globalThis.quillcast.ready === true`)
	if got := storedSession(p); got != stored {
		t.Errorf("the stopped run changed the stored session")
	}
	p.run("running again", 10*time.Second, chromedp.Click(chromedp.CSS("#run-all")))
	waitFor(p, "the steps to run again", `document.getElementById('status').textContent.startsWith('All steps ran')`)
	if got := eval[string](p, outputs); got != want {
		t.Errorf("after a stop and a fresh run the outputs differ from an uninterrupted run:\n got %.400q\nwant %.400q", got, want)
	}
	p.checkClean(ready)
}
