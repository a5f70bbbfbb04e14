package steps

import (
	"strings"
	"unicode"
)

// Step is one analysis step as read from a session.
type Step struct {
	N       int      `json:"n"`       // 1-based step number in the session
	Line    int      `json:"line"`    // 1-based document line
	Column  int      `json:"column"`  // 1-based column of the verb
	Text    string   `json:"text"`    // the line as written, comment included
	Verb    string   `json:"verb"`    // the verb, as written
	Subject string   `json:"subject"` // the subject, "" when there is none
	SubjCol int      `json:"subjectColumn,omitempty"`
	Options []Option `json:"options"`           // in the order written
	Comment string   `json:"comment,omitempty"` // the text after '#', without it
	Err     *Error   `json:"error,omitempty"`   // the first problem found on the line, nil when none
}

// Option is one key=value option of a step.
type Option struct {
	Key      string `json:"key"`
	Value    Value  `json:"value"`
	Column   int    `json:"column"`      // 1-based column of the key
	ValueCol int    `json:"valueColumn"` // 1-based column of the value
}

// Option returns the option named key and whether the step has it.
func (s *Step) Option(key string) (Option, bool) {
	for _, o := range s.Options {
		if o.Key == key {
			return o, true
		}
	}
	return Option{}, false
}

// Canonical returns the step in a standard spelling: verb, subject and
// options in the order written, single spaces, no comment. Steps with the
// same canonical form do the same thing.
func (s *Step) Canonical() string {
	var b strings.Builder
	b.WriteString(s.Verb)
	if s.Subject != "" {
		b.WriteByte(' ')
		b.WriteString(quoteIfNeeded(s.Subject))
	}
	for _, o := range s.Options {
		b.WriteByte(' ')
		b.WriteString(o.Key)
		b.WriteByte('=')
		b.WriteString(quoteIfNeeded(o.Value.Raw))
	}
	return b.String()
}

// quoteIfNeeded puts text that would not read back as one word between
// double quotes, escaping quotes and backslashes.
func quoteIfNeeded(s string) string {
	if s != "" && !strings.ContainsFunc(s, needsQuote) {
		return s
	}
	r := strings.NewReplacer(`\`, `\\`, `"`, `\"`)
	return `"` + r.Replace(s) + `"`
}

func needsQuote(r rune) bool {
	return unicode.IsSpace(r) || unicode.IsControl(r) || strings.ContainsRune("\"#\\=", r)
}
