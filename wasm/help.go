//go:build js && wasm

package main

import (
	"syscall/js"

	"quillcast/core/session"
	"quillcast/core/steps"
)

// help() answers with the reference of the step language, generated from
// the same definitions the parser uses.
func (a *app) help(args []js.Value) (any, error) {
	return steps.Help(), nil
}

// complete(line string, column number) answers with the completions at a
// 1-based column of a step line.
func (a *app) complete(args []js.Value) (any, error) {
	line, err := stringArg(args, 0, "the step line")
	if err != nil {
		return nil, err
	}
	col, err := intArg(args, 1, "the cursor column")
	if err != nil {
		return nil, err
	}
	return steps.Complete(line, col), nil
}

// parts(text string) splits a session's text into the parts the page shows.
func (a *app) parts(args []js.Value) (any, error) {
	text, err := stringArg(args, 0, "the session text")
	if err != nil {
		return nil, err
	}
	return partsOf(session.Parse(text)), nil
}
