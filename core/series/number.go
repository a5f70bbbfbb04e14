package series

import (
	"bytes"
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
