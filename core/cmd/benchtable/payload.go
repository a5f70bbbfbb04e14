package main

import (
	"fmt"
	"os"
	"path/filepath"
	"strings"
)

// payloadRows measures the engine as built for the page and the bundle.
func payloadRows(c config) ([]row, error) {
	wasm := filepath.Join(c.site, "quillcast.wasm")
	body, err := os.ReadFile(wasm)
	if err != nil {
		return nil, fmt.Errorf("%v; run make build first", err)
	}
	gz, err := gzipSize(body)
	if err != nil {
		return nil, err
	}
	rows := []row{
		{Item: "1", What: "wasm as built for the page, raw", Ours: bytesSample(len(body)), Note: breakdown(filepath.Join(c.out, namesWasm), len(body))},
		{Item: "1", What: "wasm, gzip -9", Ours: bytesSample(gz), Target: "≤ 1.4 MB", Met: verdict(true, gz <= 1_400_000)},
	}
	br, err := brotliSize(wasm)
	r := row{Item: "1", What: "wasm, brotli -q 11", Target: "≤ 1.0 MB"}
	if err != nil {
		r.Met, r.Note = "not measured", err.Error()
	} else {
		r.Ours, r.Met = bytesSample(br), verdict(true, br <= 1_000_000)
	}
	rows = append(rows, r)
	bundle := row{Item: "1", What: "single-file bundle (make bundle)"}
	if n, err := fileSize(c.bundle); err != nil {
		bundle.Note = err.Error() + "; run make bundle"
	} else {
		bundle.Ours = bytesSample(n)
		if gzb, err := fileGzip(c.bundle); err == nil {
			bundle.Note = "gzip -9 of the bundle: " + bytesSample(gzb).String()
		}
	}
	return append(rows, bundle), nil
}

func fileGzip(path string) (int, error) {
	b, err := os.ReadFile(path)
	if err != nil {
		return 0, err
	}
	return gzipSize(b)
}

// namesWasm is the engine built like the page's but keeping its function
// names, for the cost of each dependency.
const namesWasm = "quillcast-names.wasm"

// breakdown says how much function code each dependency adds, from the
// engine built with its names; what is not function code in the shipped
// engine of size shipped (data, type tables) comes last.
func breakdown(path string, shipped int) string {
	b, err := os.ReadFile(path)
	if err != nil {
		return "code by dependency not measured: " + err.Error()
	}
	shares, err := codeByPackage(b)
	if err != nil {
		return "code by dependency not measured: " + err.Error()
	}
	parts := make([]string, 0, 14)
	rest, code := 0, 0
	for i, s := range shares {
		code += s.Bytes
		if i < 12 {
			parts = append(parts, fmt.Sprintf("%s %.2f MB", s.Group, float64(s.Bytes)/1e6))
		} else {
			rest += s.Bytes
		}
	}
	if rest > 0 {
		parts = append(parts, fmt.Sprintf("the rest %.2f MB", float64(rest)/1e6))
	}
	parts = append(parts, fmt.Sprintf("not function code (data, type tables) %.2f MB", float64(shipped-code)/1e6))
	return "function code by dependency, uncompressed: " + strings.Join(parts, ", ")
}
