package browsertest

import (
	"context"
	"errors"
	"fmt"
	"net/http/httptest"
	"net/url"
	"os"
	"path/filepath"
	"strings"
	"sync"
	"testing"
	"time"

	"github.com/chromedp/cdproto/network"
	"github.com/chromedp/chromedp"

	"quillcast/core/cmd/serve/static"
)

// chromiumPath is where Debian's chromium package installs the browser.
const chromiumPath = "/usr/bin/chromium"

// unavailable skips the test, or fails it when CI=true.
func unavailable(t *testing.T, format string, args ...any) {
	t.Helper()
	msg := fmt.Sprintf(format, args...)
	if os.Getenv("CI") == "true" {
		t.Fatal(msg)
	}
	t.Skip(msg)
}

// moduleRoot walks up from the working directory to the folder with go.mod.
func moduleRoot(t *testing.T) string {
	t.Helper()
	dir, err := os.Getwd()
	if err != nil {
		t.Fatal(err)
	}
	for {
		if _, err := os.Stat(filepath.Join(dir, "go.mod")); err == nil {
			return dir
		}
		parent := filepath.Dir(dir)
		if parent == dir {
			t.Fatal("no go.mod above the test's folder")
		}
		dir = parent
	}
}

// builtSite returns a folder written by `make build` ("site") or `make
// dist` ("dist").
func builtSite(t *testing.T, name string) string {
	t.Helper()
	dir := filepath.Join(moduleRoot(t), "build", name)
	if _, err := os.Stat(filepath.Join(dir, "index.html")); err != nil {
		unavailable(t, "build/%s lacks index.html; run `make build dist bundle` first", name)
	}
	return dir
}

// request is one network request the page made.
type request struct {
	URL  string
	Type string
	At   time.Time
}

// page is a served site opened in a fresh headless Chromium.
type page struct {
	t    *testing.T
	ctx  context.Context
	base *url.URL // the site: http://127.0.0.1:port/ or the bundle's file:// URL

	mu       sync.Mutex
	requests []request
	console  []string // console errors, exceptions and browser-log errors
}

// openSite serves build/site and starts a browser on it; see [openFolder].
func openSite(t *testing.T) *page {
	t.Helper()
	return openFolder(t, "site")
}

// openFolder serves build/NAME on 127.0.0.1 with a random port and starts
// a browser on it, with a fresh profile and a 1366×768 window.
func openFolder(t *testing.T, name string) *page {
	t.Helper()
	srv := httptest.NewServer(static.Handler(builtSite(t, name)))
	t.Cleanup(srv.Close)
	base, err := url.Parse(srv.URL + "/")
	if err != nil {
		t.Fatal(err)
	}
	return startBrowser(t, base)
}

// startBrowser starts a fresh headless Chromium that will open pages under
// base, and records its requests and console.
func startBrowser(t *testing.T, base *url.URL) *page {
	t.Helper()
	if _, err := os.Stat(chromiumPath); err != nil {
		unavailable(t, "Chromium is not installed at %s (apt-get install chromium)", chromiumPath)
	}
	opts := []chromedp.ExecAllocatorOption{
		chromedp.ExecPath(chromiumPath),
		chromedp.Headless,
		chromedp.NoSandbox,
		chromedp.DisableGPU,
		chromedp.NoFirstRun,
		chromedp.NoDefaultBrowserCheck,
		chromedp.Flag("disable-quic", true),
		chromedp.Flag("disable-background-networking", true),
		chromedp.Flag("disable-component-update", true),
		chromedp.Flag("disable-sync", true),
		chromedp.Flag("disable-default-apps", true),
		chromedp.Flag("disable-extensions", true),
		chromedp.Flag("metrics-recording-only", true),
		chromedp.Flag("no-pings", true),
		chromedp.WindowSize(1366, 768),
		chromedp.UserDataDir(t.TempDir()),
	}
	actx, cancelAlloc := chromedp.NewExecAllocator(context.Background(), opts...)
	ctx, cancelCtx := chromedp.NewContext(actx)
	t.Cleanup(func() {
		cancelCtx()
		cancelAlloc()
	})
	return watch(t, ctx, base)
}

// watch starts the tab of ctx and records its requests and console.
func watch(t *testing.T, ctx context.Context, base *url.URL) *page {
	t.Helper()
	p := &page{t: t, ctx: ctx, base: base}
	if err := chromedp.Do(ctx); err != nil {
		t.Fatalf("starting Chromium: %v", err)
	}
	if err := chromedp.Listen(ctx, p.record); err != nil {
		t.Fatalf("listening to the page: %v", err)
	}
	go p.readConsole()
	return p
}

// newTab opens a second tab of the same browser (sharing its storage).
func (p *page) newTab() *page {
	p.t.Helper()
	ctx, cancel := chromedp.NewContext(p.ctx)
	p.t.Cleanup(cancel)
	return watch(p.t, ctx, p.base)
}

// record notes every request the page is about to send.
func (p *page) record(ev any) {
	if e, ok := ev.(*network.EventRequestWillBeSent); ok {
		p.mu.Lock()
		p.requests = append(p.requests, request{URL: e.Request.URL, Type: string(e.Type), At: time.Now()})
		p.mu.Unlock()
	}
}

// readConsole collects console errors, uncaught exceptions and browser-log
// errors (a refused Content-Security-Policy shows up there).
func (p *page) readConsole() {
	for m, err := range chromedp.Console(p.ctx) {
		if err != nil {
			return
		}
		if m.Type == chromedp.ConsoleError || m.IsException() {
			p.mu.Lock()
			p.console = append(p.console, m.String())
			p.mu.Unlock()
		}
	}
}

// run runs actions with a time limit, failing the test on error.
func (p *page) run(what string, limit time.Duration, actions ...chromedp.Action[chromedp.Void]) {
	p.t.Helper()
	ctx, cancel := context.WithTimeout(p.ctx, limit)
	defer cancel()
	if err := chromedp.Do(ctx, actions...); err != nil {
		p.fail(what, err)
	}
}

// eval evaluates a JavaScript expression (awaiting a Promise) into T.
func eval[T any](p *page, expr string) T {
	p.t.Helper()
	ctx, cancel := context.WithTimeout(p.ctx, 20*time.Second)
	defer cancel()
	v, err := chromedp.Run(ctx, chromedp.Evaluate[T](expr, chromedp.EvalAwaitPromise))
	if err != nil {
		p.fail("evaluating "+expr, err)
	}
	return v
}

// fail stops the test with the page's console errors and a screenshot.
func (p *page) fail(what string, err error) {
	p.t.Helper()
	p.screenshot("failure-" + strings.ReplaceAll(p.t.Name(), "/", "-"))
	if errors.Is(err, context.DeadlineExceeded) {
		err = fmt.Errorf("timed out: %w", err)
	}
	p.t.Fatalf("%s: %v\nconsole errors: %q\nstatus: %q", what, err, p.consoleErrors(), p.statusText())
}

// statusText reads the page's status line, for failure messages.
func (p *page) statusText() string {
	ctx, cancel := context.WithTimeout(p.ctx, 2*time.Second)
	defer cancel()
	s, err := chromedp.Run(ctx, chromedp.Evaluate[string](`(document.querySelector('#status')||{}).textContent||''`))
	if err != nil {
		return ""
	}
	return s
}

// open navigates to the site (plus rel, a path and fragment as written in
// a link) from a blank page, and waits until the page says it is ready: the engine signalled ready and the first render is
// done.
func (p *page) open(rel string) time.Time {
	p.t.Helper()
	u := p.base.String() + rel
	p.run("opening "+u, 60*time.Second,
		chromedp.EmulateViewport(1366, 768),
		chromedp.Navigate("about:blank"),
		chromedp.Navigate(u),
		chromedp.WaitReady(chromedp.CSS(`html[data-state="ready"],html[data-state="failed"]`)),
	)
	if state := eval[string](p, `document.documentElement.dataset.state`); state != "ready" {
		p.fail("opening "+u, fmt.Errorf("the page did not start (state %q)", state))
	}
	return time.Now()
}

// consoleErrors returns the console errors seen so far.
func (p *page) consoleErrors() []string {
	p.mu.Lock()
	defer p.mu.Unlock()
	return append([]string(nil), p.console...)
}

// requestsSince returns the requests made at or after t.
func (p *page) requestsSince(t time.Time) []request {
	p.mu.Lock()
	defer p.mu.Unlock()
	var out []request
	for _, r := range p.requests {
		if !r.At.Before(t) {
			out = append(out, r)
		}
	}
	return out
}

// screenshot saves a PNG of the 1366×768 viewport under build/screenshots/.
func (p *page) screenshot(name string) {
	p.t.Helper()
	dir := filepath.Join(moduleRoot(p.t), "build", "screenshots")
	if err := os.MkdirAll(dir, 0o755); err != nil {
		p.t.Logf("screenshot %s: %v", name, err)
		return
	}
	ctx, cancel := context.WithTimeout(p.ctx, 15*time.Second)
	defer cancel()
	png, err := chromedp.Run(ctx, chromedp.CaptureScreenshot())
	if err != nil {
		p.t.Logf("screenshot %s: %v", name, err)
		return
	}
	if err := os.WriteFile(filepath.Join(dir, name+".png"), png, 0o644); err != nil {
		p.t.Logf("screenshot %s: %v", name, err)
	}
}

// checkClean fails the test on console errors or on any request that went
// elsewhere than the served site or came after since.
func (p *page) checkClean(since time.Time) {
	p.t.Helper()
	if errs := p.consoleErrors(); len(errs) > 0 {
		p.t.Errorf("the console shows errors:\n%s", strings.Join(errs, "\n"))
	}
	p.mu.Lock()
	all := append([]request(nil), p.requests...)
	p.mu.Unlock()
	if len(all) == 0 {
		p.t.Error("no request was recorded at all; the recorder is not working")
	}
	for _, r := range all {
		if !p.local(r.URL) {
			p.t.Errorf("the page sent a request outside its own files: %s (%s)", r.URL, r.Type)
		}
	}
	for _, r := range p.requestsSince(since) {
		if strings.HasPrefix(r.URL, "blob:") || strings.HasPrefix(r.URL, "data:") {
			continue // made inside the page; nothing goes over the network
		}
		p.t.Errorf("the page sent a request after it was ready: %s (%s)", r.URL, r.Type)
	}
}

// local reports whether u is the served site itself (or, for the
// single-file build, that one file), or a data:/blob: URL.
func (p *page) local(raw string) bool {
	u, err := url.Parse(raw)
	if err != nil {
		return false
	}
	switch u.Scheme {
	case "data", "blob":
		return true
	case "http":
		return p.base.Scheme == "http" && u.Host == p.base.Host && strings.HasPrefix(u.Hostname(), "127.0.0.1")
	case "file":
		return p.base.Scheme == "file" && u.Path == p.base.Path
	}
	return false
}
