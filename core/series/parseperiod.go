package series

import (
	"errors"
	"fmt"
	"strings"
)

// ErrNotPeriod is the cause of every error returned by [ParsePeriod].
var ErrNotPeriod = errors.New("not a period")

// PeriodError reports text that [ParsePeriod] cannot read as a period.
type PeriodError struct {
	Text string // the text as given
	Why  string // what is wrong and how to write it, in plain words
}

// Error returns one sentence quoting the text, what is wrong and the fix.
func (e *PeriodError) Error() string {
	return fmt.Sprintf("%q is not a period: %s", e.Text, e.Why)
}

// Unwrap returns [ErrNotPeriod].
func (e *PeriodError) Unwrap() error { return ErrNotPeriod }

// ParsePeriod reads a period label as users type it in steps and infers the
// frequency from its shape:
//
//	2024-03-01       day
//	2024-W05         ISO 8601 week (2024W05 too); week 53 only in years that have one
//	2024-03          month (also 03/2024, Mar 2024, March 2024)
//	2024-Q1          quarter (also 2024Q1, Q1 2024)
//	2024             year (four digits)
//	17               index position (a whole number that is not four digits)
//
// Leading and trailing spaces are ignored; letters may be in any case.
// Dates written as 01/02/2024 are refused because the day/month order is
// not known; the error asks for the 2024-02-01 form. Errors wrap
// [ErrNotPeriod].
func ParsePeriod(text string) (Period, error) {
	b := []byte(strings.TrimSpace(text))
	d := scanDate(b)
	c := struct{ year, a, b int }{int(d.year), int(d.a), int(d.b)}
	switch d.shape {
	case shapeYMD:
		if d.hasTime {
			return Period{}, &PeriodError{text, "a period has no time of day; write the day alone, as in 2024-03-01"}
		}
		if c.b > daysIn(c.year, c.a) {
			return Period{}, &PeriodError{text, fmt.Sprintf("%s %d has only %d days", monthLong(c.a), c.year, daysIn(c.year, c.a))}
		}
		return Period{Day, daysFromCivil(c.year, c.a, c.b)}, nil
	case shapeYW:
		if c.a > isoWeeksIn(c.year) {
			return Period{}, &PeriodError{text, fmt.Sprintf("ISO year %d has 52 weeks, not 53", c.year)}
		}
		return NewWeek(c.year, c.a), nil
	case shapeYM, shapeMY, shapeMonY:
		return NewMonth(c.year, c.a), nil
	case shapeYQ:
		return NewQuarter(c.year, c.a), nil
	case shapeY:
		return NewYear(c.year), nil
	case shapeInt:
		if c.year < 1 {
			return Period{}, &PeriodError{text, "positions count from 1"}
		}
		return NewIndex(c.year), nil
	case shapeAB:
		return Period{}, &PeriodError{text, "the order of day and month is not clear; write the date as year-month-day, as in 2024-03-01"}
	}
	return Period{}, &PeriodError{text, periodHint(b)}
}

// periodHint explains what might be wrong with text that has no period
// shape.
func periodHint(b []byte) string {
	const forms = "write 2024-03-01 (day), 2024-W05 (week), 2024-03 (month), 2024-Q1 (quarter), 2024 (year) or 17 (position)"
	s := string(b)
	switch {
	case s == "":
		return "it is empty; " + forms
	case len(s) == 7 && s[4] == '-' && s[5] >= '0' && s[5] <= '9':
		return "the month must be 01 to 12; " + forms
	case len(s) >= 6 && (strings.Contains(strings.ToUpper(s), "Q")):
		return "a quarter is Q1 to Q4 after a four-digit year, as in 2024-Q1"
	case len(s) >= 6 && (strings.Contains(strings.ToUpper(s), "W")):
		return "a week is W01 to W53 after a four-digit year, as in 2024-W05"
	}
	return forms
}

// monthLong returns the English name of month m (1..12).
func monthLong(m int) string {
	names := [...]string{"January", "February", "March", "April", "May", "June",
		"July", "August", "September", "October", "November", "December"}
	if m < 1 || m > 12 {
		return "month"
	}
	return names[m-1]
}
