package series

import "strconv"

// This file decides which mark is the decimal one. One cell may settle it
// (1,234.5 or 12,5), or leave it open (1,234 could be either); the column
// decides from all of its cells.

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
	start := 0
	if b[0] == '-' {
		start = 1
	}
	lead := dot - start
	switch {
	case dot < 0:
		return evNone, true
	case after != 3 || lead == 0 || lead > 3 || b[start] == '0':
		return evDot, true
	}
	return evAmbiguous, true
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
		lead := 0
		for lead < nb.n && nb.buf[lead] != '.' && nb.buf[lead] != ',' {
			lead++
		}
		if nb.after != 3 || lead == 0 || lead > 3 || nb.buf[0] == '0' {
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
