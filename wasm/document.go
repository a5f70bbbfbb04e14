//go:build js && wasm

package main

import (
	"encoding/json"
	"fmt"
	"strings"

	"quillcast/core/memo"
	"quillcast/core/session"
)

// pagePart is one stretch of a session as the page edits it: prose (its
// markdown), a block of step lines, or a block of embedded data.
type pagePart struct {
	Kind  string     `json:"kind"`           // "prose", "steps" or "data"
	Text  string     `json:"text,omitempty"` // prose markdown, or the data block's body
	Name  string     `json:"name,omitempty"` // file name of a data block
	HTML  string     `json:"html,omitempty"` // prose rendered for reading; ignored when sent back
	Lines []pageLine `json:"lines"`          // step lines of a steps block; null for other parts
}

// pageLine is one step line and its 1-based line in the whole document, by
// which the page finds the line an error or an output belongs to.
type pageLine struct {
	Text string `json:"text"`
	Line int    `json:"line"`
}

// partsOf splits a session document into the parts the page shows,
// prose rendered for reading as the memo renders it ([memo.Note]).
func partsOf(doc *session.Document) []pagePart {
	out := []pagePart{}
	lines := doc.StepLines()
	for i, p := range doc.Parts {
		switch p.Kind {
		case session.Steps:
			pp := pagePart{Kind: "steps", Lines: []pageLine{}}
			for _, l := range lines {
				if l.Block == i {
					pp.Lines = append(pp.Lines, pageLine{Text: l.Text, Line: l.Line})
				}
			}
			out = append(out, pp)
		case session.Data:
			out = append(out, pagePart{Kind: "data", Name: p.Name, Text: p.Body})
		default:
			out = append(out, pagePart{Kind: "prose", Text: p.Raw, HTML: memo.Note(p.Raw)})
		}
	}
	return out
}

// documentOf writes the session document for parts sent by the page as
// JSON text.
func documentOf(partsJSON string) (*session.Document, error) {
	var parts []pagePart
	if err := json.Unmarshal([]byte(partsJSON), &parts); err != nil {
		return nil, fmt.Errorf("the page sent a session the engine cannot read (%v); reload the page", err)
	}
	blocks := make([]session.Part, 0, len(parts))
	for _, p := range parts {
		switch p.Kind {
		case "steps":
			var b strings.Builder
			for _, l := range p.Lines {
				b.WriteString(strings.ReplaceAll(l.Text, "\n", " "))
				b.WriteByte('\n')
			}
			blocks = append(blocks, session.Part{Kind: session.Steps, Body: b.String()})
		case "data":
			blocks = append(blocks, session.Part{Kind: session.Data, Name: p.Name, Body: p.Text})
		case "prose":
			if strings.TrimSpace(p.Text) != "" {
				blocks = append(blocks, session.Part{Kind: session.Prose, Body: strings.Trim(p.Text, "\n") + "\n"})
			}
		default:
			return nil, fmt.Errorf("the page sent a part of kind %q, which the engine does not know; reload the page", p.Kind)
		}
	}
	return session.Build(blocks), nil
}
