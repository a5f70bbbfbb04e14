package main

import (
	"archive/zip"
	"bytes"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

func root() string { return filepath.Join("..", "..", "..") }

func TestRunDemo(t *testing.T) {
	t.Parallel()
	out := t.TempDir()
	var stdout, stderr bytes.Buffer
	code := run([]string{
		"-session", filepath.Join(root(), "testdata", "sessions", "demo.md"),
		"-data", filepath.Join(root(), "testdata", "demo", "wickery-monthly-orders.csv"),
		"-out", out, "-version", "test",
	}, &stdout, &stderr)
	if code != 0 {
		t.Fatalf("exit %d: %s", code, stderr.String())
	}
	for _, name := range []string{"memo.md", "memo.html", "memo.zip", "forecasts.csv"} {
		if st, err := os.Stat(filepath.Join(out, name)); err != nil || st.Size() == 0 {
			t.Errorf("%s missing or empty: %v", name, err)
		}
	}
	charts, _ := filepath.Glob(filepath.Join(out, "charts", "*.svg"))
	if len(charts) < 5 {
		t.Errorf("%d charts written, want at least 5", len(charts))
	}
	md, _ := os.ReadFile(filepath.Join(out, "memo.md"))
	for _, c := range charts {
		if !strings.Contains(string(md), "charts/"+filepath.Base(c)) {
			t.Errorf("memo.md does not link %s", filepath.Base(c))
		}
	}
	b, _ := os.ReadFile(filepath.Join(out, "memo.zip"))
	zr, err := zip.NewReader(bytes.NewReader(b), int64(len(b)))
	if err != nil {
		t.Fatal(err)
	}
	names := map[string]bool{}
	for _, f := range zr.File {
		names[f.Name] = true
	}
	if !names["memo.md"] || !names["forecasts.csv"] {
		t.Errorf("zip holds %v", names)
	}
}

func TestRunErrors(t *testing.T) {
	t.Parallel()
	dir := t.TempDir()
	sess := filepath.Join(dir, "bad.md")
	text := "# Bad\n\n```quill\nload wickery-monthly-orders.csv\nsmooth centered widht=3\nsplit last=99999\n```\n"
	if err := os.WriteFile(sess, []byte(text), 0o644); err != nil {
		t.Fatal(err)
	}
	tests := []struct {
		name string
		args []string
		code int
		want []string
	}{
		{"step errors with positions", []string{"-session", sess, "-data", filepath.Join(root(), "testdata", "demo", "wickery-monthly-orders.csv"), "-out", filepath.Join(dir, "out")}, 1,
			[]string{"line 5, column 17: unknown option `widht` for `smooth`; did you mean `width`?", "line 6, column 1:", "nothing was written"}},
		{"missing session", []string{"-session", filepath.Join(dir, "none.md"), "-out", dir}, 1, []string{"cannot read the session"}},
		{"missing data file", []string{"-session", sess, "-data", filepath.Join(dir, "none.csv"), "-out", dir}, 1, []string{"cannot read the data file"}},
		{"no output folder", []string{"-session", sess}, 2, []string{"-out"}},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			var stdout, stderr bytes.Buffer
			if code := run(tc.args, &stdout, &stderr); code != tc.code {
				t.Errorf("exit %d, want %d: %s", code, tc.code, stderr.String())
			}
			for _, w := range tc.want {
				if !strings.Contains(stderr.String(), w) {
					t.Errorf("stderr lacks %q:\n%s", w, stderr.String())
				}
			}
		})
	}
	if _, err := os.Stat(filepath.Join(dir, "out")); err == nil {
		t.Error("an output folder was written despite the errors")
	}
}

// TestRunDataFolder attaches a whole folder, as `make memo` does with its
// default DATA=testdata/demo.
func TestRunDataFolder(t *testing.T) {
	t.Parallel()
	out := t.TempDir()
	var stdout, stderr bytes.Buffer
	code := run([]string{"-session", filepath.Join(root(), "testdata", "sessions", "shops-bakeoff.md"),
		"-data", filepath.Join(root(), "testdata", "demo"), "-out", out}, &stdout, &stderr)
	if code != 0 {
		t.Fatalf("exit %d: %s", code, stderr.String())
	}
}
