package main

import (
	"bytes"
	"compress/gzip"
	"crypto/sha256"
	"encoding/base64"
	"encoding/json"
	"fmt"
	"html"
	"maps"
	"slices"
	"strings"

	"quillcast/core/cmd/serve/static"
)

// hashSource returns the CSP hash source of an inline script or style.
func hashSource(text string) string {
	sum := sha256.Sum256([]byte(text))
	return "'sha256-" + base64.StdEncoding.EncodeToString(sum[:]) + "'"
}

// bundlePolicy allows exactly the inline scripts and styles of the bundle
// and the engine's chart style sheet; no connection, no outside file.
func bundlePolicy(scripts, styles []string) string {
	var s, st []string
	for _, x := range scripts {
		s = append(s, hashSource(x))
	}
	for _, x := range styles {
		st = append(st, hashSource(x))
	}
	for _, h := range static.StyleHashes() {
		st = append(st, "'"+h+"'")
	}
	return "default-src 'none'; " +
		"script-src " + strings.Join(s, " ") + " 'wasm-unsafe-eval'; " +
		"style-src " + strings.Join(st, " ") + "; " +
		"img-src data:; " +
		"worker-src blob:; " +
		"base-uri 'none'; " +
		"form-action 'none'"
}

// embeddedFiles returns the data block's JSON: the demo files, the worker and the
// gzip-compressed engine, base64-encoded, by name.
func embeddedFiles(files siteFiles) (string, error) {
	out := map[string]string{}
	for _, name := range slices.Sorted(maps.Keys(files)) {
		if strings.HasPrefix(name, "demo/") || name == "worker.js" {
			out[name] = base64.StdEncoding.EncodeToString(files[name])
		}
	}
	var gz bytes.Buffer
	zw, err := gzip.NewWriterLevel(&gz, gzip.BestCompression)
	if err != nil {
		return "", err
	}
	if _, err := zw.Write(files["quillcast.wasm"]); err != nil {
		return "", err
	}
	if err := zw.Close(); err != nil {
		return "", err
	}
	out["quillcast.wasm.gz"] = base64.StdEncoding.EncodeToString(gz.Bytes())
	b, err := json.Marshal(out)
	return string(b), err
}

// inlineSafe refuses text that would end its inline element early.
func inlineSafe(name, text, closing string) error {
	if strings.Contains(strings.ToLower(text), closing) {
		return fmt.Errorf("%s contains %q and cannot be placed inline", name, closing)
	}
	return nil
}

// buildBundle returns the single-file page.
func buildBundle(files siteFiles) (string, error) {
	app, err := joinModules(files, "app.js")
	if err != nil {
		return "", err
	}
	runtime := string(files["wasm_exec.js"])
	style := string(files["style.css"])
	for _, c := range []struct{ name, text, closing string }{
		{"wasm_exec.js", runtime, "</script"}, {"the joined modules", app, "</script"}, {"style.css", style, "</style"},
	} {
		if err := inlineSafe(c.name, c.text, c.closing); err != nil {
			return "", err
		}
	}
	data, err := embeddedFiles(files)
	if err != nil {
		return "", err
	}
	page := string(files["index.html"])
	page = strings.Replace(page, styleRef, "<style>"+style+"</style>", 1)
	page = strings.Replace(page, runtimRef, "<script>"+runtime+"</script>", 1)
	page = strings.Replace(page, appRef, `<script type="module">`+app+"</script>", 1)
	page = strings.Replace(page, engineRef+"\n", "", 1) // the engine is inside the page: nothing to fetch
	page = strings.Replace(page, engineRef, "", 1)
	meta := `<meta http-equiv="Content-Security-Policy" content="` + html.EscapeString(bundlePolicy([]string{runtime, app}, []string{style})) + `">`
	page = strings.Replace(page, `<meta charset="utf-8">`, `<meta charset="utf-8">`+"\n"+meta, 1)
	page = strings.Replace(page, "</body>", `<script type="application/json" id="quillcast-files">`+data+"</script>\n</body>", 1)
	return page, nil
}
