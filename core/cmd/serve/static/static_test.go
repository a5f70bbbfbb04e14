package static

import (
	"crypto/sha256"
	"encoding/base64"
	"net/http"
	"net/http/httptest"
	"os"
	"path/filepath"
	"regexp"
	"strings"
	"testing"

	"quillcast/core/chart"
)

func writeSite(t *testing.T) string {
	t.Helper()
	dir := t.TempDir()
	files := map[string]string{
		"index.html":                 "<!doctype html><title>q</title>",
		"app.js":                     "export {}",
		"quillcast.wasm":             "\x00asm",
		"quillcast.0a1b2c3d4e.wasm":  "\x00asm",
		"demo/orders.csv":            "month,units\n2024-01,5\n",
		"demo/demo.md":               "# demo\n",
		"chart.svg":                  "<svg/>",
		"assets-0a1b2c3d4e5f/app.js": "export {}",
		"lib/worker.mjs":             "export {}",
		".secret":                    "no",
		"empty/readme.txt":           "no index here",
	}
	for name, body := range files {
		p := filepath.Join(dir, filepath.FromSlash(name))
		if err := os.MkdirAll(filepath.Dir(p), 0o755); err != nil {
			t.Fatal(err)
		}
		if err := os.WriteFile(p, []byte(body), 0o644); err != nil {
			t.Fatal(err)
		}
	}
	return dir
}

func TestHandler(t *testing.T) {
	t.Parallel()
	srv := httptest.NewServer(Handler(writeSite(t)))
	defer srv.Close()
	tests := []struct {
		name, method, path string
		status             int
		contentType        string
		cache              string
	}{
		{"page", "GET", "/", 200, "text/html; charset=utf-8", "no-cache"},
		{"script", "GET", "/app.js", 200, "text/javascript; charset=utf-8", "no-cache"},
		{"module", "GET", "/lib/worker.mjs", 200, "text/javascript; charset=utf-8", "no-cache"},
		{"engine", "GET", "/quillcast.wasm", 200, "application/wasm", "no-cache"},
		{"hashed engine", "GET", "/quillcast.0a1b2c3d4e.wasm", 200, "application/wasm", "public, max-age=31536000, immutable"},
		{"hashed folder", "GET", "/assets-0a1b2c3d4e5f/app.js", 200, "text/javascript; charset=utf-8", "public, max-age=31536000, immutable"},
		{"csv", "GET", "/demo/orders.csv", 200, "text/csv; charset=utf-8", "no-cache"},
		{"markdown", "GET", "/demo/demo.md", 200, "text/markdown; charset=utf-8", "no-cache"},
		{"svg", "GET", "/chart.svg", 200, "image/svg+xml", "no-cache"},
		{"head", "HEAD", "/quillcast.wasm", 200, "application/wasm", "no-cache"},
		{"dot file", "GET", "/.secret", 404, "", ""},
		{"folder without index", "GET", "/empty/", 404, "", ""},
		{"missing", "GET", "/nothing.js", 404, "", ""},
		{"escape", "GET", "/../../etc/passwd", 404, "", ""},
		{"post", "POST", "/app.js", 405, "", ""},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			req, err := http.NewRequest(tc.method, srv.URL+tc.path, nil)
			if err != nil {
				t.Fatal(err)
			}
			res, err := http.DefaultClient.Do(req)
			if err != nil {
				t.Fatal(err)
			}
			res.Body.Close()
			if res.StatusCode != tc.status {
				t.Fatalf("%s %s: status %d, want %d", tc.method, tc.path, res.StatusCode, tc.status)
			}
			if got := res.Header.Get("Content-Security-Policy"); got != Policy() {
				t.Errorf("%s %s: Content-Security-Policy %q, want %q", tc.method, tc.path, got, Policy())
			}
			if tc.status != 200 {
				return
			}
			if got := res.Header.Get("Content-Type"); got != tc.contentType {
				t.Errorf("%s %s: Content-Type %q, want %q", tc.method, tc.path, got, tc.contentType)
			}
			if got := res.Header.Get("Cache-Control"); got != tc.cache {
				t.Errorf("%s %s: Cache-Control %q, want %q", tc.method, tc.path, got, tc.cache)
			}
		})
	}
}

func TestPolicyKeepsThePageLocal(t *testing.T) {
	t.Parallel()
	// The privacy promise of the design: nothing but our own origin may be
	// contacted, and WebAssembly may be compiled (common practice for a
	// Go-compiled page).
	policy := Policy()
	for _, want := range []string{"default-src 'none'", "connect-src 'self'", "'wasm-unsafe-eval'", "style-src 'self' 'sha256-"} {
		if !strings.Contains(policy, want) {
			t.Errorf("Policy() = %q lacks %q", policy, want)
		}
	}
	for _, bad := range []string{"unsafe-inline", "'unsafe-eval'", "http:", "https:", "*"} {
		if strings.Contains(policy, bad) {
			t.Errorf("Policy() = %q allows %q", policy, bad)
		}
	}
}

func TestMetaPolicy(t *testing.T) {
	t.Parallel()
	meta := MetaPolicy()
	if strings.Contains(meta, "frame-ancestors") {
		t.Errorf("MetaPolicy() = %q carries frame-ancestors, which a meta element cannot", meta)
	}
	if !strings.HasPrefix(Policy(), meta) || !strings.Contains(meta, "connect-src 'self'") {
		t.Errorf("MetaPolicy() = %q is not Policy() without its last directive", meta)
	}
}

func TestContentTypeUnknown(t *testing.T) {
	t.Parallel()
	if got := ContentType("archive.xyz"); got != "application/octet-stream" {
		t.Errorf("ContentType(archive.xyz) = %q, want application/octet-stream", got)
	}
	if got := ContentType("DATA.CSV"); got != "text/csv; charset=utf-8" {
		t.Errorf("ContentType(DATA.CSV) = %q, want text/csv", got)
	}
}

// TestPolicyAllowsChartStyles draws charts of two kinds and checks that the
// hash of each one's <style> text is among the policy's style sources.
func TestPolicyAllowsChartStyles(t *testing.T) {
	t.Parallel()
	charts := map[string]string{
		"line": chart.Line{Periods: []string{"2024-01", "2024-02"}, Series: []chart.Series{{Name: "units", Values: []float64{1, 2}}}}.SVG(),
		"bars": chart.Bars{Labels: []string{"1", "2"}, Series: []chart.Series{{Name: "MASE", Values: []float64{0.5, 0.7}}}}.SVG(),
	}
	policy := Policy()
	for name, svg := range charts {
		m := regexp.MustCompile(`(?s)<style>(.*?)</style>`).FindStringSubmatch(svg)
		if m == nil {
			t.Errorf("%s chart: no style element", name)
			continue
		}
		sum := sha256.Sum256([]byte(m[1]))
		if h := "'sha256-" + base64.StdEncoding.EncodeToString(sum[:]) + "'"; !strings.Contains(policy, h) {
			t.Errorf("%s chart: the policy lacks its style hash %s", name, h)
		}
	}
}
