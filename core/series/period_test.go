package series

import (
	"errors"
	"testing"
)

func TestPeriodString(t *testing.T) {
	t.Parallel()
	tests := []struct {
		name string
		p    Period
		want string
	}{
		{"day", NewDay(2024, 3, 1), "2024-03-01"},
		{"day before 1970", NewDay(1871, 12, 31), "1871-12-31"},
		{"leap day", NewDay(2024, 2, 29), "2024-02-29"},
		{"day normalised", NewDay(2023, 2, 29), "2023-03-01"},
		{"week", NewWeek(2024, 5), "2024-W05"},
		{"week 53 of 2020", NewWeek(2020, 53), "2020-W53"},                 // 2020-01-01 was a Wednesday in a leap year (ISO 8601 rule, common practice)
		{"week 1 of 2021 starts 2021-01-04", NewWeek(2021, 1), "2021-W01"}, // hand calculation: 4 January 2021 was a Monday
		{"week 53 of 2021 is week 1 of 2022", NewWeek(2021, 53), "2022-W01"},
		{"month", NewMonth(2024, 3), "2024-03"},
		{"month carries", NewMonth(2024, 13), "2025-01"},
		{"quarter", NewQuarter(2024, 1), "2024-Q1"},
		{"quarter carries", NewQuarter(2024, 0), "2023-Q4"},
		{"year", NewYear(1871), "1871"},
		{"small year", NewYear(800), "0800"},
		{"index", NewIndex(17), "17"},
		{"zero", Period{}, ""},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			if got := tt.p.String(); got != tt.want {
				t.Errorf("%#v.String() = %q, want %q", tt.p, got, tt.want)
			}
		})
	}
}

func TestPeriodArithmetic(t *testing.T) {
	t.Parallel()
	tests := []struct {
		name  string
		start string
		k     int
		want  string
	}{
		{"month forward across a year", "2024-11", 3, "2025-02"},
		{"month backward", "2024-01", -1, "2023-12"},
		{"quarter", "2024-Q4", 1, "2025-Q1"},
		{"week across week 53", "2020-W52", 2, "2021-W01"},
		{"week back into week 53", "2021-W01", -1, "2020-W53"},
		{"day across a leap day", "2024-02-28", 2, "2024-03-01"},
		{"day across a century without leap day", "1900-02-28", 1, "1900-03-01"},
		{"year", "1871", 99, "1970"},
		{"index", "1", 23, "24"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			p, err := ParsePeriod(tt.start)
			if err != nil {
				t.Fatal(err)
			}
			q := p.Add(tt.k)
			if q.String() != tt.want {
				t.Errorf("%s + %d = %s, want %s", tt.start, tt.k, q, tt.want)
			}
			if d := q.Sub(p); d != tt.k {
				t.Errorf("(%s).Sub(%s) = %d, want %d", q, p, d, tt.k)
			}
		})
	}
}

// parsePeriodTests pair period labels with what ParsePeriod must return.
var parsePeriodTests = []struct {
	name string
	text string
	freq Frequency
	want string // canonical label; "" when an error is expected
	msg  string // expected error message
}{
	{"day", "2024-03-01", Day, "2024-03-01", ""},
	{"day with slashes", "2024/03/01", Day, "2024-03-01", ""},
	{"week", "2024-W05", Week, "2024-W05", ""},
	{"week without dash", "2024W05", Week, "2024-W05", ""},
	{"week lower case", "2024-w05", Week, "2024-W05", ""},
	{"week 53 where the year has one", "2015-W53", Week, "2015-W53", ""}, // 2015-01-01 was a Thursday (common practice)
	{"month", "2024-03", Month, "2024-03", ""},
	{"month first", "03/2024", Month, "2024-03", ""},
	{"month name", "Mar 2024", Month, "2024-03", ""},
	{"long month name", "March 2024", Month, "2024-03", ""},
	{"quarter", "2024-Q1", Quarter, "2024-Q1", ""},
	{"quarter without dash", "2024Q1", Quarter, "2024-Q1", ""},
	{"quarter first", "Q1 2024", Quarter, "2024-Q1", ""},
	{"year", "2024", Year, "2024", ""},
	{"index", "17", Index, "17", ""},
	{"spaces around", "  2024-03 ", Month, "2024-03", ""},
	{"week 53 where the year has none", "2021-W53", 0, "", `"2021-W53" is not a period: ISO year 2021 has 52 weeks, not 53`},
	{"day that does not exist", "2023-02-29", 0, "", `"2023-02-29" is not a period: February 2023 has only 28 days`},
	{"month 13", "2024-13", 0, "", `"2024-13" is not a period: the month must be 01 to 12; write 2024-03-01 (day), 2024-W05 (week), 2024-03 (month), 2024-Q1 (quarter), 2024 (year) or 17 (position)`},
	{"quarter 5", "2024-Q5", 0, "", `"2024-Q5" is not a period: a quarter is Q1 to Q4 after a four-digit year, as in 2024-Q1`},
	{"order unclear", "01/02/2024", 0, "", `"01/02/2024" is not a period: the order of day and month is not clear; write the date as year-month-day, as in 2024-03-01`},
	{"time of day", "2024-03-01 10:00", 0, "", `"2024-03-01 10:00" is not a period: a period has no time of day; write the day alone, as in 2024-03-01`},
	{"position zero", "0", 0, "", `"0" is not a period: positions count from 1`},
	{"empty", "", 0, "", `"" is not a period: it is empty; write 2024-03-01 (day), 2024-W05 (week), 2024-03 (month), 2024-Q1 (quarter), 2024 (year) or 17 (position)`},
	{"words", "next month", 0, "", `"next month" is not a period: write 2024-03-01 (day), 2024-W05 (week), 2024-03 (month), 2024-Q1 (quarter), 2024 (year) or 17 (position)`},
}

func TestParsePeriod(t *testing.T) {
	t.Parallel()
	for _, tt := range parsePeriodTests {
		t.Run(tt.name, func(t *testing.T) {
			p, err := ParsePeriod(tt.text)
			if tt.want == "" {
				if err == nil {
					t.Fatalf("ParsePeriod(%q) = %s, want an error", tt.text, p)
				}
				if !errors.Is(err, ErrNotPeriod) {
					t.Errorf("error %v does not wrap ErrNotPeriod", err)
				}
				if err.Error() != tt.msg {
					t.Errorf("ParsePeriod(%q) error\n got %s\nwant %s", tt.text, err, tt.msg)
				}
				return
			}
			if err != nil {
				t.Fatalf("ParsePeriod(%q): %v", tt.text, err)
			}
			if p.Freq != tt.freq || p.String() != tt.want {
				t.Errorf("ParsePeriod(%q) = %s %s, want %s %s", tt.text, p.Freq, p, tt.freq, tt.want)
			}
		})
	}
}

// TestWeeksInYear checks the years with an ISO week 53 from 2000 to 2030
// (common practice; the list follows the ISO 8601 rule: years whose
// 1 January is a Thursday, or a Wednesday in a leap year).
func TestWeeksInYear(t *testing.T) {
	t.Parallel()
	long := map[int]bool{2004: true, 2009: true, 2015: true, 2020: true, 2026: true}
	for y := 2000; y <= 2030; y++ {
		want := 52
		if long[y] {
			want = 53
		}
		if got := isoWeeksIn(y); got != want {
			t.Errorf("isoWeeksIn(%d) = %d, want %d", y, got, want)
		}
	}
}

func TestPeriodDate(t *testing.T) {
	t.Parallel()
	tests := []struct {
		name  string
		label string
		want  string
	}{
		{"week starts on Monday", "2024-W01", "2024-01-01"}, // hand calculation: 1 January 2024 was a Monday
		{"week 1 in the previous year", "2020-W01", "2019-12-30"},
		{"quarter", "2024-Q3", "2024-07-01"},
		{"month", "1996-02", "1996-02-01"},
		{"year", "1871", "1871-01-01"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			p, err := ParsePeriod(tt.label)
			if err != nil {
				t.Fatal(err)
			}
			d, ok := p.Date()
			if !ok || d.Format("2006-01-02") != tt.want {
				t.Errorf("(%s).Date() = %s %v, want %s", p, d.Format("2006-01-02"), ok, tt.want)
			}
		})
	}
	if _, ok := NewIndex(3).Date(); ok {
		t.Error("an index period has a date")
	}
}

func TestDefaultSeason(t *testing.T) {
	t.Parallel()
	// Common practice: 12 months, 4 quarters, 52 weeks, 7 days per cycle.
	want := map[Frequency]int{Day: 7, Week: 52, Month: 12, Quarter: 4, Year: 0, Index: 0, NoFrequency: 0}
	for f, m := range want {
		if got := f.DefaultSeason(); got != m {
			t.Errorf("%q.DefaultSeason() = %d, want %d", f, got, m)
		}
	}
	for _, word := range []string{"monthly", "Month", "quarters", "annual", "index", "weekly", "day"} {
		if _, ok := ParseFrequency(word); !ok {
			t.Errorf("ParseFrequency(%q) failed", word)
		}
	}
	if _, ok := ParseFrequency("fortnight"); ok {
		t.Error(`ParseFrequency("fortnight") succeeded`)
	}
}

// TestCalendarRoundTrip converts every day from 1600 to 2400 to a date
// and back, and checks ISO weeks against the standard library.
func TestCalendarRoundTrip(t *testing.T) {
	t.Parallel()
	start, end := daysFromCivil(1600, 1, 1), daysFromCivil(2400, 12, 31)
	for n := start; n <= end; n += 1 {
		y, m, d := civilFromDays(n)
		if daysFromCivil(y, m, d) != n {
			t.Fatalf("day %d -> %d-%d-%d does not come back", n, y, m, d)
		}
		if n%97 == 0 {
			p := Period{Day, n}
			date, _ := p.Date()
			iy, iw := date.ISOWeek()
			wy, ww := isoWeekOf(n)
			if iy != wy || iw != ww {
				t.Fatalf("%s: ISO week %d-%d, standard library says %d-%d", p, wy, ww, iy, iw)
			}
			back, err := ParsePeriod(p.String())
			if err != nil || back != p {
				t.Fatalf("%s does not parse back: %v %v", p, back, err)
			}
		}
	}
}

func FuzzParsePeriod(f *testing.F) {
	for _, tt := range parsePeriodTests {
		f.Add(tt.text)
	}
	f.Fuzz(func(t *testing.T, text string) {
		p, err := ParsePeriod(text)
		if err != nil {
			if !errors.Is(err, ErrNotPeriod) {
				t.Fatalf("error %v does not wrap ErrNotPeriod", err)
			}
			return
		}
		back, err := ParsePeriod(p.String())
		if err != nil || back != p {
			t.Fatalf("ParsePeriod(%q) = %s, which reads back as %v (%v)", text, p, back, err)
		}
	})
}
