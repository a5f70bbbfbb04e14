//go:build js && wasm

package main

import (
	"bytes"
	"errors"
	"fmt"
	"syscall/js"

	"quillcast/core/memo"
)

// programVersion is written in the memo's appendix.
const programVersion = "Quillcast (browser engine, API " + version + ")"

// memoExport is the memo in the form asked for. Markdown and HTML come as
// text; the zip comes as bytes (base64 in the JSON).
type memoExport struct {
	Format string `json:"format"`
	Text   string `json:"text,omitempty"`
	Bytes  []byte `json:"bytes,omitempty"`
}

// memoOf(format string) writes the memo of the last run as "md", "html" or
// "zip" (memo.md, the charts as SVG files and forecasts.csv).
func (a *app) memoOf(args []js.Value) (any, error) {
	format, err := stringArg(args, 0, "the memo format")
	if err != nil {
		return nil, err
	}
	a.mu.Lock()
	res := a.last
	a.mu.Unlock()
	if res == nil {
		return nil, errors.New("run the steps first; the memo is written from their results")
	}
	m := res.Memo(programVersion)
	switch format {
	case "md":
		text, err := memo.Markdown(m)
		return memoExport{Format: format, Text: text}, err
	case "html":
		text, err := memo.HTML(m)
		return memoExport{Format: format, Text: text}, err
	case "zip":
		var buf bytes.Buffer
		if err := memo.Zip(&buf, m, res.ForecastSheet()); err != nil {
			return nil, err
		}
		return memoExport{Format: format, Bytes: buf.Bytes()}, nil
	}
	return nil, fmt.Errorf("the memo can be written as md, html or zip, not %q", format)
}
