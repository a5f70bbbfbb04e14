//go:build js && wasm

package store

import (
	"errors"
	"fmt"
	"syscall/js"
)

// dbName and dbVersion name the page's database and its layout. Raise
// dbVersion when the layout changes and extend upgrade to match.
const (
	dbName    = "quillcast"
	dbVersion = 1
)

// IndexedDB is a [Backend] in the browser's IndexedDB. Values are kept as
// text. Every method blocks until the browser answers, so call them from a
// goroutine.
type IndexedDB struct {
	db js.Value
	// onClose is called when another tab upgrades the database and this
	// connection had to close; the page should ask for a reload.
	onClose func()
}

// OpenIndexedDB opens (creating or upgrading as needed) the page's database.
// onClose is called if a newer page in another tab upgrades the database and
// this connection closes. It fails with a plain explanation when the browser
// has no IndexedDB (some private windows) or another tab blocks the upgrade.
func OpenIndexedDB(onClose func()) (*IndexedDB, error) {
	factory := js.Global().Get("indexedDB")
	if factory.Type() != js.TypeObject {
		return nil, errors.New("this browser offers no IndexedDB storage here (a private window?)")
	}
	req, err := call(factory, "open", dbName, dbVersion)
	if err != nil {
		return nil, fmt.Errorf("the browser refused to open storage: %w", err)
	}
	done := make(chan error, 1)
	var funcs []js.Func
	on := func(event string, f func(js.Value)) {
		fn := js.FuncOf(func(this js.Value, args []js.Value) any { f(req); return nil })
		funcs = append(funcs, fn)
		req.Set("on"+event, fn)
	}
	on("upgradeneeded", upgrade)
	on("success", func(js.Value) { done <- nil })
	on("error", func(r js.Value) { done <- domError(r.Get("error")) })
	on("blocked", func(js.Value) {
		done <- errors.New("another Quillcast tab is using an older layout of the stored data; close the other tabs and reload")
	})
	err = <-done
	req.Set("onupgradeneeded", js.Null())
	req.Set("onsuccess", js.Null())
	req.Set("onerror", js.Null())
	req.Set("onblocked", js.Null())
	for _, f := range funcs {
		f.Release()
	}
	if err != nil {
		return nil, err
	}
	s := &IndexedDB{db: req.Get("result"), onClose: onClose}
	var closeFn js.Func
	closeFn = js.FuncOf(func(this js.Value, args []js.Value) any {
		s.db.Call("close")
		if s.onClose != nil {
			s.onClose()
		}
		return nil
	})
	// Lives as long as the connection; the page reloads after it fires.
	s.db.Set("onversionchange", closeFn)
	return s, nil
}

// upgrade creates the object stores a database of an older layout lacks.
func upgrade(req js.Value) {
	db := req.Get("result")
	names := db.Get("objectStoreNames")
	for _, b := range []string{SessionBucket, DatasetBucket} {
		if !names.Call("contains", b).Bool() {
			db.Call("createObjectStore", b)
		}
	}
}

// Kind returns "IndexedDB".
func (s *IndexedDB) Kind() string { return "IndexedDB" }

// Get implements [Backend].
func (s *IndexedDB) Get(bucket, key string) ([]byte, bool, error) {
	var v js.Value
	err := s.txn([]string{bucket}, "readonly", func(tx js.Value, fail func(error)) error {
		return s.request(tx.Call("objectStore", bucket), "get", []any{key}, func(r js.Value) { v = r }, fail)
	})
	if err != nil {
		return nil, false, err
	}
	if v.Type() != js.TypeString {
		return nil, false, nil
	}
	return []byte(v.String()), true, nil
}

// Put implements [Backend].
func (s *IndexedDB) Put(bucket, key string, value []byte) error {
	return s.txn([]string{bucket}, "readwrite", func(tx js.Value, fail func(error)) error {
		_, err := call(tx.Call("objectStore", bucket), "put", string(value), key)
		return err
	})
}

// Swap implements [Backend]: the read, the check and the write happen in
// one readwrite transaction, which no other tab can interleave with.
func (s *IndexedDB) Swap(bucket, key string, value []byte, check func([]byte, bool) error) error {
	return s.txn([]string{bucket}, "readwrite", func(tx js.Value, fail func(error)) error {
		store := tx.Call("objectStore", bucket)
		return s.request(store, "get", []any{key}, func(r js.Value) {
			var old []byte
			found := r.Type() == js.TypeString
			if found {
				old = []byte(r.String())
			}
			if err := check(old, found); err != nil {
				fail(err)
				return
			}
			if _, err := call(store, "put", string(value), key); err != nil {
				fail(err)
			}
		}, fail)
	})
}

// Delete implements [Backend].
func (s *IndexedDB) Delete(bucket, key string) error {
	return s.txn([]string{bucket}, "readwrite", func(tx js.Value, fail func(error)) error {
		_, err := call(tx.Call("objectStore", bucket), "delete", key)
		return err
	})
}

// All implements [Backend].
func (s *IndexedDB) All(bucket string) (map[string][]byte, error) {
	var keys, values js.Value
	err := s.txn([]string{bucket}, "readonly", func(tx js.Value, fail func(error)) error {
		store := tx.Call("objectStore", bucket)
		if err := s.request(store, "getAllKeys", nil, func(r js.Value) { keys = r }, fail); err != nil {
			return err
		}
		return s.request(store, "getAll", nil, func(r js.Value) { values = r }, fail)
	})
	if err != nil {
		return nil, err
	}
	out := map[string][]byte{}
	for i := 0; i < keys.Length() && i < values.Length(); i++ {
		if k, v := keys.Index(i), values.Index(i); k.Type() == js.TypeString && v.Type() == js.TypeString {
			out[k.String()] = []byte(v.String())
		}
	}
	return out, nil
}

// Clear implements [Backend].
func (s *IndexedDB) Clear() error {
	buckets := []string{SessionBucket, DatasetBucket}
	return s.txn(buckets, "readwrite", func(tx js.Value, fail func(error)) error {
		for _, b := range buckets {
			if _, err := call(tx.Call("objectStore", b), "clear"); err != nil {
				return err
			}
		}
		return nil
	})
}
