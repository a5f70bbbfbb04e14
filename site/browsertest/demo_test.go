package browsertest

import (
	"testing"
)

// TestDemoPage opens the page as a first-time visitor does: the engine
// starts, the demo data is drawn as a chart with a table of its first rows,
// nothing shows up in the console and no request leaves the page's files.
func TestDemoPage(t *testing.T) {
	p := openSite(t)
	ready := p.open("")
	p.screenshot("demo-1366x768")

	if !eval[bool](p, `globalThis.quillcast && globalThis.quillcast.ready === true`) {
		t.Error("the engine's ready flag is not set")
	}
	if mode := eval[string](p, `document.documentElement.dataset.engine`); mode != "worker" {
		t.Errorf("the engine runs in %q, want a worker", mode)
	}
	checks := []struct {
		name string
		expr string
	}{
		{"chart drawn by the engine", `document.querySelectorAll('#parts svg.qc').length`},
		{"table of first rows", `document.querySelectorAll('#parts table.figures tbody tr').length`},
		{"dataset listed in the rail", `document.querySelectorAll('#datasets li').length`},
		{"session listed in the rail", `document.querySelectorAll('#sessions li').length`},
		{"step lines with their verb marked", `document.querySelectorAll('#parts code.line .verb').length`},
		{"numbered exhibits", `document.querySelectorAll('#parts figure.exhibit h3 .num').length`},
		{"notes rendered from markdown", `document.querySelectorAll('#parts .prose h2').length`},
	}
	for _, c := range checks {
		if n := eval[int](p, c.expr); n == 0 {
			t.Errorf("%s: none found (%s)", c.name, c.expr)
		}
	}
	// The chart's own style sheet must apply under the page's policy: the
	// background rectangle takes its fill from it.
	if fill := eval[string](p, `(() => { const r = document.querySelector('#parts svg.qc .qc-bg'); return r ? getComputedStyle(r).fill : 'none'; })()`); fill == "none" || fill == "" {
		t.Errorf("the chart's style sheet did not apply (background fill %q)", fill)
	}
	p.checkClean(ready)
}
