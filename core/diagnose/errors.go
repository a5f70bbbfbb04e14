package diagnose

import (
	"errors"
	"fmt"
	"math"
)

// Sentinel causes of an [*InputError], for use with errors.Is.
var (
	ErrTooShort    = errors.New("series too short")
	ErrBadSeason   = errors.New("season length not usable")
	ErrBadWidth    = errors.New("width not usable")
	ErrBadLag      = errors.New("lag not usable")
	ErrNotFinite   = errors.New("value is not a finite number")
	ErrNotPositive = errors.New("value is not positive")
	ErrConstant    = errors.New("series is constant")
)

// InputError reports a series or setting that a diagnostic cannot use.
// Its message is one sentence in plain words saying what was found and what
// is needed.
type InputError struct {
	Pos   int   // 1-based period of the offending value; 0 when the error is not about one value
	Cause error // one of the sentinel errors of this package
	Text  string
}

// Error returns the plain-words message.
func (e *InputError) Error() string { return e.Text }

// Unwrap returns the sentinel cause.
func (e *InputError) Unwrap() error { return e.Cause }

func inputErr(cause error, pos int, format string, args ...any) error {
	return &InputError{Pos: pos, Cause: cause, Text: fmt.Sprintf(format, args...)}
}

// checkFinite returns an error naming the first value of y that is NaN or
// infinite.
func checkFinite(y []float64) error {
	for i, v := range y {
		if math.IsNaN(v) {
			return inputErr(ErrNotFinite, i+1, "period %d has no value; fill or remove the gap first", i+1)
		}
		if math.IsInf(v, 0) {
			return inputErr(ErrNotFinite, i+1, "period %d holds an infinite value; correct it first", i+1)
		}
	}
	return nil
}

// checkPositive returns an error counting the values of y that are zero or
// negative and naming the first one; what says what needs positive values.
func checkPositive(y []float64, what string) error {
	first, count := 0, 0
	for i, v := range y {
		if v <= 0 {
			if count == 0 {
				first = i + 1
			}
			count++
		}
	}
	if count == 0 {
		return nil
	}
	return inputErr(ErrNotPositive, first,
		"%s needs values above zero, but %d %s zero or negative (the first at period %d)",
		what, count, plural(count, "value is", "values are"), first)
}

func plural(n int, one, many string) string {
	if n == 1 {
		return one
	}
	return many
}
