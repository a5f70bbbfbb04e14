package series

import (
	"fmt"
	"math"
	"strconv"
)

// This file reads value columns: it decides each column's decimal mark
// from all of its cells, then reads every cell.

// valueColumn reads column c of every data row; missing cells are NaN.
func (r *reader) valueColumn(c int) []float64 {
	name := r.names[c]
	var first [evAmbiguous + 1]int
	var count [evAmbiguous + 1]int
	for k := range first {
		first[k] = -1
	}
	money, percent := 0, 0
	for i, row := range r.rows {
		b := trimCell(r.t.cell(int(row), c))
		if ev, ok := quickNumber(b); ok {
			count[ev]++
			if first[ev] < 0 {
				first[ev] = i
			}
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
		ev := nb.markEvidence()
		count[ev]++
		if first[ev] < 0 {
			first[ev] = i
		}
	}
	cellAt := func(i int) string { return string(trimCell(r.t.cell(int(r.rows[i]), c))) }
	dec := byte('.')
	switch {
	case r.opt.DecimalMark == '.' || r.opt.DecimalMark == ',':
		dec = r.opt.DecimalMark
		if count[evDot]+count[evComma]+count[evAmbiguous] > 0 {
			r.decide("column %q: %s, as the decimal mark option says", name, markSentence(dec))
		}
	case r.opt.DecimalMark != 0:
		r.fail(-1, c, "", ErrOption, fmt.Sprintf("%q cannot be a decimal mark; choose a point or a comma", string(rune(r.opt.DecimalMark))))
		return nil
	case count[evDot] > 0 && count[evComma] > 0:
		late, early := max(first[evDot], first[evComma]), min(first[evDot], first[evComma])
		r.fail(late, c, cellAt(late), ErrDecimalMark, fmt.Sprintf("%s writes the decimal mark as %s, but line %d (%s) writes it as %s; write every number in the column the same way",
			quoteCell(cellAt(late)), markWord(late == first[evComma]), r.lineOf(early), quoteCell(cellAt(early)), markWord(early == first[evComma])))
		return nil
	case count[evComma] > 0:
		dec = ','
		r.decide("column %q: %s, decided from all %d numbers, such as %s on line %d", name, markSentence(dec),
			count[evNone]+count[evComma]+count[evAmbiguous], quoteCell(cellAt(first[evComma])), r.lineOf(first[evComma]))
	case count[evDot] > 0:
		if count[evAmbiguous] > 0 || hasComma(cellAt(first[evDot])) {
			r.decide("column %q: %s, decided from all %d numbers, such as %s on line %d", name, markSentence('.'),
				count[evNone]+count[evDot]+count[evAmbiguous], quoteCell(cellAt(first[evDot])), r.lineOf(first[evDot]))
		}
	case count[evAmbiguous] > 0 && r.decimal != 0:
		dec = r.decimal
		r.decide("column %q: no number settles the decimal mark, so it follows column %q: %s", name, r.decCol, markSentence(dec))
	case count[evAmbiguous] > 0:
		i := first[evAmbiguous]
		r.fail(i, c, cellAt(i), ErrDecimalMark, fmt.Sprintf("%s could be a whole number with a thousands separator or a number with three decimals, and no cell in the column settles it; set the decimal mark to a point or a comma", quoteCell(cellAt(i))))
		return nil
	}
	if count[evDot]+count[evComma] > 0 && r.decimal == 0 {
		r.decimal, r.decCol = dec, name
	}
	if money > 0 {
		r.decide("column %q: currency signs in %d %s are left out", name, money, plural(money, "cell", "cells"))
	}
	if percent > 0 {
		r.decide("column %q: percent signs in %d %s are left out, so 12%% reads as 12", name, percent, plural(percent, "cell", "cells"))
	}
	values := make([]float64, len(r.rows))
	for i, row := range r.rows {
		b := trimCell(r.t.cell(int(row), c))
		if ev, ok := quickNumber(b); ok && (dec == '.' || ev == evNone) {
			v, err := strconv.ParseFloat(string(b), 64)
			if err == nil {
				values[i] = v
				continue
			}
		}
		if isMissing(b, r.opt.Missing) {
			values[i] = math.NaN()
			continue
		}
		nb := scanNumber(b)
		v, why := nb.value(dec)
		if why != "" || (nb.ok && (math.IsInf(v, 0) || math.IsNaN(v))) {
			r.fail(i, c, string(b), ErrNotNumber, notNumber(b, why, dec, nb))
			continue
		}
		values[i] = v
	}
	return values
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

func hasComma(s string) bool {
	for i := 0; i < len(s); i++ {
		if s[i] == ',' {
			return true
		}
	}
	return false
}
