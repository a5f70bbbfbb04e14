package main

import (
	"errors"
	"fmt"
	"slices"
	"strings"
)

// codeShare is the code size of the functions of one group of packages.
type codeShare struct {
	Group string
	Bytes int
}

// wasmReader walks a WebAssembly binary (the WebAssembly Core
// Specification 2.0, chapter 5, "Binary Format").
type wasmReader struct {
	b   []byte
	pos int
}

var errTruncated = errors.New("the wasm file ends in the middle of a section")

func (r *wasmReader) uleb() (int, error) {
	var v, shift int
	for {
		if r.pos >= len(r.b) || shift > 35 {
			return 0, errTruncated
		}
		c := r.b[r.pos]
		r.pos++
		v |= int(c&0x7f) << shift
		if c < 0x80 {
			return v, nil
		}
		shift += 7
	}
}

func (r *wasmReader) bytes(n int) ([]byte, error) {
	if n < 0 || r.pos+n > len(r.b) {
		return nil, errTruncated
	}
	out := r.b[r.pos : r.pos+n]
	r.pos += n
	return out, nil
}

func (r *wasmReader) name() (string, error) {
	n, err := r.uleb()
	if err != nil {
		return "", err
	}
	b, err := r.bytes(n)
	return string(b), err
}

// codeByPackage sums the size of every function body of a wasm binary by
// the group of its Go package, using the binary's name section (absent
// when the binary was linked with -s), largest first.
func codeByPackage(wasm []byte) ([]codeShare, error) {
	r := &wasmReader{b: wasm}
	if magic, err := r.bytes(8); err != nil || string(magic[:4]) != "\x00asm" {
		return nil, errors.New("not a WebAssembly binary")
	}
	imported := 0
	var bodies []int
	names := map[int]string{}
	for r.pos < len(r.b) {
		id, err := r.bytes(1)
		if err != nil {
			return nil, err
		}
		size, err := r.uleb()
		if err != nil {
			return nil, err
		}
		body, err := r.bytes(size)
		if err != nil {
			return nil, err
		}
		s := &wasmReader{b: body}
		switch id[0] {
		case 2:
			imported, err = countFuncImports(s)
		case 10:
			bodies, err = bodySizes(s)
		case 0:
			err = readNames(s, names)
		}
		if err != nil {
			return nil, err
		}
	}
	if len(names) == 0 {
		return nil, errors.New("the wasm binary has no function names (built with -s)")
	}
	sums := map[string]int{}
	for i, n := range bodies {
		sums[packageGroup(names[imported+i])] += n
	}
	out := make([]codeShare, 0, len(sums))
	for g, n := range sums {
		out = append(out, codeShare{g, n})
	}
	slices.SortFunc(out, func(a, b codeShare) int { return b.Bytes - a.Bytes })
	return out, nil
}

func countFuncImports(s *wasmReader) (int, error) {
	count, err := s.uleb()
	if err != nil {
		return 0, err
	}
	funcs := 0
	for range count {
		if _, err := s.name(); err != nil {
			return 0, err
		}
		if _, err := s.name(); err != nil {
			return 0, err
		}
		kind, err := s.bytes(1)
		if err != nil {
			return 0, err
		}
		switch kind[0] {
		case 0: // function: type index
			funcs++
			_, err = s.uleb()
		case 1: // table: reference type and limits
			if _, err = s.bytes(1); err == nil {
				err = skipLimits(s)
			}
		case 2: // memory: limits
			err = skipLimits(s)
		case 3: // global: value type and mutability
			_, err = s.bytes(2)
		default:
			err = fmt.Errorf("unknown import kind %d", kind[0])
		}
		if err != nil {
			return 0, err
		}
	}
	return funcs, nil
}

func skipLimits(s *wasmReader) error {
	flag, err := s.bytes(1)
	if err != nil {
		return err
	}
	if _, err := s.uleb(); err != nil {
		return err
	}
	if flag[0]&1 == 1 {
		_, err = s.uleb()
	}
	return err
}

func bodySizes(s *wasmReader) ([]int, error) {
	count, err := s.uleb()
	if err != nil {
		return nil, err
	}
	sizes := make([]int, 0, count)
	for range count {
		n, err := s.uleb()
		if err != nil {
			return nil, err
		}
		if _, err := s.bytes(n); err != nil {
			return nil, err
		}
		sizes = append(sizes, n)
	}
	return sizes, nil
}

// readNames reads the function names of a custom section named "name".
func readNames(s *wasmReader, names map[int]string) error {
	sec, err := s.name()
	if err != nil || sec != "name" {
		return err
	}
	for s.pos < len(s.b) {
		id, err := s.bytes(1)
		if err != nil {
			return err
		}
		size, err := s.uleb()
		if err != nil {
			return err
		}
		sub, err := s.bytes(size)
		if err != nil {
			return err
		}
		if id[0] != 1 {
			continue
		}
		f := &wasmReader{b: sub}
		count, err := f.uleb()
		if err != nil {
			return err
		}
		for range count {
			idx, err := f.uleb()
			if err != nil {
				return err
			}
			if names[idx], err = f.name(); err != nil {
				return err
			}
		}
	}
	return nil
}

// packageGroup names the dependency a Go function belongs to: gonum,
// goldmark, go-indexeddb (with its JavaScript helpers), each package of
// ours, or the Go runtime and standard library. The wasm linker writes
// import paths with "_" for "/" and "-" (gonum.org_v1_gonum_mat.Foo); both
// forms are understood.
func packageGroup(fn string) string {
	n := strings.ReplaceAll(strings.TrimPrefix(fn, "type:"), "_", "/")
	switch {
	case strings.HasPrefix(n, "gonum.org/"):
		return "gonum"
	case strings.HasPrefix(n, "github.com/yuin/goldmark"):
		return "goldmark"
	case strings.HasPrefix(n, "github.com/hack-pad/"), strings.HasPrefix(n, "github.com/hack/pad/"):
		return "go-indexeddb and its helpers"
	case strings.HasPrefix(n, "main."):
		return "quillcast/wasm"
	case strings.HasPrefix(n, "quillcast/"):
		if i := strings.IndexByte(n, '.'); i > 0 {
			n = n[:i]
		}
		return n
	case strings.Contains(n, "/") && isDomain(n[:strings.IndexByte(n, '/')]):
		return "other modules"
	}
	return "Go runtime and standard library"
}

// isDomain reports whether the first element of an import path names a
// host, such as golang.org, as module paths outside the standard library
// start.
func isDomain(seg string) bool {
	if !strings.Contains(seg, ".") || strings.HasSuffix(seg, ".") || strings.HasPrefix(seg, ".") {
		return false
	}
	for _, c := range seg {
		if !(c >= 'a' && c <= 'z' || c >= '0' && c <= '9' || c == '.' || c == '-') {
			return false
		}
	}
	return true
}
