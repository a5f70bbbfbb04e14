package series

import (
	"encoding/json"
	"errors"
	"flag"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

var update = flag.Bool("update", false, "rewrite the expected messages in testdata/bad")

// TestBadInputs reads every file in testdata/bad and compares the error
// with the message in the file of the same name ending in .want. A file
// ending in .json beside it holds the ReadOptions for the case. The
// messages are our own wording, checked by reading each one against its
// input; -update rewrites them.
func TestBadInputs(t *testing.T) {
	t.Parallel()
	files, err := filepath.Glob(filepath.Join("testdata", "bad", "*.csv"))
	if err != nil {
		t.Fatal(err)
	}
	if len(files) < 30 {
		t.Fatalf("the catalogue holds %d bad inputs, want at least 30", len(files))
	}
	for _, file := range files {
		name := strings.TrimSuffix(filepath.Base(file), ".csv")
		t.Run(name, func(t *testing.T) {
			t.Parallel()
			data, err := os.ReadFile(file)
			if err != nil {
				t.Fatal(err)
			}
			opt := badOptions(t, file)
			_, err = Read(data, filepath.Base(file), opt)
			if err == nil {
				t.Fatalf("Read(%q) succeeded, want an error", data)
			}
			var pe *ParseError
			if !errors.As(err, &pe) {
				t.Errorf("error %v holds no *ParseError", err)
			}
			got := err.Error() + "\n"
			wantFile := strings.TrimSuffix(file, ".csv") + ".want"
			if *update {
				if err := os.WriteFile(wantFile, []byte(got), 0o644); err != nil {
					t.Fatal(err)
				}
				return
			}
			want, err := os.ReadFile(wantFile)
			if err != nil {
				t.Fatal(err)
			}
			if got != string(want) {
				t.Errorf("Read(%q)\n got %s\nwant %s", data, got, want)
			}
		})
	}
}

// badOptions reads the options of a bad case, if it has any.
func badOptions(t *testing.T, file string) ReadOptions {
	t.Helper()
	var opt ReadOptions
	b, err := os.ReadFile(strings.TrimSuffix(file, ".csv") + ".json")
	if errors.Is(err, os.ErrNotExist) {
		return opt
	}
	if err != nil {
		t.Fatal(err)
	}
	if err := json.Unmarshal(b, &opt); err != nil {
		t.Fatalf("options of %s: %v", file, err)
	}
	return opt
}
