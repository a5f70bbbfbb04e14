//go:build js && wasm

package store

import (
	"context"
	"fmt"
	"slices"
	"syscall/js"

	"github.com/hack-pad/go-indexeddb/idb"
)

// dbName and dbVersion name the page's database and its layout. Raise
// dbVersion when the layout changes and extend upgrade to match.
const (
	dbName    = "quillcast"
	dbVersion = 1
)

// IndexedDB is a [Backend] in the browser's IndexedDB, through
// github.com/hack-pad/go-indexeddb. Values are kept as text. Every method
// waits for the browser's answer, so call them from a goroutine, never from
// a JavaScript callback.
type IndexedDB struct {
	db *idb.Database
}

// OpenIndexedDB opens (creating or upgrading as needed) the page's database.
// It must be called from a goroutine.
//
// onClose is called when a newer page in another tab upgrades the database:
// this connection closes at once so the upgrade is not held up, and the page
// should ask for a reload. OpenIndexedDB fails with [ErrUnavailable] when the
// browser offers no IndexedDB here (some private windows, storage turned
// off) and with [ErrBlocked] when another tab holds the database open with an
// older layout and does not let go.
func OpenIndexedDB(onClose func()) (*IndexedDB, error) {
	raw := js.Global().Get("indexedDB")
	if raw.Type() != js.TypeObject {
		return nil, ErrUnavailable
	}
	blocked := make(chan struct{}, 1)
	factory, release := watchBlocked(raw, blocked)
	defer release()
	f, err := idb.WrapFactory(factory)
	if err != nil {
		return nil, unavailable(err)
	}
	ctx := context.Background()
	req, err := f.Open(ctx, dbName, dbVersion, upgrade)
	if err != nil {
		return nil, unavailable(err)
	}
	type opened struct {
		db  *idb.Database
		err error
	}
	done := make(chan opened, 1)
	go func() {
		db, err := req.Await(ctx)
		done <- opened{db, err}
	}()
	var o opened
	select {
	case o = <-done:
	case <-blocked:
		// The open stays pending until the other tab lets go; when it
		// does, close the late connection so the next load upgrades.
		go func() {
			if late := <-done; late.err == nil {
				_ = late.db.Close()
			}
		}()
		return nil, ErrBlocked
	}
	if o.err != nil {
		return nil, unavailable(o.err)
	}
	if conn, err := req.Request.Result(); err == nil {
		watchVersionChange(conn, onClose)
	}
	return &IndexedDB{db: o.db}, nil
}

// unavailable says why the browser refused its storage, in the words of
// [ErrUnavailable] followed by the browser's own reason.
func unavailable(err error) error {
	return fmt.Errorf("%w (%v)", ErrUnavailable, err)
}

// watchBlocked returns a stand-in for the browser's IndexedDB factory whose
// open also reports the request's "blocked" event on blocked (go-indexeddb
// listens for success, error and upgradeneeded only). release frees the
// handlers once the open has settled.
func watchBlocked(factory js.Value, blocked chan<- struct{}) (js.Value, func()) {
	onBlocked := js.FuncOf(func(js.Value, []js.Value) any {
		select {
		case blocked <- struct{}{}:
		default:
		}
		return nil
	})
	var req js.Value
	open := js.FuncOf(func(this js.Value, args []js.Value) any {
		a := make([]any, len(args))
		for i, v := range args {
			a[i] = v
		}
		req = factory.Call("open", a...)
		req.Call("addEventListener", "blocked", onBlocked)
		return req
	})
	stand := js.Global().Get("Object").New()
	stand.Set("open", open)
	return stand, func() {
		if !req.IsUndefined() {
			req.Call("removeEventListener", "blocked", onBlocked)
		}
		open.Release()
		onBlocked.Release()
	}
}

// watchVersionChange calls onClose when another tab asks to upgrade the
// database. go-indexeddb closes the connection itself on that event; this
// tells the page. The handler lives as long as the connection.
func watchVersionChange(conn js.Value, onClose func()) {
	if onClose == nil {
		return
	}
	conn.Call("addEventListener", "versionchange", js.FuncOf(func(js.Value, []js.Value) any {
		onClose()
		return nil
	}))
}

// upgrade creates the object stores a database of an older layout lacks.
// It runs inside the browser's upgradeneeded event and waits for nothing.
func upgrade(db *idb.Database, oldVersion, newVersion uint) error {
	names, err := db.ObjectStoreNames()
	if err != nil {
		return err
	}
	for _, b := range []string{SessionBucket, DatasetBucket} {
		if !slices.Contains(names, b) {
			if _, err := db.CreateObjectStore(b, idb.ObjectStoreOptions{}); err != nil {
				return err
			}
		}
	}
	return nil
}

// Kind returns "IndexedDB".
func (s *IndexedDB) Kind() string { return "IndexedDB" }
