package series

import (
	"fmt"
	"strings"
)

// roles says what each column is for.
type roles struct {
	date   int       // the period column; -1 when none
	year   int       // a year column combined with sub; -1 when none
	sub    int       // the quarter or month column beside year
	subOf  Frequency // Quarter or Month
	key    int       // the series key column (long layout); -1 for wide
	values []int     // value columns
	labels []int     // other text columns kept in the long layout
}

// chooseRoles finds the period column, from the option or from the cells.
func (r *reader) chooseRoles(st []colStats) (roles, bool) {
	ro := roles{date: -1, year: -1, sub: -1, key: -1}
	if r.opt.Date != "" {
		c, err := r.column(r.opt.Date, "periods")
		if err != nil {
			r.errs = append(r.errs, err.(*ParseError))
			return ro, false
		}
		ro.date = c
		return ro, true
	}
	whole := func(c int) bool { return st[c].present() > 0 && st[c].ints == st[c].present() }
	// A year column beside a quarter or month column.
	for y, name := range r.names {
		if !hinted(name, yearNames) || st[y].shapes[shapeY] != st[y].present() || st[y].present() == 0 {
			continue
		}
		for s, sname := range r.names {
			switch {
			case hinted(sname, quarterNames) && (whole(s) || st[s].shapes[shapeNone] == st[s].present()):
				ro.year, ro.sub, ro.subOf = y, s, Quarter
			case hinted(sname, monthNames2) && st[s].present() > 0 && st[s].dated() == 0:
				ro.year, ro.sub, ro.subOf = y, s, Month
			default:
				continue
			}
			return ro, true
		}
	}
	// Columns whose names say they hold periods come first: calendar
	// dates, then years, then plain positions.
	named := func(c int) bool { return hinted(r.names[c], dateNames) }
	years := func(c int) bool { return st[c].present() > 0 && st[c].shapes[shapeY] == st[c].present() }
	pick := func(ok func(c int) bool) bool {
		for c := range r.names {
			if ok(c) {
				ro.date = c
				return true
			}
		}
		return false
	}
	dated := func(hint bool) func(int) bool {
		return func(c int) bool {
			p := st[c].present()
			return p > 0 && 2*st[c].datedIf(hint) >= p && named(c) == hint
		}
	}
	// The cases are tried in order; the first that picks a column ends it.
	switch {
	case pick(dated(true)),
		pick(func(c int) bool { return named(c) && years(c) }),
		pick(func(c int) bool { return whole(c) && (named(c) || hinted(r.names[c], counterNames)) }),
		// Then columns that look like periods without saying so.
		pick(dated(false)),
		pick(func(c int) bool { return years(c) && r.countsUp(c) }),
		// A column named for periods that holds none: read it to report why.
		pick(func(c int) bool { return named(c) && st[c].present() > 0 && !st[c].numeric() }):
	}
	return ro, true
}

// countsUp reports whether column c holds whole numbers that go up by one
// from row to row.
func (r *reader) countsUp(c int) bool {
	if len(r.rows) < 2 {
		return false
	}
	prev := -1
	for i, row := range r.rows {
		d := scanDate(trimCell(r.t.cell(int(row), c)))
		if d.shape != shapeY && d.shape != shapeInt {
			return false
		}
		if i > 0 && int(d.year) != prev+1 {
			return false
		}
		prev = int(d.year)
	}
	return true
}

// combined reads a year column and a quarter or month column into period
// ordinals.
func (r *reader) combined(ro roles) (Frequency, []int) {
	ords := make([]int, len(r.rows))
	for i, row := range r.rows {
		yb := trimCell(r.t.cell(int(row), ro.year))
		sb := trimCell(r.t.cell(int(row), ro.sub))
		yd := scanDate(yb)
		if yd.shape != shapeY {
			r.fail(i, ro.year, string(yb), ErrNotDate, fmt.Sprintf("%s is not a year; write the year with four digits, as in 2024", quoteCell(string(yb))))
			continue
		}
		n := subPeriod(sb, ro.subOf)
		if n == 0 {
			want := "a quarter from 1 to 4 (or Q1 to Q4)"
			if ro.subOf == Month {
				want = "a month from 1 to 12 or its name"
			}
			r.fail(i, ro.sub, string(sb), ErrNotDate, fmt.Sprintf("%s is not %s", quoteCell(string(sb)), want))
			continue
		}
		if ro.subOf == Quarter {
			ords[i] = NewQuarter(int(yd.year), n).Ordinal
		} else {
			ords[i] = NewMonth(int(yd.year), n).Ordinal
		}
	}
	if r.failed() {
		return NoFrequency, nil
	}
	r.decide("columns %q and %q together give the periods, read as %s", r.names[ro.year], r.names[ro.sub], ro.subOf.Plural())
	if want := r.opt.Frequency; want != NoFrequency && want != ro.subOf {
		if !coarser(ro.subOf, want) {
			r.fail(-1, ro.sub, "", ErrOption, fmt.Sprintf("they give %s, which cannot be read as %s; set the frequency to %s or leave it to be found", ro.subOf.Plural(), want.Plural(), ro.subOf))
			return NoFrequency, nil
		}
		for i, n := range ords {
			ords[i] = convert(n, ro.subOf, want)
		}
		r.decide("each row counts for the %s its %s falls in, as the frequency option says", want, ro.subOf)
		return want, ords
	}
	return ro.subOf, ords
}

// subPeriod reads a quarter (1..4, Q1..Q4) or a month (1..12, English
// name) cell; 0 when it is neither.
func subPeriod(b []byte, f Frequency) int {
	if f == Quarter && len(b) == 2 && b[0]|0x20 == 'q' {
		b = b[1:]
	}
	v, n, j := digits(b, 0)
	if n > 0 && n <= 2 && j == len(b) {
		if f == Quarter && v >= 1 && v <= 4 || f == Month && v >= 1 && v <= 12 {
			return v
		}
		return 0
	}
	if f == Month {
		return monthNumber(b)
	}
	return 0
}

// chooseKey returns the column telling series apart in the long layout, or
// -1 for the wide layout. ords are the periods of the rows (nil when the
// file has no period column).
func (r *reader) chooseKey(ro roles, st []colStats, ords []int) int {
	if r.opt.Series != "" {
		c, err := r.column(r.opt.Series, "series names")
		if err != nil {
			r.errs = append(r.errs, err.(*ParseError))
			return -1
		}
		return c
	}
	if r.opt.Layout == Wide {
		return -1
	}
	candidate, named := -1, false
	for _, hint := range []bool{true, false} {
		for c, name := range r.names {
			if c == ro.date || c == ro.year || c == ro.sub || candidate >= 0 {
				continue
			}
			// An unnamed key repeats: at most half as many names as rows.
			if hint && hinted(name, keyNames) && (st[c].textual() || st[c].ints == st[c].present()) ||
				!hint && st[c].textual() && len(st[c].keys) > 1 && 2*len(st[c].keys) <= st[c].cells {
				candidate, named = c, hint
			}
		}
	}
	if r.opt.Layout == Long {
		if candidate < 0 {
			r.fail(-1, -1, "", ErrOption, fmt.Sprintf("the long layout needs a column naming the series, and none was found among %s; name it with the series option", quotedList(r.names, 12)))
		}
		return candidate
	}
	if candidate < 0 || ords == nil {
		return -1
	}
	if named && st[candidate].textual() {
		return candidate
	}
	// Long when periods repeat, and repeat far less within each key.
	// Judged on rows spread evenly over the file.
	n := min(len(r.rows), 5000)
	seen := make(map[int]bool, n)
	type pair struct {
		key string
		ord int
	}
	seenKey := make(map[pair]bool, n)
	dupPeriod, dupKey := 0, 0
	for j := range n {
		i := j * len(r.rows) / n
		if seen[ords[i]] {
			dupPeriod++
		}
		seen[ords[i]] = true
		k := pair{string(trimCell(r.t.cell(int(r.rows[i]), candidate))), ords[i]}
		if seenKey[k] {
			dupKey++
		}
		seenKey[k] = true
	}
	if dupPeriod > 0 && 2*dupKey < dupPeriod {
		return candidate
	}
	return -1
}

// chooseValues picks the value columns and, in the long layout, the text
// columns kept as labels.
func (r *reader) chooseValues(ro *roles, st []colStats) {
	used := func(c int) bool { return c == ro.date || c == ro.year || c == ro.sub || c == ro.key }
	if len(r.opt.Values) > 0 {
		for _, name := range r.opt.Values {
			c, err := r.column(name, "values")
			if err != nil {
				r.errs = append(r.errs, err.(*ParseError))
				return
			}
			if used(c) {
				r.fail(-1, c, "", ErrOption, "this column holds the periods or the series names and cannot also be a value column; choose another value column")
				return
			}
			ro.values = append(ro.values, c)
		}
	}
	dateFound := ro.date >= 0 || ro.year >= 0
	for c, name := range r.names {
		if used(c) || len(r.opt.Values) > 0 && contains(ro.values, c) {
			continue
		}
		s := &st[c]
		switch {
		case len(r.opt.Values) > 0:
			if ro.key >= 0 {
				ro.labels = append(ro.labels, c)
			}
		case s.present() == 0:
			r.decide("column %q is empty and is left out", name)
		case s.numeric() && dateFound && s.ints == s.present() && (hinted(name, counterNames) || hinted(name, dateNames)):
			r.decide("column %q numbers the rows or repeats part of the period, and is not read as a series", name)
		case s.numeric():
			ro.values = append(ro.values, c)
		case ro.key >= 0:
			ro.labels = append(ro.labels, c)
		default:
			r.decide("column %q holds text and is not read as a series", name)
		}
	}
	if len(ro.values) == 0 {
		r.fail(-1, -1, "", ErrNoValues, fmt.Sprintf("no column holds numbers to read as a series; the columns are %s", quotedList(r.names, 12)))
	}
}

func contains(list []int, c int) bool {
	for _, v := range list {
		if v == c {
			return true
		}
	}
	return false
}

// seriesName returns the name of the series for key k and value column c.
func (r *reader) seriesName(ro roles, key string, c int) string {
	switch {
	case ro.key < 0:
		return r.names[c]
	case len(ro.values) == 1:
		return key
	}
	return strings.TrimSpace(key + " " + r.names[c])
}
