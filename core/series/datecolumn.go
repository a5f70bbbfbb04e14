package series

import (
	"fmt"
)

// This file turns the period column into one period ordinal per row,
// deciding once for the whole column how its dates are written (day-first
// or month-first) and what frequency they have.

// freqOfShape returns the frequency a date shape is written in; Day for
// full dates, whose frequency is inferred afterwards.
func freqOfShape(s shape) Frequency {
	switch s {
	case shapeYMD, shapeAB:
		return Day
	case shapeYW:
		return Week
	case shapeYM, shapeMY, shapeMonY:
		return Month
	case shapeYQ:
		return Quarter
	case shapeY:
		return Year
	case shapeInt:
		return Index
	}
	return NoFrequency
}

// dateColumn reads column c of every data row into period ordinals of one
// frequency.
func (r *reader) dateColumn(c int) (Frequency, []int) {
	name := r.names[c]
	cells := make([]dateCell, len(r.rows))
	var count [Index + 1]int
	firstOf := [Index + 1]int{-1, -1, -1, -1, -1, -1, -1}
	times := 0
	for i, row := range r.rows {
		b := trimCell(r.t.cell(int(row), c))
		d := scanDate(b)
		cells[i] = d
		if d.hasTime {
			times++
		}
		f := freqOfShape(d.shape)
		if f != NoFrequency && firstOf[f] < 0 {
			firstOf[f] = i
		}
		count[f]++
	}
	// Positions written 1, 2, ..., 1999, 2000 are one index column.
	if count[Index] > 0 && count[Year] > 0 {
		for i := range cells {
			if cells[i].shape == shapeY {
				cells[i].shape = shapeInt
			}
		}
		count[Index] += count[Year]
		count[Year] = 0
	}
	// The column's frequency is the one most of its cells are written in.
	written := NoFrequency
	for f := Day; f <= Index; f++ {
		if count[f] > count[written] || written == NoFrequency && count[f] > 0 {
			written = f
		}
	}
	if written == NoFrequency {
		for i, row := range r.rows {
			if b := trimCell(r.t.cell(int(row), c)); !isMissing(b, r.opt.Missing) {
				why := "is not a period, and no cell of the column is"
				if twoDigitYear(b) {
					why = "has a two-digit year, and so do the other cells of the column"
				}
				r.fail(i, c, string(b), ErrNotDate, fmt.Sprintf("%s %s; write periods as 2024-03-01, 2024-W05, 2024-03, 2024-Q1 or 2024, or choose another period column", quoteCell(string(b)), why))
				break
			}
		}
		return NoFrequency, nil
	}
	example := quoteCell(string(trimCell(r.t.cell(int(r.rows[firstOf[written]]), c))))
	r.decide("column %q holds the periods, written like %s", name, example)
	for i, d := range cells {
		b := trimCell(r.t.cell(int(r.rows[i]), c))
		switch f := freqOfShape(d.shape); {
		case d.shape == shapeNone && isMissing(b, r.opt.Missing):
			r.fail(i, c, string(b), ErrNotDate, "the period is missing; fill it in or delete the row")
		case d.shape == shapeNone && twoDigitYear(b):
			r.fail(i, c, string(b), ErrNotDate, fmt.Sprintf("%s has a two-digit year; write the year with four digits, like the rest of the column, as in %s", quoteCell(string(b)), example))
		case d.shape == shapeNone:
			r.fail(i, c, string(b), ErrNotDate, fmt.Sprintf("%s is not a period; write it like the rest of the column, as in %s, or delete the row if it holds a total or a note", quoteCell(string(b)), example))
		case f != written:
			r.fail(i, c, string(b), ErrFrequency, fmt.Sprintf("%s is a %s, but the column holds %s such as %s; write every period the same way", quoteCell(string(b)), f, written.Plural(), example))
		}
	}
	order := r.dayOrder(c, cells)
	ords := make([]int, len(cells))
	for i, d := range cells {
		if freqOfShape(d.shape) != written {
			continue
		}
		ord, why := ordinalOf(d, order)
		if why != "" {
			b := trimCell(r.t.cell(int(r.rows[i]), c))
			r.fail(i, c, string(b), ErrNotDate, fmt.Sprintf("%s is not a date: %s", quoteCell(string(b)), why))
		}
		ords[i] = ord
	}
	if r.failed() {
		return NoFrequency, nil
	}
	if written == Index && r.opt.Frequency != Index && hinted(name, serialNames) && serialDays(ords) {
		r.decide("column %q holds numbers like %d, read as spreadsheet day numbers (%d is %s); if they are positions, set the frequency to index",
			name, ords[0], ords[0], Period{Day, ords[0] - serialEpoch})
		for i := range ords {
			ords[i] -= serialEpoch
		}
		written = Day
	}
	freq := r.frequency(c, written, ords)
	if times > 0 {
		r.decide("%d dates in column %q carry a time of day; the time is dropped and each row counts for the %s its date falls in", times, name, freq)
	}
	return freq, ords
}

// dayOrder decides whether dates like 01/02/2024 in column c put the day or
// the month first, from all of the column's values or from the option.
func (r *reader) dayOrder(c int, cells []dateCell) DateOrder {
	dayFirst, monthFirst := -1, -1
	ab := -1
	for i, d := range cells {
		if d.shape != shapeAB {
			continue
		}
		if ab < 0 {
			ab = i
		}
		if d.a > 12 && dayFirst < 0 {
			dayFirst = i
		}
		if d.b > 12 && monthFirst < 0 {
			monthFirst = i
		}
	}
	if ab < 0 {
		return r.opt.DateOrder
	}
	name := r.names[c]
	cellText := func(i int) string { return string(trimCell(r.t.cell(int(r.rows[i]), c))) }
	switch r.opt.DateOrder {
	case DayFirst:
		if monthFirst >= 0 {
			r.fail(monthFirst, c, cellText(monthFirst), ErrDateOrder, fmt.Sprintf("%s cannot be day-first, as the date order option says; correct the date or change the option", quoteCell(cellText(monthFirst))))
		}
		r.decide("dates in column %q are read day first (01/02/2024 is 1 February 2024), as the date order option says", name)
		return DayFirst
	case MonthFirst:
		if dayFirst >= 0 {
			r.fail(dayFirst, c, cellText(dayFirst), ErrDateOrder, fmt.Sprintf("%s cannot be month-first, as the date order option says; correct the date or change the option", quoteCell(cellText(dayFirst))))
		}
		r.decide("dates in column %q are read month first (01/02/2024 is 2 January 2024), as the date order option says", name)
		return MonthFirst
	}
	switch {
	case dayFirst >= 0 && monthFirst >= 0:
		late, early := max(dayFirst, monthFirst), min(dayFirst, monthFirst)
		r.fail(late, c, cellText(late), ErrDateOrder, fmt.Sprintf("%s puts the %s first, but line %d (%s) puts the %s first; write every date in one order",
			quoteCell(cellText(late)), firstPart(late == dayFirst), r.lineOf(early), quoteCell(cellText(early)), firstPart(early == dayFirst)))
		return DetectOrder
	case dayFirst >= 0:
		r.decide("dates in column %q are read day first (01/02/2024 is 1 February 2024): line %d has %s", name, r.lineOf(dayFirst), quoteCell(cellText(dayFirst)))
		return DayFirst
	case monthFirst >= 0:
		r.decide("dates in column %q are read month first (01/02/2024 is 2 January 2024): line %d has %s", name, r.lineOf(monthFirst), quoteCell(cellText(monthFirst)))
		return MonthFirst
	}
	r.fail(ab, c, cellText(ab), ErrDateOrder, fmt.Sprintf("%s and every other date in the column could be day-first or month-first; set the date order to day-first or month-first", quoteCell(cellText(ab))))
	return DetectOrder
}

// firstPart names the part written first.
func firstPart(dayFirst bool) string {
	if dayFirst {
		return "day"
	}
	return "month"
}

// ordinalOf returns the ordinal of a date cell in the frequency its shape
// is written in (day numbers for full dates), or why it is not a date.
func ordinalOf(d dateCell, order DateOrder) (int, string) {
	y, a, b := int(d.year), int(d.a), int(d.b)
	switch d.shape {
	case shapeAB:
		if order == MonthFirst {
			a, b = b, a
		}
		// a is now the day, b the month.
		if b > 12 {
			return 0, fmt.Sprintf("there is no month %d", b)
		}
		a, b = b, a
		fallthrough
	case shapeYMD: // a month, b day
		if b > daysIn(y, a) {
			return 0, fmt.Sprintf("%s %d has only %d days", monthLong(a), y, daysIn(y, a))
		}
		return daysFromCivil(y, a, b), ""
	case shapeYW:
		if a > isoWeeksIn(y) {
			return 0, fmt.Sprintf("ISO year %d has 52 weeks, not 53", y)
		}
		return NewWeek(y, a).Ordinal, ""
	case shapeYM, shapeMY, shapeMonY:
		return NewMonth(y, a).Ordinal, ""
	case shapeYQ:
		return NewQuarter(y, a).Ordinal, ""
	case shapeY, shapeInt:
		return y, ""
	}
	return 0, "its shape is not known"
}

// serialEpoch is the spreadsheet day number of 1970-01-01 in the 1900 date
// system (day 1 is 1900-01-01, counting a 29 February 1900 that never was;
// common practice of spreadsheet exports).
const serialEpoch = 25569

// serialNames are column names under which whole numbers are taken for
// spreadsheet day numbers.
var serialNames = []string{"date", "day", "datetime", "timestamp"}

// serialDays reports whether every number lies between 20000 and 80000,
// spreadsheet day numbers for 1954 to 2119.
func serialDays(ords []int) bool {
	for _, n := range ords {
		if n < 20000 || n > 80000 {
			return false
		}
	}
	return len(ords) > 0
}
