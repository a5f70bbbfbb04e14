//go:build js && wasm

// Package store keeps the page's sessions and datasets in the browser, on
// top of a small key-value interface ([Backend]) with two twins: [Memory],
// used by tests under Node and where the browser offers no IndexedDB, and
// [IndexedDB], used in the page.
//
// Sessions and datasets live apart: a session names the datasets it uses,
// and a dataset can serve several sessions. Every session carries a version
// counter; [Sessions.Save] refuses to overwrite a newer version written by
// another tab ([ErrConflict]), so nothing is overwritten silently.
package store

// The two buckets of the store.
const (
	SessionBucket = "sessions"
	DatasetBucket = "datasets"
)

// Backend is a key-value store with named buckets. Keys and values are
// opaque to it. All methods may block; call them from a goroutine, never
// from a JavaScript callback.
type Backend interface {
	// Get returns the value under key, and false when there is none.
	Get(bucket, key string) ([]byte, bool, error)
	// Put stores value under key.
	Put(bucket, key string, value []byte) error
	// Swap stores value under key only when check accepts the current value
	// (nil, false when there is none), in one step no other writer can
	// interleave with. It returns check's error, if any, and stores nothing.
	Swap(bucket, key string, value []byte, check func(old []byte, found bool) error) error
	// Delete removes key; a missing key is not an error.
	Delete(bucket, key string) error
	// All returns every value of a bucket, by key.
	All(bucket string) (map[string][]byte, error)
	// Clear removes everything in every bucket.
	Clear() error
	// Kind names the backend for the page ("IndexedDB" or "memory").
	Kind() string
}
