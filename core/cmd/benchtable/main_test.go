package main

import (
	"strings"
	"testing"
)

func TestSampleString(t *testing.T) {
	tests := []struct {
		name string
		s    sample
		want string
	}{
		{"empty", sample{Unit: "s"}, "not measured"},
		{"one run", sample{Values: []float64{0.25}, Unit: "s"}, "0.250 s (n=1)"},
		// hand calculation: sorted 0.003, 0.004, 0.009 → median 0.004 s = 4 ms
		{"milliseconds", sample{Values: []float64{0.009, 0.003, 0.004}, Unit: "s"}, "4.00 ms (3.00–9.00, n=3)"},
		// hand calculation: median of 1, 2, 3, 10 is (2+3)/2 = 2.5
		{"even count", sample{Values: []float64{10, 1, 3, 2}, Unit: "s"}, "2.50 s (1.00–10.0, n=4)"},
		{"bytes", sample{Values: []float64{1_234_567}, Unit: "B"}, "1.23 MB (n=1)"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			if got := tc.s.String(); got != tc.want {
				t.Errorf("%v: got %q, want %q", tc.s.Values, got, tc.want)
			}
		})
	}
}

func TestWriteTable(t *testing.T) {
	rows := []row{
		{Item: "4", What: "sweep", Ours: sample{Values: []float64{0.2}, Unit: "s"}, Other: sample{Values: []float64{0.9}, Unit: "s"},
			Versus: "numpy", Ratio: "4.5× faster", Target: "≥ 1.8×", Met: "yes", Note: "agrees"},
		{Item: "7", What: "memory", Ours: sample{Unit: "B"}, Target: "≤ 300 MB", Met: "not measured"},
	}
	var b strings.Builder
	if err := writeTable(&b, rows); err != nil {
		t.Fatal(err)
	}
	got := b.String()
	for _, want := range []string{
		"| 4 | sweep | 0.200 s (n=1) | numpy: 0.900 s (n=1) | 4.5× faster | ≥ 1.8× | yes |",
		"| 7 | memory | not measured | — | — | ≤ 300 MB | not measured |",
		"- 4 sweep: agrees",
	} {
		if !strings.Contains(got, want) {
			t.Errorf("table lacks %q:\n%s", want, got)
		}
	}
}

func TestPackageGroup(t *testing.T) {
	tests := []struct{ fn, want string }{
		{"gonum.org/v1/gonum/mat.(*Dense).Mul", "gonum"},
		{"github.com/yuin/goldmark/parser.(*parser).Parse", "goldmark"},
		{"github.com/hack-pad/safejs.Value.Call", "go-indexeddb and its helpers"},
		{"quillcast/core/forecast.Smoothing.Fit", "quillcast/core/forecast"},
		{"main.(*app).attach", "quillcast/wasm"},
		{"runtime.mallocgc", "Go runtime and standard library"},
		{"encoding/json.Marshal", "Go runtime and standard library"},
		{"golang.org/x/text/unicode.Foo", "other modules"},
		// as the wasm linker writes them
		{"gonum.org_v1_gonum_mat.__VecDense_.RawVector", "gonum"},
		{"github.com_yuin_goldmark_ast.__Blockquote_.FirstChild", "goldmark"},
		{"quillcast_core_steps_runner.__exec_.load", "quillcast/core/steps/runner"},
		{"github.com_hack_pad_go_indexeddb_idb.__Cursor_.Key", "go-indexeddb and its helpers"},
		{"runtime.__gcControl_.revise", "Go runtime and standard library"},
	}
	for _, tc := range tests {
		t.Run(tc.fn, func(t *testing.T) {
			if got := packageGroup(tc.fn); got != tc.want {
				t.Errorf("packageGroup(%q) = %q, want %q", tc.fn, got, tc.want)
			}
		})
	}
}

// tinyWasm is a hand-assembled module: one imported function, two
// function bodies of 3 and 2 bytes, and a name section naming them.
func tinyWasm() []byte {
	b := []byte("\x00asm\x01\x00\x00\x00")
	section := func(id byte, body []byte) { b = append(append(append(b, id), byte(len(body))), body...) }
	section(2, []byte("\x01\x02go\x01f\x00\x00"))           // import go.f, a function of type 0
	section(10, []byte("\x02\x03\x00\x01\x0b\x02\x00\x0b")) // bodies of 3 and 2 bytes, each after its size
	names := []byte("\x02\x01\x0cruntime.gcdd\x02\x12gonum.org/v1/mat.X")
	sub := append([]byte{1, byte(len(names))}, names...)
	section(0, append([]byte("\x04name"), sub...))
	return b
}

func TestCodeByPackage(t *testing.T) {
	w := tinyWasm()
	got, err := codeByPackage(w)
	if err != nil {
		t.Fatal(err)
	}
	want := map[string]int{ // hand calculation: body sizes 3 and 2 bytes
		"Go runtime and standard library": 3,
		"gonum":                           2,
	}
	if len(got) != len(want) {
		t.Fatalf("groups %v, want %v", got, want)
	}
	for _, g := range got {
		if want[g.Group] != g.Bytes {
			t.Errorf("group %q: %d bytes, want %d", g.Group, g.Bytes, want[g.Group])
		}
	}
	if _, err := codeByPackage(w[:len(w)-3]); err == nil {
		t.Error("a truncated binary was read without error")
	}
	if _, err := codeByPackage([]byte("not wasm")); err == nil {
		t.Error("text was read as wasm")
	}
}

// FuzzCodeByPackage: whatever the bytes, reading them does not panic.
func FuzzCodeByPackage(f *testing.F) {
	f.Add(tinyWasm())
	f.Add([]byte("\x00asm\x01\x00\x00\x00\x0a\xff"))
	f.Fuzz(func(t *testing.T, b []byte) {
		_, _ = codeByPackage(b)
	})
}

func TestFaster(t *testing.T) {
	s := func(v float64) sample { return sample{Values: []float64{v}, Unit: "s"} }
	tests := []struct {
		name        string
		ours, other sample
		want        string
	}{
		{"faster", s(0.2), s(0.9), "4.50× faster"},      // hand calculation: 0.9/0.2
		{"just short", s(0.5), s(0.89), "1.78× faster"}, // 0.89/0.5, not rounded up to 1.8
		{"much faster", s(0.25), s(70), "280.0× faster"},
		{"slower", s(2), s(1), "2.00× slower"},
		{"missing", sample{}, s(1), ""},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			if got, _ := faster(tc.ours, tc.other); got != tc.want {
				t.Errorf("faster(%v, %v) = %q, want %q", tc.ours.Values, tc.other.Values, got, tc.want)
			}
		})
	}
}
