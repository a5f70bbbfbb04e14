//go:build js && wasm

package main

import (
	"sync"
	"syscall/js"

	"quillcast/core/series"
)

// app is the one value holding the engine's state in the page: the datasets
// attached so far, by name. Every exported function is a method value
// captured from it; there is no package-level state.
type app struct {
	mu       sync.Mutex
	datasets map[string]*series.Dataset
}

func newApp() *app {
	return &app{datasets: make(map[string]*series.Dataset)}
}

// functions returns the JavaScript functions of the API by name. They live
// as long as the page, so they are never released.
func (a *app) functions() map[string]js.Func {
	return map[string]js.Func{
		"attach": asyncFunc("attach", a.attach),
	}
}
