package series

import "fmt"

// This file decides the frequency of a period column: as the option says,
// or inferred from the dates (full dates that all fall on the same day of
// the month are monthly, quarterly or yearly; on the same weekday, weekly).

// coarser reports whether periods of frequency from can be mapped into
// periods of frequency to: each day lies in one week, month, quarter and
// year; each month in one quarter and year; each quarter in one year.
func coarser(from, to Frequency) bool {
	switch from {
	case Day:
		return to == Week || to == Month || to == Quarter || to == Year
	case Month:
		return to == Quarter || to == Year
	case Quarter:
		return to == Year
	}
	return false
}

// convert maps ordinal n of frequency from into frequency to (see coarser).
func convert(n int, from, to Frequency) int {
	if from == Day {
		if to == Week {
			return weekOfMonday(n - (weekday(n) - 1)).Ordinal
		}
		y, m, _ := civilFromDays(n)
		n, from = 12*y+m-1, Month
	}
	if from == Month {
		if to == Month {
			return n
		}
		n, from = floorDiv(n, 3), Quarter
	}
	if to == Quarter {
		return n
	}
	return floorDiv(n, 4)
}

// frequency returns the frequency of column c, written in frequency
// written, and rewrites ords into it.
func (r *reader) frequency(c int, written Frequency, ords []int) Frequency {
	name := r.names[c]
	if want := r.opt.Frequency; want != NoFrequency {
		if want == written || want == Index && written == Year {
			r.decide("the periods are %s, as the frequency option says", want.Plural())
			return want
		}
		if !coarser(written, want) {
			r.fail(-1, c, "", ErrOption, fmt.Sprintf("it holds %s, which cannot be read as %s; set the frequency to %s or leave it to be found",
				written.Plural(), want.Plural(), written))
			return NoFrequency
		}
		example := Period{written, ords[0]}
		for i, n := range ords {
			ords[i] = convert(n, written, want)
		}
		r.decide("each row counts for the %s its period falls in, as the frequency option says (%s counts for %s)",
			want, example, Period{want, ords[0]})
		return want
	}
	switch written {
	case Day:
		return r.inferFromDays(name, ords)
	case Month:
		return r.inferFromMonths(name, ords, "")
	}
	return written
}

// inferFromDays finds the frequency of full dates.
func (r *reader) inferFromDays(name string, days []int) Frequency {
	sameDay, monthEnds, sameWeekday, distinct := true, true, true, false
	_, _, d0 := civilFromDays(days[0])
	w0 := weekday(days[0])
	for _, n := range days {
		if n != days[0] {
			distinct = true
		}
		y, m, d := civilFromDays(n)
		if d != d0 {
			sameDay = false
		}
		if d != daysIn(y, m) {
			monthEnds = false
		}
		if weekday(n) != w0 {
			sameWeekday = false
		}
	}
	if !distinct {
		r.decide("column %q holds a single date; it is read as a day", name)
		return Day
	}
	if sameDay || monthEnds {
		which := fmt.Sprintf("day %d of their month", d0)
		if monthEnds && !sameDay {
			which = "the last day of their month"
		} else if d0 == 1 {
			which = "the first day of their month"
		}
		for i, n := range days {
			y, m, _ := civilFromDays(n)
			days[i] = 12*y + m - 1
		}
		return r.inferFromMonths(name, days, "all dates fall on "+which)
	}
	if sameWeekday {
		for i, n := range days {
			days[i] = convert(n, Day, Week)
		}
		r.decide("all dates in column %q fall on a %s: they are read as ISO weeks (Monday to Sunday), each date counting for its week", name, weekdayName(w0))
		return Week
	}
	r.decide("the dates in column %q are read as days", name)
	return Day
}

// inferFromMonths finds the frequency of month ordinals: months that are
// all the same month of their quarter are quarters, all the same month of
// the year are years. why explains how the months were found ("" when the
// column is written as months).
func (r *reader) inferFromMonths(name string, months []int, why string) Frequency {
	m0 := floorMod(months[0], 12)
	sameMonth, sameInQuarter, distinct := true, true, false
	for _, m := range months {
		if m != months[0] {
			distinct = true
		}
		if floorMod(m, 12) != m0 {
			sameMonth = false
		}
		if floorMod(m, 3) != floorMod(months[0], 3) {
			sameInQuarter = false
		}
	}
	if why != "" {
		why += " and "
	}
	switch {
	case distinct && sameMonth:
		for i, m := range months {
			months[i] = floorDiv(m, 12)
		}
		r.decide("in column %q %severy period is %s: read as years", name, why, monthLong(m0+1))
		return Year
	case distinct && sameInQuarter:
		for i, m := range months {
			months[i] = floorDiv(m, 3)
		}
		r.decide("in column %q %severy period is month %d of its quarter: read as quarters", name, why, floorMod(m0, 3)+1)
		return Quarter
	}
	if why != "" {
		r.decide("in column %q %s: read as months", name, why[:len(why)-len(" and ")])
	}
	return Month
}

// weekdayName returns the English name of ISO weekday w (1 = Monday).
func weekdayName(w int) string {
	names := [...]string{"Monday", "Tuesday", "Wednesday", "Thursday", "Friday", "Saturday", "Sunday"}
	return names[(w+6)%7]
}
