//go:build js && wasm

package main

// This file holds the boundary rules every function handed to JavaScript
// follows: a panic never escapes (it becomes an error result and its stack
// goes to the console), and slow work settles a Promise from a goroutine so
// that no JavaScript callback ever blocks.

import (
	"encoding/json"
	"fmt"
	"runtime/debug"
	"syscall/js"
)

// envelope is what every exported function returns, encoded as JSON text:
// {"ok":true,"value":...} or {"ok":false,"error":{...}}.
type envelope struct {
	OK    bool     `json:"ok"`
	Value any      `json:"value,omitempty"`
	Error *Failure `json:"error,omitempty"`
}

// encode turns a result or an error into the JSON text of an envelope.
func encode(v any, err error) string {
	env := envelope{OK: err == nil, Value: v}
	if err != nil {
		f := failureOf(err)
		env = envelope{Error: &f}
	}
	b, jerr := json.Marshal(env)
	if jerr != nil {
		f := Failure{Message: "the engine could not encode its answer: " + jerr.Error()}
		b, _ = json.Marshal(envelope{Error: &f})
	}
	return string(b)
}

// handler is the Go side of an exported function: it receives the
// JavaScript arguments, already checked for count by the caller, and returns
// a value to encode as JSON or an error.
type handler func(args []js.Value) (any, error)

// protect calls h and turns a panic into an error, logging its stack to the
// browser console so the fault can be reported.
func protect(name string, h handler, args []js.Value) (v any, err error) {
	defer func() {
		if r := recover(); r != nil {
			stack := string(debug.Stack())
			js.Global().Get("console").Call("error", fmt.Sprintf("quillcast: %s failed inside the engine: %v\n%s", name, r, stack))
			v, err = nil, fmt.Errorf("the engine failed while doing %q (%v); your text and data are unchanged, and the details are in the browser console", name, r)
		}
	}()
	return h(args)
}

// syncFunc wraps h as a JavaScript function that returns the JSON envelope
// text at once. Use it only for quick work: it runs inside the caller's
// event-loop turn.
func syncFunc(name string, h handler) js.Func {
	return js.FuncOf(func(this js.Value, args []js.Value) any {
		return encode(protect(name, h, args))
	})
}

// asyncFunc wraps h as a JavaScript function that returns a Promise at once
// and settles it with the JSON envelope text from a goroutine, so h may wait
// for other Promises (IndexedDB) without blocking the page.
func asyncFunc(name string, h handler) js.Func {
	return js.FuncOf(func(this js.Value, args []js.Value) any {
		// Copy the arguments: the slice is only valid during this call.
		held := append([]js.Value(nil), args...)
		return newPromise(func(resolve func(string)) {
			go func() { resolve(encode(protect(name, h, held))) }()
		})
	})
}

// newPromise creates a JavaScript Promise; start receives the function that
// settles it and must not block. The executor function is released as soon
// as the Promise constructor has called it.
func newPromise(start func(resolve func(string))) js.Value {
	executor := js.FuncOf(func(this js.Value, args []js.Value) any {
		resolve := args[0]
		start(func(s string) { resolve.Invoke(s) })
		return nil
	})
	defer executor.Release()
	return js.Global().Get("Promise").New(executor)
}

// await waits for a JavaScript Promise from a goroutine (never from a
// callback) and returns its value, or its rejection as an error.
func await(p js.Value) (js.Value, error) {
	type outcome struct {
		v   js.Value
		err error
	}
	done := make(chan outcome, 1)
	onOK := js.FuncOf(func(this js.Value, args []js.Value) any {
		done <- outcome{v: arg0(args)}
		return nil
	})
	onErr := js.FuncOf(func(this js.Value, args []js.Value) any {
		done <- outcome{err: jsError(arg0(args))}
		return nil
	})
	defer onOK.Release()
	defer onErr.Release()
	p.Call("then", onOK, onErr)
	o := <-done
	return o.v, o.err
}

func arg0(args []js.Value) js.Value {
	if len(args) == 0 {
		return js.Undefined()
	}
	return args[0]
}

// jsError turns a JavaScript rejection reason into a Go error.
func jsError(v js.Value) error {
	if v.Type() == js.TypeObject {
		if name, msg := v.Get("name"), v.Get("message"); msg.Type() == js.TypeString {
			if name.Type() == js.TypeString {
				return &browserError{Name: name.String(), Message: msg.String()}
			}
			return &browserError{Message: msg.String()}
		}
	}
	return &browserError{Message: v.String()}
}

// browserError is an error raised by the browser (a DOMException from
// IndexedDB, for example). Name is the exception's name, such as
// "QuotaExceededError".
type browserError struct {
	Name, Message string
}

func (e *browserError) Error() string {
	if e.Name == "" {
		return e.Message
	}
	return e.Name + ": " + e.Message
}
