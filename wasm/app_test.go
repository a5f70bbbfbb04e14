//go:build js && wasm

package main

import (
	"encoding/json"
	"errors"
	"fmt"
	"strings"
	"syscall/js"
	"testing"

	"quillcast/core/steps"
	"quillcast/wasm/store"
)

// testApp returns an app whose store is in memory, as where the browser
// offers no IndexedDB.
func testApp() *app {
	a := newApp()
	a.storeOnce.Do(func() {
		a.backend = store.NewMemory()
		a.sessions = store.NewSessions(a.backend, now, newID)
		a.sets = store.NewDatasets(a.backend, now)
	})
	return a
}

func bytesValue(s string) js.Value {
	u8 := js.Global().Get("Uint8Array").New(len(s))
	js.CopyBytesToJS(u8, []byte(s))
	return u8
}

const ordersCSV = "month,units\n2024-01,10\n2024-02,12\n2024-03,11\n2024-04,13\n2024-05,15\n2024-06,14\n"

func TestAttachAndExport(t *testing.T) {
	a := testApp()
	v, err := a.attach([]js.Value{bytesValue(ordersCSV), js.ValueOf("orders.csv")})
	if err != nil {
		t.Fatalf("attach: %v", err)
	}
	p := v.(preview)
	if len(p.Series) != 1 || p.Series[0].Name != "units" || len(p.Series[0].Head) != 6 || !strings.HasPrefix(p.Series[0].Chart, "<svg") {
		t.Fatalf("preview of a six-month file: %+v", p)
	}
	if got, want := p.Series[0].Step, "load orders.csv value=units date=month"; got != want {
		t.Errorf("load step for the series: %q, want %q", got, want)
	}
	if len(p.Bakeoff) != 0 {
		t.Errorf("a one-series file offers a bake-off: %q", p.Bakeoff)
	}
	if list, _ := a.sets.List(); len(list) != 1 || list[0].Name != "orders.csv" {
		t.Errorf("the attached file is not stored: %+v", list)
	}
	parts := `[{"kind":"prose","text":"# Orders\n"},{"kind":"steps","lines":[{"text":"load orders.csv value=units date=month"}]}]`
	tests := []struct {
		name     string
		withData bool
		want     []string
		not      []string
	}{
		{"steps only", false, []string{"# Orders", "```quill\nload orders.csv"}, []string{"quill-data", "2024-03,11"}},
		{"with data", true, []string{"```quill-data orders.csv\n", "2024-03,11"}, nil},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			out, err := a.exportSession([]js.Value{js.ValueOf(parts), js.ValueOf(tc.withData)})
			if err != nil {
				t.Fatal(err)
			}
			text := out.(string)
			for _, w := range tc.want {
				if !strings.Contains(text, w) {
					t.Errorf("session file lacks %q:\n%s", w, text)
				}
			}
			for _, n := range tc.not {
				if strings.Contains(text, n) {
					t.Errorf("session file carries %q:\n%s", n, text)
				}
			}
		})
	}
	missing := `[{"kind":"steps","lines":[{"text":"load other.csv"}]}]`
	if _, err := a.exportSession([]js.Value{js.ValueOf(missing), js.ValueOf(true)}); err == nil || !strings.Contains(err.Error(), "not attached") {
		t.Errorf("exporting with data a session whose file is missing: %v, want a 'not attached' error", err)
	}
}

func TestLongFileSteps(t *testing.T) {
	a := testApp()
	csv := "shop,month,units\n"
	for _, shop := range []string{"Harbour Row", "Old Mill"} {
		for m := 1; m <= 6; m++ {
			csv += fmt.Sprintf("%s,2024-%02d,%d\n", shop, m, 10+m)
		}
	}
	v, err := a.attach([]js.Value{bytesValue(csv), js.ValueOf("shops.csv")})
	if err != nil {
		t.Fatal(err)
	}
	p := v.(preview)
	if len(p.Series) != 2 {
		t.Fatalf("%d series, want 2", len(p.Series))
	}
	if got, want := p.Series[0].Step, `load shops.csv series="Harbour Row" date=month`; got != want {
		t.Errorf("load step of the first shop: %q, want %q", got, want)
	}
	if got, want := strings.Join(p.Bakeoff, " | "), "load shops.csv date=month | bakeoff"; got != want {
		t.Errorf("bake-off steps: %q, want %q", got, want)
	}
}

func TestMemoNeedsARun(t *testing.T) {
	a := testApp()
	if _, err := a.memoOf([]js.Value{js.ValueOf("md")}); err == nil || !strings.Contains(err.Error(), "run the steps first") {
		t.Errorf("memo before any run: %v, want 'run the steps first'", err)
	}
}

func TestFailureData(t *testing.T) {
	tests := []struct {
		name string
		err  error
		want Failure
	}{
		{"step error", &steps.Error{Step: 2, Line: 7, Column: 14, Msg: "unknown option"}, Failure{Message: "line 7, column 14: unknown option", Step: 2, Line: 7, Column: 14}},
		{"conflict", fmt.Errorf("%w (version 3 there, 2 here)", store.ErrConflict), Failure{Message: store.ErrConflict.Error() + " (version 3 there, 2 here)", Code: "conflict"}},
		{"quota", fmt.Errorf("%w (QuotaExceededError)", store.ErrQuota), Failure{Message: store.ErrQuota.Error() + " (QuotaExceededError)", Code: "quota"}},
		{"plain", errors.New("no such file"), Failure{Message: "no such file"}},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			got, _ := json.Marshal(failureOf(tc.err))
			want, _ := json.Marshal(tc.want)
			if string(got) != string(want) {
				t.Errorf("failureOf(%v) = %s, want %s", tc.err, got, want)
			}
		})
	}
}

// TestRunSendsChangedOnly checks that a run leaves out the blocks of the
// outputs the page says it holds, and only of those.
func TestRunSendsChangedOnly(t *testing.T) {
	a := testApp()
	if _, err := a.attach([]js.Value{bytesValue(ordersCSV), js.ValueOf("orders.csv")}); err != nil {
		t.Fatal(err)
	}
	session := func(last string) string {
		return `[{"kind":"steps","lines":[{"text":"load orders.csv value=units date=month"},{"text":"` + last + `"}]}]`
	}
	run := func(parts string, held []string) pageResult {
		t.Helper()
		args := []js.Value{js.ValueOf(parts)}
		if held != nil {
			b, _ := json.Marshal(held)
			args = append(args, js.ValueOf(string(b)))
		}
		v, err := a.runSession(args)
		if err != nil {
			t.Fatal(err)
		}
		return v.(ran).Result
	}
	first := run(session("split last=2"), nil)
	var keys []string
	for _, o := range first.Outputs {
		if o.Kept || len(o.Blocks) == 0 || o.Key == "" {
			t.Fatalf("first run, step %d: kept %v, %d blocks, key %q; want every block and a key", o.Step, o.Kept, len(o.Blocks), o.Key)
		}
		keys = append(keys, o.Key)
	}
	tests := []struct {
		name string
		last string
		held []string
		kept []bool // per step
	}{
		{"the page holds nothing", "split last=2", []string{}, []bool{false, false}},
		{"same session, all held", "split last=2", keys, []bool{true, true}},
		{"last step edited", "split last=3", keys, []bool{true, false}},
		{"unknown keys", "split last=2", []string{"0123456789abcdef"}, []bool{false, false}},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			res := run(session(tc.last), tc.held)
			for i, o := range res.Outputs {
				if o.Kept != tc.kept[i] || (o.Kept && o.Blocks != nil) || (!o.Kept && len(o.Blocks) == 0) {
					t.Errorf("step %d: kept %v with %d blocks, want kept %v", i+1, o.Kept, len(o.Blocks), tc.kept[i])
				}
			}
		})
	}
	if _, err := a.runSession([]js.Value{js.ValueOf(session("split last=2")), js.ValueOf("[1,")}); err == nil {
		t.Error("a garbled list of held outputs was accepted")
	}
}
