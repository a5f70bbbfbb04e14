package series

import "strings"

// Frequency is how often a series has a value: one period per day, ISO 8601
// week, month, quarter or year, or a plain position for series without
// dates. The zero value means "not set".
type Frequency uint8

// Frequencies a [Period] can have.
const (
	NoFrequency Frequency = iota // not set
	Day                          // calendar day
	Week                         // ISO 8601 week, Monday to Sunday
	Month                        // calendar month
	Quarter                      // calendar quarter (Q1 = January to March)
	Year                         // calendar year
	Index                        // plain position 1, 2, 3, ... without a calendar
)

// frequencyNames are the words written in steps and shown to users.
var frequencyNames = [...]string{
	NoFrequency: "",
	Day:         "day",
	Week:        "week",
	Month:       "month",
	Quarter:     "quarter",
	Year:        "year",
	Index:       "index",
}

// String returns the word for f: "day", "week", "month", "quarter", "year"
// or "index"; "" when f is not set.
func (f Frequency) String() string {
	if int(f) < len(frequencyNames) {
		return frequencyNames[f]
	}
	return ""
}

// Plural returns the word for several periods of f: "days", "weeks", ...,
// "positions" for index series.
func (f Frequency) Plural() string {
	switch f {
	case Index:
		return "positions"
	case NoFrequency:
		return "periods"
	}
	if f > Index {
		return "periods"
	}
	return f.String() + "s"
}

// DefaultSeason returns the usual number of periods in one seasonal cycle
// for f (common practice): 12 for months, 4 for quarters, 52 for ISO weeks,
// 7 for days (one week). Years, index series and an unset frequency have no
// default season and return 0.
func (f Frequency) DefaultSeason() int {
	switch f {
	case Month:
		return 12
	case Quarter:
		return 4
	case Week:
		return 52
	case Day:
		return 7
	}
	return 0
}

// ParseFrequency reads a frequency word as written in steps: "day", "week",
// "month", "quarter", "year" or "index", in any case, also as "daily",
// "weekly", "monthly", "quarterly", "yearly", "annual" and the plural forms.
// The second result is false for any other text.
func ParseFrequency(word string) (Frequency, bool) {
	switch strings.ToLower(strings.TrimSpace(word)) {
	case "day", "days", "daily":
		return Day, true
	case "week", "weeks", "weekly":
		return Week, true
	case "month", "months", "monthly":
		return Month, true
	case "quarter", "quarters", "quarterly":
		return Quarter, true
	case "year", "years", "yearly", "annual", "annually":
		return Year, true
	case "index", "position", "positions":
		return Index, true
	}
	return NoFrequency, false
}
