//go:build js && wasm

package main

import (
	"encoding/json"
	"errors"
	"strings"
	"syscall/js"
	"testing"
)

func decodeEnvelope(t *testing.T, text string) envelope {
	t.Helper()
	var env struct {
		OK    bool            `json:"ok"`
		Value json.RawMessage `json:"value"`
		Error *Failure        `json:"error"`
	}
	if err := json.Unmarshal([]byte(text), &env); err != nil {
		t.Fatalf("answer %q is not JSON: %v", text, err)
	}
	out := envelope{OK: env.OK, Error: env.Error}
	if env.Value != nil {
		out.Value = string(env.Value)
	}
	return out
}

func TestExportedFunctionsNeverPanic(t *testing.T) {
	tests := []struct {
		name    string
		h       handler
		ok      bool
		value   string
		message string
	}{
		{"value", func([]js.Value) (any, error) { return map[string]int{"n": 3}, nil }, true, `{"n":3}`, ""},
		{"error", func([]js.Value) (any, error) { return nil, errors.New("line 2: no such column") }, false, "", "line 2: no such column"},
		{"panic", func([]js.Value) (any, error) { panic("boom") }, false, "", `the engine failed while doing "probe"`},
		{"runtime fault", func(args []js.Value) (any, error) { return args[5].String(), nil }, false, "", "your text and data are unchanged"},
		{"unencodable", func([]js.Value) (any, error) { return func() {}, nil }, false, "", "could not encode"},
	}
	for _, tc := range tests {
		t.Run(tc.name+"/sync", func(t *testing.T) {
			f := syncFunc("probe", tc.h)
			defer f.Release()
			checkEnvelope(t, f.Invoke().String(), tc.ok, tc.value, tc.message)
		})
		t.Run(tc.name+"/async", func(t *testing.T) {
			f := asyncFunc("probe", tc.h)
			defer f.Release()
			p := f.Invoke()
			if !p.InstanceOf(js.Global().Get("Promise")) {
				t.Fatalf("async function returned %s, want a Promise", p.Type())
			}
			v, err := await(p)
			if err != nil {
				t.Fatalf("the Promise was rejected: %v", err)
			}
			checkEnvelope(t, v.String(), tc.ok, tc.value, tc.message)
		})
	}
}

func checkEnvelope(t *testing.T, text string, ok bool, value, message string) {
	t.Helper()
	env := decodeEnvelope(t, text)
	if env.OK != ok {
		t.Fatalf("answer %s: ok = %v, want %v", text, env.OK, ok)
	}
	if ok {
		if env.Value != value {
			t.Errorf("answer %s: value %v, want %s", text, env.Value, value)
		}
		return
	}
	if env.Error == nil || !strings.Contains(env.Error.Message, message) {
		t.Errorf("answer %s: want an error containing %q", text, message)
	}
}

func TestAwaitRejection(t *testing.T) {
	p := js.Global().Get("Promise").Call("reject", js.Global().Get("Error").New("quota exceeded"))
	if _, err := await(p); err == nil || !strings.Contains(err.Error(), "quota exceeded") {
		t.Errorf("await(rejected) error = %v, want one containing %q", err, "quota exceeded")
	}
}

func TestArguments(t *testing.T) {
	u8 := js.Global().Get("Uint8Array").New(3)
	js.CopyBytesToJS(u8, []byte("a,b"))
	tests := []struct {
		name    string
		args    []js.Value
		wantErr string
	}{
		{"bytes and text", []js.Value{u8, js.ValueOf("orders.csv")}, ""},
		{"text where bytes belong", []js.Value{js.ValueOf("a,b"), js.ValueOf("orders.csv")}, "the file's contents as bytes"},
		{"missing name", []js.Value{u8}, "the file name as text"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			_, err := bytesArg(tc.args, 0, "the file's contents")
			if err == nil {
				_, err = stringArg(tc.args, 1, "the file name")
			}
			if tc.wantErr == "" {
				if err != nil {
					t.Fatalf("unexpected error %v", err)
				}
				return
			}
			if err == nil || !strings.Contains(err.Error(), tc.wantErr) {
				t.Errorf("error %v, want one containing %q", err, tc.wantErr)
			}
		})
	}
}
