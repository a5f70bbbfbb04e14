//go:build js && wasm

package main

import (
	"fmt"
	"syscall/js"
	"unicode/utf8"

	"quillcast/core/session"
	"quillcast/core/steps"
)

// exportSession(parts string, withData bool) writes the session's text form
// for saving as a file. With data, every attached file its load steps name
// is embedded as a data block, so the file alone reproduces the analysis;
// without, the file carries the steps and notes only.
func (a *app) exportSession(args []js.Value) (any, error) {
	partsJSON, err := stringArg(args, 0, "the session")
	if err != nil {
		return nil, err
	}
	withData := len(args) > 1 && args[1].Truthy()
	doc, err := documentOf(partsJSON)
	if err != nil {
		return nil, err
	}
	if !withData {
		return doc.String(), nil
	}
	embedded := doc.Embedded()
	blocks := make([]session.Part, 0, len(doc.Parts))
	for _, p := range doc.Parts {
		switch p.Kind {
		case session.Steps:
			blocks = append(blocks, session.Part{Kind: p.Kind, Body: p.Body})
		case session.Data:
			blocks = append(blocks, session.Part{Kind: p.Kind, Name: p.Name, Body: p.Body})
		default:
			blocks = append(blocks, session.Part{Kind: p.Kind, Body: p.Raw})
		}
	}
	a.mu.Lock()
	defer a.mu.Unlock()
	for _, name := range steps.Parse(doc).Files() {
		if _, ok := embedded[name]; ok {
			continue
		}
		data, ok := a.files[name]
		if !ok {
			return nil, fmt.Errorf("the session loads %q, which is not attached; attach it or save the session without its data", name)
		}
		if !utf8.Valid(data) {
			return nil, fmt.Errorf("%q is not text, so it cannot be written into the session file; save the session without its data", name)
		}
		blocks = append(blocks, session.Part{Kind: session.Data, Name: name, Body: string(data)})
		embedded[name] = data
	}
	return session.Build(blocks).String(), nil
}
