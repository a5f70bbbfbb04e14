//go:build js && wasm

package store

import (
	"errors"
	"fmt"

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

// The browser's names for the storage errors a user can act on.
var (
	quotaExceeded = idb.NewDOMException("QuotaExceededError")
	invalidState  = idb.NewDOMException("InvalidStateError")
	unknownError  = idb.NewDOMException("UnknownError")
	abortError    = idb.NewDOMException("AbortError")
)

// explain turns storage errors a user can act on into plain advice; other
// errors, and nil, pass through.
func explain(err error) error {
	switch {
	case err == nil:
		return nil
	case errors.Is(err, quotaExceeded):
		return fmt.Errorf("%w (%v)", ErrQuota, err)
	case errors.Is(err, invalidState):
		return fmt.Errorf("the stored data was closed, perhaps by another tab that updated Quillcast; reload this page (%w)", err)
	case errors.Is(err, unknownError), errors.Is(err, abortError):
		return fmt.Errorf("the browser's storage failed; your work is still on the page, so save it as a file before reloading (%w)", err)
	}
	return err
}
