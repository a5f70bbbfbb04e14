//go:build js && wasm

package main

import (
	"fmt"
	"syscall/js"
)

// stringArg returns args[i] as a string; what names the argument for the
// error message.
func stringArg(args []js.Value, i int, what string) (string, error) {
	if i >= len(args) || args[i].Type() != js.TypeString {
		return "", fmt.Errorf("the page did not pass %s as text", what)
	}
	return args[i].String(), nil
}

// bytesArg copies args[i], a Uint8Array, into Go memory.
func bytesArg(args []js.Value, i int, what string) ([]byte, error) {
	if i >= len(args) || !args[i].InstanceOf(js.Global().Get("Uint8Array")) {
		return nil, fmt.Errorf("the page did not pass %s as bytes", what)
	}
	b := make([]byte, args[i].Get("length").Int())
	js.CopyBytesToGo(b, args[i])
	return b, nil
}
