//go:build js && wasm

package main

import (
	"context"
	"maps"
	"syscall/js"

	"quillcast/core/steps/runner"
)

// ran is the answer to run: the session's text as it will be saved, its
// parts with document lines, and each step's output.
type ran struct {
	Text   string         `json:"text"`
	Parts  []pagePart     `json:"parts"`
	Result *runner.Result `json:"result"`
}

// runSession(parts string) runs the session whose parts the page sends as
// JSON text (see [pagePart]) on the attached files. Steps unchanged since
// the last run reuse their results, so an edit re-runs only from the edited
// step on. Progress is dispatched as it goes (see [reportProgress]).
func (a *app) runSession(args []js.Value) (any, error) {
	partsJSON, err := stringArg(args, 0, "the session")
	if err != nil {
		return nil, err
	}
	doc, err := documentOf(partsJSON)
	if err != nil {
		return nil, err
	}
	a.mu.Lock()
	files := maps.Clone(a.files)
	r := a.run
	a.mu.Unlock()
	res := r.RunWith(context.Background(), doc, runner.Data{Files: files}, runner.Options{Progress: reportProgress})
	a.mu.Lock()
	a.last = res
	a.mu.Unlock()
	return ran{Text: doc.String(), Parts: partsOf(doc), Result: res}, nil
}
