package session

import "strings"

// Parse splits a session's text into parts. It never fails: any text is a
// valid document, and text that is not a fenced block of ours is prose.
// Joining the parts' Raw texts gives back text exactly.
func Parse(text string) *Document {
	d := &Document{}
	lines := rawLines(text)
	prose := -1 // index in lines where the current prose run starts
	flushProse := func(end int) {
		if prose < 0 || prose >= end {
			prose = -1
			return
		}
		d.Parts = append(d.Parts, makePart(Prose, lines[prose:end]))
		prose = -1
	}
	for i := 0; i < len(lines); {
		f, ok := openFence(lines[i].text)
		if !ok {
			if prose < 0 {
				prose = i
			}
			i++
			continue
		}
		end, closed := closeFence(lines, i+1, f)
		kind, name := classify(f.info)
		if kind == Prose {
			// Another code block: prose, but its contents must not be
			// read as fences of ours.
			if prose < 0 {
				prose = i
			}
			i = end
			continue
		}
		flushProse(i)
		p := makePart(kind, lines[i:end])
		p.Name = name
		p.Closed = closed
		bodyEnd := end
		if closed {
			bodyEnd = end - 1
		}
		if i+1 < len(lines) {
			p.BodyLine = lines[i].num + 1
			p.BodyOffset = lines[i].offset + len(lines[i].raw)
		}
		var b strings.Builder
		for _, l := range lines[i+1 : bodyEnd] {
			b.WriteString(l.raw)
		}
		p.Body = b.String()
		if p.BodyLine == 0 {
			p.BodyLine = lines[i].num + 1
			p.BodyOffset = len(text)
		}
		d.Parts = append(d.Parts, p)
		i = end
	}
	flushProse(len(lines))
	return d
}

type rawLine struct {
	raw    string // the line with its line break
	text   string // without the line break
	num    int    // 1-based
	offset int
}

func rawLines(text string) []rawLine {
	var out []rawLine
	off := 0
	for n := 1; off < len(text); n++ {
		i := strings.IndexByte(text[off:], '\n')
		end := len(text)
		if i >= 0 {
			end = off + i + 1
		}
		raw := text[off:end]
		t := strings.TrimSuffix(strings.TrimSuffix(raw, "\n"), "\r")
		out = append(out, rawLine{raw: raw, text: t, num: n, offset: off})
		off = end
	}
	return out
}

func makePart(k Kind, ls []rawLine) Part {
	var b strings.Builder
	for _, l := range ls {
		b.WriteString(l.raw)
	}
	return Part{Kind: k, Raw: b.String(), Line: ls[0].num, Offset: ls[0].offset}
}

type fence struct {
	char   byte
	length int
	indent int
	info   string
}

// openFence reports whether line opens a fenced code block (CommonMark
// 0.31, section 4.5: up to three spaces, then at least three backticks or
// tildes; an info string after backticks may not contain a backtick).
func openFence(line string) (fence, bool) {
	indent := 0
	for indent < len(line) && line[indent] == ' ' {
		indent++
	}
	if indent > 3 || indent >= len(line) {
		return fence{}, false
	}
	c := line[indent]
	if c != '`' && c != '~' {
		return fence{}, false
	}
	n := 0
	for indent+n < len(line) && line[indent+n] == c {
		n++
	}
	if n < 3 {
		return fence{}, false
	}
	info := strings.TrimSpace(line[indent+n:])
	if c == '`' && strings.IndexByte(info, '`') >= 0 {
		return fence{}, false
	}
	return fence{char: c, length: n, indent: indent, info: info}, true
}

// closeFence finds the end of the block opened by f, searching from line
// from; end is one past the closing fence (or len(lines) when unclosed).
func closeFence(lines []rawLine, from int, f fence) (end int, closed bool) {
	for i := from; i < len(lines); i++ {
		t := lines[i].text
		indent := 0
		for indent < len(t) && t[indent] == ' ' {
			indent++
		}
		if indent > 3 {
			continue
		}
		n := 0
		for indent+n < len(t) && t[indent+n] == f.char {
			n++
		}
		if n >= f.length && strings.TrimSpace(t[indent+n:]) == "" {
			return i + 1, true
		}
	}
	return len(lines), false
}

func classify(info string) (Kind, string) {
	fields := strings.Fields(info)
	if len(fields) == 0 {
		return Prose, ""
	}
	switch fields[0] {
	case StepsInfo:
		return Steps, ""
	case DataInfo:
		// The name is the rest of the line: file names often hold
		// spaces ("Orders 2024.csv").
		_, name, _ := strings.Cut(strings.TrimSpace(info), DataInfo)
		return Data, strings.TrimSpace(name)
	}
	return Prose, ""
}
