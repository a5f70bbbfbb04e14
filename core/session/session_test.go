package session

import (
	"fmt"
	"strings"
	"testing"
)

var parseTests = []struct {
	name  string
	text  string
	kinds []Kind
	steps []string // step lines, in order
	data  map[string]string
}{
	{name: "empty", text: "", kinds: nil},
	{name: "prose only", text: "# Title\n\nSome words.\n", kinds: []Kind{Prose}},
	{
		name:  "prose and steps",
		text:  "# Orders\n\n```quill\nload a.csv\nsplit last=12\n```\n\nAfter.\n",
		kinds: []Kind{Prose, Steps, Prose},
		steps: []string{"load a.csv", "split last=12"},
	},
	{
		name:  "steps with CRLF",
		text:  "```quill\r\nload a.csv\r\n```\r\n",
		kinds: []Kind{Steps},
		steps: []string{"load a.csv"},
	},
	{
		name:  "other code block stays prose and hides a fence of ours",
		text:  "````text\n```quill\nload x\n```\n````\n",
		kinds: []Kind{Prose},
	},
	{
		name:  "tilde fence and longer closing fence",
		text:  "~~~quill\nsplit last=4\n~~~~~\n",
		kinds: []Kind{Steps},
		steps: []string{"split last=4"},
	},
	{
		name:  "unclosed steps run to the end",
		text:  "text\n```quill\nload a.csv\nsplit last=2",
		kinds: []Kind{Prose, Steps},
		steps: []string{"load a.csv", "split last=2"},
	},
	{
		name:  "indented four spaces is not a fence",
		text:  "    ```quill\n    load\n",
		kinds: []Kind{Prose},
	},
	{
		name:  "embedded data",
		text:  "```quill-data shop.csv\nmonth,units\n2024-01,5\n```\n```quill\nload shop.csv\n```\n",
		kinds: []Kind{Data, Steps},
		steps: []string{"load shop.csv"},
		data:  map[string]string{"shop.csv": "month,units\n2024-01,5\n"},
	},
	{
		name:  "empty steps block",
		text:  "```quill\n```\n",
		kinds: []Kind{Steps},
	},
	{
		name:  "fence line at end without break",
		text:  "```quill",
		kinds: []Kind{Steps},
	},
}

func TestParse(t *testing.T) {
	t.Parallel()
	for _, tc := range parseTests {
		t.Run(tc.name, func(t *testing.T) {
			d := Parse(tc.text)
			if got := d.String(); got != tc.text {
				t.Fatalf("round trip of %q gave %q", tc.text, got)
			}
			var kinds []Kind
			for _, p := range d.Parts {
				kinds = append(kinds, p.Kind)
			}
			if len(kinds) != len(tc.kinds) {
				t.Fatalf("kinds of %q: got %v, want %v", tc.text, kinds, tc.kinds)
			}
			for i := range kinds {
				if kinds[i] != tc.kinds[i] {
					t.Fatalf("kinds of %q: got %v, want %v", tc.text, kinds, tc.kinds)
				}
			}
			lines := d.StepLines()
			if len(lines) != len(tc.steps) {
				t.Fatalf("step lines of %q: got %d, want %d", tc.text, len(lines), len(tc.steps))
			}
			for i, l := range lines {
				if l.Text != tc.steps[i] {
					t.Errorf("step line %d: got %q, want %q", i, l.Text, tc.steps[i])
				}
				if !strings.HasPrefix(tc.text[l.Offset:], l.Text) {
					t.Errorf("step line %d: offset %d does not point at %q", i, l.Offset, l.Text)
				}
				if got := strings.Count(tc.text[:l.Offset], "\n") + 1; got != l.Line {
					t.Errorf("step line %d: line %d, counted %d", i, l.Line, got)
				}
			}
			emb := d.Embedded()
			for name, want := range tc.data {
				if string(emb[name]) != want {
					t.Errorf("data %s: got %q, want %q", name, emb[name], want)
				}
			}
		})
	}
}

func TestBuildRoundTrip(t *testing.T) {
	t.Parallel()
	d := Build([]Part{
		{Kind: Prose, Body: "# Candle orders"},
		{Kind: Steps, Body: "load a.csv\n```\nsplit last=3\n"},
		{Kind: Data, Name: "a.csv", Body: "m,u\n2024-01,3\n"},
	})
	if len(d.Parts) != 4 { // prose, steps, blank prose, data
		var ks []Kind
		for _, p := range d.Parts {
			ks = append(ks, p.Kind)
		}
		t.Fatalf("parts: %v in %q", ks, d.String())
	}
	if got := d.Steps(); got != "load a.csv\n```\nsplit last=3\n" {
		t.Errorf("steps: got %q", got)
	}
	if got := string(d.Embedded()["a.csv"]); got != "m,u\n2024-01,3\n" {
		t.Errorf("data: got %q", got)
	}
}

func TestWithSteps(t *testing.T) {
	t.Parallel()
	text := "Intro.\n\n```quill\nload a.csv\nsplit last=12\n```\n\nEnd.\n"
	d := Parse(text)
	e := d.WithSteps(1, "load a.csv\nsplit last=6\n")
	want := "Intro.\n\n```quill\nload a.csv\nsplit last=6\n```\n\nEnd.\n"
	if got := e.String(); got != want {
		t.Errorf("got %q, want %q", got, want)
	}
	if got := d.WithSteps(0, "x").String(); got != text {
		t.Errorf("prose part must not change: got %q", got)
	}
}

func FuzzParse(f *testing.F) {
	for _, tc := range parseTests {
		f.Add(tc.text)
	}
	f.Fuzz(func(t *testing.T, text string) {
		d := Parse(text)
		if got := d.String(); got != text {
			t.Fatalf("round trip of %q gave %q", text, got)
		}
		for _, l := range d.StepLines() {
			if l.Offset < 0 || l.Offset > len(text) || !strings.HasPrefix(text[l.Offset:], l.Text) {
				t.Fatalf("line %+v outside %q", l, text)
			}
		}
		for i, p := range d.Parts {
			if p.Kind == Steps {
				body := d.WithSteps(i, p.Body)
				if body.String() != text {
					t.Fatalf("WithSteps with the same body changed %q into %q", text, body.String())
				}
			}
		}
	})
}

func BenchmarkParse(b *testing.B) {
	for _, n := range []int{10, 100, 1000} {
		var sb strings.Builder
		for i := range n {
			if i%3 == 0 {
				sb.WriteString("Some prose about the orders.\n\n")
			}
			sb.WriteString("```quill\nforecast moving-average width=12 as=ma\nevaluate by=mase\n```\n\n")
		}
		text := sb.String()
		b.Run(fmt.Sprint(n)+"-blocks", func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				Parse(text)
			}
		})
	}
}

func TestBuildFromParsed(t *testing.T) {
	t.Parallel()
	text := "# Orders\n\nIntro.\n\n```quill\nload a.csv\n```\n\nMiddle.\n\n```quill-data a.csv\nm,u\n```\n\n```quill\nsplit last=3\n```\n\nEnd.\n"
	d := Parse(text)
	var blocks []Part
	for _, p := range d.Parts {
		if p.Kind == Prose {
			p.Body = p.Raw
		}
		blocks = append(blocks, p)
	}
	if got := Build(blocks).String(); got != text {
		t.Errorf("built %q, want %q", got, text)
	}
}
