package series

import (
	"cmp"
	"fmt"
	"slices"
	"strings"
)

// reader holds the state of one call to [Read].
type reader struct {
	opt      ReadOptions
	t        *table
	names    []string // column names
	rows     []int32  // table rows holding data, after the header and the row filter
	ds       *Dataset
	errs     ErrorList
	errLines map[int]bool
	decimal  byte   // decimal mark decided for an earlier column; 0 when none
	decCol   string // the column that decided it
	delim    byte   // the cell separator; 0 for one column
	slots    int    // periods held by the series built so far
}

// Read reads a delimited text file (CSV, TSV and the like) into regular
// series. name is the file name, kept for messages and the memo. The zero
// [ReadOptions] detects the delimiter, the header, the period column and
// its frequency, the value columns, the layout and each column's decimal
// mark, and cleans nothing.
//
// Read returns an [ErrorList] of [*ParseError] values, ordered by line,
// when the file cannot be read as series: a cell that is not a number or
// not a period, rows with too many or too few cells, an unclosed quote,
// dates whose day/month order or numbers whose decimal mark no value
// settles, a file that is too large or not UTF-8 text. Problems that leave
// the series usable or fixable by an option (gaps, missing values,
// duplicate periods, rows out of order) are listed in [Dataset.Problems]
// instead; every decision taken is in [Dataset.Decisions].
func Read(data []byte, name string, opt ReadOptions) (*Dataset, error) {
	r := &reader{opt: opt, errLines: map[int]bool{},
		ds: &Dataset{Name: name, Fingerprint: Fingerprint(data)}}
	r.read(data)
	if len(r.errs) > 0 {
		slices.SortStableFunc(r.errs, func(a, b *ParseError) int { return cmp.Compare(a.Line, b.Line) })
		return nil, r.errs
	}
	return r.ds, nil
}

// read fills r.ds or r.errs.
func (r *reader) read(data []byte) {
	limit := r.opt.MaxBytes
	if limit <= 0 {
		limit = DefaultMaxBytes
	}
	data, err := checkBytes(data, limit)
	if err != nil {
		r.errs = append(r.errs, err.(*ParseError))
		return
	}
	delim := r.opt.Delimiter
	switch delim {
	case 0:
		delim = sniffDelimiter(data)
		r.decide("cells are separated by %s", delimiterName(delim))
	case ',', ';', '\t', '|':
	default:
		r.fail(-1, -1, "", ErrOption, fmt.Sprintf("%q cannot separate cells; choose a comma, semicolon, tab or vertical bar", string(rune(delim))))
		return
	}
	r.delim = delim
	t, err := split(data, delim)
	if err != nil {
		r.errs = append(r.errs, err.(*ParseError))
		return
	}
	r.t = t
	if t.rows() == 0 {
		r.fail(-1, -1, "", ErrEmpty, "the file holds no rows of data")
		return
	}
	r.skipTitle()
	if t.rows() == 0 {
		r.fail(-1, -1, "", ErrEmpty, "the file holds a title but no table; load a file with a header line and rows of data")
		return
	}
	if first, end, ok := r.acrossColumns(); ok && (r.opt.Layout == DetectLayout || r.opt.Layout == Across) && r.opt.Header != NoHeader {
		r.readAcross(first, end)
		return
	}
	if r.opt.Layout == Across {
		r.fail(-1, -1, "", ErrOption, "the across layout needs column names that are periods after a label column, as in \"shop,2024-01,2024-02\"; none were found on the first line")
		return
	}
	header := r.opt.Header == WithHeader || r.opt.Header == DetectHeader && r.headerLooksLikeNames()
	r.nameColumns(header)
	if !r.dataRows(header) {
		return
	}
	r.ds.Columns = r.names
	st := r.stats()
	ro, ok := r.chooseRoles(st)
	if !ok {
		return
	}
	r.assemble(ro, st)
}

// skipTitle drops up to maxTitleLines rows of one cell at the top of a
// table whose rows have more cells, such as a report title above the
// column names, and says so.
func (r *reader) skipTitle() {
	t := r.t
	if r.delim == 0 || t.rows() < 2 {
		return
	}
	top := 0
	for top < min(maxTitleLines, t.rows()-1) && t.width(top) == 1 {
		top++
	}
	if top == 0 || t.width(top) < 2 {
		return
	}
	for row := range top {
		r.decide("line %d (%s) is a title above the table and is left out", t.line[row], quoteCell(string(trimCell(t.cell(row, 0)))))
	}
	t.first = t.first[top:]
	t.line = t.line[top:]
}

// dataRows sets r.rows to the rows holding data, reports ragged rows and
// applies the row filter. It returns false when nothing is left to read.
func (r *reader) dataRows(header bool) bool {
	t := r.t
	start := 0
	if header {
		start = 1
	}
	width := len(r.names)
	r.rows = make([]int32, 0, t.rows()-start)
	for row := start; row < t.rows(); row++ {
		w := t.width(row)
		if w < width {
			r.failLine(int(t.line[row]), ErrRagged, fmt.Sprintf(
				"this line has %d %s but the first line has %d; add the missing cells, or put quotes around a cell that holds a %s",
				w, plural(w, "cell", "cells"), width, r.delimiterWord()))
			continue
		}
		if w > width {
			extra := false
			for c := width; c < w; c++ {
				extra = extra || len(trimCell(t.cell(row, c))) > 0
			}
			if extra {
				r.failLine(int(t.line[row]), ErrRagged, fmt.Sprintf(
					"this line has %d cells but the first line has %d; put quotes around a cell that holds a %s, as in \"1,5\"",
					w, width, r.delimiterWord()))
				continue
			}
		}
		r.rows = append(r.rows, int32(row))
	}
	if r.failed() {
		return false
	}
	if r.opt.Only.Column != "" {
		c, err := r.column(r.opt.Only.Column, "row filter")
		if err != nil {
			r.errs = append(r.errs, err.(*ParseError))
			return false
		}
		want := strings.TrimSpace(r.opt.Only.Value)
		kept := r.rows[:0]
		for _, row := range r.rows {
			if string(trimCell(t.cell(int(row), c))) == want {
				kept = append(kept, row)
			}
		}
		r.decide("only rows whose column %q holds %q are read (%d rows)", r.names[c], want, len(kept))
		r.rows = kept
	}
	if len(r.rows) == 0 {
		msg := "the file has column names but no rows of data; add rows below the first line"
		if r.opt.Only.Column != "" {
			msg = fmt.Sprintf("no row has %q in column %q; check the row filter", r.opt.Only.Value, r.opt.Only.Column)
		}
		r.fail(-1, -1, "", ErrEmpty, msg)
		return false
	}
	r.ds.Rows = len(r.rows)
	return true
}

// delimiterWord names the file's delimiter for ragged-row messages.
func (r *reader) delimiterWord() string {
	switch r.delim {
	case ',':
		return "comma"
	case ';':
		return "semicolon"
	case '\t':
		return "tab"
	case '|':
		return "vertical bar"
	}
	return "separator"
}

// plural picks the word for n things.
func plural(n int, one, many string) string {
	if n == 1 {
		return one
	}
	return many
}

// decide records a decision.
func (r *reader) decide(format string, args ...any) {
	r.ds.Decisions = append(r.ds.Decisions, fmt.Sprintf(format, args...))
}

// lineOf returns the file line of data row i (an index into r.rows).
func (r *reader) lineOf(i int) int { return int(r.t.line[r.rows[i]]) }

// fail records an error at data row i (an index into r.rows; -1 for none)
// and column c (0-based; -1 for none), at most one per line.
func (r *reader) fail(i, c int, cell string, cause error, msg string) {
	e := &ParseError{Err: cause, Msg: msg, Cell: cell}
	if i >= 0 {
		e.Line = r.lineOf(i)
	}
	if c >= 0 {
		e.Column = c + 1
		if c < len(r.names) {
			e.Name = r.names[c]
		}
	}
	r.add(e)
}

// failHeader records an error at column c of the line of column names.
func (r *reader) failHeader(c int, cause error, msg string) {
	r.add(&ParseError{Line: int(r.t.line[0]), Column: c + 1, Name: r.names[c], Cell: r.names[c], Err: cause, Msg: msg})
}

// failLine records an error for a whole line.
func (r *reader) failLine(line int, cause error, msg string) {
	r.add(&ParseError{Line: line, Err: cause, Msg: msg})
}

// add keeps e unless its line already has an error or the list is full.
func (r *reader) add(e *ParseError) {
	if len(r.errs) >= maxErrors || (e.Line > 0 && r.errLines[e.Line]) {
		return
	}
	if e.Line > 0 {
		r.errLines[e.Line] = true
	}
	r.errs = append(r.errs, e)
}

// failed reports whether an error has been recorded.
func (r *reader) failed() bool { return len(r.errs) > 0 }
