package steps

import (
	"errors"
	"fmt"
	"strings"
)

// Sentinel causes of step errors, for errors.Is.
var (
	ErrSyntax  = errors.New("step syntax")        // a line that cannot be read
	ErrVerb    = errors.New("unknown verb")       // a verb the language does not have
	ErrOption  = errors.New("option")             // an unknown, repeated or missing option
	ErrValue   = errors.New("option value")       // a value of the wrong kind or out of range
	ErrSubject = errors.New("subject")            // a missing or unknown subject
	ErrOrder   = errors.New("step order")         // a step that needs an earlier one
	ErrRun     = errors.New("step could not run") // the step ran and failed on the data
)

// Error is a problem with one step. Step, Line and Column count from 1;
// Line and Column are counted in the whole session document (columns in
// characters, not bytes). Step is 0 when the problem lies outside any step.
type Error struct {
	Step   int    `json:"step"`
	Line   int    `json:"line"`
	Column int    `json:"column"`
	Msg    string `json:"message"` // one plain sentence: what was found, what was expected, the fix
	Cause  error  `json:"-"`
}

// Error returns "line L, column C: message".
func (e *Error) Error() string {
	if e.Line == 0 {
		return e.Msg
	}
	return fmt.Sprintf("line %d, column %d: %s", e.Line, e.Column, e.Msg)
}

// Unwrap returns the sentinel cause.
func (e *Error) Unwrap() error { return e.Cause }

// ErrorList is every problem found by a checking pass, in document order,
// at most one per line.
type ErrorList []*Error

// Error joins the messages, one per line.
func (l ErrorList) Error() string {
	parts := make([]string, len(l))
	for i, e := range l {
		parts[i] = e.Error()
	}
	return strings.Join(parts, "\n")
}

// Err returns the list as an error, or nil when it is empty.
func (l ErrorList) Err() error {
	if len(l) == 0 {
		return nil
	}
	return l
}

// quote writes user text between backticks, the way messages quote what
// was found; long text is shortened.
func quote(s string) string {
	r := []rune(s)
	if len(r) > 40 {
		s = string(r[:37]) + "..."
	}
	return "`" + s + "`"
}
