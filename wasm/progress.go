//go:build js && wasm

package main

import (
	"syscall/js"

	"quillcast/core/steps/runner"
)

// progressEvent is the name of the event that carries a run's progress. It
// is dispatched on globalThis: in a worker, worker.js forwards it to the
// page, which dispatches it again on its own globalThis.
const progressEvent = "quillcast-progress"

// reportProgress dispatches p as a CustomEvent whose detail is
// {fraction, text}: the share of the run done (0 to 1) for a progress bar's
// value, and a label written by the engine. Hosts without events (Node)
// hear nothing. It is called from the goroutine running the session, never
// from a JavaScript callback.
func reportProgress(p runner.Progress) {
	g := js.Global()
	if g.Get("dispatchEvent").Type() != js.TypeFunction || g.Get("CustomEvent").Type() != js.TypeFunction {
		return
	}
	detail := map[string]any{"fraction": p.Fraction(), "text": p.String()}
	g.Call("dispatchEvent", g.Get("CustomEvent").New(progressEvent, map[string]any{"detail": detail}))
}
