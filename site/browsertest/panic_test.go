package browsertest

import (
	"fmt"
	"net/http/httptest"
	"net/url"
	"os"
	"os/exec"
	"path/filepath"
	"strings"
	"testing"

	"quillcast/core/cmd/serve/static"
)

// faultLabel is the forecast label that makes a step fault inside an
// engine built with the faulthook tag (see core/steps/runner/faulthook_on.go).
const faultLabel = "engine-fault-drill"

// faultySite copies build/site into a temporary folder and replaces its
// engine with one built with the faulthook tag, as `make build` builds the
// shipped one.
func faultySite(t *testing.T) string {
	t.Helper()
	src := builtSite(t, "site")
	goTool, err := exec.LookPath("go")
	if err != nil {
		unavailable(t, "the go command is needed to build the engine with the faulthook tag: %v", err)
	}
	dir := t.TempDir()
	if err := os.CopyFS(dir, os.DirFS(src)); err != nil {
		t.Fatalf("copying build/site: %v", err)
	}
	wasm := filepath.Join(dir, "quillcast.wasm")
	if err := os.Remove(wasm); err != nil {
		t.Fatalf("removing the shipped engine from the copy: %v", err)
	}
	cmd := exec.Command(goTool, "build", "-tags", "faulthook", "-trimpath", "-ldflags=-s -w", "-o", wasm, "./wasm")
	cmd.Dir = moduleRoot(t)
	cmd.Env = append(os.Environ(), "GOOS=js", "GOARCH=wasm")
	if out, err := cmd.CombinedOutput(); err != nil {
		t.Fatalf("building the engine with the faulthook tag: %v\n%s", err, out)
	}
	return dir
}

// openFaulty serves the site with the faulty engine and starts a browser
// on it.
func openFaulty(t *testing.T) *page {
	t.Helper()
	srv := httptest.NewServer(static.Handler(faultySite(t)))
	t.Cleanup(srv.Close)
	base, err := url.Parse(srv.URL + "/")
	if err != nil {
		t.Fatal(err)
	}
	return startBrowser(t, base)
}

// stepOutputs returns the text of each step's output, in page order.
func stepOutputs(p *page) []string {
	return eval[[]string](p, `[...document.querySelectorAll('#parts code.line')].map(c => { const o = c.closest('.step').querySelector('.output'); return o ? o.textContent : ''; })`)
}

// stepErrors returns the error shown under each step, in page order ("" for none).
func stepErrors(p *page) []string {
	return eval[[]string](p, `[...document.querySelectorAll('#parts code.line')].map(c => { const e = c.closest('.step').querySelector('.output .msg.error'); return e ? e.textContent : ''; })`)
}

// goTrace reports whether text shows any part of a Go stack trace.
func goTrace(text string) bool {
	for _, mark := range []string{"goroutine ", ".go:", "runtime/", "panic(", "[recovered]"} {
		if strings.Contains(text, mark) {
			return true
		}
	}
	return false
}

// TestStepPanic runs, on an engine built to fault on one step, a session
// whose third of five steps faults inside the engine: that step shows the
// fault in plain words, the steps before it keep their outputs, an
// independent step after it runs and a dependent one says which step it
// waits on. The page keeps working (an edit re-runs, a file attaches, the
// memo exports, with the fault still shown), and after a reload the stored
// session and its outputs come back as they were.
func TestStepPanic(t *testing.T) {
	p := openFaulty(t)
	p.open("") // the first visit stores the demo and its data
	lines := []string{
		"load wickery-monthly-orders.csv value=units date=month",
		"split last=12",
		"forecast naive as=" + faultLabel,
		"forecast seasonal-naive as=same-month",
		"check " + faultLabel,
	}
	ready := p.open("#steps=" + url.PathEscape(strings.Join(lines, "\n")))
	waitFor(p, "the shared steps to run", fmt.Sprintf(`document.querySelectorAll('#parts code.line').length === %d && document.querySelectorAll('#parts .output').length === %d && !!document.querySelector('#parts .output .msg.error')`, len(lines), len(lines)))
	if got := eval[[]string](p, `[...document.querySelectorAll('#parts code.line')].map(n => n.textContent)`); strings.Join(got, "\n") != strings.Join(lines, "\n") {
		t.Fatalf("the page shows the steps %q, want %q", got, lines)
	}
	eval[bool](p, `(() => { [...document.querySelectorAll('#parts code.line')][2].scrollIntoView(); return true; })()`)
	p.screenshot("step-panic")

	outs, errs := stepOutputs(p), stepErrors(p)
	for i := range 2 {
		if outs[i] == "" || errs[i] != "" {
			t.Errorf("step %d shows %q with error %q; want its output and no error", i+1, outs[i], errs[i])
		}
	}
	if !strings.HasPrefix(errs[2], "Step 3") || !strings.Contains(errs[2], "internal fault") || !strings.Contains(errs[2], "the steps before it are unaffected") {
		t.Errorf("the faulting step shows %q; want its fault in plain words", errs[2])
	}
	if errs[3] != "" || !eval[bool](p, `(() => { const c = [...document.querySelectorAll('#parts code.line')][3]; return !!c.closest('.step').querySelector('.output svg.qc, .output table'); })()`) {
		t.Errorf("the independent forecast after the fault shows %q with error %q; want its chart or table", outs[3], errs[3])
	}
	if !strings.Contains(outs[4], "Waits on step 3") {
		t.Errorf("the step that needs the faulting forecast shows %q; want it to say it waits on step 3", outs[4])
	}
	t.Logf("step 3 shows %q; step 5 shows %q", errs[2], outs[4])
	if page := eval[string](p, `document.body.innerText`); goTrace(page) {
		t.Errorf("the page shows a Go stack trace:\n%.1200s", page)
	}
	waitFor(p, "the autosave", `/^[0-9]+$/.test(document.documentElement.dataset.saved || '')`)
	saved := eval[int](p, `Number(document.documentElement.dataset.saved)`)

	// The page keeps working: an edit to another step runs it again and
	// the fault stays shown where it was.
	before := outs[3]
	editStep(p, "forecast seasonal-naive", "forecast drift as=same-month")
	lines[3] = "forecast drift as=same-month"
	waitFor(p, "the edited step's new output", fmt.Sprintf(`(() => { const c = [...document.querySelectorAll('#parts code.line')][3]; const o = c && c.closest('.step').querySelector('.output'); return !!o && o.textContent !== '' && o.textContent !== %q; })()`, before))
	if errs := stepErrors(p); errs[3] != "" || !strings.Contains(errs[2], "internal fault") {
		t.Errorf("after the edit the errors read %q; want the fault on step 3 only", errs)
	}
	if outs := stepOutputs(p); !strings.Contains(outs[4], "Waits on step 3") {
		t.Errorf("after the edit step 5 shows %q; want it still to wait on step 3", outs[4])
	}
	// A file attaches, and the memo exports.
	if a := attachBytes(p, monthRows(repeated(30, "240")...), "after-the-fault.csv"); !a.OK {
		t.Errorf("attaching a file after the fault failed: %s", a.errorText())
	}
	md := eval[string](p, `globalThis.quillcast.memo("md").then(t => JSON.parse(t).value.text)`)
	if !strings.Contains(md, "same-month") || !strings.Contains(strings.ToLower(md), "estimates") || goTrace(md) {
		t.Errorf("the memo after the fault lacks the working forecast or the estimates notice, or shows a stack:\n%.800s", md)
	}
	checkAlive(t, p)
	waitFor(p, "the edit's save", fmt.Sprintf(`/^[0-9]+$/.test(document.documentElement.dataset.saved || '') && Number(document.documentElement.dataset.saved) > %d`, saved))
	p.checkClean(ready)

	// After a reload the stored session is intact and shows the same
	// outputs, the fault included.
	keep, shown := kept(p), stepOutputs(p)
	ready = p.open("")
	waitFor(p, "the restored outputs", fmt.Sprintf(`document.querySelectorAll('#parts .output').length === %d`, len(lines)))
	compareKept(t, "after a reload", keep, kept(p))
	if got := stepOutputs(p); strings.Join(got, "\n----\n") != strings.Join(shown, "\n----\n") {
		t.Errorf("after a reload the outputs differ:\n got %.600q\nwant %.600q", got, shown)
	}
	p.checkClean(ready)
}
