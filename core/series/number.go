package series

import (
	"bytes"
	"strconv"
	"unicode/utf8"
)

// This file reads number cells as spreadsheets and ledgers export them:
// decimal point or decimal comma, thousands grouped by the other mark, by
// spaces or by apostrophes, currency signs, percent signs, negatives with a
// minus sign or in parentheses, and an exponent.

// number is a number cell taken apart by scanNumber.
type number struct {
	ok      bool // the cell is a number in some format
	buf     [48]byte
	n       int    // digits of the number in buf[:n], marks as found
	neg     bool   // minus sign or parentheses
	dots    int    // '.' marks in the digits
	commas  int    // ',' marks in the digits
	lastSep byte   // the last of '.' or ',' in the digits
	after   int    // digits after lastSep (before an exponent)
	grouped bool   // spaces or apostrophes group digits
	exp     []byte // exponent part "e-3", within the cell
	percent bool
	money   bool
	bad     string // why the cell is not a number, as a hint; "" when ok
}

// isMissing reports whether a trimmed cell means "no value": empty, NA,
// N/A, NaN, null, none, missing, #N/A, -, --, a dash, ".", "?", or one of
// the extra markers given.
func isMissing(b []byte, extra []string) bool {
	switch {
	case len(b) == 0:
		return true
	case b[0] >= '0' && b[0] <= '9':
		return false
	case len(b) == 1:
		return b[0] == '-' || b[0] == '.' || b[0] == '?'
	}
	if len(b) <= 8 {
		var low [8]byte
		for i, c := range b {
			if c >= 'A' && c <= 'Z' {
				c += 'a' - 'A'
			}
			low[i] = c
		}
		switch string(low[:len(b)]) {
		case "na", "n/a", "n.a.", "nan", "null", "none", "missing", "#n/a", "--", "\u2013", "\u2014":
			return true
		}
	}
	for _, m := range extra {
		if len(m) == len(b) && bytes.EqualFold(b, []byte(m)) {
			return true
		}
	}
	return false
}

// trimCell trims ASCII spaces, tabs and no-break spaces from both ends.
func trimCell(b []byte) []byte {
	for len(b) > 0 {
		if b[0] == ' ' || b[0] == '\t' {
			b = b[1:]
		} else if len(b) >= 2 && b[0] == 0xC2 && b[1] == 0xA0 {
			b = b[2:]
		} else {
			break
		}
	}
	for len(b) > 0 {
		if c := b[len(b)-1]; c == ' ' || c == '\t' {
			b = b[:len(b)-1]
		} else if len(b) >= 2 && b[len(b)-2] == 0xC2 && b[len(b)-1] == 0xA0 {
			b = b[:len(b)-2]
		} else {
			break
		}
	}
	return b
}

// scanNumber takes a trimmed cell apart without deciding which mark is the
// decimal one.
func scanNumber(b []byte) (nb number) {
	// Sign, parentheses, currency and percent around the digits.
	if len(b) >= 2 && b[0] == '(' && b[len(b)-1] == ')' {
		nb.neg = true
		b = trimCell(b[1 : len(b)-1])
	}
	for len(b) > 0 && !plainEdge(b[0]) || len(b) > 0 && !plainEdge(b[len(b)-1]) {
		var ok bool
		if b, ok = stripMoney(b); ok {
			nb.money = true
			continue
		}
		if len(b) > 0 && b[len(b)-1] == '%' {
			nb.percent = true
			b = trimCell(b[:len(b)-1])
			continue
		}
		if len(b) > 0 && (b[0] == '-' || b[0] == '+') && !nb.neg {
			nb.neg = b[0] == '-'
			b = trimCell(b[1:])
			continue
		}
		if len(b) >= 3 && b[0] == 0xE2 && b[1] == 0x88 && b[2] == 0x92 && !nb.neg { // U+2212 minus sign
			nb.neg = true
			b = trimCell(b[3:])
			continue
		}
		break
	}
	if len(b) > 0 && b[len(b)-1] == '-' && !nb.neg { // trailing minus of some ledgers
		nb.neg = true
		b = trimCell(b[:len(b)-1])
	}
	// Exponent.
	if e := indexExp(b); e > 0 && e < len(b)-1 {
		exp := b[e+1:]
		if exp[0] == '-' || exp[0] == '+' {
			exp = exp[1:]
		}
		if len(exp) > 0 && allDigits(exp) {
			nb.exp = b[e:]
			b = b[:e]
		}
	}
	if len(b) == 0 {
		nb.bad = "no digits"
		return nb
	}
	digitsSeen := 0
	for i := 0; i < len(b); {
		c := b[i]
		switch {
		case c >= '0' && c <= '9':
			digitsSeen++
			nb.after++
		case c == '.' || c == ',':
			if nb.n > 0 && (nb.buf[nb.n-1] == '.' || nb.buf[nb.n-1] == ',') {
				nb.bad = "two marks in a row"
				return nb
			}
			if c == '.' {
				nb.dots++
			} else {
				nb.commas++
			}
			nb.lastSep = c
			nb.after = 0
		case c == ' ' || c == '\'':
			nb.grouped = true
			i++
			continue
		case c == 0xC2 && i+1 < len(b) && b[i+1] == 0xA0: // no-break space
			nb.grouped = true
			i += 2
			continue
		case c == 0xE2 && i+2 < len(b) && b[i+1] == 0x80 && b[i+2] == 0xAF: // narrow no-break space
			nb.grouped = true
			i += 3
			continue
		default:
			nb.bad = letterHint(b)
			return nb
		}
		if nb.n == len(nb.buf) {
			nb.bad = "too many digits"
			return nb
		}
		nb.buf[nb.n] = c
		nb.n++
		i++
	}
	if digitsSeen == 0 {
		nb.bad = "no digits"
		return nb
	}
	nb.ok = true
	return nb
}

// stripMoney removes one currency sign or three-letter currency code from
// either end of b.
func stripMoney(b []byte) ([]byte, bool) {
	if len(b) == 0 {
		return b, false
	}
	for _, sym := range [...]string{"$", "\u20ac", "\u00a3", "\u00a5", "\u20b9", "\u20a9", "\u20bd", "\u20ba", "\u20aa", "\u20a3"} {
		if bytes.HasPrefix(b, []byte(sym)) {
			return trimCell(b[len(sym):]), true
		}
		if bytes.HasSuffix(b, []byte(sym)) {
			return trimCell(b[:len(b)-len(sym)]), true
		}
	}
	if len(b) >= 5 && isUpper3(b[:3]) && b[3] == ' ' {
		return trimCell(b[4:]), true
	}
	if len(b) >= 5 && isUpper3(b[len(b)-3:]) && b[len(b)-4] == ' ' {
		return trimCell(b[:len(b)-4]), true
	}
	return b, false
}

// plainEdge reports whether c may start or end a plain number, so that
// no sign, currency or percent needs stripping there.
func plainEdge(c byte) bool { return c >= '0' && c <= '9' || c == '.' || c == ',' }

// indexExp returns the index of the first 'e' or 'E' in b, or -1.
func indexExp(b []byte) int {
	for i, c := range b {
		if c|0x20 == 'e' {
			return i
		}
	}
	return -1
}

// quickNumber reads a cell written as plain digits with at most one point
// and an optional leading minus, the shape of most machine exports. It
// returns false for anything else, which scanNumber then takes apart.
func quickNumber(b []byte) (ev evidence, ok bool) {
	i := 0
	if len(b) > 0 && b[0] == '-' {
		i = 1
	}
	digits, dot, after := 0, -1, 0
	for ; i < len(b); i++ {
		c := b[i]
		switch {
		case c >= '0' && c <= '9':
			digits++
			if dot >= 0 {
				after++
			}
		case c == '.' && dot < 0:
			dot = i
		default:
			return evNone, false
		}
	}
	if digits == 0 || digits > 17 || dot == len(b)-1 {
		return evNone, false
	}
	switch {
	case dot < 0:
		return evNone, true
	case after != 3 || b[0] == '.' || b[0] == '-' && dot == 1 || b[0] == '0' && dot == 1 || b[0] == '-' && b[1] == '0' && dot == 2:
		return evDot, true
	}
	return evAmbiguous, true
}

func isUpper3(b []byte) bool {
	return b[0] >= 'A' && b[0] <= 'Z' && b[1] >= 'A' && b[1] <= 'Z' && b[2] >= 'A' && b[2] <= 'Z'
}

func allDigits(b []byte) bool {
	for _, c := range b {
		if c < '0' || c > '9' {
			return false
		}
	}
	return true
}

// letterHint guesses why a cell with other characters is not a number.
func letterHint(b []byte) string {
	hasDigit := false
	for _, c := range b {
		if c >= '0' && c <= '9' {
			hasDigit = true
		}
	}
	if len(b) > 0 && b[0] == '#' {
		return "a spreadsheet error code; fix the formula in the sheet"
	}
	if hasDigit {
		for _, c := range b {
			switch c {
			case 'O', 'o':
				return "a letter O instead of a zero?"
			case 'l', 'I':
				return "a letter l instead of a one?"
			}
		}
	}
	if !utf8.Valid(b) {
		return "characters that are not UTF-8 text; save the file as UTF-8"
	}
	return ""
}

// evidence is what one cell says about the decimal mark of its column.
type evidence uint8

const (
	evNone      evidence = iota // no mark, or nothing to learn
	evDot                       // the decimal mark must be '.'
	evComma                     // the decimal mark must be ','
	evAmbiguous                 // one mark followed by exactly three digits: 1,234 or 1.234
)

// markEvidence returns what a scanned number says about the decimal mark.
func (nb *number) markEvidence() evidence {
	switch {
	case nb.dots > 0 && nb.commas > 0:
		if nb.lastSep == '.' {
			return evDot
		}
		return evComma
	case nb.dots > 1:
		return evComma
	case nb.commas > 1:
		return evDot
	case nb.dots == 1 || nb.commas == 1:
		lead := nb.buf[0]
		if nb.after != 3 || lead == '.' || lead == ',' || (lead == '0' && nb.buf[1] == nb.lastSep) {
			if nb.lastSep == '.' {
				return evDot
			}
			return evComma
		}
		if nb.grouped { // "1 234,567": spaces group, so the mark is decimal
			if nb.lastSep == '.' {
				return evDot
			}
			return evComma
		}
		return evAmbiguous
	}
	return evNone
}

// value returns the number with decimal mark dec ('.' or ','), or false
// with a hint when its marks do not fit that reading: the other mark must
// group digits in threes (twos before the last group are accepted, as in
// 1,23,456.7), before any decimal mark.
func (nb *number) value(dec byte) (float64, string) {
	if !nb.ok {
		if nb.bad == "" {
			return 0, "text"
		}
		return 0, nb.bad
	}
	var out [64]byte
	k := 0
	group := byte('.')
	if dec == '.' {
		group = ','
	}
	seenDec := false
	run, groups := 0, 0
	for i := 0; i < nb.n; i++ {
		c := nb.buf[i]
		switch c {
		case dec:
			if seenDec {
				return 0, "two decimal marks?"
			}
			if groups > 0 && run != 3 {
				return 0, "digits grouped oddly"
			}
			seenDec = true
			out[k] = '.'
			k++
			run = 0
		case group:
			if seenDec {
				return 0, "a grouping mark after the decimal mark"
			}
			if run == 0 || run > 3 || (groups > 0 && run < 2) {
				return 0, "digits grouped oddly"
			}
			groups++
			run = 0
		default:
			out[k] = c
			k++
			run++
		}
	}
	if groups > 0 && !seenDec && run != 3 {
		return 0, "digits grouped oddly"
	}
	k += copy(out[k:], nb.exp)
	v, err := strconv.ParseFloat(string(out[:k]), 64)
	if err != nil {
		return 0, "too large"
	}
	if nb.neg {
		v = -v
	}
	return v, ""
}
