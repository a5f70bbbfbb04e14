package series

// This file recognises the shape of one date cell. A shape says how the
// cell is written; which frequency and which day/month order a column has
// is decided later from all of its cells (see datecolumn.go).

// shape is the written form of a date cell.
type shape uint8

const (
	shapeNone shape = iota // not a date
	shapeYMD               // 2024-03-01, 2024/03/01
	shapeYM                // 2024-03, 2024/03
	shapeYQ                // 2024-Q1, 2024Q1, Q1 2024
	shapeYW                // 2024-W05, 2024W05
	shapeY                 // 2024
	shapeMY                // 03/2024, 3-2024
	shapeAB                // 01/02/2024: day-first or month-first
	shapeMonY              // Mar 2024, March 2024, Mar-2024
	shapeInt               // 17: a plain position
)

// dateCell is one date cell taken apart. For shapeAB, a and b are the first
// and second numbers, whose roles the column decides.
type dateCell struct {
	year    int32 // the year; the position itself for shapeInt
	a, b    uint8 // month and day (YMD), month (YM, MY, MonY), quarter, week, or the two leading numbers of AB
	shape   shape
	hasTime bool // a time of day follows the date
	dotted  bool // a month written with a point (2024.03, 03.2024), which may also be a number
}

// cellOf packs the parts of a date cell; parts were range-checked by the
// caller.
func cellOf(s shape, year, a, b int) dateCell {
	return dateCell{year: int32(year), a: uint8(a), b: uint8(b), shape: s}
}

// monthNames holds English month names and their usual abbreviations,
// lower case, with the month number.
var monthNames = [...]struct {
	name string
	m    int
}{
	{"january", 1}, {"jan", 1}, {"february", 2}, {"feb", 2}, {"march", 3}, {"mar", 3},
	{"april", 4}, {"apr", 4}, {"may", 5}, {"june", 6}, {"jun", 6}, {"july", 7}, {"jul", 7},
	{"august", 8}, {"aug", 8}, {"september", 9}, {"sept", 9}, {"sep", 9},
	{"october", 10}, {"oct", 10}, {"november", 11}, {"nov", 11}, {"december", 12}, {"dec", 12},
}

// digits reads a run of ASCII digits at b[i:], at most 9, and returns its
// value, its length and the index after it.
func digits(b []byte, i int) (v, n, j int) {
	for j = i; j < len(b) && j-i < 10 && b[j] >= '0' && b[j] <= '9'; j++ {
		v = v*10 + int(b[j]-'0')
	}
	return v, j - i, j
}

// isDateSep reports whether c separates the parts of a date.
func isDateSep(c byte) bool { return c == '-' || c == '/' || c == '.' }

// scanDate recognises the shape of a trimmed cell. It checks only the
// shape and the ranges that do not depend on the column (month 1..12,
// quarter 1..4, week 1..53, day 1..31); scanDate never allocates.
func scanDate(b []byte) dateCell {
	if len(b) == 0 {
		return dateCell{}
	}
	if c := b[0] | 0x20; c >= 'a' && c <= 'z' {
		return scanLetterFirst(b)
	}
	v1, n1, i := digits(b, 0)
	if n1 == 0 {
		return dateCell{}
	}
	if i == len(b) {
		if n1 == 4 {
			return cellOf(shapeY, v1, 0, 0)
		}
		if n1 <= 9 && (n1 == 1 || b[0] != '0') {
			return cellOf(shapeInt, v1, 0, 0)
		}
		return dateCell{}
	}
	if n1 == 4 {
		return scanYearFirst(b, v1, i)
	}
	if n1 <= 2 && i+1 < len(b) && (b[i] == ' ' || b[i] == '-' || b[i] == '/') && (b[i+1]|0x20) >= 'a' && (b[i+1]|0x20) <= 'z' {
		return scanDayMonthName(b, v1, i+1)
	}
	if n1 > 2 || !isDateSep(b[i]) {
		return dateCell{}
	}
	sep := b[i]
	v2, n2, j := digits(b, i+1)
	if n2 == 4 && j == len(b) {
		// 03.2024 is a month, but 3.2024 or 12.0001 is more likely a number.
		if sep == '.' && (n1 != 2 || v2 < 1000 || v2 > 2999) {
			return dateCell{}
		}
		if v1 >= 1 && v1 <= 12 {
			c := cellOf(shapeMY, v2, v1, 0)
			c.dotted = sep == '.'
			return c
		}
		return dateCell{}
	}
	if n2 == 0 || n2 > 2 || j >= len(b) || b[j] != sep {
		return dateCell{}
	}
	y, n3, k := digits(b, j+1)
	if n3 != 4 || v1 < 1 || v2 < 1 || v1 > 31 || v2 > 31 || (v1 > 12 && v2 > 12) {
		return dateCell{}
	}
	c := cellOf(shapeAB, y, v1, v2)
	return withTime(c, b, k)
}

// scanYearFirst handles cells starting with a four-digit year y; b[i] is
// the byte after the year.
func scanYearFirst(b []byte, y, i int) dateCell {
	c := b[i]
	if c == ' ' && i+1 < len(b) {
		i++
		c = b[i]
	}
	if c == '-' && i+1 < len(b) && (b[i+1]|0x20 == 'q' || b[i+1]|0x20 == 'w') {
		i++
		c = b[i]
	}
	switch c | 0x20 {
	case 'q':
		if i+2 == len(b) && b[i+1] >= '1' && b[i+1] <= '4' {
			return cellOf(shapeYQ, y, int(b[i+1]-'0'), 0)
		}
		return dateCell{}
	case 'w':
		w, n, j := digits(b, i+1)
		if n == 2 && j == len(b) && w >= 1 && w <= 53 {
			return cellOf(shapeYW, y, w, 0)
		}
		return dateCell{}
	}
	if c != '-' && c != '/' && c != '.' {
		return dateCell{}
	}
	m, n, j := digits(b, i+1)
	if n == 0 || n > 2 || m < 1 || m > 12 {
		return dateCell{}
	}
	if j == len(b) {
		d := cellOf(shapeYM, y, m, 0)
		d.dotted = c == '.'
		return d
	}
	if b[j] != c {
		return dateCell{}
	}
	d, n, k := digits(b, j+1)
	if n == 0 || n > 2 || d < 1 || d > 31 {
		return dateCell{}
	}
	return withTime(cellOf(shapeYMD, y, m, d), b, k)
}

// scanLetterFirst handles "Q1 2024", "Mar 2024", "March 2024", "Mar-2024"
// and "Mar 1, 2024".
func scanLetterFirst(b []byte) dateCell {
	if b[0]|0x20 == 'q' && len(b) >= 7 && b[1] >= '1' && b[1] <= '4' && (b[2] == ' ' || b[2] == '-' || b[2] == '/') {
		y, n, j := digits(b, 3)
		if n == 4 && j == len(b) {
			return cellOf(shapeYQ, y, int(b[1]-'0'), 0)
		}
		return dateCell{}
	}
	i := 0
	for i < len(b) && (b[i]|0x20) >= 'a' && (b[i]|0x20) <= 'z' {
		i++
	}
	m := monthNumber(b[:i])
	if m == 0 || i == len(b) {
		return dateCell{}
	}
	if b[i] == '.' && i+1 < len(b) {
		i++
	}
	if b[i] != ' ' && b[i] != '-' && b[i] != '/' {
		return dateCell{}
	}
	v, n, j := digits(b, i+1)
	if n >= 1 && n <= 2 && b[i] == ' ' && j+6 <= len(b) && b[j] == ',' && b[j+1] == ' ' { // Mar 1, 2024
		y, n, k := digits(b, j+2)
		if n != 4 || v < 1 || v > 31 {
			return dateCell{}
		}
		return withTime(cellOf(shapeYMD, y, m, v), b, k)
	}
	if n != 4 || j != len(b) {
		return dateCell{}
	}
	return cellOf(shapeMonY, v, m, 0)
}

// scanDayMonthName handles "1 Mar 2024", "01-Mar-2024", "1/March/2024";
// day d has been read and b[i] starts the month name.
func scanDayMonthName(b []byte, d, i int) dateCell {
	sep := b[i-1]
	j := i
	for j < len(b) && (b[j]|0x20) >= 'a' && (b[j]|0x20) <= 'z' {
		j++
	}
	m := monthNumber(b[i:j])
	if j < len(b) && b[j] == '.' {
		j++
	}
	if m == 0 || d < 1 || d > 31 || j >= len(b) || b[j] != sep {
		return dateCell{}
	}
	y, n, k := digits(b, j+1)
	if n != 4 {
		return dateCell{}
	}
	return withTime(cellOf(shapeYMD, y, m, d), b, k)
}

// twoDigitYear reports whether a cell looks like a date written with a
// two-digit year, such as 01/02/24, Mar-24 or 1-Mar-24.
func twoDigitYear(b []byte) bool {
	n := len(b)
	if n < 4 {
		return false
	}
	if b[n-1] < '0' || b[n-1] > '9' || b[n-2] < '0' || b[n-2] > '9' || !(b[n-3] == '/' || b[n-3] == '-' || b[n-3] == '.' || b[n-3] == ' ') {
		return false
	}
	_, lead, _ := digits(b, 0)
	return lead != 4 // 2024-13 is a wrong month, not a short year
}

// monthNumber returns 1..12 for an English month name or abbreviation in
// any case, else 0.
func monthNumber(word []byte) int {
	if len(word) < 3 || len(word) > 9 {
		return 0
	}
	var low [9]byte
	for i, c := range word {
		low[i] = c | 0x20
	}
	w := string(low[:len(word)])
	for _, mn := range monthNames {
		if mn.name == w {
			return mn.m
		}
	}
	return 0
}

// withTime accepts the end of a date cell at b[k:]: nothing, or a time of
// day such as "T13:45", " 13:45:07", " 1:45 PM", "T13:45:07.5Z",
// "13:45+02:00". The date stays the date written; a zone offset does not
// move it to another day.
func withTime(c dateCell, b []byte, k int) dateCell {
	if k == len(b) {
		return c
	}
	if b[k] != 'T' && b[k] != ' ' {
		return dateCell{}
	}
	h, n, j := digits(b, k+1)
	if n == 0 || n > 2 || h > 23 || j >= len(b) || b[j] != ':' {
		return dateCell{}
	}
	mi, n, j := digits(b, j+1)
	if n != 2 || mi > 59 {
		return dateCell{}
	}
	for ; j < len(b); j++ {
		switch ch := b[j]; {
		case ch >= '0' && ch <= '9', ch == ':', ch == '.', ch == '+', ch == '-', ch == ' ', ch == 'Z':
		case ch|0x20 == 'a' || ch|0x20 == 'p' || ch|0x20 == 'm':
		default:
			return dateCell{}
		}
	}
	c.hasTime = true
	return c
}
