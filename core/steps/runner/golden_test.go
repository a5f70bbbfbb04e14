package runner

import (
	"bytes"
	"encoding/json"
	"flag"
	"os"
	"path/filepath"
	"strconv"
	"testing"

	"quillcast/core/memo"
)

var update = flag.Bool("update", false, "rewrite the golden files in testdata")

// golden compares got with testdata/name, or rewrites the file under -update.
func golden(t *testing.T, name string, got []byte) {
	t.Helper()
	path := filepath.Join("testdata", name)
	if *update {
		if err := os.MkdirAll("testdata", 0o755); err != nil {
			t.Fatal(err)
		}
		if err := os.WriteFile(path, got, 0o644); err != nil {
			t.Fatal(err)
		}
		return
	}
	want, err := os.ReadFile(path)
	if err != nil {
		t.Fatalf("%v (run go test -update to write it)", err)
	}
	if !bytes.Equal(got, want) {
		t.Errorf("%s differs from the golden file; run go test -update after checking the change\n%s", name, firstDiff(got, want))
	}
}

func firstDiff(got, want []byte) string {
	gl, wl := bytes.Split(got, []byte("\n")), bytes.Split(want, []byte("\n"))
	for i := range min(len(gl), len(wl)) {
		if !bytes.Equal(gl[i], wl[i]) {
			return "line " + itoa(i+1) + ":\n got: " + string(gl[i]) + "\nwant: " + string(wl[i])
		}
	}
	return "lengths differ: " + itoa(len(gl)) + " and " + itoa(len(wl)) + " lines"
}

func itoa(n int) string { return strconv.Itoa(n) }

// TestDemoMemo runs the demo session (regression values: our own past
// output, reviewed by hand) and compares the memo with the golden file.
func TestDemoMemo(t *testing.T) {
	t.Parallel()
	res := New().Run(t.Context(), sessionFile(t, "demo.md"), demoData(t))
	for _, e := range res.Errors {
		t.Errorf("demo step failed: %v", e)
	}
	m := res.Memo("test")
	if missing := m.Missing(); len(missing) > 0 {
		t.Errorf("the demo memo lacks sections %v", missing)
	}
	md, err := memo.Markdown(m)
	if err != nil {
		t.Fatal(err)
	}
	golden(t, "demo-memo.md", []byte(md))
	if _, err := memo.HTML(m); err != nil {
		t.Errorf("HTML: %v", err)
	}
	var zip bytes.Buffer
	if err := memo.Zip(&zip, m, res.ForecastSheet()); err != nil {
		t.Errorf("zip: %v", err)
	}
}

// TestDeterministic checks that the same session and data give the same
// bytes, whether run afresh or re-run on a runner that reuses results.
func TestDeterministic(t *testing.T) {
	t.Parallel()
	doc, data := sessionFile(t, "demo.md"), demoData(t)
	r := New()
	first, err := json.Marshal(r.Run(t.Context(), doc, data))
	if err != nil {
		t.Fatalf("the result does not encode as JSON: %v", err)
	}
	again, _ := json.Marshal(r.Run(t.Context(), doc, data))
	fresh, _ := json.Marshal(New().Run(t.Context(), doc, data))
	if !bytes.Equal(first, again) || !bytes.Equal(first, fresh) {
		t.Error("the same session and data gave different outputs")
	}
}

// TestDemoSessions runs every demo session of testdata/sessions on the demo
// data: none may fail, and each memo must be complete.
func TestDemoSessions(t *testing.T) {
	t.Parallel()
	data := demoData(t)
	for _, name := range []string{"demo.md", "shops-bakeoff.md"} {
		t.Run(name, func(t *testing.T) {
			res := New().Run(t.Context(), sessionFile(t, name), data)
			for _, e := range res.Errors {
				t.Errorf("step failed: %v", e)
			}
			for _, o := range res.Outputs {
				if o.Status != Done {
					t.Errorf("step %d (%s): %s", o.Step, o.Text, o.Status)
				}
			}
			m := res.Memo("test")
			if missing := m.Missing(); len(missing) > 0 {
				t.Errorf("memo lacks sections %v", missing)
			}
			if _, err := memo.Markdown(m); err != nil {
				t.Error(err)
			}
		})
	}
}
