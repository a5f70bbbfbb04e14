//go:build js && wasm

package main

// Failure is an error as the page receives it: a message in plain words and,
// when the error points into a session text or a data file, its place so the
// page can mark the spot. Line and Column count from 1; 0 means unknown.
// Problems lists every error when one answer found several.
type Failure struct {
	Message  string    `json:"message"`
	Step     int       `json:"step,omitempty"`
	Line     int       `json:"line,omitempty"`
	Column   int       `json:"column,omitempty"`
	Problems []Failure `json:"problems,omitempty"`
}

// failureOf turns an error into the data the page shows.
func failureOf(err error) Failure {
	f := Failure{Message: err.Error()}
	return f
}
