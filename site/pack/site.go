package main

import (
	"fmt"
	"io/fs"
	"os"
	"path/filepath"
	"strings"
)

// siteFiles is a built site: file contents by slash-separated path.
type siteFiles map[string][]byte

// The references in index.html that both outputs rewrite. engineRef asks
// the browser to fetch the engine while the page's modules still load; the
// page then compiles that same response (engine.js), so its address must
// stay the one the modules ask for.
const (
	styleRef  = `<link rel="stylesheet" href="style.css">`
	runtimRef = `<script src="wasm_exec.js"></script>`
	appRef    = `<script type="module" src="app.js"></script>`
	engineRef = `<link rel="preload" href="quillcast.wasm" as="fetch" type="application/wasm" crossorigin>`
)

// readSite reads every file under dir and checks the page's references.
func readSite(dir string) (siteFiles, error) {
	files := siteFiles{}
	err := filepath.WalkDir(dir, func(p string, d fs.DirEntry, err error) error {
		if err != nil || d.IsDir() {
			return err
		}
		rel, err := filepath.Rel(dir, p)
		if err != nil {
			return err
		}
		b, err := os.ReadFile(p)
		files[filepath.ToSlash(rel)] = b
		return err
	})
	if err != nil {
		return nil, fmt.Errorf("reading the built site: %w (run `make build` first)", err)
	}
	return files, files.check()
}

// check makes sure the page refers to its assets the way the rewriting
// expects and that the engine is there.
func (f siteFiles) check() error {
	index, ok := f["index.html"]
	if !ok {
		return fmt.Errorf("the built site has no index.html; run `make build` first")
	}
	for _, ref := range []string{styleRef, runtimRef, appRef, engineRef} {
		if !strings.Contains(string(index), ref) {
			return fmt.Errorf("index.html no longer contains %s; update site/pack to match", ref)
		}
	}
	for _, name := range []string{"style.css", "wasm_exec.js", "app.js", "quillcast.wasm"} {
		if _, ok := f[name]; !ok {
			return fmt.Errorf("the built site lacks %s; run `make build` first", name)
		}
	}
	return nil
}
