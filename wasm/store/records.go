//go:build js && wasm

package store

import (
	"context"
	"syscall/js"

	"github.com/hack-pad/go-indexeddb/idb"
)

// This file holds the record operations of [IndexedDB]. Each runs in one
// transaction and waits with go-indexeddb's Await, so each must be called
// from a goroutine (the bridge settles a Promise from one).

// bucket starts a transaction over the named buckets and returns the first
// one's object store.
func (s *IndexedDB) bucket(mode idb.TransactionMode, bucket string, more ...string) (*idb.Transaction, *idb.ObjectStore, error) {
	tx, err := s.db.Transaction(mode, bucket, more...)
	if err != nil {
		return nil, nil, explain(err)
	}
	st, err := tx.ObjectStore(bucket)
	if err != nil {
		return nil, nil, explain(err)
	}
	return tx, st, nil
}

// text returns v as bytes when it is a stored text.
func text(v js.Value) ([]byte, bool) {
	if v.Type() != js.TypeString {
		return nil, false
	}
	return []byte(v.String()), true
}

// Get implements [Backend].
func (s *IndexedDB) Get(bucket, key string) ([]byte, bool, error) {
	_, st, err := s.bucket(idb.TransactionReadOnly, bucket)
	if err != nil {
		return nil, false, err
	}
	req, err := st.Get(js.ValueOf(key))
	if err != nil {
		return nil, false, explain(err)
	}
	v, err := req.Await(context.Background())
	if err != nil {
		return nil, false, explain(err)
	}
	b, ok := text(v)
	return b, ok, nil
}

// Put implements [Backend].
func (s *IndexedDB) Put(bucket, key string, value []byte) error {
	tx, st, err := s.bucket(idb.TransactionReadWrite, bucket)
	if err != nil {
		return err
	}
	if _, err := st.PutKey(js.ValueOf(key), js.ValueOf(string(value))); err != nil {
		return explain(err)
	}
	return explain(tx.Await(context.Background()))
}

// Swap implements [Backend]: the read, the check and the write happen in
// one readwrite transaction, which no other tab can interleave with. The
// write is issued while the read's success event is still being handled
// (go-indexeddb resumes the waiting goroutine before the browser regains
// control), so the transaction is still active.
func (s *IndexedDB) Swap(bucket, key string, value []byte, check func([]byte, bool) error) error {
	ctx := context.Background()
	tx, st, err := s.bucket(idb.TransactionReadWrite, bucket)
	if err != nil {
		return err
	}
	req, err := st.Get(js.ValueOf(key))
	if err != nil {
		return explain(err)
	}
	v, err := req.Await(ctx)
	if err != nil {
		return explain(err)
	}
	old, found := text(v)
	if err := check(old, found); err != nil {
		_ = tx.Abort() // nothing was written; the abort only ends the transaction early
		return err
	}
	if _, err := st.PutKey(js.ValueOf(key), js.ValueOf(string(value))); err != nil {
		return explain(err)
	}
	return explain(tx.Await(ctx))
}

// Delete implements [Backend].
func (s *IndexedDB) Delete(bucket, key string) error {
	tx, st, err := s.bucket(idb.TransactionReadWrite, bucket)
	if err != nil {
		return err
	}
	if _, err := st.Delete(js.ValueOf(key)); err != nil {
		return explain(err)
	}
	return explain(tx.Await(context.Background()))
}

// All implements [Backend]. Records whose key or value is not text (written
// by something other than Quillcast) are left out.
func (s *IndexedDB) All(bucket string) (map[string][]byte, error) {
	_, st, err := s.bucket(idb.TransactionReadOnly, bucket)
	if err != nil {
		return nil, err
	}
	cur, err := st.OpenCursor(idb.CursorNext)
	if err != nil {
		return nil, explain(err)
	}
	out := map[string][]byte{}
	err = cur.Iter(context.Background(), func(c *idb.CursorWithValue) error {
		k, err := c.Key()
		if err != nil {
			return err
		}
		v, err := c.Value()
		if err != nil {
			return err
		}
		if b, ok := text(v); ok && k.Type() == js.TypeString {
			out[k.String()] = b
		}
		return nil
	})
	if err != nil {
		return nil, explain(err)
	}
	return out, nil
}

// Clear implements [Backend]: both buckets empty in one transaction.
func (s *IndexedDB) Clear() error {
	tx, sessions, err := s.bucket(idb.TransactionReadWrite, SessionBucket, DatasetBucket)
	if err != nil {
		return err
	}
	datasets, err := tx.ObjectStore(DatasetBucket)
	if err != nil {
		return explain(err)
	}
	for _, st := range []*idb.ObjectStore{sessions, datasets} {
		if _, err := st.Clear(); err != nil {
			return explain(err)
		}
	}
	return explain(tx.Await(context.Background()))
}
