//go:build js && wasm

package store

import (
	"errors"
	"fmt"
	"syscall/js"

	"github.com/hack-pad/go-indexeddb/idb"
)

// ErrConflict means another tab saved a newer version of the session.
var ErrConflict = errors.New("another tab saved this session after it was opened here")

// ErrNotFound means no session or dataset has the given id or name.
var ErrNotFound = errors.New("not found")

// ErrQuota means the browser's storage for the page is full: the write was
// not made, and the page should offer an export of the user's work.
var ErrQuota = errors.New("the browser's storage for this page is full; save your session as a file now, then delete old sessions or datasets to make room")

// ErrUnavailable means the browser offers no IndexedDB here (some private
// windows, or storage turned off for the site); the page works in memory.
var ErrUnavailable = errors.New("this browser offers no lasting storage to this page here (a private window, or storage turned off for this site)")

// ErrBlocked means another tab holds the database open with an older layout
// and did not close it when asked.
var ErrBlocked = errors.New("another Quillcast tab keeps the stored sessions open with an older layout; close the other Quillcast tabs and reload this page")

// explain turns storage errors a user can act on into plain advice; other
// errors, and nil, pass through. The browser's exception may reach it as a
// go-indexeddb DOMException or, when a call threw it, as a js.Error.
func explain(err error) error {
	switch {
	case err == nil:
		return nil
	case named(err, "QuotaExceededError"):
		return fmt.Errorf("%w (%v)", ErrQuota, err)
	case named(err, "InvalidStateError"):
		return fmt.Errorf("the stored data was closed, perhaps by another tab that updated Quillcast; reload this page (%w)", err)
	case named(err, "UnknownError"), named(err, "AbortError"):
		return fmt.Errorf("the browser's storage failed; your work is still on the page, so save it as a file before reloading (%w)", err)
	}
	return err
}

// named reports whether err is the browser exception called name (such as
// "QuotaExceededError").
func named(err error, name string) bool {
	if errors.Is(err, idb.NewDOMException(name)) {
		return true
	}
	var je js.Error
	if errors.As(err, &je) && je.Value.Type() == js.TypeObject {
		n := je.Value.Get("name")
		return n.Type() == js.TypeString && n.String() == name
	}
	return false
}
