//go:build js && wasm

package main

import (
	"encoding/json"
	"strings"
	"testing"

	"quillcast/core/session"
)

func TestDocumentRoundTrip(t *testing.T) {
	tests := []struct {
		name string
		text string
		// wantLines are the document lines of the step lines, in order.
		wantLines []int
	}{
		{"steps only", "```quill\nload orders.csv\nsplit last=12\n```\n", []int{2, 3}},
		{"prose between blocks", "# Orders\n\nA note.\n\n```quill\nload orders.csv\n```\n\nMore.\n\n```quill\nsplit last=6\n```\n", []int{6, 12}},
		{"embedded data", "```quill\nload a.csv\n```\n\n```quill-data a.csv\nmonth,units\n2024-01,3\n```\n", []int{2}},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			parts := partsOf(session.Parse(tc.text))
			var got []int
			for _, p := range parts {
				for _, l := range p.Lines {
					got = append(got, l.Line)
				}
			}
			if len(got) != len(tc.wantLines) {
				t.Fatalf("step lines at %v, want %v", got, tc.wantLines)
			}
			for i := range got {
				if got[i] != tc.wantLines[i] {
					t.Errorf("step line %d at document line %d, want %d", i+1, got[i], tc.wantLines[i])
				}
			}
			// What the page sends back must give the same parts again,
			// and a second round must not change the text at all.
			b, err := json.Marshal(parts)
			if err != nil {
				t.Fatal(err)
			}
			doc, err := documentOf(string(b))
			if err != nil {
				t.Fatal(err)
			}
			again, _ := json.Marshal(partsOf(doc))
			doc2, err := documentOf(string(again))
			if err != nil {
				t.Fatal(err)
			}
			if doc.String() != doc2.String() {
				t.Errorf("the text drifts between rounds:\n%q\n%q", doc.String(), doc2.String())
			}
			if strings.Count(doc.String(), "```quill\n") != strings.Count(tc.text, "```quill\n") {
				t.Errorf("step blocks changed:\n%s", doc.String())
			}
		})
	}
}

func TestDocumentOfRejectsUnknownParts(t *testing.T) {
	for _, bad := range []string{`{`, `[{"kind":"spreadsheet"}]`} {
		if _, err := documentOf(bad); err == nil || !strings.Contains(err.Error(), "reload the page") {
			t.Errorf("documentOf(%s) error %v, want one telling to reload", bad, err)
		}
	}
}

func TestProseRendered(t *testing.T) {
	text := "## Patterns\n\nOrders *grow*. <script>alert(1)</script> [link](javascript:alert(1))\n\n```quill\nsplit last=12\n```\n"
	parts := partsOf(session.Parse(text))
	if len(parts) == 0 || parts[0].Kind != "prose" {
		t.Fatalf("parts = %+v, want prose first", parts)
	}
	html := parts[0].HTML
	for _, want := range []string{"<h2>Patterns</h2>", "<em>grow</em>"} {
		if !strings.Contains(html, want) {
			t.Errorf("rendered note lacks %s:\n%s", want, html)
		}
	}
	for _, bad := range []string{"<script", "javascript:"} {
		if strings.Contains(html, bad) {
			t.Errorf("rendered note carries %s:\n%s", bad, html)
		}
	}
}
