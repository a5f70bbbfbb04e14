package memo

import (
	"bytes"
	"html"
	"strings"

	"github.com/yuin/goldmark"
)

// HTML returns the memo as one self-contained HTML page: its own style
// sheet with light and dark schemes, the charts inlined, nothing loaded
// from anywhere (a Content-Security-Policy says so to the browser).
//
// Paragraphs, list items and table notes go through goldmark with raw HTML
// left out, links other than http, https, mailto and relative ones turned
// into plain text, and images shown as their description. Titles, headings,
// captions and table cells are escaped as plain text. Charts, drawn and
// escaped by package quillcast/core/chart, are inserted by this function
// after [Memo.Check] has made sure they are plain SVG drawings.
func HTML(m Memo) (string, error) {
	if err := m.Check(); err != nil {
		return "", err
	}
	md := newMarkdown()
	var b strings.Builder
	b.WriteString("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n")
	b.WriteString("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n")
	b.WriteString("<meta http-equiv=\"Content-Security-Policy\" content=\"default-src 'none'; style-src 'unsafe-inline'\">\n")
	b.WriteString("<title>" + html.EscapeString(m.Title) + "</title>\n")
	b.WriteString("<style>" + memoStyle + "</style>\n</head>\n<body>\n<main class=\"memo\">\n<header>\n")
	b.WriteString("<h1>" + html.EscapeString(m.Title) + "</h1>\n")
	if fields := headerFields(m); len(fields) > 0 {
		b.WriteString("<dl class=\"memo-meta\">\n")
		for _, f := range fields {
			b.WriteString("<dt>" + f.label + "</dt><dd>" + html.EscapeString(f.value) + "</dd>\n")
		}
		b.WriteString("</dl>\n")
	}
	b.WriteString("</header>\n")
	exhibits := m.Exhibits()
	next := 0
	for si, s := range m.Sections {
		b.WriteString("<section>\n<h2>" + html.EscapeString(s.heading()) + "</h2>\n")
		for bi, block := range s.Blocks {
			var ex Exhibit
			if next < len(exhibits) && exhibits[next].Section == si && exhibits[next].Block == bi {
				ex = exhibits[next]
				next++
			}
			if err := writeHTMLBlock(&b, md, block, ex); err != nil {
				return "", err
			}
		}
		b.WriteString("</section>\n")
	}
	if m.Version != "" {
		b.WriteString("<footer>" + html.EscapeString(versionLine(m.Version)) + "</footer>\n")
	}
	b.WriteString("</main>\n</body>\n</html>\n")
	return b.String(), nil
}

func writeHTMLBlock(b *strings.Builder, md goldmark.Markdown, block Block, ex Exhibit) error {
	switch t := block.(type) {
	case Paragraph:
		return convert(b, md, guardProse(t.Text))
	case List:
		var src strings.Builder
		for _, it := range t.Items {
			item := strings.TrimSpace(oneLine(guardProse(it)))
			if item == "" {
				item = "\u00a0"
			}
			src.WriteString("- " + item + "\n")
		}
		return convert(b, md, src.String())
	case Steps:
		b.WriteString("<pre class=\"steps\"><code>")
		b.WriteString(html.EscapeString(strings.TrimRight(strings.ReplaceAll(t.Text, "\r\n", "\n"), "\n")))
		b.WriteString("</code></pre>\n")
	case Table:
		writeHTMLTable(b, t, ex)
		if t.Note != "" {
			b.WriteString("<div class=\"note\">\n")
			if err := convert(b, md, guardProse(t.Note)); err != nil {
				return err
			}
			b.WriteString("</div>\n")
		}
	case Chart:
		b.WriteString("<figure class=\"exhibit\">\n<figcaption>")
		b.WriteString(html.EscapeString(ExhibitTitle(ex.Number, t.Caption)))
		b.WriteString("</figcaption>\n")
		b.WriteString(strings.TrimSpace(t.SVG))
		b.WriteString("\n</figure>\n")
	}
	return nil
}

func convert(b *strings.Builder, md goldmark.Markdown, src string) error {
	var out bytes.Buffer
	if err := md.Convert([]byte(src), &out); err != nil {
		return err
	}
	b.Write(out.Bytes())
	return nil
}

func writeHTMLTable(b *strings.Builder, t Table, ex Exhibit) {
	b.WriteString("<div class=\"table\"><table>\n<caption>")
	b.WriteString(html.EscapeString(ExhibitTitle(ex.Number, t.Caption)))
	b.WriteString("</caption>\n<thead><tr>")
	for _, c := range t.Columns {
		b.WriteString("<th scope=\"col\"" + numClass(c) + ">" + html.EscapeString(c.Header) + "</th>")
	}
	b.WriteString("</tr></thead>\n<tbody>\n")
	for _, row := range t.Rows {
		b.WriteString("<tr>")
		for i, cell := range row {
			b.WriteString("<td" + numClass(t.Columns[i]) + ">" + html.EscapeString(cell) + "</td>")
		}
		b.WriteString("</tr>\n")
	}
	b.WriteString("</tbody>\n</table></div>\n")
}

func numClass(c Column) string {
	if c.Numeric {
		return " class=\"num\""
	}
	return ""
}

// memoStyle is the standalone memo's style sheet: a reading column, quiet
// tables with figures in tabular digits, and a dark scheme.
const memoStyle = `:root{color-scheme:light dark;--ink:#22262e;--muted:#5d6470;--paper:#fcfbf7;--rule:#e4e1d8;--accent:#1d5f99;--band:#f3f0e6}` +
	`@media (prefers-color-scheme:dark){:root{--ink:#e6e4de;--muted:#a9afb9;--paper:#1b1d22;--rule:#343842;--accent:#7cb6ec;--band:#24272e}}` +
	`body{margin:0;background:var(--paper);color:var(--ink);font:16px/1.55 Georgia,"Iowan Old Style",serif}` +
	`.memo{max-width:46rem;margin:0 auto;padding:2rem 1.25rem 4rem}` +
	`h1{font-size:1.9rem;line-height:1.2;margin:0 0 .75rem}` +
	`h2{font-size:1.25rem;margin:2.2rem 0 .6rem;padding-bottom:.2rem;border-bottom:2px solid var(--accent)}` +
	`.memo-meta{display:grid;grid-template-columns:max-content 1fr;gap:.1rem 1rem;margin:0;color:var(--muted)}` +
	`.memo-meta dt{font-weight:600}.memo-meta dd{margin:0}` +
	`a{color:var(--accent)}` +
	`.table{overflow-x:auto;margin:1.2rem 0}` +
	`table{border-collapse:collapse;font:14px/1.4 system-ui,sans-serif;font-variant-numeric:tabular-nums;min-width:60%}` +
	`caption,figcaption{caption-side:top;text-align:left;font:600 14px/1.4 system-ui,sans-serif;color:var(--accent);margin-bottom:.4rem}` +
	`th,td{padding:.3rem .7rem;border-bottom:1px solid var(--rule);text-align:left}` +
	`th{border-bottom:2px solid var(--ink)}tbody tr:nth-child(even){background:var(--band)}` +
	`.num{text-align:right}` +
	`.note{font-size:.9rem;color:var(--muted)}` +
	`figure{margin:1.5rem 0}figure svg{width:100%;height:auto;display:block}` +
	`pre{background:var(--band);padding:.8rem 1rem;overflow-x:auto;font:13px/1.5 ui-monospace,Menlo,Consolas,monospace}` +
	`code{font-family:ui-monospace,Menlo,Consolas,monospace}` +
	`footer{margin-top:3rem;color:var(--muted);font-size:.85rem;border-top:1px solid var(--rule);padding-top:.6rem}` +
	`@media print{body{background:#fff;color:#000}.memo{max-width:none}}`
