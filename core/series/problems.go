package series

import (
	"fmt"
	"math"
	"strings"
)

// This file writes the problems of one series: values missing, periods
// without a row, and the closing counts once a kind has many entries.

// missing reports the values still missing: cells marked missing and
// periods without a row.
func (b *builder) missing() {
	r := b.r
	v := b.s.Values
	for i := 0; i < len(v); i++ {
		if !math.IsNaN(v[i]) || b.dups[i] != nil {
			continue
		}
		if b.at[i] != 0 {
			k := int(b.at[i] - 1)
			cell := string(trimCell(r.t.cell(int(r.rows[b.idx[k]]), b.col)))
			b.problem(Problem{Err: ErrMissing, Line: b.line(k), Column: b.col + 1, Name: r.names[b.col], Cell: cell, Period: b.s.PeriodAt(i), Count: 1,
				Message: fmt.Sprintf("line %d, column %q: series %q has no value for %s (the cell holds %s)", b.line(k), r.names[b.col], b.name, b.s.PeriodAt(i), quoteCell(cell)),
				Fix:     "fill in the value, or set fill to carry forward, linear or seasonal"})
			continue
		}
		j := i
		for j+1 < len(v) && b.at[j+1] == 0 && math.IsNaN(v[j+1]) {
			j++
		}
		runs := j - i + 1
		what := fmt.Sprintf("no row for %s", b.s.PeriodAt(i))
		if runs > 1 {
			what = fmt.Sprintf("no rows for %s to %s (%d %s)", b.s.PeriodAt(i), b.s.PeriodAt(j), runs, b.freq.Plural())
		}
		where := ""
		if i > 0 && j+1 < len(v) && b.at[i-1] != 0 && b.at[j+1] != 0 {
			where = fmt.Sprintf(", between line %d and line %d", b.line(int(b.at[i-1]-1)), b.line(int(b.at[j+1]-1)))
		}
		b.problem(Problem{Err: ErrGap, Period: b.s.PeriodAt(i), Count: runs,
			Message: fmt.Sprintf("series %q has %s%s", b.name, what, where),
			Fix:     "add the missing rows, or set fill to carry forward, linear or seasonal"})
		i = j
	}
}

// problem lists p, or counts it once maxPerKind of its kind are listed.
func (b *builder) problem(p Problem) {
	p.Series = b.name
	if b.kinds == nil {
		b.kinds = map[error]int{}
		b.more = map[error][2]int{}
	}
	if b.kinds[p.Err] < maxPerKind {
		b.kinds[p.Err]++
		b.r.ds.Problems = append(b.r.ds.Problems, p)
		return
	}
	m := b.more[p.Err]
	if m[0] == 0 {
		m[1] = p.Line
	}
	m[0] += max(p.Count, 1)
	b.more[p.Err] = m
}

// closeProblems adds one problem counting those not listed, per kind.
func (b *builder) closeProblems() {
	for _, cause := range []error{ErrDuplicate, ErrOutOfOrder, ErrMissing, ErrGap} {
		m, ok := b.more[cause]
		if !ok {
			continue
		}
		what := map[error]string{ErrDuplicate: "duplicate periods", ErrOutOfOrder: "rows out of order", ErrMissing: "missing values", ErrGap: "periods without a row"}[cause]
		b.r.ds.Problems = append(b.r.ds.Problems, Problem{Err: cause, Series: b.name, Line: m[1], Count: m[0],
			Blocking: cause == ErrDuplicate || cause == ErrOutOfOrder,
			Message:  fmt.Sprintf("series %q has %d more %s after the %d listed", b.name, m[0], what, maxPerKind),
			Fix:      "see the rows listed above for what to do"})
	}
}

// valueList writes values as "120, 125 and 130".
func valueList(v []float64) string {
	s := make([]string, 0, min(len(v), 5))
	for i, x := range v {
		if i == 4 && len(v) > 5 {
			return strings.Join(s, ", ") + fmt.Sprintf(" and %d more", len(v)-4)
		}
		s = append(s, formatValue(x))
	}
	return andList(s)
}

// lineList writes line numbers as "12, 14 and 15".
func lineList(lines []int) string {
	s := make([]string, 0, min(len(lines), 5))
	for i, l := range lines {
		if i == 4 && len(lines) > 5 {
			return strings.Join(s, ", ") + fmt.Sprintf(" and %d more", len(lines)-4)
		}
		s = append(s, fmt.Sprint(l))
	}
	return andList(s)
}

// andList joins words as "a, b and c".
func andList(s []string) string {
	switch len(s) {
	case 0:
		return ""
	case 1:
		return s[0]
	}
	out := s[0]
	for _, w := range s[1 : len(s)-1] {
		out += ", " + w
	}
	return out + " and " + s[len(s)-1]
}
