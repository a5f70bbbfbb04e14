//go:build js && wasm

package main

import (
	"crypto/rand"
	"encoding/hex"
	"sync"
	"syscall/js"
	"time"

	"quillcast/core/series"
	"quillcast/core/steps/runner"
	"quillcast/wasm/store"
)

// app is the one value holding the engine's state in the page: the open
// session's runner, the attached files and the store. Every exported
// function is a method value captured from it; there is no package-level
// state.
type app struct {
	mu       sync.Mutex
	files    map[string][]byte          // attached files by name, as the steps name them
	datasets map[string]*series.Dataset // files read with default options, for previews
	run      *runner.Runner             // the open session's runner, reused between runs
	last     *runner.Result             // the last run's result, for the memo

	storeOnce sync.Once
	backend   store.Backend
	storeNote string // why the page works in memory, when it does
	sessions  *store.Sessions
	sets      *store.Datasets
}

func newApp() *app {
	return &app{
		files:    map[string][]byte{},
		datasets: map[string]*series.Dataset{},
		run:      runner.New(),
	}
}

// functions returns the JavaScript functions of the API by name. They live
// as long as the page, so they are never released.
func (a *app) functions() map[string]js.Func {
	return map[string]js.Func{
		"attach":           asyncFunc("attach", a.attach),
		"preview":          asyncFunc("preview", a.preview),
		"help":             syncFunc("help", a.help),
		"complete":         syncFunc("complete", a.complete),
		"parts":            syncFunc("parts", a.parts),
		"run":              asyncFunc("run", a.runSession),
		"bakeoffPart":      asyncFunc("bakeoffPart", a.bakeoffPart),
		"storage":          asyncFunc("storage", a.storage),
		"datasets":         asyncFunc("datasets", a.listDatasets),
		"removeDataset":    asyncFunc("removeDataset", a.removeDataset),
		"sessions":         asyncFunc("sessions", a.listSessions),
		"openSession":      asyncFunc("openSession", a.openSession),
		"saveSession":      asyncFunc("saveSession", a.saveSession),
		"renameSession":    asyncFunc("renameSession", a.renameSession),
		"duplicateSession": asyncFunc("duplicateSession", a.duplicateSession),
		"deleteSession":    asyncFunc("deleteSession", a.deleteSession),
		"forgetAll":        asyncFunc("forgetAll", a.forgetAll),
		"memo":             asyncFunc("memo", a.memoOf),
		"exportSession":    asyncFunc("exportSession", a.exportSession),
	}
}

// now is the clock for save stamps; the bridge, not core, reads it.
func now() time.Time { return time.Now() }

// newID returns a random session id of 16 hex digits.
func newID() string {
	var b [8]byte
	_, _ = rand.Read(b[:]) // crypto/rand never fails in the browser
	return hex.EncodeToString(b[:])
}
