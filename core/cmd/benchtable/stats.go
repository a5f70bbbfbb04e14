package main

import (
	"fmt"
	"slices"
)

// sample is a set of repeated measurements of one figure, in one unit
// (seconds or bytes).
type sample struct {
	Values []float64 `json:"samples"`
	Unit   string    `json:"unit"` // "s" or "B"
	Note   string    `json:"note,omitempty"`
}

// ok reports whether the sample holds at least one measurement.
func (s sample) ok() bool { return len(s.Values) > 0 }

// median returns the middle value (the mean of the two middle values for
// an even count); 0 for an empty sample.
func (s sample) median() float64 {
	if len(s.Values) == 0 {
		return 0
	}
	v := slices.Sorted(slices.Values(s.Values))
	n := len(v)
	if n%2 == 1 {
		return v[n/2]
	}
	return (v[n/2-1] + v[n/2]) / 2
}

// span returns the smallest and largest value.
func (s sample) span() (lo, hi float64) {
	if len(s.Values) == 0 {
		return 0, 0
	}
	return slices.Min(s.Values), slices.Max(s.Values)
}

// String gives the median with the range and count, such as
// "0.212 s (0.201–0.250, n=5)"; a single run shows its value alone. The
// median chooses the scale (MB for bytes; ms below 10 ms, s above).
func (s sample) String() string {
	if !s.ok() {
		return "not measured"
	}
	f, unit := scale(s.median(), s.Unit)
	m := fmt.Sprintf("%s %s", digits(s.median()*f), unit)
	if len(s.Values) == 1 {
		return m + " (n=1)"
	}
	lo, hi := s.span()
	return fmt.Sprintf("%s (%s–%s, n=%d)", m, digits(lo*f), digits(hi*f), len(s.Values))
}

// scale returns the factor and unit to show a value of about v in.
func scale(v float64, unit string) (float64, string) {
	switch {
	case unit == "B":
		return 1e-6, "MB"
	case unit == "s" && v < 0.01:
		return 1e3, "ms"
	}
	return 1, unit
}

// digits shows three significant decimals for small values and fewer for
// large ones.
func digits(v float64) string {
	switch {
	case v >= 100:
		return fmt.Sprintf("%.0f", v)
	case v >= 10:
		return fmt.Sprintf("%.1f", v)
	case v >= 1:
		return fmt.Sprintf("%.2f", v)
	}
	return fmt.Sprintf("%.3f", v)
}
