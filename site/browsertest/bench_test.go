package browsertest

import (
	"context"
	"encoding/json"
	"fmt"
	"net/http"
	"net/http/httptest"
	"net/url"
	"os"
	"path/filepath"
	"slices"
	"strings"
	"testing"
	"time"

	"github.com/chromedp/cdproto/cdp"
	cdppage "github.com/chromedp/cdproto/page"
	"github.com/chromedp/chromedp"
)

// This file holds the in-page speed measurements of `make bench`. They run
// only with QUILLCAST_BENCH=1 and write their figures to page.json in the
// folder QUILLCAST_BENCH_DIR (build/bench by default), where command
// benchtable joins them with the native ones into one table. The compute
// rows run the engine built with the bench tag (build/bench/
// quillcast-bench.wasm) in Web Workers of a small page of their own; time
// to ready and re-run latency use build/dist as a static host serves it.

// benchSample is one figure's repeated measurements, as benchtable reads it.
type benchSample struct {
	Values []float64 `json:"samples"`
	Unit   string    `json:"unit"`
	Note   string    `json:"note,omitempty"`
}

// benchFigures is page.json.
type benchFigures struct {
	Load    string                 `json:"load"` // one-minute load average at start and end
	Workers int                    `json:"workers"`
	HWSSE   float64                `json:"hwSSE"`
	Rows    map[string]benchSample `json:"rows"`
}

// benchDir returns the folder of the prepared inputs, or skips the test
// unless QUILLCAST_BENCH=1.
func benchDir(t *testing.T) string {
	t.Helper()
	if os.Getenv("QUILLCAST_BENCH") != "1" {
		t.Skip("speed measurements run with QUILLCAST_BENCH=1 (make bench)")
	}
	dir := os.Getenv("QUILLCAST_BENCH_DIR")
	if dir == "" {
		dir = filepath.Join(moduleRoot(t), "build", "bench")
	}
	if _, err := os.Stat(filepath.Join(dir, "inputs.json")); err != nil {
		t.Fatalf("%v; run `go run ./core/cmd/benchtable -prepare` first", err)
	}
	return dir
}

// readyHook records, in every new document, when the engine's API object
// appears with ready set (__qcEngineAt) and when the page declares itself
// ready after its first render (__qcPageAt), in milliseconds since the
// navigation started. It also times each call of the engine's run
// function (__qcRun: milliseconds and the answer's length in characters),
// so that the re-run figure can be split into engine and page work.
const readyHook = `(() => {
  let api;
  Object.defineProperty(globalThis, 'quillcast', { configurable: true,
    get() { return api; },
    set(v) {
      api = v;
      if (v && v.ready && !globalThis.__qcEngineAt) globalThis.__qcEngineAt = performance.now();
      if (v && typeof v.run === 'function' && !v.run.__qcTimed) {
        const run = v.run;
        v.run = (...args) => {
          const t0 = performance.now();
          return Promise.resolve(run.apply(v, args)).then((text) => {
            globalThis.__qcRun = { ms: performance.now() - t0, bytes: text.length };
            return text;
          });
        };
        v.run.__qcTimed = true;
      }
    } });
  new MutationObserver(() => {
    if (document.documentElement && document.documentElement.dataset.state === 'ready' && !globalThis.__qcPageAt) globalThis.__qcPageAt = performance.now();
  }).observe(document, { attributes: true, subtree: true, attributeFilter: ['data-state'] });
})()`

// hookReady installs readyHook in the tab of p.
func hookReady(p *page) {
	p.t.Helper()
	p.run("installing the ready hook", 10*time.Second, chromedp.Func(func(ctx context.Context, t *chromedp.Target) error {
		_, err := cdp.Call(ctx, t, cdppage.AddScriptToEvaluateOnNewDocument, cdppage.AddScriptToEvaluateOnNewDocumentParams{Source: readyHook})
		return err
	}))
}

// readyTimes opens the dist page and returns seconds from navigation to the
// engine's ready signal and to the first render.
func readyTimes(p *page) (engine, render float64) {
	p.open("")
	waitFor(p, "the ready stamps", `!!globalThis.__qcEngineAt && !!globalThis.__qcPageAt`)
	return eval[float64](p, `globalThis.__qcEngineAt`) / 1e3, eval[float64](p, `globalThis.__qcPageAt`) / 1e3
}

// TestBenchPage measures every in-page row and writes page.json.
func TestBenchPage(t *testing.T) {
	dir := benchDir(t)
	figs := benchFigures{Rows: map[string]benchSample{}}
	startLoad := loadAverage()
	const visits = 5

	// Time to ready: a fresh browser (empty profile) per first visit; the
	// repeat visits reuse the last browser's profile and cache.
	first, repeat := benchSample{Unit: "s"}, benchSample{Unit: "s"}
	var firstRender, repeatRender []float64
	var p *page
	for range visits {
		p = openFolder(t, "dist")
		hookReady(p)
		e, r := readyTimes(p)
		first.Values, firstRender = append(first.Values, e), append(firstRender, r)
	}
	for range visits {
		e, r := readyTimes(p)
		repeat.Values, repeatRender = append(repeat.Values, e), append(repeatRender, r)
	}
	first.Note = fmt.Sprintf("engine ready signal; the demo's first render done at %s s (median)", median(firstRender))
	repeat.Note = fmt.Sprintf("engine ready signal; first render at %s s (median); wasm served as %s; %s", median(repeatRender), wasmCache(p), compileCost(p))
	figs.Rows["ready-first"], figs.Rows["ready-repeat"] = first, repeat

	// Re-run latency, on the page just opened.
	figs.Rows["rerun-last"] = rerunLatency(p, "pick by=mase", "pick by=rmse", 10)
	figs.Rows["rerun-first"] = rerunLatency(p, "smooth centered width=12", "smooth centered width=4", 6)
	if errs := p.consoleErrors(); len(errs) > 0 {
		t.Errorf("the console shows errors:\n%s", strings.Join(errs, "\n"))
	}

	computeRows(t, dir, &figs)
	figs.Load = startLoad + " at start, " + loadAverage() + " at end"

	b, err := json.MarshalIndent(figs, "", "  ")
	if err != nil {
		t.Fatal(err)
	}
	if err := os.WriteFile(filepath.Join(dir, "page.json"), b, 0o644); err != nil {
		t.Fatal(err)
	}
	t.Logf("page figures:\n%s", b)
}

// wasmCache describes how the dist folder's engine was served: its path
// and Cache-Control header, from the page's own resource timing.
func wasmCache(p *page) string {
	name := eval[string](p, `(performance.getEntriesByType('resource').map(e => e.name).find(n => n.endsWith('.wasm')) || '')`)
	if name == "" {
		return "(no wasm request seen)"
	}
	u, err := url.Parse(name)
	if err != nil {
		return name
	}
	res, err := http.Head(name)
	if err != nil {
		return u.Path
	}
	res.Body.Close()
	return fmt.Sprintf("%s with Cache-Control %q", u.Path, res.Header.Get("Cache-Control"))
}

// compileCost compares, in the page with a warm cache, compiling the
// engine from its bytes (as the page does before handing them to its
// worker) with compiling it while streaming from the cached response,
// which lets the browser reuse the code it compiled on an earlier visit.
func compileCost(p *page) string {
	var c struct{ Bytes, Streaming []float64 }
	raw := eval[string](p, `(async () => {
	  const u = performance.getEntriesByType('resource').map((e) => e.name).find((n) => n.endsWith('.wasm'));
	  const b = await (await fetch(u)).arrayBuffer();
	  const out = { bytes: [], streaming: [] };
	  for (let i = 0; i < 3; i++) {
	    let t0 = performance.now(); await WebAssembly.compile(b); out.bytes.push((performance.now() - t0) / 1e3);
	    t0 = performance.now(); await WebAssembly.compileStreaming(fetch(u)); out.streaming.push((performance.now() - t0) / 1e3);
	  }
	  return JSON.stringify(out);
	})()`)
	if err := json.Unmarshal([]byte(raw), &c); err != nil {
		return "compile time not measured: " + err.Error()
	}
	return fmt.Sprintf("compiling the engine from its bytes, as the page does: %s s (median of 3); streaming compile of the cached response: %s s", median(c.Bytes), median(c.Streaming))
}

// editHook times one edit: from the Enter key that commits it to the
// status line saying every step ran.
const editHook = `(() => {
  const s = document.getElementById('status');
  globalThis.__qcEdit = { t0: 0, t1: 0 };
  if (!globalThis.__qcEditWired) {
    globalThis.__qcEditWired = true;
    document.addEventListener('keydown', (e) => { if (e.key === 'Enter' && globalThis.__qcEdit.t0 === 0) globalThis.__qcEdit.t0 = performance.now(); }, true);
    new MutationObserver(() => {
      const st = globalThis.__qcEdit;
      if (st.t0 > 0 && st.t1 === 0 && s.textContent.startsWith('All steps ran')) st.t1 = performance.now();
    }).observe(s, { childList: true, characterData: true, subtree: true });
  }
  return true;
})()`

// rerunLatency edits the step line from to to and back, reps times in
// all, and returns the seconds from each Enter to the updated outputs.
func rerunLatency(p *page, from, to string, reps int) benchSample {
	p.t.Helper()
	s := benchSample{Unit: "s"}
	var calls []float64
	var answer int
	for i := range reps {
		a, b := from, to
		if i%2 == 1 {
			a, b = to, from
		}
		sel := stepSelector(p, a)
		eval[bool](p, editHook)
		p.run("editing "+a, 20*time.Second,
			chromedp.Click(chromedp.CSS(sel)),
			chromedp.WaitVisible(chromedp.CSS("input.line-edit")),
			chromedp.SetValue(chromedp.CSS("input.line-edit"), b),
			chromedp.KeyEvent("\r"),
		)
		waitFor(p, "the re-run after editing "+a, `globalThis.__qcEdit.t1 > 0`)
		s.Values = append(s.Values, (eval[float64](p, `globalThis.__qcEdit.t1 - globalThis.__qcEdit.t0`))/1e3)
		calls = append(calls, eval[float64](p, `(globalThis.__qcRun || {ms: 0}).ms`)/1e3)
		answer = eval[int](p, `(globalThis.__qcRun || {bytes: 0}).bytes`)
		time.Sleep(600 * time.Millisecond) // let the autosave finish
	}
	s.Note = fmt.Sprintf("editing %q to %q and back, Enter to the status line saying all steps ran; of which the engine's run call (worker round trip with an answer of %d characters of JSON) took %s s (median), the rest is the page swapping in the outputs that changed",
		from, to, answer, median(calls))
	return s
}

// median formats the median of v in seconds with three decimals.
func median(v []float64) string {
	if len(v) == 0 {
		return "?"
	}
	c := slices.Sorted(slices.Values(v))
	m := c[len(c)/2]
	if len(c)%2 == 0 {
		m = (c[len(c)/2-1] + c[len(c)/2]) / 2
	}
	return fmt.Sprintf("%.3f", m)
}

// benchServer serves the bench engine, Go's wasm_exec.js, the prepared
// inputs and a blank page to run them from.
func benchServer(t *testing.T, dir string, competition string) *url.URL {
	t.Helper()
	root := moduleRoot(t)
	files := map[string]string{
		"/wasm_exec.js":    filepath.Join(root, "build", "site", "wasm_exec.js"),
		"/bench.wasm":      filepath.Join(dir, "quillcast-bench.wasm"),
		"/walk.f64":        filepath.Join(dir, "walk.f64"),
		"/hw.f64":          filepath.Join(dir, "hw.f64"),
		"/rows.csv":        filepath.Join(dir, "rows.csv"),
		"/competition.csv": competition,
	}
	for _, f := range files {
		if _, err := os.Stat(f); err != nil {
			t.Fatalf("%v; make bench builds and prepares it", err)
		}
	}
	srv := httptest.NewServer(http.HandlerFunc(func(w http.ResponseWriter, r *http.Request) {
		if r.URL.Path == "/" {
			w.Header().Set("Content-Type", "text/html; charset=utf-8")
			fmt.Fprintf(w, "<!doctype html><meta charset=utf-8><title>bench</title><script>%s</script>", strings.ReplaceAll(benchScript, "</", "<\\/"))
			return
		}
		f, ok := files[r.URL.Path]
		if !ok {
			http.NotFound(w, r)
			return
		}
		if strings.HasSuffix(f, ".wasm") {
			w.Header().Set("Content-Type", "application/wasm")
		}
		http.ServeFile(w, r, f)
	}))
	t.Cleanup(srv.Close)
	u, err := url.Parse(srv.URL + "/")
	if err != nil {
		t.Fatal(err)
	}
	return u
}

// loadAverage returns the machine's one-minute load average, or "?".
func loadAverage() string {
	b, err := os.ReadFile("/proc/loadavg")
	if f := strings.Fields(string(b)); err == nil && len(f) > 0 {
		return f[0]
	}
	return "?"
}
