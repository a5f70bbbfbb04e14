package memo

import (
	"bytes"
	"html"
	"strings"
	"testing"
	"unicode/utf8"

	"github.com/yuin/goldmark"
	"github.com/yuin/goldmark/extension"
)

// cellText renders a one-cell GFM table and returns the cell's text, or
// ok false when the cell holds markup (emphasis, links, code, HTML) instead
// of plain text, or when no table came out.
func cellText(md goldmark.Markdown, cell string) (string, bool) {
	var out bytes.Buffer
	if err := md.Convert([]byte("| h |\n| --- |\n| "+cell+" |\n"), &out); err != nil {
		return "", false
	}
	doc := out.String()
	start := strings.Index(doc, "<td>")
	end := strings.LastIndex(doc, "</td>")
	if start < 0 || end < start || strings.Count(doc, "<td>") != 1 {
		return "", false
	}
	inner := doc[start+len("<td>") : end]
	if strings.ContainsAny(inner, "<>") {
		return "", false
	}
	return html.UnescapeString(inner), true
}

// normalCell is what a cell should read back as: escapeInline's rules
// without the escaping.
func normalCell(s string) string {
	var b strings.Builder
	for i := 0; i < len(s); {
		r, size := utf8.DecodeRuneInString(s[i:])
		if r == 0 || (r == utf8.RuneError && size == 1) {
			r = utf8.RuneError // each broken byte becomes one U+FFFD
		}
		b.WriteRune(r)
		i += size
	}
	s = b.String()
	s = strings.NewReplacer("\n", " ", "\r", " ", "\t", " ", "\v", " ", "\f", " ").Replace(s)
	return strings.Trim(s, " ")
}

// FuzzEscapeCell checks that any text put through escapeCell reads back from
// a GFM table cell as the same plain text, with no markup.
func FuzzEscapeCell(f *testing.F) {
	for _, s := range []string{"1,234.5", "a | b", "*bold*", "_x_", "`code`", "[l](u)", "![i](u)", "<b>",
		"&amp;", "~~s~~", "\\", "-12", "# h", "x\ny", " pad ", "https://example.com", "\x00", "\xff",
		"<script>alert(1)</script>", "]]>", "&#60;", "**", "|", "\\|"} {
		f.Add(s)
	}
	md := goldmark.New(goldmark.WithExtensions(extension.Table, extension.Strikethrough))
	f.Fuzz(func(t *testing.T, s string) {
		esc := escapeCell(s)
		if strings.ContainsAny(esc, "\n\r") || !utf8.ValidString(esc) {
			t.Fatalf("escapeCell(%q) = %q holds a line break or broken UTF-8", s, esc)
		}
		got, plain := cellText(md, esc)
		if !plain {
			t.Fatalf("escapeCell(%q) = %q reads back as markup", s, esc)
		}
		if want := normalCell(s); got != want {
			t.Fatalf("escapeCell(%q) = %q reads back as %q, want %q", s, esc, got, want)
		}
	})
}

// FuzzHTMLNote checks that no note, however hostile, leaves live markup in
// the HTML memo or swallows the sections after it.
func FuzzHTMLNote(f *testing.F) {
	for _, s := range hostileNotes {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, note string) {
		doc, err := HTML(hostileMemo(note))
		if err != nil {
			t.Fatal(err)
		}
		body := doc[strings.Index(doc, "<body>"):]
		if m := liveMarkup(body); m != "" {
			t.Fatalf("note %q left live markup %q", note, m)
		}
		if !strings.Contains(body, "<h2>Assumptions and cautions</h2>") {
			t.Fatalf("note %q swallowed the cautions section", note)
		}
	})
}

// FuzzCheckSVG checks that checkSVG never panics and never accepts a
// drawing holding something that runs or loads in a browser.
func FuzzCheckSVG(f *testing.F) {
	f.Add(`<svg xmlns="http://www.w3.org/2000/svg"><rect x="1"/></svg>`)
	f.Add(`<svg xmlns="http://www.w3.org/2000/svg"><script>alert(1)</script></svg>`)
	f.Add(`<svg xmlns="http://www.w3.org/2000/svg" onload="x"></svg>`)
	f.Add(`<svg><style>@import url(x)</style></svg>`)
	f.Add(`<!DOCTYPE x><svg/>`)
	f.Add(`<svg/><svg/>`)
	f.Fuzz(func(t *testing.T, doc string) {
		if checkSVG(doc) != nil {
			return
		}
		low := strings.ToLower(doc)
		for _, bad := range []string{"<script", "<foreignobject", "<image", "href", "url(", "@import", "<!doctype", "<!entity"} {
			if strings.Contains(low, bad) {
				t.Fatalf("accepted %q holding %q", doc, bad)
			}
		}
	})
}
