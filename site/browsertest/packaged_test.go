package browsertest

import (
	"net/url"
	"os"
	"path/filepath"
	"strings"
	"testing"

	cdppage "github.com/chromedp/cdproto/page"
	"github.com/chromedp/chromedp"
)

// checkDemo asserts that the demo session rendered its charts and tables.
func checkDemo(t *testing.T, p *page) {
	t.Helper()
	if n := eval[int](p, `document.querySelectorAll('#parts svg.qc').length`); n == 0 {
		t.Error("no chart drawn")
	}
	if n := eval[int](p, `document.querySelectorAll('#parts table.figures tbody tr').length`); n == 0 {
		t.Error("no table shown")
	}
}

// TestDist opens the folder written by `make dist`, as a static host would
// serve it: assets under a content-hashed folder, the policy in a meta
// element.
func TestDist(t *testing.T) {
	p := openFolder(t, "dist")
	ready := p.open("")
	checkDemo(t, p)
	if n := eval[int](p, `document.querySelectorAll('meta[http-equiv="Content-Security-Policy"]').length`); n != 1 {
		t.Errorf("the dist page has %d policy meta elements, want 1", n)
	}
	p.checkClean(ready)
}

// TestBundle opens the single-file build from disk: no server at all, and
// the page must still run the demo, with no request but the file itself.
func TestBundle(t *testing.T) {
	file := filepath.Join(moduleRoot(t), "build", "quillcast.html")
	if _, err := os.Stat(file); err != nil {
		unavailable(t, "build/quillcast.html is missing; run `make bundle` first")
	}
	p := startBrowser(t, &url.URL{Scheme: "file", Path: file})
	ready := p.open("")
	p.screenshot("bundle-from-disk")
	checkDemo(t, p)
	t.Logf("engine runs in %q; storage: %q", eval[string](p, `document.documentElement.dataset.engine`), eval[string](p, `document.getElementById('storage-note').textContent`))
	p.checkClean(ready)
}

// TestWithoutWorkers opens the page in a browser that offers no Web
// Workers: the engine runs on the page itself, the page says so, and the
// demo still renders.
func TestWithoutWorkers(t *testing.T) {
	p := openSite(t)
	if _, err := chromedp.Call(p.ctx, cdppage.AddScriptToEvaluateOnNewDocument, cdppage.AddScriptToEvaluateOnNewDocumentParams{Source: "delete globalThis.Worker;"}); err != nil {
		t.Fatalf("removing workers: %v", err)
	}
	ready := p.open("")
	if mode := eval[string](p, `document.documentElement.dataset.engine`); mode != "page" {
		t.Errorf("without workers the engine runs in %q, want the page", mode)
	}
	if status := eval[string](p, `document.getElementById('status').textContent`); !strings.Contains(status, "no worker") {
		t.Errorf("the status %q does not say that no worker could start", status)
	}
	checkDemo(t, p)
	p.checkClean(ready)
}
