//go:build js && wasm

package main

import (
	"context"
	"maps"
	"syscall/js"

	"quillcast/core/bakeoff"
	"quillcast/core/steps"
	"quillcast/core/steps/runner"
)

// ran is the answer to run: the session's text as it will be saved, its
// parts with document lines, and each step's output.
type ran struct {
	Text   string     `json:"text"`
	Parts  []pagePart `json:"parts"`
	Result pageResult `json:"result"`
}

// pageResult is a run's outcome as the page receives it: every step's
// output, in order, with the blocks left out of those the page already
// holds, and every step error.
type pageResult struct {
	Outputs []pageOutput   `json:"outputs"`
	Errors  []*steps.Error `json:"errors"`
}

// pageOutput is one step's output. When Kept is true the page said it holds
// an output with the same [runner.Output.Key], so Blocks is left out (the
// charts and tables are most of an answer's size) and the page shows what
// it drew before; the other fields are sent as always.
type pageOutput struct {
	runner.Output
	Kept bool `json:"kept,omitempty"`
}

// runSession(parts string, held? string) runs the session whose parts the
// page sends as JSON text (see [pagePart]) on the attached files. held,
// optional, is a JSON array of the output keys the page holds: outputs
// with one of those keys come back without their blocks (see
// [pageOutput]). Steps unchanged since the last run reuse their results, so
// an edit re-runs only from the edited step on. Progress is dispatched as
// it goes (see [reportProgress]); a bake-off step shares its series among
// the page's further workers where the page offers them (see [pagePool]).
func (a *app) runSession(args []js.Value) (any, error) {
	partsJSON, err := stringArg(args, 0, "the session")
	if err != nil {
		return nil, err
	}
	var held []string
	if len(args) > 1 && args[1].Type() == js.TypeString {
		if err := jsonArg(args, 1, "the outputs it shows", &held); err != nil {
			return nil, err
		}
	}
	doc, err := documentOf(partsJSON)
	if err != nil {
		return nil, err
	}
	a.mu.Lock()
	files := maps.Clone(a.files)
	r := a.run
	a.mu.Unlock()
	ctx := context.Background()
	if p := pagePoolOf(); p != nil {
		ctx = bakeoff.WithPool(ctx, p)
	}
	res := r.RunWith(ctx, doc, runner.Data{Files: files}, runner.Options{Progress: reportProgress})
	a.mu.Lock()
	a.last = res
	a.mu.Unlock()
	return ran{Text: doc.String(), Parts: partsOf(doc), Result: resultFor(res, held)}, nil
}

// resultFor is res as the page receives it, when the page holds the
// outputs whose keys are in held.
func resultFor(res *runner.Result, held []string) pageResult {
	have := make(map[string]bool, len(held))
	for _, k := range held {
		have[k] = true
	}
	out := pageResult{Outputs: make([]pageOutput, len(res.Outputs)), Errors: res.Errors}
	for i, o := range res.Outputs {
		p := pageOutput{Output: o}
		if o.Key != "" && have[o.Key] {
			p.Blocks, p.Kept = nil, true
		}
		out.Outputs[i] = p
	}
	return out
}
