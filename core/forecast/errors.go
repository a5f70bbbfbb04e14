package forecast

import "errors"

// Causes of fitting errors, for use with errors.Is. The message of the
// returned error says in plain words what was found and what is needed.
var (
	// ErrTooShort: the training series is shorter than the method needs.
	ErrTooShort = errors.New("series too short for the method")
	// ErrBadValue: the series holds a missing or infinite value.
	ErrBadValue = errors.New("series holds a value that is not a finite number")
	// ErrNotPositive: a multiplicative or logarithmic method met a zero or negative value.
	ErrNotPositive = errors.New("series has zero or negative values")
	// ErrSeason: the season length does not suit the method or the series.
	ErrSeason = errors.New("season length does not suit the series")
	// ErrSetting: a parameter given by the user is unknown or out of range.
	ErrSetting = errors.New("parameter setting not accepted")
	// ErrNoInterval: the method has no analytic prediction interval.
	ErrNoInterval = errors.New("no analytic prediction interval")
)

// Error is an error of this package: a plain-words message and its cause,
// one of the Err values above.
type Error struct {
	Cause error  // one of the Err values of this package
	Msg   string // the message shown to the user
}

// Error returns the message.
func (e *Error) Error() string { return e.Msg }

// Unwrap returns the cause.
func (e *Error) Unwrap() error { return e.Cause }
