package series

import (
	"fmt"
	"strings"
)

// This file names the columns and sorts them into roles: the period
// column, the value columns, the series key of the long layout, and the
// rest.

// colStats summarises a sample of one column's cells.
type colStats struct {
	cells   int             // cells sampled
	missing int             // missing markers and empty cells
	shapes  [10]int         // date shapes, by shape
	dotted  int             // months written with a point, which may be numbers
	numbers int             // cells that read as a number in some format
	ints    int             // cells that are whole numbers without marks
	text    int             // cells that are neither numbers nor dates
	keys    map[string]bool // distinct texts, up to a few
}

// dated returns the cells with a calendar date shape.
func (c *colStats) dated() int {
	n := 0
	for s := shapeYMD; s <= shapeMonY; s++ {
		if s != shapeY {
			n += c.shapes[s]
		}
	}
	return n
}

// datedIf returns the cells with a calendar date shape, counting months
// written with a point (2024.03) only when the column's name says it holds
// periods.
func (c *colStats) datedIf(named bool) int {
	if named {
		return c.dated()
	}
	return c.dated() - c.dotted
}

// present returns the cells that are not missing.
func (c *colStats) present() int { return c.cells - c.missing }

// numeric reports whether most present cells are numbers.
func (c *colStats) numeric() bool { return c.present() > 0 && 2*c.numbers >= c.present() }

// textual reports whether most present cells are text.
func (c *colStats) textual() bool { return c.present() > 0 && 2*c.text > c.present() }

// sampleRows returns at most n data rows spread evenly over rows.
func sampleRows(rows []int32, n int) []int32 {
	if len(rows) <= n {
		return rows
	}
	out := make([]int32, n)
	for i := range out {
		out[i] = rows[i*len(rows)/n]
	}
	return out
}

// stats samples every column.
func (r *reader) stats() []colStats {
	sample := sampleRows(r.rows, 2000)
	st := make([]colStats, len(r.names))
	for c := range st {
		st[c].keys = map[string]bool{}
		for _, row := range sample {
			b := trimCell(r.t.cell(int(row), c))
			s := &st[c]
			s.cells++
			if isMissing(b, r.opt.Missing) {
				s.missing++
				continue
			}
			d := scanDate(b)
			s.shapes[d.shape]++
			if d.dotted {
				s.dotted++
			}
			nb := scanNumber(b)
			switch {
			case nb.ok:
				s.numbers++
				if d.shape == shapeInt || d.shape == shapeY {
					s.ints++
				}
			case d.shape == shapeNone:
				s.text++
			}
			if len(s.keys) < 64 {
				s.keys[string(b)] = true
			}
		}
	}
	return st
}

// headerLooksLikeNames reports whether the first row holds column names:
// some cell in it is text while the cells below it are numbers or dates,
// or every cell in it is text.
func (r *reader) headerLooksLikeNames() bool {
	t := r.t
	isText := func(b []byte) bool {
		return len(b) > 0 && !isMissing(b, r.opt.Missing) && scanDate(b).shape == shapeNone && !scanNumber(b).ok
	}
	w := t.width(0)
	texts, filled := 0, 0
	for c := 0; c < w; c++ {
		b := trimCell(t.cell(0, c))
		if len(b) == 0 {
			continue
		}
		filled++
		if !isText(b) {
			continue
		}
		texts++
		below := 0
		for row := 1; row < min(t.rows(), 6); row++ {
			if cell := trimCell(t.cell(row, c)); len(cell) > 0 && !isMissing(cell, r.opt.Missing) && !isText(cell) {
				below++
			}
		}
		if below > 0 {
			return true
		}
	}
	return texts > 0 && texts == filled
}

// nameColumns sets r.names from the header row, or makes names up.
func (r *reader) nameColumns(header bool) {
	t := r.t
	width := 0
	for row := 0; row < t.rows(); row++ {
		width = max(width, t.width(row))
	}
	if header {
		width = t.width(0)
	}
	r.names = make([]string, width)
	seen := map[string]int{}
	var renamed []string
	for c := range r.names {
		name := ""
		if header {
			name = strings.ToValidUTF8(string(trimCell(t.cell(0, c))), "\uFFFD")
		}
		if name == "" {
			name = fmt.Sprintf("column %d", c+1)
			if header {
				renamed = append(renamed, fmt.Sprintf("column %d has no name and is called %q", c+1, name))
			}
		}
		key := strings.ToLower(name)
		if n := seen[key]; n > 0 {
			newName := fmt.Sprintf("%s (%d)", name, n+1)
			renamed = append(renamed, fmt.Sprintf("column %d repeats the name %q and is called %q", c+1, name, newName))
			seen[key] = n + 1
			name = newName
		} else {
			seen[key] = 1
		}
		r.names[c] = name
	}
	if header {
		r.decide("the first line holds the column names: %s", quotedList(r.names, 12))
	} else {
		r.decide("the first line holds data, not column names; the columns are called %s", quotedList(r.names, 12))
	}
	for _, s := range renamed {
		r.decide("%s", s)
	}
}

// column returns the index of the column called name (ignoring case and
// surrounding spaces), or an error listing the names there are.
func (r *reader) column(name, what string) (int, error) {
	want := strings.ToLower(strings.TrimSpace(name))
	for c, n := range r.names {
		if strings.ToLower(n) == want {
			return c, nil
		}
	}
	return -1, &ParseError{Err: ErrColumn, Msg: fmt.Sprintf("there is no column %q for the %s; the columns are %s",
		name, what, quotedList(r.names, 12))}
}

// quotedList writes names as "a", "b" and "c", at most n of them.
func quotedList(names []string, n int) string {
	q := make([]string, 0, min(len(names), n))
	for i, s := range names {
		if i == n {
			break
		}
		q = append(q, fmt.Sprintf("%q", s))
	}
	out := strings.Join(q, ", ")
	if len(names) > n {
		out += fmt.Sprintf(" and %d more", len(names)-n)
	}
	return out
}

// Name hints, lower case.
var (
	dateNames    = []string{"date", "day", "week", "month", "quarter", "year", "period", "time", "timestamp", "datetime", "when", "month start", "week start"}
	counterNames = []string{"period", "t", "index", "obs", "observation", "row", "no", "no.", "n", "#", "position", "seq"}
	keyNames     = []string{"series", "series id", "name", "id", "key", "item", "sku", "product", "store", "shop", "region", "code", "label", "group", "unique_id"}
	yearNames    = []string{"year", "yr", "yyyy"}
	quarterNames = []string{"quarter", "qtr", "q"}
	monthNames2  = []string{"month", "mon", "mth", "mm"}
)

// hinted reports whether a column name is one of names.
func hinted(name string, names []string) bool {
	low := strings.ToLower(strings.TrimSpace(name))
	for _, n := range names {
		if low == n {
			return true
		}
	}
	return false
}
