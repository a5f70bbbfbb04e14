package series

import (
	"fmt"
	"math"
	"strconv"
)

// Fill fills the missing values (NaN) of s in place with the given method
// and returns one [Change] per value filled, in period order:
//
//   - CarryForward repeats the last value before each gap; a gap at the
//     start stays missing.
//   - Linear draws a straight line between the values on either side of
//     each gap; gaps at either end stay missing.
//   - Seasonal takes the value one season earlier (s.Season periods), or
//     one season later where there is no earlier one; it fails when
//     s.Season is below 2.
//
// NoFill changes nothing. Values that cannot be filled stay NaN.
func Fill(s *Series, method FillMethod) ([]Change, error) {
	v := s.Values
	var changes []Change
	add := func(i int, x float64, from, to int) {
		v[i] = x
		changes = append(changes, Change{Kind: Filled, Series: s.Name, Period: s.PeriodAt(i), New: x,
			From: s.PeriodAt(from), To: s.PeriodAt(to), Fill: method})
	}
	switch method {
	case NoFill:
	case CarryForward:
		last := -1
		for i, x := range v {
			switch {
			case !math.IsNaN(x):
				last = i
			case last >= 0:
				add(i, v[last], last, last)
			}
		}
	case Linear:
		prev := -1
		for i := 0; i < len(v); i++ {
			if math.IsNaN(v[i]) {
				continue
			}
			if prev >= 0 && i-prev > 1 {
				a, b := v[prev], v[i]
				for j := prev + 1; j < i; j++ {
					t := float64(j-prev) / float64(i-prev)
					add(j, a+t*(b-a), prev, i)
				}
			}
			prev = i
		}
	case Seasonal:
		m := s.Season
		if m < 2 {
			return nil, &ParseError{Err: ErrOption, Msg: fmt.Sprintf("seasonal filling of series %q needs a season length of 2 or more; set the season, or fill by carry forward or linear", s.Name)}
		}
		orig := make([]bool, len(v))
		for i, x := range v {
			orig[i] = !math.IsNaN(x)
		}
		for i := range v {
			if orig[i] {
				continue
			}
			switch {
			case i-m >= 0 && !math.IsNaN(v[i-m]):
				add(i, v[i-m], i-m, i-m)
			case i+m < len(v) && orig[i+m]:
				add(i, v[i+m], i+m, i+m)
			}
		}
	default:
		return nil, &ParseError{Err: ErrOption, Msg: fmt.Sprintf("fill method %d is not known; choose carry forward, linear or seasonal", method)}
	}
	return changes, nil
}

// formatValue writes a value for messages: as few digits as identify it,
// without an exponent below 1e15.
func formatValue(x float64) string {
	if math.IsNaN(x) {
		return "missing"
	}
	if math.Abs(x) < 1e15 {
		return strconv.FormatFloat(x, 'f', -1, 64)
	}
	return strconv.FormatFloat(x, 'g', -1, 64)
}
