package browsertest

import (
	"testing"
	"time"

	"github.com/chromedp/cdproto/emulation"
	"github.com/chromedp/chromedp"
	"github.com/chromedp/chromedp/kb"
)

// TestDarkSchemeAndHelp shows the page in the dark scheme with the step
// reference open (F2), generated from the engine's step definitions, and
// checks that the page's own colours follow the scheme.
func TestDarkSchemeAndHelp(t *testing.T) {
	p := openSite(t)
	if _, err := chromedp.Call(p.ctx, emulation.SetEmulatedMedia, emulation.SetEmulatedMediaParams{
		Features: []*emulation.MediaFeature{{Name: "prefers-color-scheme", Value: "dark"}},
	}); err != nil {
		t.Fatalf("asking for the dark scheme: %v", err)
	}
	ready := p.open("")
	if bg := eval[string](p, `getComputedStyle(document.querySelector('.doc')).backgroundColor`); bg != "rgb(27, 29, 34)" {
		t.Errorf("in the dark scheme the memo draft's background is %s, want the dark paper rgb(27, 29, 34)", bg)
	}
	p.run("opening the step reference", 10*time.Second, chromedp.KeyEvent(kb.F2))
	waitFor(p, "the step reference", `!document.getElementById('help-panel').hidden && document.querySelectorAll('#help-panel .verb-help').length > 5`)
	for _, verb := range []string{"load", "split", "forecast", "evaluate"} {
		if n := eval[int](p, `[...document.querySelectorAll('#help-panel h3 code')].filter(c => c.textContent === '`+verb+`').length`); n != 1 {
			t.Errorf("the step reference lists the verb %q %d times, want once", verb, n)
		}
	}
	p.screenshot("dark-with-reference")
	p.checkClean(ready)
}
