package series

import (
	"crypto/sha256"
	"encoding/hex"
	"errors"
	"fmt"
	"strings"
)

// Dataset is what [Read] found in one file: its series, the decisions taken
// while reading it and the problems a forecaster should know about.
type Dataset struct {
	Name        string    // the file name as given to Read
	Fingerprint string    // see [Fingerprint]
	Layout      Layout    // wide, long or across
	Frequency   Frequency // frequency of every series in the file
	Columns     []string  // column names in file order (made up as "column 3" without a header)
	DateColumn  string    // the column holding periods; "" when positions were counted by row
	SeriesKey   string    // the column telling series apart (long layout) or naming them (across); "" in the wide layout
	Rows        int       // data rows read (after [ReadOptions.Only])
	Series      []*Series // wide: one per value column; long: one per key and value column; across: one per row; in order of appearance
	Labels      [][]Label // long and across layouts: Labels[i] holds the other text columns of Series[i]
	Decisions   []string  // every decision taken while reading, one plain sentence each
	Problems    []Problem // gaps, missing values, duplicates and out-of-order rows, by series, then period, then line
	Changes     []Change  // every change made by sorting, combining duplicates or filling, in order
}

// Label is the text of one extra column of the long layout (such as a
// category or a fit/test role), aligned with the values of one series.
type Label struct {
	Column string   // column name
	Text   []string // one per value of the series; "" where the period had no row
}

// Problem is something in the data a forecaster should know before using
// a series. Blocking problems (duplicates, out-of-order rows) make
// [Dataset.Lookup] refuse the series until the matching option is set.
type Problem struct {
	Err      error  // cause: ErrGap, ErrMissing, ErrDuplicate or ErrOutOfOrder
	Series   string // name of the series concerned
	Line     int    // 1-based line of the file; 0 when no row exists (a gap)
	Column   int    // 1-based column; 0 when none
	Name     string // column name; "" when none
	Cell     string // the cell text; "" when none
	Period   Period // the period concerned (the first one of a run of gaps)
	Count    int    // number of periods concerned (a run of gaps); 1 otherwise
	Message  string // what was found, in plain words, with its position
	Fix      string // what to do about it
	Blocking bool   // the series is not usable until this is resolved
}

// String returns the message and the fix as one sentence.
func (p Problem) String() string {
	if p.Fix == "" {
		return p.Message
	}
	return p.Message + "; " + p.Fix
}

// Change is one change made to the data on request: a row placed at its
// period, duplicates combined, or a missing value filled. [Change.String]
// states it in one plain sentence.
type Change struct {
	Kind   ChangeKind // what was done
	Series string     // name of the series changed
	Period Period     // the period whose value changed or was placed
	Lines  []int      // lines of the file involved (Reversed: the first and last row); none for a filled value
	Old    []float64  // the values found on those lines
	New    float64    // the value now in the series
	From   Period     // Placed: the period of the row it now comes before; Filled: where the value came from (the left end for Linear); Reversed: the newest period
	To     Period     // Filled by Linear: the right end of the line
	Fill   FillMethod // Filled: the method
	Agg    Aggregate  // Combined: the aggregate
	Before int        // Placed: the line of the row it now comes before
}

// ChangeKind says what a [Change] did.
type ChangeKind uint8

// Kinds of change.
const (
	Placed   ChangeKind = iota + 1 // a row out of order placed at its period
	Combined                       // several rows for one period combined
	Filled                         // a missing value filled
	Reversed                       // rows running newest first read in reverse order
)

// String states the change in one plain sentence.
func (c Change) String() string {
	switch c.Kind {
	case Reversed:
		return fmt.Sprintf("series %q ran newest first, from %s on line %d down to %s on line %d; its rows are read in reverse order", c.Series, c.From, c.Lines[0], c.Period, c.Lines[1])
	case Placed:
		return fmt.Sprintf("line %d (%s) placed at its period in series %q, before line %d (%s)", c.Lines[0], c.Period, c.Series, c.Before, c.From)
	case Combined:
		return fmt.Sprintf("%s in series %q: lines %s (%s) combined by %s into %s", c.Period, c.Series, lineList(c.Lines), valueList(c.Old), c.Agg, formatValue(c.New))
	case Filled:
		how := ""
		switch c.Fill {
		case CarryForward:
			how = "carrying forward " + c.From.String()
		case Linear:
			how = fmt.Sprintf("a straight line from %s to %s", c.From, c.To)
		case Seasonal:
			how = "taking the value one season away, " + c.From.String()
		}
		return fmt.Sprintf("%s in series %q: missing, filled with %s by %s", c.Period, c.Series, formatValue(c.New), how)
	}
	return fmt.Sprintf("%s in series %q: %s", c.Period, c.Series, formatValue(c.New))
}

// Lookup returns the series with the given name (compared without regard
// to case or surrounding spaces). It returns an error naming the series
// found when there is no such series, and the first blocking problem, with
// its fix, when the series is not ready for use.
func (d *Dataset) Lookup(name string) (*Series, error) {
	want := strings.ToLower(strings.TrimSpace(name))
	for _, s := range d.Series {
		if strings.ToLower(s.Name) != want {
			continue
		}
		for _, p := range d.Problems {
			if p.Blocking && p.Series == s.Name {
				return nil, &ParseError{Err: p.Err, Msg: fmt.Sprintf("series %q is not ready: %s", s.Name, p)}
			}
		}
		return s, nil
	}
	names := make([]string, len(d.Series))
	for i, s := range d.Series {
		names[i] = fmt.Sprintf("%q", s.Name)
	}
	list := strings.Join(names, ", ")
	if len(names) > 8 {
		list = strings.Join(names[:8], ", ") + fmt.Sprintf(" and %d more", len(names)-8)
	}
	return nil, &ParseError{Err: ErrColumn,
		Msg: fmt.Sprintf("%s has no series %q; the series found are %s", d.Name, name, list)}
}

// LabelsOf returns the text of extra column column for Series[i] (long
// layout), or nil when there is none.
func (d *Dataset) LabelsOf(i int, column string) []string {
	if i < 0 || i >= len(d.Labels) {
		return nil
	}
	for _, l := range d.Labels[i] {
		if strings.EqualFold(l.Column, column) {
			return l.Text
		}
	}
	return nil
}

// Ready reports whether Series[i] has no blocking problem.
func (d *Dataset) Ready(i int) bool {
	for _, p := range d.Problems {
		if p.Blocking && p.Series == d.Series[i].Name {
			return false
		}
	}
	return true
}

// ProblemsOf returns the problems of the named series, and how many of them
// carry cause target (errors.Is).
func (d *Dataset) ProblemsOf(name string, target error) (list []Problem, count int) {
	for _, p := range d.Problems {
		if p.Series != name {
			continue
		}
		list = append(list, p)
		if errors.Is(p.Err, target) {
			count += max(p.Count, 1)
		}
	}
	return list, count
}

// Fingerprint returns a short identity of a file's bytes for the memo: the
// first 16 hexadecimal digits of their SHA-256 digest. Two files with the
// same fingerprint hold the same bytes (with overwhelming likelihood).
func Fingerprint(data []byte) string {
	sum := sha256.Sum256(data)
	return hex.EncodeToString(sum[:8])
}
