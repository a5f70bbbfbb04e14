package accuracy

import (
	"fmt"
	"math"
)

// Result is the value of one measure, or the reason it has none.
type Result struct {
	// Value is the measure's value when Defined; 0 otherwise. Never NaN
	// or infinite.
	Value float64
	// Defined is false when the measure cannot be computed on these data.
	Defined bool
	// Reason says in plain words why the measure is undefined, for
	// example "MAPE undefined: 3 actual values are zero"; empty when
	// Defined.
	Reason string
}

// Better reports whether r is better than o on measure m: a defined result
// beats an undefined one, and two defined results compare by
// [Measure.Better]. Two undefined results are equal (neither is better).
func (r Result) Better(m Measure, o Result) bool {
	switch {
	case !r.Defined:
		return false
	case !o.Defined:
		return true
	}
	return m.Better(r.Value, o.Value)
}

// value returns a defined result, or an undefined one when v is not finite
// (sums of huge errors can overflow).
func value(m Measure, v float64) Result {
	if math.IsNaN(v) || math.IsInf(v, 0) {
		return undefined(m, "the errors are too large to add up")
	}
	return Result{Value: v, Defined: true}
}

// undefined returns an undefined result whose reason starts with the
// measure's abbreviation: "MAPE undefined: <why>".
func undefined(m Measure, why string) Result {
	return Result{Reason: fmt.Sprintf("%s undefined: %s", label(m), why)}
}

// label returns the measure's abbreviation as printed: "sMAPE", "RMSE".
func label(m Measure) string {
	if m == SMAPE {
		return "sMAPE"
	}
	s := m.String()
	b := []byte(s)
	for i, c := range b {
		if c >= 'a' && c <= 'z' {
			b[i] = c - 'a' + 'A'
		}
	}
	return string(b)
}

func abs(v float64) float64 { return math.Abs(v) }

func finite(v float64) bool { return !math.IsNaN(v) && !math.IsInf(v, 0) }

func plural(n int, one, many string) string {
	if n == 1 {
		return one
	}
	return many
}
