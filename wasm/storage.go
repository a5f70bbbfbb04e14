//go:build js && wasm

package main

import (
	"syscall/js"

	"quillcast/wasm/store"
)

// openStore opens IndexedDB the first time storage is needed, falling back
// to memory (and saying why) where the browser has none. It must be called
// from a goroutine.
func (a *app) openStore() {
	a.storeOnce.Do(func() {
		db, err := store.OpenIndexedDB(func() {
			js.Global().Call("dispatchEvent", js.Global().Get("Event").New("quillcast-storage-closed"))
		})
		if err != nil {
			a.backend = store.NewMemory()
			a.storeNote = "Nothing is kept after this page closes: " + err.Error() + "."
		} else {
			a.backend = db
		}
		a.sessions = store.NewSessions(a.backend, now, newID)
		a.sets = store.NewDatasets(a.backend, now)
	})
}

// storageInfo tells the page where its work is kept.
type storageInfo struct {
	Kind string `json:"kind"` // "IndexedDB" or "memory"
	Note string `json:"note"` // why it is memory, when it is
}

// storage() opens the store and loads every stored dataset into the engine,
// so that sessions can run at once. It answers with a [storageInfo].
func (a *app) storage(args []js.Value) (any, error) {
	a.openStore()
	list, err := a.sets.List()
	if err != nil {
		return nil, err
	}
	for _, info := range list {
		ds, err := a.sets.Get(info.Name)
		if err != nil {
			return nil, err
		}
		a.mu.Lock()
		a.files[ds.Name] = ds.Data
		a.mu.Unlock()
	}
	return storageInfo{Kind: a.backend.Kind(), Note: a.storeNote}, nil
}

// datasets() lists the stored datasets.
func (a *app) listDatasets(args []js.Value) (any, error) {
	a.openStore()
	return a.sets.List()
}

// removeDataset(name) deletes a stored dataset and forgets its file.
func (a *app) removeDataset(args []js.Value) (any, error) {
	name, err := stringArg(args, 0, "the dataset name")
	if err != nil {
		return nil, err
	}
	a.openStore()
	a.mu.Lock()
	delete(a.files, name)
	delete(a.datasets, name)
	a.mu.Unlock()
	return nil, a.sets.Delete(name)
}

// sessions() lists the stored sessions, most recent first.
func (a *app) listSessions(args []js.Value) (any, error) {
	a.openStore()
	return a.sessions.List()
}

// openSession(id) returns a stored session.
func (a *app) openSession(args []js.Value) (any, error) {
	id, err := stringArg(args, 0, "the session id")
	if err != nil {
		return nil, err
	}
	a.openStore()
	return a.sessions.Get(id)
}

// saveSession(json) saves a session sent as the JSON of a [store.Session]
// carrying the version it was opened at, and answers with the saved session.
// A newer save from another tab answers with an error of code "conflict".
func (a *app) saveSession(args []js.Value) (any, error) {
	var s store.Session
	if err := jsonArg(args, 0, "the session", &s); err != nil {
		return nil, err
	}
	a.openStore()
	return a.sessions.Save(s)
}

// renameSession(id, title) renames a stored session.
func (a *app) renameSession(args []js.Value) (any, error) {
	id, err := stringArg(args, 0, "the session id")
	if err != nil {
		return nil, err
	}
	title, err := stringArg(args, 1, "the new title")
	if err != nil {
		return nil, err
	}
	a.openStore()
	return a.sessions.Rename(id, title)
}

// duplicateSession(id, title) stores a copy of a session.
func (a *app) duplicateSession(args []js.Value) (any, error) {
	id, err := stringArg(args, 0, "the session id")
	if err != nil {
		return nil, err
	}
	title, err := stringArg(args, 1, "the copy's title")
	if err != nil {
		return nil, err
	}
	a.openStore()
	return a.sessions.Duplicate(id, title)
}

// deleteSession(id) deletes a stored session; its datasets stay.
func (a *app) deleteSession(args []js.Value) (any, error) {
	id, err := stringArg(args, 0, "the session id")
	if err != nil {
		return nil, err
	}
	a.openStore()
	return nil, a.sessions.Delete(id)
}

// forgetAll() deletes every stored session and dataset and forgets the
// attached files.
func (a *app) forgetAll(args []js.Value) (any, error) {
	a.openStore()
	a.mu.Lock()
	clear(a.files)
	clear(a.datasets)
	a.mu.Unlock()
	return nil, a.backend.Clear()
}
