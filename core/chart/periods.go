package chart

import "strconv"

// This file chooses which period labels the period axis shows.

// tick is one labelled position on the period axis.
type tick struct {
	pos   int
	label string
}

// stamp is a period label read as calendar parts.
type stamp struct {
	year int
	sub  int // quarter, month, ISO week or day of year, counted from 1
}

// inferFrequency reads the frequency from the shape of the first non-empty
// label; every other non-empty label must have the same shape.
func inferFrequency(labels []string) Frequency {
	f := Unlabelled
	for _, l := range labels {
		if l == "" {
			continue
		}
		g := shapeOf(l)
		if f == Unlabelled {
			f = g
		}
		if g != f || g == Unlabelled {
			return Unlabelled
		}
	}
	return f
}

func shapeOf(l string) Frequency {
	digits := func(s string) bool {
		for i := 0; i < len(s); i++ {
			if s[i] < '0' || s[i] > '9' {
				return false
			}
		}
		return len(s) > 0
	}
	if len(l) < 4 || !digits(l[:4]) {
		return Unlabelled
	}
	switch {
	case len(l) == 4:
		return Yearly
	case len(l) == 7 && l[4] == '-' && l[5] == 'Q' && l[6] >= '1' && l[6] <= '4':
		return Quarterly
	case len(l) == 7 && l[4] == '-' && digits(l[5:]):
		return Monthly
	case len(l) == 8 && l[4] == '-' && l[5] == 'W' && digits(l[6:]):
		return Weekly
	case len(l) == 10 && l[4] == '-' && l[7] == '-' && digits(l[5:7]) && digits(l[8:]):
		return Daily
	}
	return Unlabelled
}

// parseStamp reads a label of frequency f; ok is false when it does not fit.
func parseStamp(l string, f Frequency) (stamp, bool) {
	if shapeOf(l) != f {
		return stamp{}, false
	}
	year, _ := strconv.Atoi(l[:4])
	var sub int
	switch f {
	case Yearly:
		sub = 1
	case Quarterly:
		sub = int(l[6] - '0')
	case Monthly:
		sub, _ = strconv.Atoi(l[5:])
	case Weekly:
		sub, _ = strconv.Atoi(l[6:])
	case Daily:
		m, _ := strconv.Atoi(l[5:7])
		d, _ := strconv.Atoi(l[8:])
		if m == 1 && d == 1 {
			sub = 1
		} else {
			sub = m*100 + d // only "is it 1 January" and the month matter
		}
	}
	return stamp{year: year, sub: sub}, true
}

// perYear is the number of periods in a year at frequency f.
func perYear(f Frequency) int {
	switch f {
	case Quarterly:
		return 4
	case Monthly:
		return 12
	case Weekly:
		return 52
	case Daily:
		return 365
	}
	return 1
}

// yearSteps are the year spacings tried, smallest first.
var yearSteps = [...]int{1, 2, 5, 10, 20, 25, 50, 100, 200, 500, 1000}

// periodTicks chooses at most maxTicks labelled positions (at least 2 are
// allowed) among labels. Over three years or more it marks the first period
// of each year (or of every 2nd, 5th, … year) and shows the year; monthly
// data over a shorter span get every month, 2nd, 3rd or 6th month from
// January, weekly data every 1, 2, 4, 13 or 26 weeks from week 1, daily
// data the first of every 1, 2, 3 or 6 months; anything else is thinned
// evenly.
func periodTicks(labels []string, f Frequency, maxTicks int) []tick {
	maxTicks = max(maxTicks, 2)
	if f == Inferred {
		f = inferFrequency(labels)
	}
	if f != Unlabelled && f != Yearly && len(labels) >= 3*perYear(f) {
		if t := yearTicks(labels, f, maxTicks); len(t) >= 2 {
			return t
		}
	}
	if f == Yearly {
		if t := yearTicks(labels, f, maxTicks); len(t) >= 2 {
			return t
		}
	}
	switch f {
	case Monthly:
		if t := monthTicks(labels, maxTicks); len(t) >= 2 {
			return t
		}
	case Weekly:
		if t := weekTicks(labels, maxTicks); len(t) >= 2 {
			return t
		}
	case Daily:
		if t := dayTicks(labels, maxTicks); len(t) >= 2 {
			return t
		}
	}
	return evenTicks(labels, maxTicks)
}

// yearTicks marks the first period of every k-th year, labelled by the year.
func yearTicks(labels []string, f Frequency, maxTicks int) []tick {
	type start struct{ pos, year int }
	var starts []start
	for i, l := range labels {
		s, ok := parseStamp(l, f)
		if ok && s.sub == 1 {
			starts = append(starts, start{i, s.year})
		}
	}
	for _, k := range yearSteps {
		n := 0
		for _, s := range starts {
			if s.year%k == 0 {
				n++
			}
		}
		if n <= maxTicks {
			out := make([]tick, 0, n)
			for _, s := range starts {
				if s.year%k == 0 {
					out = append(out, tick{s.pos, strconv.Itoa(s.year)})
				}
			}
			return out
		}
	}
	return nil
}

// monthTicks marks every k-th month (k of 1, 2, 3 or 6) counted from January.
func monthTicks(labels []string, maxTicks int) []tick {
	for _, k := range [...]int{1, 2, 3, 6} {
		var out []tick
		for i, l := range labels {
			s, ok := parseStamp(l, Monthly)
			if ok && (s.sub-1)%k == 0 {
				out = append(out, tick{i, l})
			}
		}
		if len(out) <= maxTicks {
			return out
		}
	}
	return nil
}

// weekTicks marks every k-th week (k of 1, 2, 4, 13 or 26) counted from
// week 1, labelled in full.
func weekTicks(labels []string, maxTicks int) []tick {
	for _, k := range [...]int{1, 2, 4, 13, 26} {
		var out []tick
		for i, l := range labels {
			s, ok := parseStamp(l, Weekly)
			if ok && (s.sub-1)%k == 0 {
				out = append(out, tick{i, l})
			}
		}
		if len(out) <= maxTicks {
			return out
		}
	}
	return nil
}

// dayTicks marks the first day of every k-th month (k of 1, 2, 3 or 6),
// labelled by the month ("2024-03").
func dayTicks(labels []string, maxTicks int) []tick {
	for _, k := range [...]int{1, 2, 3, 6} {
		var out []tick
		for i, l := range labels {
			if shapeOf(l) != Daily || l[8:] != "01" {
				continue
			}
			month, _ := strconv.Atoi(l[5:7])
			if (month-1)%k == 0 {
				out = append(out, tick{i, l[:7]})
			}
		}
		if len(out) <= maxTicks {
			return out
		}
	}
	return nil
}

// evenTicks shows every k-th label from the first, k of 1, 2, 5, 10, ….
func evenTicks(labels []string, maxTicks int) []tick {
	n := len(labels)
	k := 1
	for mult := 1; ; mult *= 10 {
		found := false
		for _, base := range [...]int{1, 2, 5} {
			k = base * mult
			if (n+k-1)/k <= maxTicks {
				found = true
				break
			}
		}
		if found || mult > n {
			break
		}
	}
	out := make([]tick, 0, (n+k-1)/k)
	for i := 0; i < n; i += k {
		out = append(out, tick{i, labels[i]})
	}
	return out
}
