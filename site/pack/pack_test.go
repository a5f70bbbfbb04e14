package main

import (
	"os"
	"path/filepath"
	"strings"
	"testing"
)

func testSite() siteFiles {
	return siteFiles{
		"index.html":      []byte("<!doctype html>\n<head>\n<meta charset=\"utf-8\">\n" + styleRef + "\n" + runtimRef + "\n" + appRef + "\n" + engineRef + "\n</head>\n<body>\n<main></main>\n</body>\n"),
		"style.css":       []byte("body { color: black; }\n"),
		"wasm_exec.js":    []byte("globalThis.Go = class {};\n"),
		"quillcast.wasm":  []byte("\x00asm\x01\x00\x00\x00"),
		"worker.js":       []byte("self.onmessage = () => {};\n"),
		"app.js":          []byte("import { el } from \"./dom.js\";\nimport { call } from \"./engine.js\";\nel(call);\n"),
		"dom.js":          []byte("export function el(x) {\n  return x;\n}\n"),
		"engine.js":       []byte("import { el } from \"./dom.js\";\nexport async function call() {\n  return el(1);\n}\n"),
		"demo/orders.csv": []byte("month,units\n2024-01,5\n"),
	}
}

func TestJoinModules(t *testing.T) {
	got, err := joinModules(testSite(), "app.js")
	if err != nil {
		t.Fatal(err)
	}
	// Each module after what it imports; no import or export left.
	order := []string{"// --- dom.js", "// --- engine.js", "// --- app.js"}
	last := -1
	for _, mark := range order {
		i := strings.Index(got, mark)
		if i < last {
			t.Fatalf("modules out of order in:\n%s", got)
		}
		last = i
	}
	for _, bad := range []string{"import ", "export "} {
		if strings.Contains(got, bad) {
			t.Errorf("joined modules still contain %q:\n%s", bad, got)
		}
	}
	if !strings.Contains(got, "async function call()") {
		t.Errorf("the exported declaration lost its form:\n%s", got)
	}
}

func TestJoinModulesRefuses(t *testing.T) {
	tests := []struct {
		name    string
		change  map[string]string
		wantErr string
	}{
		{"other import form", map[string]string{"app.js": "import * as d from \"./dom.js\";\n"}, "understands only"},
		{"missing module", map[string]string{"app.js": "import { x } from \"./gone.js\";\n"}, "gone.js"},
		{"circle", map[string]string{"dom.js": "import { call } from \"./engine.js\";\nexport function el() {}\n"}, "circle"},
		{"same name twice", map[string]string{"engine.js": "export function el() {}\n", "app.js": "import { el } from \"./dom.js\";\nimport { call } from \"./engine.js\";\n"}, `both declare "el"`},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			files := testSite()
			for k, v := range tc.change {
				files[k] = []byte(v)
			}
			_, err := joinModules(files, "app.js")
			if err == nil || !strings.Contains(err.Error(), tc.wantErr) {
				t.Errorf("joinModules error %v, want one containing %q", err, tc.wantErr)
			}
		})
	}
}

func TestDist(t *testing.T) {
	out := filepath.Join(t.TempDir(), "dist")
	files := testSite()
	if err := writeDist(files, out); err != nil {
		t.Fatal(err)
	}
	entries, err := os.ReadDir(out)
	if err != nil {
		t.Fatal(err)
	}
	folder := ""
	for _, e := range entries {
		if e.IsDir() {
			folder = e.Name()
		}
	}
	if !strings.HasPrefix(folder, "assets-") || len(folder) != len("assets-")+12 {
		t.Fatalf("asset folder %q, want assets- and 12 hex digits", folder)
	}
	index, err := os.ReadFile(filepath.Join(out, "index.html"))
	if err != nil {
		t.Fatal(err)
	}
	for _, want := range []string{`href="` + folder + `/style.css"`, `src="` + folder + `/quillcast.js"`, `rel="preload" href="` + folder + `/quillcast.wasm"`, `http-equiv="Content-Security-Policy"`, "connect-src &#39;self&#39;"} {
		if !strings.Contains(string(index), want) {
			t.Errorf("dist index.html lacks %s:\n%s", want, index)
		}
	}
	joined, err := os.ReadFile(filepath.Join(out, folder, "quillcast.js"))
	if err != nil || strings.Contains(string(joined), "import {") || !strings.Contains(string(joined), "// --- app.js") {
		t.Errorf("the joined modules are missing or still import (%v):\n%s", err, joined)
	}
	if _, err := os.Stat(filepath.Join(out, folder, "demo", "orders.csv")); err != nil {
		t.Errorf("the demo file is not in the asset folder: %v", err)
	}
	files["style.css"] = []byte("body { color: navy; }\n")
	if assetFolder(files) == folder {
		t.Error("a changed asset keeps the same folder name")
	}
}

func TestBundle(t *testing.T) {
	page, err := buildBundle(testSite())
	if err != nil {
		t.Fatal(err)
	}
	for _, want := range []string{"<style>body { color: black; }", "<script>globalThis.Go", `<script type="module">`, `id="quillcast-files"`, "quillcast.wasm.gz", "worker.js", "demo/orders.csv", "script-src &#39;sha256-", "&#39;wasm-unsafe-eval&#39;"} {
		if !strings.Contains(page, want) {
			t.Errorf("bundle lacks %s", want)
		}
	}
	for _, bad := range []string{`src="app.js"`, `href="style.css"`, "connect-src &#39;self&#39;", `rel="preload"`} {
		if strings.Contains(page, bad) {
			t.Errorf("bundle still has %s", bad)
		}
	}
	files := testSite()
	files["dom.js"] = []byte("export function el() { return \"</script>\"; }\n")
	if _, err := buildBundle(files); err == nil || !strings.Contains(err.Error(), "cannot be placed inline") {
		t.Errorf("a module containing </script>: error %v, want a refusal", err)
	}
}

func TestCheckSite(t *testing.T) {
	files := testSite()
	files["index.html"] = []byte("<html></html>")
	if err := files.check(); err == nil || !strings.Contains(err.Error(), "update site/pack") {
		t.Errorf("an index.html without the expected references: %v, want an error", err)
	}
}
