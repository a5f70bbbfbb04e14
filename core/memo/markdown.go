package memo

import (
	"strings"
)

// Markdown returns the memo as CommonMark with GFM tables. Charts appear as
// image links to charts/NN-stem.svg, the files [Zip] writes beside memo.md.
// It returns the error of [Memo.Check] when the memo cannot be written.
func Markdown(m Memo) (string, error) {
	if err := m.Check(); err != nil {
		return "", err
	}
	var b strings.Builder
	writeMarkdown(&b, m)
	return b.String(), nil
}

func writeMarkdown(b *strings.Builder, m Memo) {
	b.WriteString("# " + escapeInline(m.Title) + "\n")
	var meta []string
	for _, f := range headerFields(m) {
		meta = append(meta, "**"+f.label+":** "+escapeInline(f.value))
	}
	if len(meta) > 0 {
		b.WriteString("\n" + strings.Join(meta, "\\\n") + "\n")
	}
	exhibits := m.Exhibits()
	next := 0
	for si, s := range m.Sections {
		b.WriteString("\n## " + escapeInline(s.heading()) + "\n")
		for bi, block := range s.Blocks {
			var ex Exhibit
			if next < len(exhibits) && exhibits[next].Section == si && exhibits[next].Block == bi {
				ex = exhibits[next]
				next++
			}
			b.WriteString("\n")
			writeMarkdownBlock(b, block, ex)
		}
	}
	if m.Version != "" {
		b.WriteString("\n---\n\n*" + escapeInline(versionLine(m.Version)) + "*\n")
	}
}

func writeMarkdownBlock(b *strings.Builder, block Block, ex Exhibit) {
	switch t := block.(type) {
	case Paragraph:
		b.WriteString(guardProse(t.Text) + "\n")
	case List:
		for _, it := range t.Items {
			item := strings.TrimSpace(oneLine(guardProse(it)))
			if item == "" {
				item = "\u00a0"
			}
			b.WriteString("- " + item + "\n")
		}
	case Steps:
		fence := codeFence(t.Text)
		b.WriteString(fence + escapeInfo(t.Info) + "\n")
		text := strings.TrimRight(strings.ReplaceAll(t.Text, "\r\n", "\n"), "\n")
		if text != "" {
			b.WriteString(text + "\n")
		}
		b.WriteString(fence + "\n")
	case Table:
		b.WriteString("**" + escapeInline(ExhibitTitle(ex.Number, t.Caption)) + "**\n\n")
		writeMarkdownTable(b, t)
		if t.Note != "" {
			b.WriteString("\n" + guardProse(t.Note) + "\n")
		}
	case Chart:
		title := escapeInline(ExhibitTitle(ex.Number, t.Caption))
		b.WriteString("**" + title + "**\n\n")
		b.WriteString("![" + title + "](" + ex.File + ")\n")
	}
}

func writeMarkdownTable(b *strings.Builder, t Table) {
	b.WriteString("|")
	for _, c := range t.Columns {
		h := escapeCell(c.Header)
		if h == "" {
			h = "\u00a0"
		}
		b.WriteString(" " + h + " |")
	}
	b.WriteString("\n|")
	for _, c := range t.Columns {
		if c.Numeric {
			b.WriteString(" ---: |")
		} else {
			b.WriteString(" :--- |")
		}
	}
	b.WriteString("\n")
	for _, row := range t.Rows {
		b.WriteString("|")
		for _, cell := range row {
			b.WriteString(" " + escapeCell(cell) + " |")
		}
		b.WriteString("\n")
	}
}

// escapeInfo keeps the first word of a fence's info string, made of
// letters, digits, hyphens, dots and underscores.
func escapeInfo(info string) string {
	var b strings.Builder
	for _, r := range strings.TrimSpace(info) {
		if r == '-' || r == '.' || r == '_' || (r >= 'a' && r <= 'z') || (r >= 'A' && r <= 'Z') || (r >= '0' && r <= '9') {
			b.WriteRune(r)
			continue
		}
		break
	}
	return b.String()
}

// field is one line of the memo's header.
type field struct{ label, value string }

func headerFields(m Memo) []field {
	var out []field
	for _, f := range []field{{"Prepared by", m.PreparedBy}, {"Client", m.Client}, {"Date", m.Date}} {
		if strings.TrimSpace(f.value) != "" {
			out = append(out, f)
		}
	}
	return out
}

func versionLine(v string) string {
	return "Written with Quillcast " + v + "."
}
