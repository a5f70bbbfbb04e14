package series

import (
	"fmt"
	"math"
)

// Profile summarises one series for the preview and the memo. Counts are
// numbers of periods; Min, Max and Mean are over the values present and
// NaN when there is none.
type Profile struct {
	Name       string    // the series name
	Count      int       // periods from First to Last, missing ones included
	Present    int       // periods with a value
	Missing    int       // periods without a value (NaN)
	Gaps       int       // runs of consecutive missing periods
	Duplicates int       // periods that had more than one row in the file (from the dataset's problems and changes)
	First      Period    // the first period
	Last       Period    // the last period
	Frequency  Frequency // day, week, month, quarter, year or index
	Season     int       // periods per seasonal cycle; 0 or 1 = none
	Min        float64   // smallest value
	Max        float64   // largest value
	Mean       float64   // arithmetic mean of the values present
	Zeros      int       // values equal to zero
	Negatives  int       // values below zero
}

// ProfileOf summarises s. Duplicates is 0: only the dataset knows them
// (see [Dataset.ProfileOf]).
func ProfileOf(s *Series) Profile {
	p := Profile{Name: s.Name, Count: s.Len(), First: s.Start, Last: s.End(), Frequency: s.Start.Freq, Season: s.Season,
		Min: math.NaN(), Max: math.NaN(), Mean: math.NaN()}
	sum := 0.0
	inGap := false
	for _, v := range s.Values {
		if math.IsNaN(v) {
			p.Missing++
			if !inGap {
				p.Gaps++
			}
			inGap = true
			continue
		}
		inGap = false
		p.Present++
		sum += v
		if p.Present == 1 || v < p.Min {
			p.Min = v
		}
		if p.Present == 1 || v > p.Max {
			p.Max = v
		}
		if v == 0 {
			p.Zeros++
		} else if v < 0 {
			p.Negatives++
		}
	}
	if p.Present > 0 {
		p.Mean = sum / float64(p.Present)
	}
	return p
}

// ProfileOf summarises Series[i], counting its duplicate periods from the
// problems found and the changes made while reading.
func (d *Dataset) ProfileOf(i int) Profile {
	s := d.Series[i]
	p := ProfileOf(s)
	for _, pr := range d.Problems {
		if pr.Series == s.Name && pr.Err == ErrDuplicate {
			p.Duplicates += max(pr.Count, 1)
		}
	}
	for _, c := range d.Changes {
		if c.Series == s.Name && len(c.Lines) > 1 {
			p.Duplicates++
		}
	}
	return p
}

// Sentences describes the profile in plain words, one sentence each, for
// the preview and the memo.
func (p Profile) Sentences() []string {
	if p.Count == 0 {
		return []string{fmt.Sprintf("Series %q holds no values.", p.Name)}
	}
	one := p.Frequency.String()
	if p.Frequency == Index {
		one = "position"
	}
	out := []string{fmt.Sprintf("Series %q has %d %s from %s to %s.", p.Name, p.Count, plural(p.Count, one, p.Frequency.Plural()), p.First, p.Last)}
	if p.Season > 1 {
		out = append(out, fmt.Sprintf("A seasonal cycle is taken to last %d %s.", p.Season, p.Frequency.Plural()))
	} else {
		out = append(out, "No seasonal cycle is assumed.")
	}
	switch {
	case p.Missing == 0:
		out = append(out, "No value is missing.")
	default:
		out = append(out, fmt.Sprintf("%d %s missing, in %d %s.", p.Missing, plural(p.Missing, "value is", "values are"), p.Gaps, plural(p.Gaps, "gap", "gaps")))
	}
	if p.Duplicates > 0 {
		out = append(out, fmt.Sprintf("%d %s more than one row in the file.", p.Duplicates, plural(p.Duplicates, "period had", "periods had")))
	}
	if p.Present > 0 {
		out = append(out, fmt.Sprintf("Values run from %s to %s, with a mean of %s.", formatValue(p.Min), formatValue(p.Max), formatValue(round(p.Mean, 4))))
	}
	switch {
	case p.Zeros > 0 && p.Negatives > 0:
		out = append(out, fmt.Sprintf("%d zero and %d negative values: percentage errors (MAPE) and multiplicative methods do not apply.", p.Zeros, p.Negatives))
	case p.Zeros > 0:
		out = append(out, fmt.Sprintf("%d zero %s: percentage errors (MAPE) are undefined there and multiplicative methods do not apply.", p.Zeros, plural(p.Zeros, "value", "values")))
	case p.Negatives > 0:
		out = append(out, fmt.Sprintf("%d negative %s: multiplicative methods do not apply.", p.Negatives, plural(p.Negatives, "value", "values")))
	}
	return out
}

// round rounds x to the given number of significant digits.
func round(x float64, digits int) float64 {
	if x == 0 || math.IsNaN(x) || math.IsInf(x, 0) {
		return x
	}
	scale := math.Pow(10, float64(digits)-math.Ceil(math.Log10(math.Abs(x))))
	return math.Round(x*scale) / scale
}
