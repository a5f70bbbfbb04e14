package series

import (
	"bytes"
	"fmt"
)

// This file splits the bytes of a delimited text file into rows of cells
// (RFC 4180): cells may be quoted with double quotes, inside which the
// delimiter and line breaks are plain text and "" stands for one quote.
// Lines end with LF, CRLF or a lone CR. Rows that are empty or hold only
// empty cells are skipped. Cells point into the file's bytes; only quoted
// cells with doubled quotes are copied.

// span locates one cell: data[lo:hi], or extra[-lo-1:hi] when lo < 0.
type span struct{ lo, hi int32 }

// table is a file split into rows of cells.
type table struct {
	data  []byte  // the file after a byte-order mark
	extra []byte  // unescaped quoted cells
	cells []span  // every cell of every row, row after row
	first []int32 // first[r] is the index in cells of row r's first cell; one extra entry closes the last row
	line  []int32 // line[r] is the 1-based line on which row r starts
}

// rows returns the number of rows.
func (t *table) rows() int { return len(t.line) }

// width returns the number of cells in row r.
func (t *table) width(r int) int { return int(t.first[r+1] - t.first[r]) }

// cell returns cell c of row r, or nil when the row is shorter.
func (t *table) cell(r, c int) []byte {
	i := int(t.first[r]) + c
	if i >= int(t.first[r+1]) {
		return nil
	}
	s := t.cells[i]
	if s.lo < 0 {
		return t.extra[-s.lo-1 : s.hi]
	}
	return t.data[s.lo:s.hi]
}

// split cuts data into rows and cells separated by delim (0 for a file of
// one column). It fails on a quote that is never closed and on text after
// a closing quote.
func split(data []byte, delim byte) (*table, error) {
	lines := bytes.Count(data, []byte{'\n'}) + 1
	perRow := 1
	if delim != 0 {
		end := bytes.IndexByte(data, '\n')
		if end < 0 {
			end = len(data)
		}
		perRow += bytes.Count(data[:end], []byte{delim})
	}
	// Every cell but the first of a row ends a delimiter, so a file holds
	// at most one cell per byte and line: a long first line must not
	// reserve room for that many cells on every line.
	t := &table{
		data:  data,
		cells: make([]span, 0, min(lines*perRow, len(data)+lines)),
		first: make([]int32, 0, lines+1),
		line:  make([]int32, 0, lines),
	}
	line := int32(1)
	i, n := 0, len(data)
	for i < n {
		rowStart := len(t.cells)
		rowLine := line
		empty := true
		for {
			// One cell starting at i.
			j := i
			for j < n && data[j] == ' ' {
				j++
			}
			if j < n && data[j] == '"' {
				k, err := t.quoted(j, &line, delim)
				if err != nil {
					return nil, err
				}
				i = k
				empty = false
			} else {
				for j = i; j < n; j++ {
					c := data[j]
					if c == delim || c == '\n' || c == '\r' {
						break
					}
				}
				if j > i {
					empty = empty && len(bytes.TrimSpace(data[i:j])) == 0
				}
				t.cells = append(t.cells, span{int32(i), int32(j)})
				i = j
			}
			if i < n && data[i] == delim && delim != 0 {
				i++
				continue
			}
			break
		}
		// End of row: a line break or the end of the file.
		if i < n && data[i] == '\r' {
			i++
		}
		if i < n && data[i] == '\n' {
			i++
		}
		line++
		if empty {
			t.cells = t.cells[:rowStart]
			continue
		}
		t.first = append(t.first, int32(rowStart))
		t.line = append(t.line, rowLine)
	}
	t.first = append(t.first, int32(len(t.cells)))
	return t, nil
}

// quoted reads the quoted cell whose opening quote is at data[q], appends
// it and returns the index after its closing quote and trailing spaces.
// It advances *line over line breaks inside the quotes.
func (t *table) quoted(q int, line *int32, delim byte) (int, error) {
	data := t.data
	open := *line
	start := q + 1
	j := start
	escaped := false
	for {
		k := bytes.IndexByte(data[j:], '"')
		if k < 0 {
			return 0, &ParseError{Line: int(open), Err: ErrQuote,
				Msg: "a quote opens a cell here but is never closed; close it with a second \" or remove it"}
		}
		j += k
		if j+1 < len(data) && data[j+1] == '"' {
			escaped = true
			j += 2
			continue
		}
		break
	}
	body := data[start:j]
	*line += int32(countBreaks(body))
	if escaped {
		lo := len(t.extra)
		t.extra = append(t.extra, body...)
		t.extra = append(t.extra[:lo], bytes.ReplaceAll(t.extra[lo:], []byte(`""`), []byte(`"`))...)
		t.cells = append(t.cells, span{int32(-lo - 1), int32(len(t.extra))})
	} else {
		t.cells = append(t.cells, span{int32(start), int32(j)})
	}
	k := j + 1
	for k < len(data) && data[k] == ' ' {
		k++
	}
	if k < len(data) && data[k] != delim && data[k] != '\n' && data[k] != '\r' {
		end := k
		for end < len(data) && data[end] != delim && data[end] != '\n' && data[end] != '\r' {
			end++
		}
		return 0, &ParseError{Line: int(*line), Err: ErrQuote,
			Msg: fmt.Sprintf("a cell has text after its closing quote: %s; put the whole cell in quotes and double each quote inside it, as in \"say \"\"hi\"\"\"", quoteCell(string(data[q:end])))}
	}
	return k, nil
}

// countBreaks counts line breaks (LF, CRLF or a lone CR) in b.
func countBreaks(b []byte) int {
	n := bytes.Count(b, []byte{'\n'})
	if bytes.IndexByte(b, '\r') >= 0 {
		n += bytes.Count(b, []byte{'\r'}) - bytes.Count(b, []byte("\r\n"))
	}
	return n
}
