package format

import (
	"math"
	"slices"
	"strconv"
)

// Missing is the text shown in place of a missing value (NaN).
const Missing = "—"

// Number formats v with exactly decimals digits after the point and a comma
// between every three digits of the whole part, rounding halves away from
// zero (41.25 to one decimal is "41.3"). decimals below 0 count as 0
// and above 12 as 12. A result that rounds to zero never carries a minus sign.
// NaN gives [Missing]; ±Inf gives "∞" or "-∞".
func Number(v float64, decimals int) string {
	return string(AppendNumber(nil, v, decimals))
}

// AppendNumber appends the [Number] form of v to dst and returns the
// extended slice.
func AppendNumber(dst []byte, v float64, decimals int) []byte {
	decimals = clampDecimals(decimals)
	switch {
	case math.IsNaN(v):
		return append(dst, Missing...)
	case math.IsInf(v, 1):
		return append(dst, "∞"...)
	case math.IsInf(v, -1):
		return append(dst, "-∞"...)
	}
	var buf [64]byte
	digits := strconv.AppendFloat(buf[:0], roundHalfAway(math.Abs(v), decimals), 'f', decimals, 64)
	if v < 0 && !allZero(digits) {
		dst = append(dst, '-')
	}
	whole := len(digits)
	for i, c := range digits {
		if c == '.' {
			whole = i
			break
		}
	}
	for i := 0; i < whole; i++ {
		if i > 0 && (whole-i)%3 == 0 {
			dst = append(dst, ',')
		}
		dst = append(dst, digits[i])
	}
	return append(dst, digits[whole:]...)
}

// Plain formats v with exactly decimals digits after the point and no
// thousands separators, as a program reading a file expects ("-1234.50").
// decimals is clamped to 0..12. NaN gives "" (an empty cell); ±Inf gives
// "Inf" or "-Inf". A result that rounds to zero carries no minus sign.
func Plain(v float64, decimals int) string {
	decimals = clampDecimals(decimals)
	switch {
	case math.IsNaN(v):
		return ""
	case math.IsInf(v, 1):
		return "Inf"
	case math.IsInf(v, -1):
		return "-Inf"
	}
	s := strconv.FormatFloat(roundHalfAway(v, decimals), 'f', decimals, 64)
	if len(s) > 0 && s[0] == '-' && allZero([]byte(s[1:])) {
		return s[1:]
	}
	return s
}

// Int formats n with a comma between every three digits: "-1,234,567".
func Int(n int) string {
	return Number(float64(n), 0)
}

// Percent formats p, a value already in percent (12.3 means 12.3%), with
// decimals digits and a percent sign: Percent(12.345, 1) is "12.3%".
// NaN gives [Missing] without a sign.
func Percent(p float64, decimals int) string {
	if math.IsNaN(p) {
		return Missing
	}
	return Number(p, decimals) + "%"
}

// Auto formats v with [Number], choosing the decimals from its size by
// [Decimals].
func Auto(v float64) string {
	return Number(v, Decimals(v))
}

// Decimals returns how many digits after the point suit a value of v's size:
// 0 from 1,000 up, 1 from 10, 2 from 1, and for smaller values enough digits
// to show three significant ones (0.0123 gets 4), at most 12, so values down
// to 1e-9 keep three significant digits. Zero, NaN and
// ±Inf get 2.
func Decimals(v float64) int {
	a := math.Abs(v)
	switch {
	case math.IsNaN(a) || math.IsInf(a, 0) || a == 0:
		return 2
	case a >= 999.5:
		return 0
	case a >= 9.95:
		return 1
	case a >= 0.9995:
		return 2
	}
	d := 2 - int(math.Floor(math.Log10(a)))
	return min(d, 12)
}

// ColumnDecimals returns one decimals count for a whole column of values, so
// that every cell of the column lines up: the [Decimals] of the median
// absolute value among the finite, non-zero values. A column with no such
// value gets 2.
func ColumnDecimals(values []float64) int {
	abs := make([]float64, 0, len(values))
	for _, v := range values {
		if !math.IsNaN(v) && !math.IsInf(v, 0) && v != 0 {
			abs = append(abs, math.Abs(v))
		}
	}
	if len(abs) == 0 {
		return 2
	}
	return Decimals(median(abs))
}

func median(a []float64) float64 {
	slices.Sort(a)
	n := len(a)
	if n%2 == 1 {
		return a[n/2]
	}
	return (a[n/2-1] + a[n/2]) / 2
}

func clampDecimals(d int) int {
	return max(0, min(d, 12))
}

func allZero(digits []byte) bool {
	for _, c := range digits {
		if c != '0' && c != '.' {
			return false
		}
	}
	return true
}

// roundHalfAway rounds v to decimals digits with halves away from zero, as
// people and spreadsheets do (strconv alone rounds an exact half to even:
// 41.25 would show as 41.2). Values too large for the scaled form to hold
// whole numbers exactly are returned unchanged.
func roundHalfAway(v float64, decimals int) float64 {
	p := math.Pow(10, float64(decimals))
	scaled := v * p
	if math.Abs(scaled) >= 1<<52 {
		return v
	}
	return math.Round(scaled) / p
}
