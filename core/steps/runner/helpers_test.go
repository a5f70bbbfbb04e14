package runner

import (
	"context"
	"fmt"
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"quillcast/core/session"
)

// moduleRoot is the repository root, three folders up from this package.
func moduleRoot() string { return filepath.Join("..", "..", "..") }

// demoData reads the invented demo files from testdata/demo.
func demoData(tb testing.TB) Data {
	tb.Helper()
	dir := filepath.Join(moduleRoot(), "testdata", "demo")
	entries, err := os.ReadDir(dir)
	if err != nil {
		tb.Fatalf("demo data: %v", err)
	}
	files := map[string][]byte{}
	for _, e := range entries {
		if strings.HasSuffix(e.Name(), ".csv") {
			b, err := os.ReadFile(filepath.Join(dir, e.Name()))
			if err != nil {
				tb.Fatal(err)
			}
			files[e.Name()] = b
		}
	}
	return Data{Files: files}
}

// sessionFile reads a session from testdata/sessions.
func sessionFile(tb testing.TB, name string) *session.Document {
	tb.Helper()
	b, err := os.ReadFile(filepath.Join(moduleRoot(), "testdata", "sessions", name))
	if err != nil {
		tb.Fatal(err)
	}
	return session.Parse(string(b))
}

// stepsDoc wraps step lines in a session document whose first step line is
// document line 2.
func stepsDoc(body string) *session.Document {
	return session.Parse("```quill\n" + body + "\n```\n")
}

// synthetic makes a monthly CSV of n values from 2020-01: a level, a
// trend per month, a yearly season of the given amplitude and a
// deterministic wiggle, so tests need no random numbers.
func synthetic(n int, level, trend, season float64) []byte {
	var b strings.Builder
	b.WriteString("month,units\n")
	for i := range n {
		y := 2020 + i/12
		m := i%12 + 1
		v := level + trend*float64(i) + season*math.Sin(2*math.Pi*float64(i)/12) + 3*math.Sin(float64(i)*1.7)
		fmt.Fprintf(&b, "%d-%02d,%.2f\n", y, m, v)
	}
	return []byte(b.String())
}

// run runs steps on data with a fresh runner.
func run(body string, data Data) *Result {
	return New().Run(context.Background(), stepsDoc(body), data)
}

// blockTexts gathers every message, table cell, title and note of an
// output, for searching.
func blockTexts(o Output) string {
	var b strings.Builder
	for _, bl := range o.Blocks {
		b.WriteString(bl.Title + "\n" + bl.Text + "\n")
		if bl.Table != nil {
			b.WriteString(strings.Join(bl.Table.Headers, " | ") + "\n")
			for _, r := range bl.Table.Rows {
				b.WriteString(strings.Join(r, " | ") + "\n")
			}
		}
	}
	return b.String()
}

func sessionOf(text string) *session.Document { return session.Parse(text) }
