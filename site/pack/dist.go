package main

import (
	"crypto/sha256"
	"encoding/hex"
	"html"
	"maps"
	"os"
	"path"
	"path/filepath"
	"slices"
	"strings"

	"quillcast/core/cmd/serve/static"
)

// assetFolder names the folder holding every file but index.html after the
// hash of their names and contents: any change gives a new name.
func assetFolder(files siteFiles) string {
	h := sha256.New()
	for _, name := range slices.Sorted(maps.Keys(files)) {
		if name == "index.html" {
			continue
		}
		h.Write([]byte(name))
		h.Write([]byte{0})
		h.Write(files[name])
		h.Write([]byte{0})
	}
	return "assets-" + hex.EncodeToString(h.Sum(nil))[:12]
}

// distIndex rewrites index.html to load its assets from folder and to carry
// the policy in a meta element.
func distIndex(index []byte, folder string) string {
	page := string(index)
	page = strings.Replace(page, styleRef, `<link rel="stylesheet" href="`+folder+`/style.css">`, 1)
	page = strings.Replace(page, runtimRef, `<script src="`+folder+`/wasm_exec.js"></script>`, 1)
	page = strings.Replace(page, appRef, `<script type="module" src="`+folder+`/`+joinedModules+`"></script>`, 1)
	page = strings.Replace(page, engineRef, strings.Replace(engineRef, `href="`, `href="`+folder+`/`, 1), 1)
	meta := `<meta http-equiv="Content-Security-Policy" content="` + html.EscapeString(static.MetaPolicy()) + `">`
	return strings.Replace(page, `<meta charset="utf-8">`, `<meta charset="utf-8">`+"\n"+meta, 1)
}

// joinedModules is the file of the dist folder holding the page's modules
// joined into one (see [joinModules]): the browser fetches one script
// instead of learning of the modules app.js imports only after fetching
// it, which delays starting the engine by a round trip.
const joinedModules = "quillcast.js"

// writeDist writes the folder for a static host into out, replacing it.
func writeDist(files siteFiles, out string) error {
	if err := os.RemoveAll(out); err != nil {
		return err
	}
	joined, err := joinModules(files, "app.js")
	if err != nil {
		return err
	}
	files = maps.Clone(files)
	files[joinedModules] = []byte(joined)
	folder := assetFolder(files)
	for name, body := range files {
		target := path.Join(folder, name)
		if name == "index.html" {
			target, body = name, []byte(distIndex(body, folder))
		}
		p := filepath.Join(out, filepath.FromSlash(target))
		if err := os.MkdirAll(filepath.Dir(p), 0o755); err != nil {
			return err
		}
		if err := os.WriteFile(p, body, 0o644); err != nil {
			return err
		}
	}
	return nil
}
