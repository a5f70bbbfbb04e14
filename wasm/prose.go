//go:build js && wasm

package main

import (
	"bytes"

	"github.com/yuin/goldmark"
	"github.com/yuin/goldmark/extension"
)

// proseHTML renders a note's markdown for the page with goldmark's default
// HTML renderer, which leaves raw HTML out and drops dangerous link schemes
// (javascript:, vbscript:, file:, data: other than images). The page's
// Content-Security-Policy refuses images from anywhere else.
func proseHTML(md goldmark.Markdown, text string) string {
	var b bytes.Buffer
	if err := md.Convert([]byte(text), &b); err != nil {
		return ""
	}
	return b.String()
}

// newProse returns the renderer for notes: CommonMark with tables and
// strikethrough, as the memo renders them.
func newProse() goldmark.Markdown {
	return goldmark.New(goldmark.WithExtensions(extension.Table, extension.Strikethrough))
}
