// Package refdata finds the check material that lives outside the project:
// published handbook examples, reference-library values and open competition
// data, kept in a folder named "shared" beside the repository checkout.
//
// Tests call [Path] or [ReadJSON]; when the folder is missing the test is
// skipped, except under CI (the environment variable CI=true), where a
// missing folder fails the test so that no external check is silently lost.
package refdata

import (
	"encoding/json"
	"os"
	"path/filepath"
	"testing"
)

// Root returns the shared folder: the sibling named "shared" of the
// directory holding go.mod, found by walking up from the working directory.
// It returns "" when there is none.
func Root() string {
	dir, err := os.Getwd()
	if err != nil {
		return ""
	}
	for {
		if _, err := os.Stat(filepath.Join(dir, "go.mod")); err == nil {
			shared := filepath.Join(filepath.Dir(dir), "shared")
			if st, err := os.Stat(shared); err == nil && st.IsDir() {
				return shared
			}
			return ""
		}
		parent := filepath.Dir(dir)
		if parent == dir {
			return ""
		}
		dir = parent
	}
}

// Path returns the path of rel (slash-separated, relative to the shared
// folder, for example "reference/cases/trailing_ma_nile.json"). It skips the
// test when the shared folder or the file is missing, or fails it under CI.
func Path(tb testing.TB, rel string) string {
	tb.Helper()
	root := Root()
	if root == "" {
		missing(tb, "the shared check folder beside the checkout")
		return ""
	}
	p := filepath.Join(root, filepath.FromSlash(rel))
	if _, err := os.Stat(p); err != nil {
		missing(tb, rel)
		return ""
	}
	return p
}

// ReadJSON decodes the JSON file rel (see [Path]) into v.
// Decode arrays that may hold null into []*float64 or []any: JSON null
// becomes 0 inside a []float64.
func ReadJSON(tb testing.TB, rel string, v any) {
	tb.Helper()
	p := Path(tb, rel)
	b, err := os.ReadFile(p)
	if err != nil {
		tb.Fatalf("reading %s: %v", rel, err)
	}
	if err := json.Unmarshal(b, v); err != nil {
		tb.Fatalf("decoding %s: %v", rel, err)
	}
}

func missing(tb testing.TB, what string) {
	tb.Helper()
	if os.Getenv("CI") == "true" {
		tb.Fatalf("external check material not found: %s", what)
	}
	tb.Skipf("external check material not found: %s", what)
}
