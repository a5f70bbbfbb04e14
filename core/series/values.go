package series

import (
	"fmt"
	"math"
	"strconv"
	"strings"
)

// This file reads value columns: it decides each column's decimal mark
// from all of its cells, then reads every cell.

// valueColumn reads column c of every data row; missing cells are NaN.
func (r *reader) valueColumn(c int) []float64 {
	dec, ok := r.decideMark([]int{c}, fmt.Sprintf("column %q", r.names[c]), r.names[c])
	if !ok {
		return nil
	}
	values := make([]float64, len(r.rows))
	for i := range r.rows {
		values[i] = r.number(i, c, dec)
	}
	return values
}

// number reads the cell of data row i in column c with decimal mark dec:
// NaN when missing, 0 with an error recorded when not a number.
func (r *reader) number(i, c int, dec byte) float64 {
	b := trimCell(r.t.cell(int(r.rows[i]), c))
	if ev, ok := quickNumber(b); ok && (dec == '.' || ev == evNone) {
		if v, err := strconv.ParseFloat(string(b), 64); err == nil {
			return v
		}
	}
	if isMissing(b, r.opt.Missing) {
		return math.NaN()
	}
	nb := scanNumber(b)
	v, why := nb.value(dec)
	if why != "" || (nb.ok && (math.IsInf(v, 0) || math.IsNaN(v))) {
		r.fail(i, c, string(b), ErrNotNumber, notNumber(b, why, dec, nb))
		return 0
	}
	return v
}

// cellRef is one cell: data row i (an index into r.rows), column c.
type cellRef struct{ i, c int }

// decideMark decides the decimal mark of the cells of columns cols from
// all of them, or from the option, and states the decision; what names
// the cells in sentences ("column \"units\""), name the column a later
// undecided column may follow. It reports false after recording an error.
func (r *reader) decideMark(cols []int, what, name string) (byte, bool) {
	var first [evAmbiguous + 1]cellRef
	var count [evAmbiguous + 1]int
	money, percent := 0, 0
	note := func(ev evidence, i, c int) {
		count[ev]++
		if count[ev] == 1 {
			first[ev] = cellRef{i, c}
		}
	}
	for _, c := range cols {
		for i, row := range r.rows {
			b := trimCell(r.t.cell(int(row), c))
			if ev, ok := quickNumber(b); ok {
				note(ev, i, c)
				continue
			}
			if isMissing(b, r.opt.Missing) {
				continue
			}
			nb := scanNumber(b)
			if !nb.ok {
				continue
			}
			if nb.money {
				money++
			}
			if nb.percent {
				percent++
			}
			note(nb.markEvidence(), i, c)
		}
	}
	text := func(at cellRef) string { return quoteCell(string(trimCell(r.t.cell(int(r.rows[at.i]), at.c)))) }
	raw := func(at cellRef) string { return string(trimCell(r.t.cell(int(r.rows[at.i]), at.c))) }
	numbers := count[evNone] + count[evDot] + count[evComma] + count[evAmbiguous]
	dec := byte('.')
	switch {
	case r.opt.DecimalMark == '.' || r.opt.DecimalMark == ',':
		dec = r.opt.DecimalMark
		if count[evDot]+count[evComma]+count[evAmbiguous] > 0 {
			r.decide("%s: %s, as the decimal mark option says", what, markSentence(dec))
		}
	case r.opt.DecimalMark != 0:
		r.fail(-1, cols[0], "", ErrOption, fmt.Sprintf("%q cannot be a decimal mark; choose a point or a comma", string(rune(r.opt.DecimalMark))))
		return 0, false
	case count[evDot] > 0 && count[evComma] > 0:
		late, early := first[evDot], first[evComma]
		lateComma := false
		if late.i < early.i || late.i == early.i && late.c < early.c {
			late, early = early, late
			lateComma = true
		}
		r.fail(late.i, late.c, raw(late), ErrDecimalMark, fmt.Sprintf("%s writes the decimal mark as %s, but line %d (%s) writes it as %s; write every number in the %s the same way",
			text(late), markWord(lateComma), r.lineOf(early.i), text(early), markWord(!lateComma), strings.Fields(what)[0]))
		return 0, false
	case count[evComma] > 0:
		dec = ','
		r.decide("%s: %s, decided from all %d numbers, such as %s on line %d", what, markSentence(dec),
			numbers, text(first[evComma]), r.lineOf(first[evComma].i))
	case count[evDot] > 0:
		if count[evAmbiguous] > 0 || strings.Contains(raw(first[evDot]), ",") {
			r.decide("%s: %s, decided from all %d numbers, such as %s on line %d", what, markSentence('.'),
				numbers, text(first[evDot]), r.lineOf(first[evDot].i))
		}
	case count[evAmbiguous] > 0 && r.decimal != 0:
		dec = r.decimal
		r.decide("%s: no number settles the decimal mark, so it follows column %q: %s", what, r.decCol, markSentence(dec))
	case count[evAmbiguous] > 0:
		at := first[evAmbiguous]
		r.fail(at.i, at.c, raw(at), ErrDecimalMark, fmt.Sprintf("%s could be a whole number with a thousands separator or a number with three decimals, and no cell in the %s settles it; set the decimal mark to a point or a comma",
			text(at), strings.Fields(what)[0]))
		return 0, false
	}
	if count[evDot]+count[evComma] > 0 && r.decimal == 0 {
		r.decimal, r.decCol = dec, name
	}
	if money > 0 {
		r.decide("%s: currency signs in %d %s are left out", what, money, plural(money, "cell", "cells"))
	}
	if percent > 0 {
		r.decide("%s: percent signs in %d %s are left out, so 12%% reads as 12", what, percent, plural(percent, "cell", "cells"))
	}
	return dec, true
}

// notNumber writes the message for a cell that is not a number.
func notNumber(b []byte, why string, dec byte, nb number) string {
	hint := why
	switch why {
	case "digits grouped oddly", "a grouping mark after the decimal mark", "two decimal marks?":
		if nb.markEvidence() != evNone && (dec == '.' && nb.commas > 0 || dec == ',' && nb.dots > 0) {
			hint = fmt.Sprintf("its %s does not fit this column, which uses %s as the decimal mark", markWord(dec != ','), markWord(dec == ','))
		}
	case "text", "no digits":
		hint = ""
	case "too many digits":
		hint = "more digits than a number can hold"
	case "too large":
		hint = "too large"
	}
	q := quoteCell(string(b))
	if hint == "" {
		return fmt.Sprintf("%s is not a number; correct the cell or mark it missing with NA", q)
	}
	return fmt.Sprintf("%s is not a number (%s); correct the cell or mark it missing with NA", q, hint)
}

// markWord names a decimal mark.
func markWord(comma bool) string {
	if comma {
		return "a comma"
	}
	return "a point"
}

// markSentence states a decimal-mark decision.
func markSentence(dec byte) string {
	if dec == ',' {
		return "commas are decimal marks and points or spaces group thousands (1.234,5 is one thousand two hundred thirty-four and a half)"
	}
	return "points are decimal marks and commas or spaces group thousands (1,234.5 is one thousand two hundred thirty-four and a half)"
}
