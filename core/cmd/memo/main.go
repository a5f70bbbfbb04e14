// Command memo runs a saved Quillcast session on data files and writes the
// forecast memo without a browser: the same engine as the page, for monthly
// refreshes and for tests.
//
// Usage:
//
//	memo -session orders.md -data orders.csv[,other.csv] -out memo-2025-01
//
// It writes, in the output folder, memo.md (Markdown), memo.html (one
// self-contained page), memo.zip (memo.md, charts and forecasts.csv),
// charts/*.svg and forecasts.csv. Each data file is attached under its base
// name, the name the session's load step uses; a folder attaches every
// .csv, .tsv and .txt file in it. When a step fails, the
// command prints every problem with its line and column in the session and
// exits with status 1, writing nothing.
package main

import (
	"bytes"
	"context"
	"errors"
	"flag"
	"fmt"
	"io"
	"os"
	"path/filepath"
	"strings"

	"quillcast/core/memo"
	"quillcast/core/session"
	"quillcast/core/steps/runner"
)

// version is the program version written in the memo's appendix.
const version = "0.1.0"

func main() {
	os.Exit(run(os.Args[1:], os.Stdout, os.Stderr))
}

// run is the command with its arguments and output streams; it returns
// the exit status.
func run(args []string, stdout, stderr io.Writer) int {
	fs := flag.NewFlagSet("memo", flag.ContinueOnError)
	fs.SetOutput(stderr)
	sessionPath := fs.String("session", "", "the saved session (a markdown file)")
	dataList := fs.String("data", "", "the data files the session loads, separated by commas")
	outDir := fs.String("out", "", "the folder to write the memo into (created if missing)")
	ver := fs.String("version", version, "the program version written in the memo")
	if err := fs.Parse(args); err != nil {
		return 2
	}
	if *sessionPath == "" || *outDir == "" {
		fmt.Fprintln(stderr, "memo: give the session with -session and the output folder with -out, for example: memo -session orders.md -data orders.csv -out memo")
		return 2
	}
	text, err := os.ReadFile(*sessionPath)
	if err != nil {
		fmt.Fprintf(stderr, "memo: cannot read the session %s: %v\n", *sessionPath, plainIOError(err))
		return 1
	}
	files, err := readData(*dataList)
	if err != nil {
		fmt.Fprintf(stderr, "memo: %v\n", err)
		return 1
	}
	doc := session.Parse(string(text))
	res := runner.New().Run(context.Background(), doc, runner.Data{Files: files})
	if len(res.Errors) > 0 {
		for _, e := range res.Errors {
			fmt.Fprintf(stderr, "%s: step %d, %s\n", *sessionPath, e.Step, e.Error())
		}
		fmt.Fprintf(stderr, "memo: %d %s failed; nothing was written\n", len(res.Errors), plural(len(res.Errors), "step", "steps"))
		return 1
	}
	if err := write(*outDir, res.Memo(*ver), res.ForecastSheet()); err != nil {
		fmt.Fprintf(stderr, "memo: %v\n", err)
		return 1
	}
	fmt.Fprintf(stdout, "memo written to %s\n", *outDir)
	return 0
}

// readData reads the data files named in list, separated by commas, each
// under its base name. A folder stands for every .csv, .tsv and .txt file
// in it.
func readData(list string) (map[string][]byte, error) {
	files := map[string][]byte{}
	for _, p := range strings.Split(list, ",") {
		p = strings.TrimSpace(p)
		if p == "" {
			continue
		}
		paths := []string{p}
		if st, err := os.Stat(p); err == nil && st.IsDir() {
			paths = nil
			for _, ext := range []string{"*.csv", "*.tsv", "*.txt"} {
				m, _ := filepath.Glob(filepath.Join(p, ext))
				paths = append(paths, m...)
			}
		}
		for _, q := range paths {
			b, err := os.ReadFile(q)
			if err != nil {
				return nil, fmt.Errorf("cannot read the data file %s: %v", q, plainIOError(err))
			}
			files[filepath.Base(q)] = b
		}
	}
	return files, nil
}

// write renders the memo in every form and writes the files.
func write(dir string, m memo.Memo, sheet memo.Sheet) error {
	md, err := memo.Markdown(m)
	if err != nil {
		return err
	}
	html, err := memo.HTML(m)
	if err != nil {
		return err
	}
	var zip, csv bytes.Buffer
	if err := memo.Zip(&zip, m, sheet); err != nil {
		return err
	}
	if err := memo.WriteCSV(&csv, sheet); err != nil {
		return err
	}
	files := map[string][]byte{
		"memo.md":       []byte(md),
		"memo.html":     []byte(html),
		"memo.zip":      zip.Bytes(),
		"forecasts.csv": csv.Bytes(),
	}
	for _, e := range m.Exhibits() {
		if e.File == "" {
			continue
		}
		if c, ok := m.Sections[e.Section].Blocks[e.Block].(memo.Chart); ok {
			files[filepath.FromSlash(e.File)] = []byte(c.SVG)
		}
	}
	for name, b := range files {
		p := filepath.Join(dir, name)
		if err := os.MkdirAll(filepath.Dir(p), 0o755); err != nil {
			return fmt.Errorf("cannot create the folder %s: %v", filepath.Dir(p), plainIOError(err))
		}
		if err := os.WriteFile(p, b, 0o644); err != nil {
			return fmt.Errorf("cannot write %s: %v", p, plainIOError(err))
		}
	}
	return nil
}

// plainIOError drops the operation and path Go puts in front of the cause.
func plainIOError(err error) error {
	var pe *os.PathError
	if errors.As(err, &pe) {
		return pe.Err
	}
	return err
}

func plural(n int, one, many string) string {
	if n == 1 {
		return one
	}
	return many
}
