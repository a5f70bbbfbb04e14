//go:build js && wasm

package main

import (
	"fmt"
	"reflect"
	"strings"
	"syscall/js"
	"testing"

	"quillcast/core/steps/runner"
)

func TestAnswerOf(t *testing.T) {
	tests := []struct {
		name, text, want, wantErr string
	}{
		{"value", `{"ok":true,"value":[{"forecasts":[[1.5]],"skips":[""]}]}`, `[{"forecasts":[[1.5]],"skips":[""]}]`, ""},
		{"engine error", `{"ok":false,"error":{"message":"the part of the bake-off names no methods"}}`, "", "names no methods"},
		{"error without words", `{"ok":false}`, "", "without saying why"},
		{"garbled", `{"ok":tru`, "", "could not be read"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			got, err := answerOf(tc.text)
			if tc.wantErr != "" {
				if err == nil || !strings.Contains(err.Error(), tc.wantErr) {
					t.Errorf("error %v, want one containing %q", err, tc.wantErr)
				}
				return
			}
			if err != nil || string(got) != tc.want {
				t.Errorf("answerOf = %s, %v; want %s", got, err, tc.want)
			}
		})
	}
}

// pageStandIn is a stand-in for what worker.js offers: size places whose
// run answers with this engine's bakeoffPart through a Promise, as a
// further worker does, or rejects when refuse is set.
func pageStandIn(a *app, size int, refuse bool) (js.Value, js.Func) {
	run := js.FuncOf(func(this js.Value, args []js.Value) any {
		req := args[0]
		if refuse {
			return js.Global().Get("Promise").Call("reject", js.Global().Get("Error").New("the worker could not start"))
		}
		return newPromise(func(resolve func(string)) {
			go func() { resolve(encode(a.bakeoffPart([]js.Value{req}))) }()
		})
	})
	h := js.Global().Get("Object").New()
	h.Set("size", size)
	h.Set("why", "the page was opened as a single file")
	h.Set("run", run)
	return h, run
}

// TestBakeoffAcrossWorkers runs a bake-off step with and without the page's
// further workers and checks that the table is the same and that the step
// says where it ran.
func TestBakeoffAcrossWorkers(t *testing.T) {
	a := testApp()
	var csv strings.Builder
	csv.WriteString("shop,month,units\n")
	for s, shop := range []string{"Harbour Row", "Old Mill", "Quay Street"} {
		for m := range 30 {
			fmt.Fprintf(&csv, "%s,%d-%02d,%d\n", shop, 2022+m/12, m%12+1, 40+7*s+m%5*(s+1)+m/3)
		}
	}
	if _, err := a.attach([]js.Value{bytesValue(csv.String()), js.ValueOf("shops.csv")}); err != nil {
		t.Fatal(err)
	}
	parts := `[{"kind":"steps","lines":[{"text":"load shops.csv date=month"},{"text":"bakeoff methods=naive,ses,theta last=6"}]}]`
	runWith := func(offer js.Value) runner.Output {
		t.Helper()
		if offer.IsUndefined() {
			js.Global().Delete(poolGlobal)
		} else {
			js.Global().Set(poolGlobal, offer)
			defer js.Global().Delete(poolGlobal)
		}
		// A fresh runner each time, so that the step is not reused.
		a.mu.Lock()
		a.run = runner.New()
		a.mu.Unlock()
		v, err := a.runSession([]js.Value{js.ValueOf(parts)})
		if err != nil {
			t.Fatal(err)
		}
		out := v.(ran).Result.Outputs
		if len(out) != 2 || out[1].Status != runner.Done {
			t.Fatalf("run: %+v", out)
		}
		return out[1].Output
	}
	tableOf := func(o runner.Output) *runner.Table {
		for _, b := range o.Blocks {
			if b.Kind == "table" {
				return b.Table
			}
		}
		t.Fatal("the bake-off shows no table")
		return nil
	}
	want := runWith(js.Undefined())
	tests := []struct {
		name   string
		size   int
		refuse bool
		note   string
	}{
		{"two workers", 2, false, "The bake-off was shared among 2 workers."},
		{"no workers", 0, false, "The bake-off ran in one worker: the page was opened as a single file."},
		{"workers fail", 3, true, "Part of the bake-off ran in one worker because another worker could not run it: the worker could not start."},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			h, run := pageStandIn(a, tc.size, tc.refuse)
			defer run.Release()
			got := runWith(h)
			if !reflect.DeepEqual(tableOf(got), tableOf(want)) {
				t.Errorf("table %+v, want %+v (one worker)", tableOf(got), tableOf(want))
			}
			text := ""
			for _, b := range got.Blocks {
				text += b.Text + "\n"
			}
			if !strings.Contains(text, tc.note) {
				t.Errorf("bake-off output lacks %q:\n%s", tc.note, text)
			}
		})
	}
}
