package browsertest

import (
	"archive/zip"
	"bytes"
	"encoding/base64"
	"fmt"
	"io"
	"net/url"
	"os"
	"path/filepath"
	"regexp"
	"strings"
	"testing"
	"time"

	cdppage "github.com/chromedp/cdproto/page"
	"github.com/chromedp/chromedp"
)

// Each hostile payload, if it ever runs, sets window.__pwned to its number.
// None carries a double quote, so each fits a quoted step value.
const (
	payScript = `<script>window.__pwned=1</script>`
	paySVG    = `<svg onload=window.__pwned=2>`
	payImg    = `<img src=x onerror=window.__pwned=3>`
	payJSLink = `javascript:window.__pwned=4`
	payData   = `data:text/html,<script>window.__pwned=5</script>`
	payStyle  = `</style><style>*{display:none}</style>`
)

// tripwire replaces the dialogs with a flag, so that a payload calling one
// cannot hang the test, and records that it tried.
const tripwire = `window.__dialogs = 0;
for (const f of ["alert", "confirm", "prompt", "print"]) window[f] = () => { window.__dialogs++; };`

// armTripwire installs [tripwire] in every document p opens from now on,
// and dismisses any real dialog, counting it.
func armTripwire(t *testing.T, p *page) *int {
	t.Helper()
	if _, err := chromedp.Call(p.ctx, cdppage.AddScriptToEvaluateOnNewDocument, cdppage.AddScriptToEvaluateOnNewDocumentParams{Source: tripwire}); err != nil {
		t.Fatalf("arming the tripwire: %v", err)
	}
	opened := new(int)
	err := chromedp.Listen(p.ctx, func(ev any) {
		if _, ok := ev.(*cdppage.EventJavascriptDialogOpening); ok {
			p.mu.Lock()
			*opened++
			p.mu.Unlock()
			go chromedp.Call(p.ctx, cdppage.HandleJavaScriptDialog, cdppage.HandleJavaScriptDialogParams{Accept: false})
		}
	})
	if err != nil {
		t.Fatalf("listening for dialogs: %v", err)
	}
	return opened
}

// checkInert fails the test when a payload ran or left live markup under
// the element matching root: a tripped wire, an opened dialog, an event
// handler attribute, a script element, a javascript: or data: link, or a
// style element outside the engine's charts.
func checkInert(t *testing.T, p *page, where, root string, opened *int) {
	t.Helper()
	report := eval[string](p, fmt.Sprintf(`(() => {
		const out = [];
		if (window.__pwned !== undefined) out.push("window.__pwned = " + window.__pwned);
		if (window.__dialogs) out.push(window.__dialogs + " dialog calls");
		const root = document.querySelector(%q) || document;
		for (const n of root.querySelectorAll("*")) {
			for (const a of n.attributes) {
				const v = a.value.trim().toLowerCase();
				if (a.name.startsWith("on")) out.push(n.tagName + " has " + a.name);
				if (/^(href|src|xlink:href|action|formaction)$/.test(a.name) && (v.startsWith("javascript:") || v.startsWith("data:text"))) out.push(n.tagName + " links to " + a.value);
			}
			if (n.tagName.toLowerCase() === "script") out.push("a script element");
			if (n.tagName.toLowerCase() === "style" && !n.closest("svg")) out.push("a style element outside a chart");
			if (n.tagName.toLowerCase() === "iframe" || n.tagName.toLowerCase() === "object" || n.tagName.toLowerCase() === "embed") out.push("an " + n.tagName);
		}
		return out.join("\n");
	})()`, root))
	p.mu.Lock()
	dialogs := *opened
	p.mu.Unlock()
	if dialogs > 0 {
		report += fmt.Sprintf("\n%d dialogs opened", dialogs)
	}
	if report != "" {
		p.screenshot("hostile-" + strings.ReplaceAll(where, " ", "-"))
		t.Errorf("%s: hostile input became live:\n%s", where, report)
	}
}

// hostileFileName is the name of the hostile data file (no slash, so any
// file system takes it).
const hostileFileName = `orders <img src=x onerror=window.__pwned=3>.csv`

// hostileSession is a session file whose title, notes, memo details,
// column names, series labels and file name all carry payloads, with its
// data embedded.
func hostileSession() string {
	var data strings.Builder
	data.WriteString("shop,month," + payScript + "\n")
	labels := []string{paySVG, "=HYPERLINK(1)", "+SUM(1)", "@cmd", payJSLink}
	for _, l := range labels {
		for i := range 30 {
			fmt.Fprintf(&data, "%s,%d-%02d,%d\n", l, 2022+i/12, i%12+1, 100+i%12*3+len(l))
		}
	}
	return "# Review " + payScript + "\n\n" +
		"A note with a [link](" + payJSLink + "), an ![image](" + payData + "), raw " + payImg + " and " + paySVG + ", " +
		"a <a href=\"" + payJSLink + "\">raw link</a>, <style>*{display:none}</style> and " + payStyle + ".\n\n" +
		"=1+1 and @SUM(A1) and +2 and -3 lead these lines.\n\n" +
		"```quill\n" +
		`memo title="` + paySVG + `" client="=HYPERLINK(1)" by="@cmd"` + "\n" +
		`load "` + hostileFileName + `" series="` + paySVG + `" value="` + payScript + `" date=month` + "\n" +
		"split last=6\n" +
		"smooth centered width=12\n" +
		"forecast seasonal-naive as=sn\n" +
		"forecast ses as=s\n" +
		"evaluate\n" +
		"```\n\n" +
		"```quill-data " + hostileFileName + "\n" + data.String() + "```\n"
}

// TestHostileInput opens a session file full of payloads (markup, links,
// CSS, formulas) and walks everywhere it shows: the notebook and its SVG
// charts, the data preview, the memo preview, the standalone HTML memo
// opened on its own, the memo's forecast sheet, and a share link. Nothing
// may run, and the sheet's cells may not start a formula.
func TestHostileInput(t *testing.T) {
	p := openSite(t)
	opened := armTripwire(t, p)
	ready := p.open("")

	file := filepath.Join(t.TempDir(), "review "+payImg+".md")
	if err := os.WriteFile(file, []byte(hostileSession()), 0o644); err != nil {
		t.Fatal(err)
	}
	p.run("opening the hostile session", 20*time.Second, chromedp.SetUploadFiles(chromedp.CSS("#import-input"), []string{file}))
	waitFor(p, "the hostile session's charts", `document.querySelectorAll('#parts figure.exhibit svg.qc').length > 0`)
	time.Sleep(300 * time.Millisecond) // let an image error or load event fire if there were one
	checkInert(t, p, "the notebook", "body", opened)
	if title := eval[string](p, `document.getElementById('doc-title').value + ' ' + document.title`); !strings.Contains(title, "<img") && !strings.Contains(title, "review") {
		t.Logf("title shown: %q", title)
	}
	if n := eval[int](p, `[...document.querySelectorAll('#parts svg.qc')].filter(s => s.textContent.includes('window.__pwned')).length`); n == 0 {
		t.Errorf("no chart shows the hostile column name as text; the payload should appear, escaped")
	}
	if errs := eval[string](p, `[...document.querySelectorAll('#parts .output')].map(o => o.textContent).filter(t => /could not|unknown|needs/.test(t)).join('\n')`); errs != "" {
		t.Errorf("the hostile session's steps did not all run:\n%s", errs)
	}

	// The data preview of a hostile file attached through the picker.
	dataFile := filepath.Join(t.TempDir(), "second "+payImg+".csv")
	second := strings.Replace(string(monthRows("10", "12", "11", "13", "15", "14", "16", "18", "17", "19", "21", "20", "22", "24")), "units", payImg, 1)
	if err := os.WriteFile(dataFile, []byte(second), 0o644); err != nil {
		t.Fatal(err)
	}
	p.run("attaching the hostile file", 20*time.Second, chromedp.SetUploadFiles(chromedp.CSS("#file-input"), []string{dataFile}))
	waitFor(p, "the hostile file's preview", `document.getElementById('preview-dialog').open && document.querySelectorAll('#preview-body svg.qc').length > 0`)
	time.Sleep(300 * time.Millisecond)
	checkInert(t, p, "the data preview", "body", opened)
	if !eval[bool](p, `[...document.querySelectorAll('#datasets li')].some(n => n.textContent.includes('onerror=window'))`) {
		t.Error("the hostile file name is not listed as text among the datasets")
	}

	// The memo preview.
	eval[bool](p, `(() => { const d = document.getElementById('preview-dialog'); if (d.open) d.close(); return true; })()`)
	p.run("opening the memo preview", 20*time.Second, chromedp.Click(chromedp.CSS("#memo-preview")))
	waitFor(p, "the memo preview", `document.getElementById('memo-dialog').open && document.querySelectorAll('#memo-body svg.qc').length > 0`)
	time.Sleep(300 * time.Millisecond)
	checkInert(t, p, "the memo preview", "#memo-body", opened)
	if !eval[bool](p, fmt.Sprintf(`document.getElementById('memo-body').textContent.includes(%q)`, "=1+1")) {
		t.Error("the memo preview lost the note's text")
	}

	// The standalone HTML memo, opened on its own in another tab.
	html := eval[string](p, `globalThis.quillcast.memo("html").then(t => JSON.parse(t).value.text)`)
	if m := regexp.MustCompile(`(?i)<script|<[^>]+\son[a-z]+\s*=|(href|src)\s*=\s*"?(javascript|data:text)`).FindString(html); m != "" {
		t.Errorf("the HTML memo holds live markup: %q", m)
	}
	memoFile := filepath.Join(t.TempDir(), "memo.html")
	if err := os.WriteFile(memoFile, []byte(html), 0o644); err != nil {
		t.Fatal(err)
	}
	tab := p.newTab()
	tabOpened := armTripwire(t, tab)
	tab.run("opening the HTML memo", 20*time.Second, chromedp.Navigate((&url.URL{Scheme: "file", Path: memoFile}).String()), chromedp.WaitReady(chromedp.CSS("body")))
	time.Sleep(300 * time.Millisecond)
	checkInert(t, tab, "the HTML memo", "body", tabOpened)

	// The memo's forecast sheet: no cell may start a formula.
	zipB64 := eval[string](p, `globalThis.quillcast.memo("zip").then(t => JSON.parse(t).value.bytes)`)
	checkSheets(t, zipB64)

	// Hostile step labels go into the sheet too: a formula-leading label is
	// either refused by the step language or guarded in the sheet.
	out := runLines(p, []string{`load "second ` + payImg + `.csv" date=month`, "split last=3", `forecast naive as="=cmd|calc"`, `forecast drift as="@SUM(1)"`})
	if stepErrorLine.MatchString(out) {
		if !strings.Contains(out, "as") {
			t.Errorf("a formula-leading label was refused for another reason:\n%s", out)
		}
	} else {
		sheet := checkSheets(t, eval[string](p, `globalThis.quillcast.memo("zip").then(t => JSON.parse(t).value.bytes)`))
		if !strings.Contains(sheet, "cmd|calc") || !strings.Contains(sheet, "SUM(1)") {
			t.Errorf("the forecast sheet lacks the labels it should guard:\n%.500s", sheet)
		}
	}

	// A share link carrying hostile steps opens as inert text.
	steps := "load \"" + hostileFileName + "\" series=\"" + paySVG + "\"\nforecast naive as=x\n# " + payScript + " " + payImg
	ready = p.open("#steps=" + url.PathEscape(steps))
	time.Sleep(300 * time.Millisecond)
	checkInert(t, p, "a share link", "body", opened)
	if !eval[bool](p, `[...document.querySelectorAll('#parts code.line')].some(n => n.textContent.includes('onload'))`) {
		t.Error("the shared steps are not shown as text")
	}
	p.checkClean(ready)
}

// checkSheets fails the test when a CSV file of the zip (base64) holds a
// cell a spreadsheet would run: one starting with =, +, - or @ that is not
// a plain number, or with a tab or carriage return.
func checkSheets(t *testing.T, zipB64 string) string {
	t.Helper()
	raw, err := base64.StdEncoding.DecodeString(zipB64)
	if err != nil {
		t.Fatalf("the memo zip is not base64: %v", err)
	}
	zr, err := zip.NewReader(bytes.NewReader(raw), int64(len(raw)))
	if err != nil {
		t.Fatalf("the memo zip does not open: %v", err)
	}
	number := regexp.MustCompile(`^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$`)
	sheets := 0
	var all strings.Builder
	for _, f := range zr.File {
		if !strings.HasSuffix(f.Name, ".csv") {
			continue
		}
		sheets++
		rc, err := f.Open()
		if err != nil {
			t.Fatal(err)
		}
		body, _ := io.ReadAll(rc)
		rc.Close()
		all.Write(body)
		for i, line := range strings.Split(string(body), "\n") {
			for _, cell := range strings.Split(line, ",") {
				cell = strings.Trim(cell, `"`)
				if cell == "" || number.MatchString(cell) {
					continue
				}
				if strings.ContainsAny(cell[:1], "=+-@\t\r") {
					t.Errorf("%s line %d: the cell %q would run as a formula", f.Name, i+1, cell)
				}
			}
		}
	}
	if sheets == 0 {
		t.Error("the memo zip holds no CSV sheet to check")
	}
	return all.String()
}
