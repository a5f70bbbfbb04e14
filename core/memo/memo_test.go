package memo

import (
	"archive/zip"
	"bytes"
	"flag"
	"fmt"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/yuin/goldmark"
	"github.com/yuin/goldmark/extension"
)

var update = flag.Bool("update", false, "rewrite the golden files in testdata")

// golden compares got with testdata/name, or rewrites it under -update.
// The golden files are regression values: our own past output, read
// through when written.
func golden(t *testing.T, name, got string) {
	t.Helper()
	path := filepath.Join("testdata", name)
	if *update {
		if err := os.WriteFile(path, []byte(got), 0o644); err != nil {
			t.Fatal(err)
		}
		return
	}
	want, err := os.ReadFile(path)
	if err != nil {
		t.Fatalf("%v (run go test -update to write it)", err)
	}
	if got != string(want) {
		t.Errorf("%s differs from its golden file; run go test -update and inspect the diff", path)
	}
}

func TestGoldenMarkdown(t *testing.T) {
	m, _ := demoMemo(6)
	got, err := Markdown(m)
	if err != nil {
		t.Fatal(err)
	}
	golden(t, "demo.md", got)
}

func TestGoldenHTML(t *testing.T) {
	m, _ := demoMemo(6)
	got, err := HTML(m)
	if err != nil {
		t.Fatal(err)
	}
	golden(t, "demo.html", got)
}

// zipListing describes every file of a zip: name, time, size and CRC.
func zipListing(t *testing.T, data []byte) string {
	t.Helper()
	zr, err := zip.NewReader(bytes.NewReader(data), int64(len(data)))
	if err != nil {
		t.Fatal(err)
	}
	var b strings.Builder
	for _, f := range zr.File {
		fmt.Fprintf(&b, "%s\t%s\t%d\t%08x\n", f.Name, f.Modified.UTC().Format("2006-01-02T15:04:05Z"), f.UncompressedSize64, f.CRC32)
	}
	return b.String()
}

func TestGoldenZip(t *testing.T) {
	m, sheet := demoMemo(6)
	var first, second bytes.Buffer
	if err := Zip(&first, m, sheet); err != nil {
		t.Fatal(err)
	}
	if err := Zip(&second, m, sheet); err != nil {
		t.Fatal(err)
	}
	if !bytes.Equal(first.Bytes(), second.Bytes()) {
		t.Errorf("two zips of the same memo differ")
	}
	golden(t, "demo-zip.txt", zipListing(t, first.Bytes()))

	// The zip's memo.md is the Markdown form, and each chart file the SVG.
	zr, err := zip.NewReader(bytes.NewReader(first.Bytes()), int64(first.Len()))
	if err != nil {
		t.Fatal(err)
	}
	md, _ := Markdown(m)
	files := map[string]string{}
	for _, f := range zr.File {
		rc, err := f.Open()
		if err != nil {
			t.Fatal(err)
		}
		var buf bytes.Buffer
		_, _ = buf.ReadFrom(rc)
		rc.Close()
		files[f.Name] = buf.String()
	}
	if files["memo.md"] != md {
		t.Errorf("memo.md in the zip differs from Markdown(m)")
	}
	for _, ex := range m.Exhibits() {
		if ex.File == "" {
			continue
		}
		if files[ex.File] != m.Sections[ex.Section].Blocks[ex.Block].(Chart).SVG {
			t.Errorf("%s differs from the chart's SVG", ex.File)
		}
		if !strings.Contains(md, "]("+ex.File+")") {
			t.Errorf("memo.md does not link %s", ex.File)
		}
	}
	if !strings.HasPrefix(files["forecasts.csv"], "period,method,forecast,lo80,hi80,lo95,hi95\n") {
		t.Errorf("forecasts.csv starts %q", files["forecasts.csv"][:min(60, len(files["forecasts.csv"]))])
	}
}

func TestExhibits(t *testing.T) {
	m, _ := demoMemo(3)
	var got []string
	for _, ex := range m.Exhibits() {
		got = append(got, ExhibitTitle(ex.Number, ex.Caption)+" "+ex.File)
	}
	want := []string{
		"Exhibit 1 — Holdout accuracy ",
		"Exhibit 2 — Actual versus forecast charts/02-actual-vs-forecast.svg",
		"Exhibit 3 — Forecast errors over the holdout charts/03-holdout-errors.svg",
		"Exhibit 4 — Forecasts with 80% and 95% intervals ",
		"Exhibit 5 — Settings ",
	}
	if strings.Join(got, "\n") != strings.Join(want, "\n") {
		t.Errorf("exhibits:\n%s\nwant:\n%s", strings.Join(got, "\n"), strings.Join(want, "\n"))
	}
	if ExhibitTitle(7, "  ") != "Exhibit 7" {
		t.Errorf("an empty caption should give the bare number")
	}
}

func TestCleanStem(t *testing.T) {
	tests := []struct{ in, want string }{
		{"actual-vs-forecast", "actual-vs-forecast"},
		{"Holdout Errors!", "holdout-errors"},
		{"../../etc/passwd", "etc-passwd"},
		{"", "chart"},
		{"<>", "chart"},
		{strings.Repeat("a", 60), strings.Repeat("a", 40)},
	}
	for _, tc := range tests {
		t.Run(tc.in, func(t *testing.T) {
			if got := cleanStem(tc.in); got != tc.want {
				t.Errorf("cleanStem(%q) = %q, want %q", tc.in, got, tc.want)
			}
		})
	}
}

func TestMissing(t *testing.T) {
	m, _ := demoMemo(1)
	if got := m.Missing(); len(got) != 0 {
		t.Errorf("complete memo misses %v", got)
	}
	m.Sections = m.Sections[:2]
	got := m.Missing()
	want := []Kind{Partition, Comparison, Charts, Forecasts, Cautions, Notes, Appendix}
	if fmt.Sprint(got) != fmt.Sprint(want) {
		t.Errorf("Missing() = %v, want %v", got, want)
	}
}

// TestMarkdownReadsBack renders the Markdown memo with a CommonMark + GFM
// table reader and checks that every table and chart came through as one.
func TestMarkdownReadsBack(t *testing.T) {
	m, _ := demoMemo(4)
	md, err := Markdown(m)
	if err != nil {
		t.Fatal(err)
	}
	var out bytes.Buffer
	if err := goldmark.New(goldmark.WithExtensions(extension.Table)).Convert([]byte(md), &out); err != nil {
		t.Fatal(err)
	}
	doc := out.String()
	if got := strings.Count(doc, "<table>"); got != 3 {
		t.Errorf("%d tables read back, want 3", got)
	}
	if got := strings.Count(doc, `<img src="charts/`); got != 2 {
		t.Errorf("%d chart images read back, want 2", got)
	}
	if got := strings.Count(doc, "<h2>"); got != len(m.Sections) {
		t.Errorf("%d section headings read back, want %d", got, len(m.Sections))
	}
	if !strings.Contains(doc, `<td style="text-align:left">ma12 | trailing</td>`) {
		t.Errorf("a cell with a pipe did not read back whole")
	}
	if !strings.Contains(doc, `<td style="text-align:right">1,211</td>`) {
		t.Errorf("numeric columns are not right-aligned")
	}
}

func TestHTMLPage(t *testing.T) {
	m, _ := demoMemo(2)
	doc, err := HTML(m)
	if err != nil {
		t.Fatal(err)
	}
	for _, want := range []string{
		"Content-Security-Policy", "default-src 'none'", "prefers-color-scheme:dark",
		`<svg xmlns="http://www.w3.org/2000/svg"`, "<caption>Exhibit 1 — Holdout accuracy</caption>",
		"<figcaption>Exhibit 2 — Actual versus forecast</figcaption>",
		`<td class="num">1,211</td>`, `<a href="https://example.com/shops">shop list</a>`,
		"Written with Quillcast 0.1.0.",
	} {
		if !strings.Contains(doc, want) {
			t.Errorf("the page lacks %q", want)
		}
	}
}

// TestExhibitNumbersGiven checks that exhibits keep the numbers they carry
// (the numbers shown under the steps) and that unnumbered ones come after
// the highest, in reading order.
func TestExhibitNumbersGiven(t *testing.T) {
	tests := []struct {
		name   string
		blocks []Block
		want   []string
	}{
		{"none given", []Block{Table{Caption: "a"}, Paragraph{Text: "x"}, Chart{Caption: "b", Stem: "b"}},
			[]string{"1 a ", "2 b charts/02-b.svg"}},
		{"all given with gaps", []Block{Table{Number: 3, Caption: "a"}, Chart{Number: 9, Caption: "b", Stem: "b"}},
			[]string{"3 a ", "9 b charts/09-b.svg"}},
		{"mixed", []Block{Table{Caption: "new"}, Table{Number: 4, Caption: "a"}, Chart{Caption: "c", Stem: "c"}, Chart{Number: 2, Caption: "b", Stem: "b"}},
			[]string{"5 new ", "4 a ", "6 c charts/06-c.svg", "2 b charts/02-b.svg"}},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			m := Memo{Sections: []Section{{Kind: Summary, Blocks: tc.blocks}}}
			var got []string
			for _, ex := range m.Exhibits() {
				got = append(got, fmt.Sprintf("%d %s %s", ex.Number, ex.Caption, ex.File))
			}
			if strings.Join(got, "|") != strings.Join(tc.want, "|") {
				t.Errorf("exhibits of %v:\n got %q\nwant %q", tc.blocks, got, tc.want)
			}
		})
	}
}
