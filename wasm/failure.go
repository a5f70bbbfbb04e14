//go:build js && wasm

package main

import (
	"errors"

	"quillcast/core/series"
	"quillcast/core/steps"
	"quillcast/wasm/store"
)

// Failure is an error as the page receives it: a message in plain words and,
// when the error points into a session text or a data file, its place so the
// page can mark the spot. Line and Column count from 1; 0 means unknown.
// Problems lists every error when one answer found several.
type Failure struct {
	Message string `json:"message"`
	// Code names a failure the page answers with an offer: "conflict" when
	// another tab saved a newer version, "quota" when the browser's storage
	// is full (the page offers to save the session as a file).
	Code     string    `json:"code,omitempty"`
	Step     int       `json:"step,omitempty"`
	Line     int       `json:"line,omitempty"`
	Column   int       `json:"column,omitempty"`
	Problems []Failure `json:"problems,omitempty"`
}

// failureOf turns an error into the data the page shows.
func failureOf(err error) Failure {
	f := Failure{Message: err.Error()}
	if errors.Is(err, store.ErrConflict) {
		f.Code = "conflict"
	}
	if errors.Is(err, store.ErrQuota) {
		f.Code = "quota"
	}
	var se *steps.Error
	if errors.As(err, &se) {
		f.Step, f.Line, f.Column = se.Step, se.Line, se.Column
		return f
	}
	var list series.ErrorList
	if errors.As(err, &list) {
		for _, e := range list {
			f.Problems = append(f.Problems, failureOf(e))
		}
		if len(f.Problems) > 0 {
			f.Line, f.Column = f.Problems[0].Line, f.Problems[0].Column
		}
		return f
	}
	var pe *series.ParseError
	if errors.As(err, &pe) {
		f.Line, f.Column = pe.Line, pe.Column
	}
	return f
}
