package memo

import (
	"strings"
	"testing"
)

func TestNote(t *testing.T) {
	t.Parallel()
	tests := []struct {
		name, in, want string
	}{
		{"empty", "", ""},
		{"paragraph with emphasis", "Orders *grow* each autumn.", "<p>Orders <em>grow</em> each autumn.</p>\n"},
		{"heading", "## Patterns", "<h2>Patterns</h2>\n"},
		{"raw html left out", "Hi <script>alert(1)</script> there", "<p>Hi <!-- raw HTML omitted -->alert(1)<!-- raw HTML omitted --> there</p>\n"},
		{"unsafe link as text", "[click](javascript:alert(1))", "<p>click</p>\n"},
		{"safe link kept", "[site](https://example.org/)", `<p><a href="https://example.org/">site</a></p>` + "\n"},
		{"image as its description", "![logo](https://example.org/x.png)", "<p>logo</p>\n"},
		{"table", "| a | b |\n| - | - |\n| 1 | 2 |", "<table>\n<thead>\n<tr>\n<th>a</th>\n<th>b</th>\n</tr>\n</thead>\n<tbody>\n<tr>\n<td>1</td>\n<td>2</td>\n</tr>\n</tbody>\n</table>\n"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			t.Parallel()
			if got := Note(tc.in); got != tc.want {
				t.Errorf("Note(%q) = %q, want %q", tc.in, got, tc.want)
			}
		})
	}
}

// TestNoteAsInMemo checks that a note renders in the page exactly as the
// same text renders as a paragraph of the memo's HTML.
func TestNoteAsInMemo(t *testing.T) {
	t.Parallel()
	for _, note := range hostileNotes {
		m := Memo{Title: "t", Sections: []Section{{Kind: Notes, Blocks: []Block{Paragraph{Text: note}}}, CautionsSection()}}
		doc, err := HTML(m)
		if err != nil {
			t.Fatal(err)
		}
		if got := Note(note); !strings.Contains(doc, "<h2>Analyst&#39;s notes</h2>\n"+got) {
			t.Errorf("Note(%q) = %q is not what the memo shows", note, got)
		}
	}
}

func FuzzNote(f *testing.F) {
	for _, s := range hostileNotes {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, note string) {
		if m := liveMarkup(Note(note)); m != "" {
			t.Fatalf("note %q left live markup %q", note, m)
		}
	})
}
