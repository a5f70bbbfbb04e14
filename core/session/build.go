package session

import "strings"

// Build writes a new session document from prose and step blocks given in
// order: each element of blocks is either prose (its Body written as it
// is) or, when its Kind is Steps, a block of step lines written between
// fences. Data blocks are written with their Name. A blank line separates
// blocks unless the text so far ends with one or the next prose starts
// with one, so building from the
// Raw prose and the bodies of a parsed document whose blocks are separated
// by blank lines gives its text back. The result parses back into the same
// kinds, bodies and names.
func Build(blocks []Part) *Document {
	var b strings.Builder
	for i, p := range blocks {
		startsBlank := p.Kind == Prose && (strings.HasPrefix(p.Body, "\n") || strings.HasPrefix(p.Body, "\r\n"))
		if i > 0 && !strings.HasSuffix(b.String(), "\n\n") && !startsBlank {
			b.WriteByte('\n')
		}
		switch p.Kind {
		case Steps:
			writeFenced(&b, StepsInfo, p.Body)
		case Data:
			writeFenced(&b, DataInfo+" "+p.Name, p.Body)
		default:
			b.WriteString(p.Body)
			if !strings.HasSuffix(p.Body, "\n") {
				b.WriteByte('\n')
			}
		}
	}
	return Parse(b.String())
}

func writeFenced(b *strings.Builder, info, body string) {
	// A fence longer than any run of backticks at a line start in the body
	// keeps the body from closing the block early.
	n := 3
	for _, l := range strings.Split(body, "\n") {
		t := strings.TrimLeft(l, " ")
		k := 0
		for k < len(t) && t[k] == '`' {
			k++
		}
		if k >= n {
			n = k + 1
		}
	}
	f := strings.Repeat("`", n)
	b.WriteString(f + info + "\n")
	b.WriteString(body)
	if body != "" && !strings.HasSuffix(body, "\n") {
		b.WriteByte('\n')
	}
	b.WriteString(f + "\n")
}

// WithSteps returns a copy of the document in which the body of the Steps
// part at index part is replaced by body; the rest keeps its bytes. It
// returns the document unchanged when part is not a Steps part.
func (d *Document) WithSteps(part int, body string) *Document {
	if part < 0 || part >= len(d.Parts) || d.Parts[part].Kind != Steps {
		return d
	}
	p := d.Parts[part]
	open := p.Raw[:p.BodyOffset-p.Offset]
	rest := p.Raw[p.BodyOffset-p.Offset+len(p.Body):]
	if body != "" && !strings.HasSuffix(body, "\n") && rest != "" {
		body += "\n"
	}
	var b strings.Builder
	for i, q := range d.Parts {
		if i == part {
			b.WriteString(open + body + rest)
			continue
		}
		b.WriteString(q.Raw)
	}
	return Parse(b.String())
}
