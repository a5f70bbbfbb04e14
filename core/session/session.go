// Package session reads and writes the text form of a Quillcast session: a
// markdown document in which prose is ordinary CommonMark and the analysis
// steps sit in fenced code blocks whose info word is "quill".
//
// A session looks like this:
//
//	# Candle orders, next year
//
//	Orders grow and peak before the winter holidays.
//
//	```quill
//	load shop-orders.csv value=units date=month
//	split last=12
//	```
//
//	A seasonal method should do better than a moving average here.
//
//	```quill
//	forecast holt-winters as=hw
//	evaluate by=mase
//	```
//
// Data are named by the `load` step and attached separately; they are never
// part of the text unless the user asks for it, in which case a fenced block
// with the info words "quill-data NAME" carries the file's text.
//
// [Parse] keeps every byte: [Document.String] gives back the text it was
// parsed from exactly, so a saved session diffs cleanly and round-trips.
//
// Only fences at the top level of the document are recognised (indented by
// at most three spaces, as CommonMark allows); a fence inside a list item or
// a block quote stays prose.
package session

import "strings"

// Info words of the fenced blocks this package gives meaning to.
const (
	StepsInfo = "quill"      // a block of analysis steps
	DataInfo  = "quill-data" // a block of embedded data, followed by its file name
)

// Kind says what a [Part] of a document holds.
type Kind int

// The kinds of part.
const (
	Prose Kind = iota // ordinary markdown, other code blocks included
	Steps             // a fenced block of analysis steps
	Data              // a fenced block of embedded data
)

// String names the kind in plain words.
func (k Kind) String() string {
	switch k {
	case Steps:
		return "steps"
	case Data:
		return "data"
	}
	return "prose"
}

// Part is one stretch of a session document.
type Part struct {
	Kind Kind
	// Raw is the exact text of the part, fences and final line break
	// included; the Raw texts of all parts joined give the document.
	Raw string
	// Line is the 1-based line of the part's first line in the document.
	Line int
	// Offset is the byte offset of the part's first byte in the document.
	Offset int
	// Body is the text between the fences of a Steps or Data part (each
	// line with its line break); empty for prose.
	Body string
	// BodyLine is the 1-based document line of the first line of Body.
	BodyLine int
	// BodyOffset is the byte offset of Body in the document.
	BodyOffset int
	// Name is the file name of a Data part.
	Name string
	// Closed is false when a fenced part runs to the end of the document
	// without a closing fence.
	Closed bool
}

// Document is a session in its text form.
type Document struct {
	Parts []Part
}

// String returns the document's text, byte for byte as parsed.
func (d *Document) String() string {
	var b strings.Builder
	for _, p := range d.Parts {
		b.WriteString(p.Raw)
	}
	return b.String()
}

// Line is one line of steps with its place in the document.
type Line struct {
	Text   string // the line without its line break
	Line   int    // 1-based document line
	Offset int    // byte offset of the line in the document
	Block  int    // 0-based index of the Steps part in Parts
}

// StepLines returns every line inside the document's Steps parts, in order,
// blank and comment lines included, so that a step's position can be told
// in document lines.
func (d *Document) StepLines() []Line {
	var out []Line
	for i, p := range d.Parts {
		if p.Kind != Steps {
			continue
		}
		for _, l := range splitLines(p.Body, p.BodyLine, p.BodyOffset) {
			l.Block = i
			out = append(out, l)
		}
	}
	return out
}

// Embedded returns the data blocks of the document by file name. When a
// name occurs twice the first block wins.
func (d *Document) Embedded() map[string][]byte {
	out := map[string][]byte{}
	for _, p := range d.Parts {
		if p.Kind != Data || p.Name == "" {
			continue
		}
		if _, ok := out[p.Name]; !ok {
			out[p.Name] = []byte(p.Body)
		}
	}
	return out
}

// Steps returns the text of every Steps part joined in order, one line per
// document step line. It is the form a shared link carries.
func (d *Document) Steps() string {
	var b strings.Builder
	for _, l := range d.StepLines() {
		b.WriteString(l.Text)
		b.WriteByte('\n')
	}
	return b.String()
}

func splitLines(body string, line, offset int) []Line {
	var out []Line
	for len(body) > 0 {
		i := strings.IndexByte(body, '\n')
		var text string
		next := len(body)
		if i >= 0 {
			text, next = body[:i], i+1
		} else {
			text = body
		}
		out = append(out, Line{Text: strings.TrimSuffix(text, "\r"), Line: line, Offset: offset})
		body = body[next:]
		offset += next
		line++
	}
	return out
}
