//go:build js && wasm

package store

import (
	"errors"
	"fmt"
	"syscall/js"
)

// txn runs body inside one IndexedDB transaction and waits until the
// transaction completes or aborts. body issues its requests at once (the
// transaction stays open only while requests are pending) and may call
// fail, from a request's success handler, to abort the transaction with an
// error of its own.
func (s *IndexedDB) txn(buckets []string, mode string, body func(tx js.Value, fail func(error)) error) error {
	names := make([]any, len(buckets))
	for i, b := range buckets {
		names[i] = b
	}
	tx, err := call(s.db, "transaction", js.ValueOf(names), mode)
	if err != nil {
		return explain(err)
	}
	done := make(chan error, 1)
	var own error
	fail := func(err error) {
		if own == nil {
			own = err
			_, _ = call(tx, "abort") // already finishing after a request error

		}
	}
	complete := js.FuncOf(func(this js.Value, args []js.Value) any { done <- nil; return nil })
	abort := js.FuncOf(func(this js.Value, args []js.Value) any {
		if own != nil {
			done <- own
		} else {
			done <- explain(domError(tx.Get("error")))
		}
		return nil
	})
	defer complete.Release()
	defer abort.Release()
	tx.Set("oncomplete", complete)
	tx.Set("onabort", abort)
	if err := body(tx, fail); err != nil {
		fail(err)
	}
	return <-done
}

// request starts store[method](args...) and calls onResult with its result
// when it succeeds, inside the transaction. The handler is released when the
// request settles.
func (s *IndexedDB) request(store js.Value, method string, args []any, onResult func(js.Value), fail func(error)) error {
	req, err := call(store, method, args...)
	if err != nil {
		return err
	}
	var ok, bad js.Func
	release := func() {
		req.Set("onsuccess", js.Null())
		req.Set("onerror", js.Null())
		ok.Release()
		bad.Release()
	}
	ok = js.FuncOf(func(this js.Value, a []js.Value) any {
		result := req.Get("result")
		release()
		onResult(result)
		return nil
	})
	bad = js.FuncOf(func(this js.Value, a []js.Value) any {
		e := domError(req.Get("error"))
		release()
		fail(e)
		return nil
	})
	req.Set("onsuccess", ok)
	req.Set("onerror", bad)
	return nil
}

// call calls v[method](args...), turning a thrown exception into an error.
func call(v js.Value, method string, args ...any) (result js.Value, err error) {
	defer func() {
		if r := recover(); r != nil {
			if je, ok := r.(js.Error); ok {
				err = domError(je.Value)
				return
			}
			err = fmt.Errorf("the browser refused %s: %v", method, r)
		}
	}()
	return v.Call(method, args...), nil
}

// DOMError is an error the browser raised, such as "QuotaExceededError".
type DOMError struct {
	Name, Message string
}

func (e *DOMError) Error() string {
	if e.Name == "" {
		return e.Message
	}
	return e.Name + ": " + e.Message
}

// domError converts a DOMException (or anything thrown) into a *DOMError.
func domError(v js.Value) error {
	if v.Type() != js.TypeObject {
		return &DOMError{Message: "the browser's storage failed without saying why"}
	}
	return &DOMError{Name: v.Get("name").String(), Message: v.Get("message").String()}
}

// explain turns storage errors a user can act on into plain advice.
func explain(err error) error {
	var de *DOMError
	if !errors.As(err, &de) {
		return err
	}
	switch de.Name {
	case "QuotaExceededError":
		return fmt.Errorf("the browser's storage for this page is full; export the sessions you need, then delete old sessions or datasets (%w)", err)
	case "InvalidStateError":
		return fmt.Errorf("the stored data was closed by another tab that updated Quillcast; reload this page (%w)", err)
	case "UnknownError", "AbortError":
		return fmt.Errorf("the browser's storage failed; your work is still on the page, so export it before reloading (%w)", err)
	}
	return err
}
