package series

// This file holds the proleptic Gregorian calendar arithmetic behind day and
// ISO week periods. Days are counted from 1970-01-01 (day 0), so that a day
// period is one integer and stepping is one addition.
//
// The civil-date conversions follow H. Hinnant, "chrono-Compatible Low-Level
// Date Algorithms" (days_from_civil, civil_from_days), public domain.

// floorDiv returns a/b rounded towards minus infinity (b > 0).
func floorDiv(a, b int) int {
	q := a / b
	if a%b != 0 && a < 0 {
		q--
	}
	return q
}

// floorMod returns a mod b in [0, b) (b > 0).
func floorMod(a, b int) int {
	m := a % b
	if m < 0 {
		m += b
	}
	return m
}

// daysFromCivil returns the day number of year-month-day (month 1..12).
func daysFromCivil(y, m, d int) int {
	if m <= 2 {
		y--
	}
	era := floorDiv(y, 400)
	yoe := y - era*400
	mp := (m + 9) % 12
	doy := (153*mp+2)/5 + d - 1
	doe := yoe*365 + yoe/4 - yoe/100 + doy
	return era*146097 + doe - 719468
}

// civilFromDays returns the calendar date of day number n.
func civilFromDays(n int) (y, m, d int) {
	n += 719468
	era := floorDiv(n, 146097)
	doe := n - era*146097
	yoe := (doe - doe/1460 + doe/36524 - doe/146096) / 365
	y = yoe + era*400
	doy := doe - (365*yoe + yoe/4 - yoe/100)
	mp := (5*doy + 2) / 153
	d = doy - (153*mp+2)/5 + 1
	m = mp + 3
	if m > 12 {
		m -= 12
	}
	if m <= 2 {
		y++
	}
	return y, m, d
}

// isLeap reports whether y is a leap year.
func isLeap(y int) bool {
	return y%4 == 0 && (y%100 != 0 || y%400 == 0)
}

// daysIn returns the number of days in month m of year y.
func daysIn(y, m int) int {
	switch m {
	case 2:
		if isLeap(y) {
			return 29
		}
		return 28
	case 4, 6, 9, 11:
		return 30
	}
	return 31
}

// weekday returns the ISO weekday of day number n: 1 = Monday ... 7 = Sunday.
// Day 0 (1970-01-01) was a Thursday.
func weekday(n int) int {
	return floorMod(n+3, 7) + 1
}

// isoWeekMonday returns the day number of the Monday of ISO week w of
// ISO year y. Week 1 is the week holding 4 January.
func isoWeekMonday(y, w int) int {
	jan4 := daysFromCivil(y, 1, 4)
	return jan4 - (weekday(jan4) - 1) + (w-1)*7
}

// isoWeeksIn returns 53 when ISO year y has a week 53, else 52: the years
// whose 1 January is a Thursday, and leap years whose 1 January is a
// Wednesday (ISO 8601-1:2019, 3.1.1.23).
func isoWeeksIn(y int) int {
	wd := weekday(daysFromCivil(y, 1, 1))
	if wd == 4 || (wd == 3 && isLeap(y)) {
		return 53
	}
	return 52
}

// isoWeekOf returns the ISO year and week of day number n.
func isoWeekOf(n int) (year, week int) {
	thursday := n - (weekday(n) - 1) + 3
	year, _, _ = civilFromDays(thursday)
	week = (thursday-daysFromCivil(year, 1, 1))/7 + 1
	return year, week
}
