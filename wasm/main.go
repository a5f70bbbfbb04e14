//go:build js && wasm

// Command wasm is the Quillcast engine as the page sees it: the WebAssembly
// module built from this folder registers one JavaScript object,
// globalThis.quillcast, whose functions take plain values (strings and
// Uint8Array bytes) and answer with JSON text:
//
//	{"ok":true,"value":...}  or  {"ok":false,"error":{"message":...,"line":3,"column":7}}
//
// Quick calls answer at once; calls that may take a while return a Promise
// of that text. Every call runs under a recover, so a fault inside the
// engine becomes an error answer and the page keeps working. When the object
// is in place, quillcast.ready becomes true and a "quillcast-ready" event is
// dispatched on globalThis; main then waits forever so the functions stay
// callable.
package main

import "syscall/js"

func main() {
	a := newApp()
	api := js.Global().Get("Object").New()
	for name, f := range a.functions() {
		api.Set(name, f)
	}
	api.Set("version", version)
	api.Set("ready", true)
	js.Global().Set("quillcast", api)
	announceReady()
	select {}
}

// version names the bridge's API generation; the page refuses to run with
// an engine whose version it does not know.
const version = "1"

// announceReady dispatches the "quillcast-ready" event where the host has
// events (browsers; Node has no dispatchEvent on globalThis).
func announceReady() {
	g := js.Global()
	if g.Get("dispatchEvent").Type() != js.TypeFunction {
		return
	}
	g.Call("dispatchEvent", g.Get("Event").New("quillcast-ready"))
}
