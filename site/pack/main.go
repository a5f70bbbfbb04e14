// Command pack turns the built site (build/site, written by `make build`)
// into the two forms Quillcast ships in:
//
//	go run ./site/pack -site build/site -dist build/dist
//	go run ./site/pack -site build/site -bundle build/quillcast.html
//
// -dist writes the folder to upload to any static host: index.html with the
// Content-Security-Policy in a meta element, and every other file in one
// folder named after the hash of their contents (assets-0a1b2c3d4e5f/), so
// hosts may cache them for good.
//
// -bundle writes one self-contained HTML file that works when opened from
// disk with no network: the style sheet and scripts inline (allowed by
// their hashes in the page's policy), the engine gzip-compressed and
// base64-encoded in a data block, decompressed by the browser.
package main

import (
	"flag"
	"fmt"
	"os"
)

func main() {
	site := flag.String("site", "build/site", "the built site (from `make build`)")
	dist := flag.String("dist", "", "write the folder for a static host here")
	bundle := flag.String("bundle", "", "write the single-file build to this HTML file")
	flag.Parse()
	if *dist == "" && *bundle == "" {
		fmt.Fprintln(os.Stderr, "pack: give -dist FOLDER, -bundle FILE or both")
		os.Exit(2)
	}
	files, err := readSite(*site)
	if err != nil {
		fmt.Fprintln(os.Stderr, "pack:", err)
		os.Exit(1)
	}
	if *dist != "" {
		if err := writeDist(files, *dist); err != nil {
			fmt.Fprintln(os.Stderr, "pack:", err)
			os.Exit(1)
		}
		fmt.Println("wrote", *dist)
	}
	if *bundle != "" {
		page, err := buildBundle(files)
		if err == nil {
			err = os.WriteFile(*bundle, []byte(page), 0o644)
		}
		if err != nil {
			fmt.Fprintln(os.Stderr, "pack:", err)
			os.Exit(1)
		}
		fmt.Println("wrote", *bundle)
	}
}
