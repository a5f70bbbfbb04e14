package series

import (
	"errors"
	"fmt"
	"strings"
	"unicode/utf8"
)

// Causes of the errors returned by [Read] and of the entries of
// [Dataset.Problems], for use with errors.Is.
var (
	ErrTooLarge    = errors.New("file too large")
	ErrEncoding    = errors.New("text encoding not readable")
	ErrEmpty       = errors.New("no data")
	ErrQuote       = errors.New("quote not closed or misplaced")
	ErrRagged      = errors.New("row with a different number of cells")
	ErrColumn      = errors.New("column not found")
	ErrNotNumber   = errors.New("not a number")
	ErrDecimalMark = errors.New("decimal mark unclear")
	ErrNotDate     = errors.New("not a date")
	ErrDateOrder   = errors.New("day and month order unclear")
	ErrFrequency   = errors.New("dates do not fit one frequency")
	ErrNoValues    = errors.New("no value column")
	ErrSpan        = errors.New("periods span too long")
	ErrOption      = errors.New("option not usable")

	ErrGap        = errors.New("period without a row")
	ErrMissing    = errors.New("missing value")
	ErrDuplicate  = errors.New("duplicate period")
	ErrOutOfOrder = errors.New("row out of order")
)

// ParseError is a problem with the input that stops [Read]. Positions count
// from 1; zero means "not tied to a line" or "the whole line".
type ParseError struct {
	Line   int    // line of the file where the cell starts; 0 for the whole file
	Column int    // column number; 0 when the problem concerns the whole line
	Name   string // column name from the header; "" when unknown
	Cell   string // the cell text as found; "" when no single cell is at fault
	Err    error  // the cause, one of the Err... values of this package
	Msg    string // what is wrong and what to do, in plain words, without the position
}

// Error returns one sentence: the position, what was found and the fix,
// for example `line 14, column "units": "12,5O" is not a number (a letter O
// instead of a zero?); correct the cell or mark it missing with NA`.
func (e *ParseError) Error() string {
	var b strings.Builder
	if e.Line > 0 {
		fmt.Fprintf(&b, "line %d", e.Line)
	}
	if e.Name != "" || e.Column > 0 {
		if b.Len() > 0 {
			b.WriteString(", ")
		}
		if e.Name != "" {
			fmt.Fprintf(&b, "column %q", e.Name)
		} else {
			fmt.Fprintf(&b, "column %d", e.Column)
		}
	}
	if b.Len() > 0 {
		b.WriteString(": ")
	}
	b.WriteString(e.Msg)
	return b.String()
}

// Unwrap returns the cause.
func (e *ParseError) Unwrap() error { return e.Err }

// ErrorList is every problem that stopped [Read], ordered by line, at most
// one per line and at most [maxErrors] in all.
type ErrorList []*ParseError

// maxErrors caps the number of errors [Read] collects.
const maxErrors = 20

// Error returns the first error's sentence, followed by the count of the
// others when there are more.
func (l ErrorList) Error() string {
	switch len(l) {
	case 0:
		return "no errors"
	case 1:
		return l[0].Error()
	case 2:
		return l[0].Error() + " (and 1 more problem)"
	}
	return fmt.Sprintf("%s (and %d more problems)", l[0].Error(), len(l)-1)
}

// Unwrap returns the errors of the list, for errors.Is and errors.As.
func (l ErrorList) Unwrap() []error {
	errs := make([]error, len(l))
	for i, e := range l {
		errs[i] = e
	}
	return errs
}

// quoteCell returns a cell for a message: valid UTF-8, at most 40 runes.
func quoteCell(cell string) string {
	cell = strings.ToValidUTF8(cell, "\uFFFD")
	if utf8.RuneCountInString(cell) > 40 {
		r := []rune(cell)
		cell = string(r[:37]) + "..."
	}
	return fmt.Sprintf("%q", cell)
}
