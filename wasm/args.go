//go:build js && wasm

package main

import (
	"encoding/json"
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

// jsonArg decodes args[i], JSON text, into v.
func jsonArg(args []js.Value, i int, what string, v any) error {
	s, err := stringArg(args, i, what)
	if err != nil {
		return err
	}
	if err := json.Unmarshal([]byte(s), v); err != nil {
		return fmt.Errorf("the page sent %s in a form the engine cannot read (%v); reload the page", what, err)
	}
	return nil
}

// intArg returns args[i] as a whole number.
func intArg(args []js.Value, i int, what string) (int, error) {
	if i >= len(args) || args[i].Type() != js.TypeNumber {
		return 0, fmt.Errorf("the page did not pass %s as a number", what)
	}
	return args[i].Int(), nil
}
