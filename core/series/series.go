package series

// Series is a regular time series: one value per period from Start on, with
// no period skipped. Every other package of the engine works on it.
type Series struct {
	Name   string    // column or series label as found in the file
	Start  Period    // period of Values[0]
	Values []float64 // one per period from Start on; NaN marks a missing value
	Season int       // periods per seasonal cycle; 0 or 1 = none (editable by the user)
}

// Len returns the number of periods in s.
func (s *Series) Len() int { return len(s.Values) }

// PeriodAt returns the period of Values[i]; i counts from 0 and may lie
// outside the series (negative before Start, Len() and beyond after End).
func (s *Series) PeriodAt(i int) Period { return s.Start.Add(i) }

// End returns the period of the last value. For an empty series it is the
// period before Start.
func (s *Series) End() Period { return s.Start.Add(len(s.Values) - 1) }

// IndexOf returns the 0-based position of period p in s, and false when p
// has another frequency or lies outside the series.
func (s *Series) IndexOf(p Period) (int, bool) {
	if p.Freq != s.Start.Freq {
		return 0, false
	}
	i := p.Ordinal - s.Start.Ordinal
	if i < 0 || i >= len(s.Values) {
		return 0, false
	}
	return i, true
}

// Frequency returns the frequency of s (that of its Start).
func (s *Series) Frequency() Frequency { return s.Start.Freq }
