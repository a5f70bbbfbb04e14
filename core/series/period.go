package series

import (
	"fmt"
	"strconv"
	"time"
)

// Period is one period of a regular series: its frequency and an ordinal
// number that counts periods of that frequency, so that stepping is one
// addition. Periods of the same frequency compare with == and order by
// Ordinal.
//
// Ordinals count from fixed origins: days from 1970-01-01 (day 0), ISO weeks
// from the week of 1970-01-01 (week 0 starts Monday 1969-12-29), months and
// quarters from January of year 0 (ordinal = 12*year + month - 1,
// 4*year + quarter - 1), years as the year itself, and index positions as
// the 1-based position itself. The zero Period has no frequency and means
// "not set".
type Period struct {
	Freq    Frequency // how often the series has a value
	Ordinal int       // number of the period within its frequency (see above)
}

// NewDay returns the day period of year-month-day. Out-of-range months and
// days are normalised as time.Date does (month 13 is January next year).
func NewDay(year, month, day int) Period {
	t := time.Date(year, time.Month(month), day, 0, 0, 0, 0, time.UTC)
	return Period{Day, daysFromCivil(t.Year(), int(t.Month()), t.Day())}
}

// NewWeek returns ISO 8601 week w (1-based) of ISO year y. Week numbers
// beyond the year's last week continue into the next year.
func NewWeek(year, week int) Period {
	return weekOfMonday(isoWeekMonday(year, week))
}

// NewMonth returns month m (1 = January) of year y; m outside 1..12 carries
// into other years.
func NewMonth(year, month int) Period {
	return Period{Month, 12*year + month - 1}
}

// NewQuarter returns quarter q (1..4) of year y; q outside 1..4 carries into
// other years.
func NewQuarter(year, quarter int) Period {
	return Period{Quarter, 4*year + quarter - 1}
}

// NewYear returns the year period y.
func NewYear(year int) Period {
	return Period{Year, year}
}

// NewIndex returns position n (1-based) of a series without dates.
func NewIndex(n int) Period {
	return Period{Index, n}
}

// weekOfMonday returns the week period starting on the Monday with day
// number monday.
func weekOfMonday(monday int) Period {
	return Period{Week, floorDiv(monday+3, 7)}
}

// IsZero reports whether p is the zero Period (no frequency set).
func (p Period) IsZero() bool { return p.Freq == NoFrequency }

// Add returns the period k periods after p (before it when k < 0).
func (p Period) Add(k int) Period {
	return Period{p.Freq, p.Ordinal + k}
}

// Sub returns the number of periods from q to p: p = q.Add(p.Sub(q)).
// Sub panics when p and q have different frequencies, a rule of the
// caller's that no input can break: compare frequencies first.
func (p Period) Sub(q Period) int {
	if p.Freq != q.Freq {
		panic("series: Period.Sub of periods with different frequencies")
	}
	return p.Ordinal - q.Ordinal
}

// Before reports whether p comes before q; periods of different frequencies
// order by frequency.
func (p Period) Before(q Period) bool {
	if p.Freq != q.Freq {
		return p.Freq < q.Freq
	}
	return p.Ordinal < q.Ordinal
}

// Date returns the first day of p in UTC. The second result is false for
// index periods and the zero Period, which have no calendar date.
func (p Period) Date() (time.Time, bool) {
	var y, m, d int
	switch p.Freq {
	case Day:
		y, m, d = civilFromDays(p.Ordinal)
	case Week:
		y, m, d = civilFromDays(p.Ordinal*7 - 3)
	case Month:
		y, m, d = floorDiv(p.Ordinal, 12), floorMod(p.Ordinal, 12)+1, 1
	case Quarter:
		y, m, d = floorDiv(p.Ordinal, 4), 3*floorMod(p.Ordinal, 4)+1, 1
	case Year:
		y, m, d = p.Ordinal, 1, 1
	default:
		return time.Time{}, false
	}
	return time.Date(y, time.Month(m), d, 0, 0, 0, 0, time.UTC), true
}

// Year returns the calendar year of p (the ISO year for weeks); 0 for index
// periods and the zero Period.
func (p Period) Year() int {
	switch p.Freq {
	case Day:
		y, _, _ := civilFromDays(p.Ordinal)
		return y
	case Week:
		y, _ := isoWeekOf(p.Ordinal*7 - 3)
		return y
	case Month:
		return floorDiv(p.Ordinal, 12)
	case Quarter:
		return floorDiv(p.Ordinal, 4)
	case Year:
		return p.Ordinal
	}
	return 0
}

// String returns the canonical label of p, the form [ParsePeriod] reads:
// "2024-03-01" (day), "2024-W05" (ISO week), "2024-03" (month), "2024-Q1"
// (quarter), "2024" (year), "17" (index position). The zero Period gives "".
func (p Period) String() string {
	return string(p.AppendText(nil))
}

// AppendText appends the canonical label of p (see [Period.String]) to b.
func (p Period) AppendText(b []byte) []byte {
	switch p.Freq {
	case Day:
		y, m, d := civilFromDays(p.Ordinal)
		b = appendYear(b, y)
		b = append(b, '-')
		b = append2(b, m)
		b = append(b, '-')
		return append2(b, d)
	case Week:
		y, w := isoWeekOf(p.Ordinal*7 - 3)
		b = appendYear(b, y)
		b = append(b, '-', 'W')
		return append2(b, w)
	case Month:
		b = appendYear(b, floorDiv(p.Ordinal, 12))
		b = append(b, '-')
		return append2(b, floorMod(p.Ordinal, 12)+1)
	case Quarter:
		b = appendYear(b, floorDiv(p.Ordinal, 4))
		return append(b, '-', 'Q', byte('1'+floorMod(p.Ordinal, 4)))
	case Year:
		return appendYear(b, p.Ordinal)
	case Index:
		return strconv.AppendInt(b, int64(p.Ordinal), 10)
	}
	return b
}

// GoString shows p for debugging and test failures.
func (p Period) GoString() string {
	return fmt.Sprintf("series.Period{%s %s}", p.Freq, p)
}

// appendYear appends y with at least four digits.
func appendYear(b []byte, y int) []byte {
	if y >= 0 && y < 1000 {
		b = append(b, '0')
		if y < 100 {
			b = append(b, '0')
		}
		if y < 10 {
			b = append(b, '0')
		}
	}
	return strconv.AppendInt(b, int64(y), 10)
}

// append2 appends n (0..99) with two digits.
func append2(b []byte, n int) []byte {
	return append(b, byte('0'+n/10), byte('0'+n%10))
}
