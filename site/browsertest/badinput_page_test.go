package browsertest

import (
	"fmt"
	"os"
	"path/filepath"
	"strings"
	"testing"
	"time"

	"github.com/chromedp/chromedp"
)

// stepMessage returns the text of the output under the step line that
// reads exactly text.
func stepMessage(p *page, text string) string {
	return eval[string](p, fmt.Sprintf(`(() => {
		const c = [...document.querySelectorAll('#parts code.line')].find(n => n.textContent === %q);
		const o = c && c.closest('.step').querySelector('.output');
		return o ? o.textContent : '';
	})()`, text))
}

// TestBadInputThroughThePage gives the real page bad files through its
// picker and bad steps through its editor: each shows its message where the
// user looks, the steps before a bad one keep their output, the bad text
// itself is kept, and after a reload everything is as it was left.
func TestBadInputThroughThePage(t *testing.T) {
	p := openSite(t)
	ready := p.open("")
	before := kept(p)
	dir := t.TempDir()

	files := []struct {
		name string
		data []byte
		want string
	}{
		{"orders-utf16.csv", utf16LE("month,units\n2024-01,1\n2024-02,2\n", true), "saved as UTF-16 text"},
		{"empty.csv", nil, "the file is empty"},
		{"ragged.csv", []byte("month,units\n2024-01,1\n2024-02,2,9\n2024-03,3\n"), "this line has 3 cells but the first line has 2"},
		{"weeks.csv", []byte("week,units\n2021-W51,1\n2021-W52,2\n2021-W53,3\n"), "ISO year 2021 has 52 weeks, not 53"},
	}
	for _, f := range files {
		path := filepath.Join(dir, f.name)
		if err := os.WriteFile(path, f.data, 0o644); err != nil {
			t.Fatal(err)
		}
		p.run("attaching "+f.name, 20*time.Second, chromedp.SetUploadFiles(chromedp.CSS("#file-input"), []string{path}))
		waitFor(p, "the preview of "+f.name, fmt.Sprintf(`document.getElementById('preview-dialog').open && document.getElementById('preview-body').textContent.includes(%q)`, f.name))
		body := eval[string](p, `document.getElementById('preview-body').textContent`)
		if !strings.Contains(body, f.want) {
			t.Errorf("the preview of %s does not say %q:\n%.600s", f.name, f.want, body)
		}
		eval[bool](p, `(() => { document.getElementById('preview-dialog').close(); return true; })()`)
		checkAlive(t, p)
	}

	smooth := stepMessage(p, "smooth centered width=12")
	editStep(p, "split last=12", "split last=500")
	waitFor(p, "the split's error", `document.querySelector('#parts .msg.error') !== null`)
	if got := stepMessage(p, "split last=500"); !strings.Contains(got, "cannot hold out the last 500 periods") {
		t.Errorf("the bad split shows %q", got)
	}
	if got := stepMessage(p, "evaluate by=mase"); !strings.Contains(strings.ToLower(got), "step") {
		t.Errorf("a step after the bad split does not say which step it waits on: %q", got)
	}
	if got := stepMessage(p, "smooth centered width=12"); got != smooth {
		t.Errorf("a step before the bad one lost its output")
	}
	editStep(p, "evaluate by=mase", "fetch everything")
	waitFor(p, "the unknown verb's message", `[...document.querySelectorAll('#parts .msg.error')].some(m => m.textContent.includes('unknown verb'))`)
	waitFor(p, "the autosave", `/^[0-9]+$/.test(document.documentElement.dataset.saved || '')`)
	p.screenshot("bad-steps")
	edited := kept(p)
	if !strings.Contains(strings.Join(edited.Lines, "\n"), "fetch everything") {
		t.Error("the page dropped the line with the unknown verb")
	}
	for name, size := range before.Datasets {
		if edited.Datasets[name] != size {
			t.Errorf("stored dataset %s was %d bytes, now %d", name, size, edited.Datasets[name])
		}
	}
	p.checkClean(ready)

	// A reload brings back the session as left, bad lines included.
	ready = p.open("")
	compareKept(t, "after a reload", edited, kept(p))
	p.checkClean(ready)
}
