package memo

import (
	"errors"
	"html"
	"regexp"
	"strings"
	"testing"
)

// hostileNotes are notes a user (or a pasted file) might hold that must not
// become live markup in the HTML memo.
var hostileNotes = []string{
	`<script>alert(1)</script>`,
	`<img src=x onerror=alert(1)>`,
	`text <img src=x onerror=alert(1)> inline`,
	`[x](javascript:alert(1))`,
	`[x](JaVaScRiPt:alert(1))`,
	"[x](java\tscript:alert(1))",
	`[x](javascript&#58;alert(1))`,
	`[y](data:text/html;base64,PHNjcmlwdD5hbGVydCgxKTwvc2NyaXB0Pg==)`,
	`[z](vbscript:msgbox)`,
	`[f](file:///etc/passwd)`,
	`<javascript:alert(1)>`,
	`![pixel](https://tracker.example/p.png)`,
	`![d](data:image/png;base64,iVBORw0KGgo=)`,
	"```\nunclosed fence <script>alert(1)</script>",
	`<!-- unclosed comment`,
	`<style>body{background:url(https://tracker.example/)}</style>`,
	`<iframe src="https://example.com"></iframe>`,
	`<a href="javascript:alert(1)">click</a>`,
	"[ref]\n\n[ref]: javascript:alert(1)",
}

// tagPattern finds real tags (escaped text holds &lt; instead of <).
var tagPattern = regexp.MustCompile(`<(/?)([a-zA-Z][a-zA-Z0-9]*)([^>]*)>`)

// riskyAttr finds attributes that run or load something.
var riskyAttr = regexp.MustCompile(`(?i)\s(?:on\w+|src|srcset|formaction|style|background)\s*=`)

// alignStyle is the one style goldmark writes itself, on table cells.
var alignStyle = regexp.MustCompile(` style="text-align:(?:left|right|center)"`)

// hrefAttr finds link targets.
var hrefAttr = regexp.MustCompile(`(?i)\shref="([^"]*)"`)

// liveMarkup returns the first tag in body that could run or load
// something in a browser: a tag outside what a memo uses, an event handler
// or source attribute, or a link that is not http, https, mailto or
// relative. It returns "" when there is none.
func liveMarkup(body string) string {
	allowed := map[string]bool{
		"body": true, "main": true, "header": true, "footer": true, "section": true, "h1": true, "h2": true,
		"h3": true, "h4": true, "h5": true, "h6": true, "p": true, "ul": true, "ol": true, "li": true,
		"dl": true, "dt": true, "dd": true, "div": true, "table": true, "caption": true, "thead": true,
		"tbody": true, "tr": true, "th": true, "td": true, "pre": true, "code": true, "strong": true,
		"em": true, "del": true, "a": true, "br": true, "hr": true, "blockquote": true, "figure": true,
		"figcaption": true, "html": true, "input": true,
	}
	for _, m := range tagPattern.FindAllStringSubmatch(body, -1) {
		if !allowed[strings.ToLower(m[2])] {
			return m[0]
		}
		if strings.EqualFold(m[2], "input") && m[3] != ` checked="" disabled="" type="checkbox"` && m[3] != ` disabled="" type="checkbox"` {
			return m[0] // goldmark's task-list box is the only input allowed
		}
		attrs := alignStyle.ReplaceAllString(m[3], "")
		if riskyAttr.MatchString(attrs) {
			return m[0]
		}
		for _, h := range hrefAttr.FindAllStringSubmatch(m[3], -1) {
			if !safeURL(html.UnescapeString(h[1])) {
				return m[0]
			}
		}
	}
	return ""
}

func hostileMemo(text string) Memo {
	return Memo{
		Title:      "Memo " + text,
		PreparedBy: text,
		Client:     text,
		Date:       text,
		Sections: []Section{
			{Kind: Notes, Heading: text, Blocks: []Block{
				Paragraph{Text: text},
				List{Items: []string{text, "after " + text}},
				Table{Caption: text, Columns: []Column{{Header: text}, {Header: text, Numeric: true}},
					Rows: [][]string{{text, text}}, Note: text},
				Steps{Info: text, Text: text},
			}},
			CautionsSection(text),
		},
	}
}

func TestHostileHTML(t *testing.T) {
	for _, note := range hostileNotes {
		t.Run(note, func(t *testing.T) {
			doc, err := HTML(hostileMemo(note))
			if err != nil {
				t.Fatal(err)
			}
			// The memo's own head holds a <style> and a meta policy; look
			// only at the body.
			body := doc[strings.Index(doc, "<body>"):]
			if m := liveMarkup(body); m != "" {
				t.Errorf("live markup %q survived in:\n%s", m, body)
			}
			if strings.Count(doc, "<section>") != 2 || !strings.Contains(body, StandingCaution()) {
				t.Errorf("a note swallowed the rest of the memo")
			}
		})
	}
}

func TestHostileMarkdown(t *testing.T) {
	for _, note := range hostileNotes {
		t.Run(note, func(t *testing.T) {
			md, err := Markdown(hostileMemo(note))
			if err != nil {
				t.Fatal(err)
			}
			// The standing caution must still be ordinary text after the
			// note: render the Markdown and look for it outside code.
			doc, err := HTML(Memo{Title: "t", Sections: []Section{{Blocks: []Block{Paragraph{Text: md}}}, CautionsSection()}})
			if err != nil {
				t.Fatal(err)
			}
			if strings.Count(doc, "<h2>Assumptions and cautions</h2>") != 2 {
				t.Errorf("the note swallowed the cautions heading in Markdown:\n%s", md)
			}
			if m := liveMarkup(doc[strings.Index(doc, "<body>"):]); m != "" {
				t.Errorf("live markup %q survived a Markdown round trip", m)
			}
		})
	}
}

func TestCheck(t *testing.T) {
	good, _ := demoMemo(2)
	tests := []struct {
		name   string
		change func(m *Memo)
		want   string
	}{
		{"complete", func(*Memo) {}, ""},
		{"no title", func(m *Memo) { m.Title = " " }, "no title"},
		{"no cautions section", func(m *Memo) { m.Sections = m.Sections[:6] }, "cautions"},
		{"cautions without the standing caution", func(m *Memo) {
			m.Sections[6] = Section{Kind: Cautions, Blocks: []Block{Paragraph{Text: "All good."}}}
		}, "standing caution"},
		{"standing caution in another section", func(m *Memo) {
			m.Sections[6].Kind = Notes
			m.Sections[0].Blocks = append(m.Sections[0].Blocks, Paragraph{Text: StandingCaution()})
		}, "cautions"},
		{"short row", func(m *Memo) {
			tb := m.Sections[3].Blocks[0].(Table)
			tb.Rows = append(tb.Rows, []string{"naive"})
			m.Sections[3].Blocks[0] = tb
		}, "Exhibit 1 — Holdout accuracy, row 4: 1 cells for 5 columns"},
		{"table without columns", func(m *Memo) {
			m.Sections[3].Blocks[0] = Table{Caption: "empty"}
		}, "Exhibit 1 — empty has no columns"},
		{"chart with a script", func(m *Memo) {
			m.Sections[4].Blocks[0] = Chart{Caption: "bad", SVG: `<svg xmlns="http://www.w3.org/2000/svg"><script>alert(1)</script></svg>`}
		}, `Exhibit 2 — bad: the chart holds a "script" element`},
		{"chart with an event handler", func(m *Memo) {
			m.Sections[4].Blocks[0] = Chart{SVG: `<svg xmlns="http://www.w3.org/2000/svg" onload="alert(1)"></svg>`}
		}, `"onload" attribute`},
		{"chart with a link", func(m *Memo) {
			m.Sections[4].Blocks[0] = Chart{SVG: `<svg xmlns="http://www.w3.org/2000/svg"><a href="https://x"><text>t</text></a></svg>`}
		}, `"a" element`},
		{"chart loading a style", func(m *Memo) {
			m.Sections[4].Blocks[0] = Chart{SVG: `<svg xmlns="http://www.w3.org/2000/svg"><style>@import "https://x/y.css";</style></svg>`}
		}, "outside resource"},
		{"chart fill from a url", func(m *Memo) {
			m.Sections[4].Blocks[0] = Chart{SVG: `<svg xmlns="http://www.w3.org/2000/svg"><rect fill="url(https://x/#p)"/></svg>`}
		}, `"fill" attribute`},
		{"chart that is text", func(m *Memo) {
			m.Sections[4].Blocks[0] = Chart{SVG: `<b>hello</b>`}
		}, "one svg element"},
		{"chart with trailing markup", func(m *Memo) {
			m.Sections[4].Blocks[0] = Chart{SVG: `<svg xmlns="http://www.w3.org/2000/svg"></svg><img src=x>`}
		}, "well-formed"},
		{"chart with a doctype", func(m *Memo) {
			m.Sections[4].Blocks[0] = Chart{SVG: `<!DOCTYPE svg [<!ENTITY x "y">]><svg xmlns="http://www.w3.org/2000/svg"></svg>`}
		}, "declaration"},
		{"empty chart", func(m *Memo) { m.Sections[4].Blocks[0] = Chart{} }, "empty"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			m, _ := demoMemo(2)
			m.Sections = append([]Section(nil), good.Sections...)
			for i := range m.Sections {
				m.Sections[i].Blocks = append([]Block(nil), good.Sections[i].Blocks...)
			}
			tc.change(&m)
			err := m.Check()
			if tc.want == "" {
				if err != nil {
					t.Fatalf("Check() = %v, want no error", err)
				}
				return
			}
			if err == nil || !strings.Contains(err.Error(), tc.want) {
				t.Fatalf("Check() = %v, want an error containing %q", err, tc.want)
			}
			if _, herr := HTML(m); herr == nil {
				t.Errorf("HTML wrote a memo that Check refuses")
			}
			if _, merr := Markdown(m); merr == nil {
				t.Errorf("Markdown wrote a memo that Check refuses")
			}
		})
	}
	m := good
	m.Sections = nil
	if err := m.Check(); !errors.Is(err, ErrNoCautions) {
		t.Errorf("Check() on a memo with no sections = %v, want ErrNoCautions", err)
	}
}
