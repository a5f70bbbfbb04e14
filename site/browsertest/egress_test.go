package browsertest

import (
	"fmt"
	"net/http"
	"net/url"
	"os"
	"path/filepath"
	"regexp"
	"strings"
	"testing"
	"time"

	"github.com/chromedp/chromedp"
)

// everyVerbSession is a session on the demo's monthly file that uses every
// verb of the step language once at least.
var everyVerbSession = []string{
	`memo title="Egress walk" client="Nobody" by="Test" date=2026-01-01`,
	"load " + demoMonthly + " value=units date=month",
	"split last=12",
	"smooth centered width=12",
	"forecast seasonal-naive as=sn",
	"forecast ses as=s",
	"forecast holt-winters season=multiplicative as=hw",
	"combine of=sn,s as=both",
	"evaluate by=mase",
	"sweep moving-average width=2..6",
	"backtest origins=3 horizon=3",
	"difference lag=12",
	"decompose multiplicative",
	"check hw",
	"pick by=rmse",
	"bakeoff last=6",
}

// stepErrorLine finds a step error in the text [runLines] returns.
var stepErrorLine = regexp.MustCompile(`(?m)^line \d+, column \d+: `)

// walkEverything does everything a consultant does in a day on p, which is
// open and ready: attach a file through the picker, run every verb, run
// all steps on the page, preview and download the memo in each form, save
// the session file, and make a share link.
func walkEverything(t *testing.T, p *page) {
	t.Helper()
	csv := filepath.Join(t.TempDir(), "egress-orders.csv")
	if err := os.WriteFile(csv, monthRows("10", "12", "11", "13", "15", "14", "16", "18", "17", "19", "21", "20", "22", "24"), 0o644); err != nil {
		t.Fatal(err)
	}
	p.run("attaching a file", 20*time.Second, chromedp.SetUploadFiles(chromedp.CSS("#file-input"), []string{csv}))
	waitFor(p, "the preview", `document.getElementById('preview-dialog').open && document.querySelectorAll('#preview-body svg.qc').length > 0`)
	eval[bool](p, `(() => { document.getElementById('preview-dialog').close(); return true; })()`)

	if out := runLines(p, everyVerbSession); stepErrorLine.MatchString(out) {
		t.Errorf("the every-verb session has errors:\n%s", out)
	}
	p.run("running every step", 30*time.Second, chromedp.Click(chromedp.CSS("#run-all")))
	waitFor(p, "every step to run", `document.getElementById('status').textContent.startsWith('All steps ran')`)

	p.run("previewing the memo", 20*time.Second, chromedp.Click(chromedp.CSS("#memo-preview")))
	waitFor(p, "the memo preview", `document.getElementById('memo-dialog').open && document.querySelectorAll('#memo-body table').length > 0`)
	eval[bool](p, `(() => { document.getElementById('memo-dialog').close(); return true; })()`)
	for _, format := range []string{"md", "html", "zip"} {
		p.run("downloading the memo as "+format, 10*time.Second, chromedp.Click(chromedp.CSS(fmt.Sprintf(`button[data-memo=%q]`, format))))
	}
	p.run("saving the session file", 10*time.Second, chromedp.Click(chromedp.CSS("#export-with-data")), chromedp.Click(chromedp.CSS("#export-session")))
	p.run("making a share link", 10*time.Second, chromedp.Click(chromedp.CSS("#share")))
	waitFor(p, "the share link", `document.getElementById('share-link').value.includes('#steps=')`)
	time.Sleep(500 * time.Millisecond) // let any late request show up
}

// TestNoEgress records every request of a served page from navigation
// through a whole day's work: each one is for a file of the site itself,
// and none comes after the page said it was ready.
func TestNoEgress(t *testing.T) {
	p := openSite(t)
	ready := p.open("")
	walkEverything(t, p)
	p.checkClean(ready)

	dir := builtSite(t, "site")
	for _, r := range p.requestsSince(time.Time{}) {
		u, err := url.Parse(r.URL)
		if err != nil || u.Scheme != "http" {
			continue // data: and blob: stay in the page; checkClean checked the rest
		}
		rel := strings.TrimPrefix(u.Path, "/")
		if rel == "" {
			rel = "index.html"
		}
		if _, err := os.Stat(filepath.Join(dir, filepath.FromSlash(rel))); err != nil {
			t.Errorf("the page asked for %s, which is not one of the site's files", r.URL)
		}
	}
}

// TestNoEgressBundle does the same day's work in the single-file build
// opened from disk: the file itself is the only request, ever.
func TestNoEgressBundle(t *testing.T) {
	file := filepath.Join(moduleRoot(t), "build", "quillcast.html")
	if _, err := os.Stat(file); err != nil {
		unavailable(t, "build/quillcast.html is missing; run `make bundle` first")
	}
	p := startBrowser(t, &url.URL{Scheme: "file", Path: file})
	ready := p.open("")
	walkEverything(t, p)
	p.checkClean(ready)
	n := 0
	for _, r := range p.requestsSince(time.Time{}) {
		if !strings.HasPrefix(r.URL, "blob:") && !strings.HasPrefix(r.URL, "data:") {
			n++
		}
	}
	if n != 1 {
		t.Errorf("the single-file build made %d requests, want the file itself only: %v", n, p.requestsSince(time.Time{}))
	}
}

// directives splits a Content-Security-Policy into its directives.
func directives(policy string) map[string][]string {
	out := map[string][]string{}
	for _, d := range strings.Split(policy, ";") {
		f := strings.Fields(d)
		if len(f) > 0 {
			out[strings.ToLower(f[0])] = f[1:]
		}
	}
	return out
}

// checkStrict fails the test unless policy refuses everything by default,
// runs no inline or evaluated script, loads nothing from another host,
// posts no form, and connects only where connect allows (nil: nowhere).
func checkStrict(t *testing.T, where, policy string, connect []string) {
	t.Helper()
	if policy == "" {
		t.Fatalf("%s: no Content-Security-Policy", where)
	}
	d := directives(policy)
	if got := strings.Join(d["default-src"], " "); got != "'none'" {
		t.Errorf("%s: default-src is %q, want 'none'", where, got)
	}
	hashOrWord := regexp.MustCompile(`^'(self|none|wasm-unsafe-eval|sha256-[A-Za-z0-9+/=]+)'$`)
	for name, sources := range d {
		for _, s := range sources {
			switch {
			case hashOrWord.MatchString(s):
			case s == "data:" && name == "img-src", s == "blob:" && name == "worker-src":
			default:
				t.Errorf("%s: %s allows %s", where, name, s)
			}
		}
	}
	for _, name := range []string{"script-src", "style-src"} {
		if _, ok := d[name]; !ok {
			t.Errorf("%s: no %s, so it falls back to default-src only by chance", where, name)
		}
	}
	if got, want := strings.Join(d["connect-src"], " "), strings.Join(connect, " "); got != want {
		t.Errorf("%s: connect-src is %q, want %q", where, got, want)
	}
	for _, name := range []string{"base-uri", "form-action"} {
		if got := strings.Join(d[name], " "); got != "'none'" {
			t.Errorf("%s: %s is %q, want 'none'", where, name, got)
		}
	}
}

// metaPolicy reads the policy of a <meta http-equiv> element in a page.
func metaPolicy(t *testing.T, file string) string {
	t.Helper()
	b, err := os.ReadFile(file)
	if err != nil {
		unavailable(t, "%s is missing; run `make dist bundle` first", file)
	}
	m := regexp.MustCompile(`<meta http-equiv="Content-Security-Policy" content="([^"]*)">`).FindSubmatch(b)
	if m == nil {
		t.Fatalf("%s carries no policy meta element", file)
	}
	return strings.ReplaceAll(string(m[1]), "&#39;", "'")
}

// TestPolicyStrict reads the Content-Security-Policy the served page gets
// as a header, and the ones the dist folder and the single-file build
// carry in a meta element, and asserts each is strict; in the browser the
// served page reports no policy violation while it works.
func TestPolicyStrict(t *testing.T) {
	p := openSite(t)
	resp, err := http.Get(p.base.String())
	if err != nil {
		t.Fatal(err)
	}
	resp.Body.Close()
	checkStrict(t, "the served page", resp.Header.Get("Content-Security-Policy"), []string{"'self'"})

	root := moduleRoot(t)
	checkStrict(t, "the dist page", metaPolicy(t, filepath.Join(root, "build", "dist", "index.html")), []string{"'self'"})
	checkStrict(t, "the single-file build", metaPolicy(t, filepath.Join(root, "build", "quillcast.html")), nil)
}
