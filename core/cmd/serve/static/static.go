// Package static serves a built Quillcast site from a folder: the page, its
// script and style, the WebAssembly engine and the demo files.
//
// It exists so that `make serve` needs nothing but Go, and so that the
// browser tests can start the same server in-process with [Handler]. Every
// response carries the page's Content-Security-Policy ([Policy]) and a MIME
// type chosen from a fixed table ([ContentType]), so a browser gets
// `application/wasm` for the engine whatever the machine's MIME database
// says. Names that carry a content hash (`app.3f9a2c1be0.js`) are cached for a
// year; everything else is revalidated on each load.
package static

import (
	"crypto/sha256"
	"encoding/base64"
	"net/http"
	"os"
	"path"
	"path/filepath"
	"regexp"
	"strings"

	"quillcast/core/chart"
)

// Policy returns the Content-Security-Policy sent with every response.
// Scripts and styles come only from the site itself, plus the one style
// sheet every engine chart embeds, allowed by its SHA-256 hash; WebAssembly
// may be compiled; connections go only to the site itself (to fetch the
// engine and the demo files); workers may come from the site or from Blob
// URLs. Nothing may be framed, posted or loaded from elsewhere.
func Policy() string {
	styles := "'self'"
	for _, h := range StyleHashes() {
		styles += " '" + h + "'"
	}
	return "default-src 'none'; " +
		"script-src 'self' 'wasm-unsafe-eval'; " +
		"style-src " + styles + "; " +
		"img-src 'self' data:; " +
		"connect-src 'self'; " +
		"worker-src 'self' blob:; " +
		"base-uri 'none'; " +
		"form-action 'none'; " +
		"frame-ancestors 'none'"
}

// MetaPolicy returns [Policy] in the form a <meta http-equiv> element can
// carry: browsers ignore frame-ancestors there (and say so in the console),
// so it is left out. Static hosts that send no header rely on it.
func MetaPolicy() string {
	return strings.TrimSuffix(Policy(), "; frame-ancestors 'none'")
}

// StyleHashes returns the CSP hash sources ("sha256-…") of the inline style
// sheet the engine writes into its SVG charts ([chart.StyleSheet]), so that
// charts shown inline keep their look under a policy that refuses other
// inline styles.
func StyleHashes() []string {
	sum := sha256.Sum256([]byte(chart.StyleSheet))
	return []string{"sha256-" + base64.StdEncoding.EncodeToString(sum[:])}
}

// contentTypes maps a lower-case file extension to the Content-Type sent.
var contentTypes = map[string]string{
	".html": "text/html; charset=utf-8",
	".css":  "text/css; charset=utf-8",
	".js":   "text/javascript; charset=utf-8",
	".mjs":  "text/javascript; charset=utf-8",
	".wasm": "application/wasm",
	".svg":  "image/svg+xml",
	".png":  "image/png",
	".ico":  "image/x-icon",
	".json": "application/json",
	".md":   "text/markdown; charset=utf-8",
	".csv":  "text/csv; charset=utf-8",
	".tsv":  "text/tab-separated-values; charset=utf-8",
	".txt":  "text/plain; charset=utf-8",
	".zip":  "application/zip",
	".gz":   "application/gzip",
}

// hashedName matches a path whose file name carries a content hash of at
// least eight hex digits before its extension ("quillcast.0a1b2c3d4e.wasm"),
// or that lies in a content-hashed folder ("assets-0a1b2c3d4e5f/app.js",
// as `make dist` writes).
var hashedName = regexp.MustCompile(`\.[0-9a-f]{8,}\.[a-z0-9]+$|(^|/)assets-[0-9a-f]{8,}/`)

// ContentType returns the Content-Type for a file name, or
// "application/octet-stream" for an extension not in the table.
func ContentType(name string) string {
	if t, ok := contentTypes[strings.ToLower(path.Ext(name))]; ok {
		return t
	}
	return "application/octet-stream"
}

// CacheControl returns the Cache-Control value for a file's path: a year and
// immutable for content-hashed names and folders, revalidate on every load
// otherwise.
func CacheControl(name string) string {
	if hashedName.MatchString(name) {
		return "public, max-age=31536000, immutable"
	}
	return "no-cache"
}

// Handler serves the files under dir. Only GET and HEAD are answered; names
// with a segment starting with "." and folders without an index.html are not
// found, so nothing but the site itself is ever listed or sent.
func Handler(dir string) http.Handler {
	files := http.FileServer(http.Dir(dir))
	policy := Policy()
	return http.HandlerFunc(func(w http.ResponseWriter, r *http.Request) {
		h := w.Header()
		h.Set("Content-Security-Policy", policy)
		h.Set("X-Content-Type-Options", "nosniff")
		h.Set("Referrer-Policy", "no-referrer")
		if r.Method != http.MethodGet && r.Method != http.MethodHead {
			h.Set("Allow", "GET, HEAD")
			http.Error(w, "only GET and HEAD are served", http.StatusMethodNotAllowed)
			return
		}
		name := path.Clean("/" + r.URL.Path)
		if hidden(name) || !servable(dir, name) {
			http.NotFound(w, r)
			return
		}
		file := name
		if strings.HasSuffix(r.URL.Path, "/") {
			file = path.Join(name, "index.html")
		}
		h.Set("Content-Type", ContentType(file))
		h.Set("Cache-Control", CacheControl(file))
		files.ServeHTTP(w, r)
	})
}

// hidden reports whether a cleaned URL path has a segment starting with ".".
func hidden(name string) bool {
	for _, seg := range strings.Split(name, "/") {
		if strings.HasPrefix(seg, ".") {
			return true
		}
	}
	return false
}

// servable reports whether name is a regular file under dir, or a folder
// holding an index.html.
func servable(dir, name string) bool {
	p := filepath.Join(dir, filepath.FromSlash(name))
	st, err := os.Stat(p)
	if err != nil {
		return false
	}
	if !st.IsDir() {
		return st.Mode().IsRegular()
	}
	st, err = os.Stat(filepath.Join(p, "index.html"))
	return err == nil && st.Mode().IsRegular()
}
