package steps

import (
	"errors"
	"strings"
	"testing"
	"unicode/utf8"

	"quillcast/core/session"
)

// docOf wraps step lines in a session document: two lines of prose and the
// opening fence come first, so step line k is document line k+3.
func docOf(body string) string { return "Intro.\n\n```quill\n" + body + "\n```\n" }

// marker marks the expected error position inside a test input; it is
// removed before parsing (the way encoding/csv's tests mark positions).
const marker = "§"

// stripMarker returns text without the marker and the 1-based line and
// column (in characters) where it stood, or 0, 0 when there is none.
func stripMarker(text string) (string, int, int) {
	i := strings.Index(text, marker)
	if i < 0 {
		return text, 0, 0
	}
	before := text[:i]
	line := strings.Count(before, "\n") + 1
	col := utf8.RuneCountInString(before[strings.LastIndex(before, "\n")+1:]) + 1
	return before + text[i+len(marker):], line, col
}

var parseErrorTests = []struct {
	name  string
	body  string // step lines; the marker shows where the error must point
	cause error
	want  string // text the message must contain
}{
	{"unknown option with suggestion", "load a.csv\nsmooth centered §widht=12", ErrOption, "unknown option `widht` for `smooth`; did you mean `width`?"},
	{"unknown verb with suggestion", "§forcast naive", ErrVerb, "did you mean `forecast`?"},
	{"unknown verb listing verbs", "§frobnicate", ErrVerb, "the verbs are memo, load"},
	{"option where the verb belongs", "§last=12", ErrSyntax, "a step starts with a verb"},
	{"forecast without split or horizon", "load a.csv\nforecast naive§", ErrOrder, "`forecast` needs a `split` first, or say `horizon=`"},
	{"split before load", "§split last=12", ErrOrder, "add a `load` step before it"},
	{"evaluate before forecast", "load a.csv\nsplit last=4\n§evaluate", ErrOrder, "needs a `forecast` first"},
	{"unknown method", "load a.csv\nsplit last=4\nforecast §moving-averge width=3", ErrSubject, "did you mean `moving-average`?"},
	{"method option unknown", "load a.csv\nsplit last=4\nforecast moving-average §widht=3", ErrOption, "unknown option `widht` for `forecast moving-average`; did you mean `width`?"},
	{"whole number wanted", "load a.csv\nsplit last=§twelve", ErrValue, "`twelve` is not a whole number"},
	{"fraction for a whole number", "load a.csv\nsplit last=§1.5", ErrValue, "is not a whole number"},
	{"measure misspelt", "load a.csv\nsplit last=4\nforecast naive\nevaluate by=§mape2", ErrValue, "did you mean `mape`?"},
	{"subject on a verb without one", "load a.csv\nsplit last=4\nforecast naive\nevaluate §all", ErrSubject, "`evaluate` takes no subject"},
	{"missing required option", "load a.csv\nsmooth centered§", ErrOption, "`smooth` needs `width=`"},
	{"missing subject", "load§", ErrSubject, "`load` needs a file name"},
	{"option given twice", "load a.csv\nsplit last=4 §last=5", ErrOption, "given twice"},
	{"both last and from", "load a.csv\nsplit last=4 §from=2024-01", ErrOption, "not both"},
	{"not a period", "load a.csv\nsplit from=§2024-13", ErrValue, "is not a period"},
	{"unclosed quote", "memo title=§\"Candle orders", ErrSyntax, "no closing"},
	{"bare word instead of option", "load a.csv\nsplit §12", ErrSubject, "`split` takes no subject"},
	{"second bare word", "load a.csv\nsmooth centered §12", ErrSyntax, "expected an option written key=value"},
	{"backwards range", "load a.csv\nsplit last=4\nsweep moving-average width=§24..2", ErrValue, "runs backwards"},
	{"range end out of bounds", "load a.csv\nsplit last=4\nsweep moving-average width=§0..5", ErrValue, "out of range"},
	{"sweep without a range", "load a.csv\nsplit last=4\nsweep moving-average§", ErrOption, "width=2..24"},
	{"check of an unknown label", "load a.csv\nsplit last=4\nforecast naive as=nv\ncheck §nb", ErrOrder, "did you mean `nv`?"},
	{"duplicate label", "load a.csv\nsplit last=4\nforecast naive\nforecast §naive", ErrOrder, "already used by step 3"},
	{"combine of unknown label", "load a.csv\nsplit last=4\nforecast naive\ncombine of=naive,§drift", ErrOrder, "no forecast is labelled `drift`"},
	{"interval out of range", "load a.csv\nsplit last=4\nforecast naive interval=80,§101", ErrValue, "out of range"},
	{"smooth kind misspelt", "load a.csv\nsmooth §centred width=5", ErrSubject, "did you mean `centered`?"},
	{"not a number with NaN", "load a.csv\nsplit last=§NaN", ErrValue, "is not a whole number"},
	{"comment after an error-free step does not hide the error", "load a.csv # first\nsplit §lats=3 # second", ErrOption, "did you mean `last`?"},
	{"wide characters count as one column", "memo title=\"Bougies d’hiver\" §clinet=x", ErrOption, "did you mean `client`?"},
}

func TestParseErrors(t *testing.T) {
	t.Parallel()
	for _, tc := range parseErrorTests {
		t.Run(tc.name, func(t *testing.T) {
			text, line, col := stripMarker(docOf(tc.body))
			p := ParseText(text)
			if len(p.Errors) == 0 {
				t.Fatalf("%q: no error, want %q", tc.body, tc.want)
			}
			e := p.Errors[0]
			if !strings.Contains(e.Msg, tc.want) {
				t.Errorf("%q: message %q does not contain %q", tc.body, e.Msg, tc.want)
			}
			if !errors.Is(e, tc.cause) {
				t.Errorf("%q: cause %v, want %v", tc.body, e.Cause, tc.cause)
			}
			if e.Line != line || e.Column != col {
				t.Errorf("%q: error at line %d, column %d, want line %d, column %d (%s)", tc.body, e.Line, e.Column, line, col, e)
			}
			if e.Step == 0 || e.Step > len(p.Steps) || p.Steps[e.Step-1].Line != e.Line {
				t.Errorf("%q: error names step %d, which is not on line %d", tc.body, e.Step, e.Line)
			}
		})
	}
}

var parseTests = []struct {
	name string
	body string
	want []string // canonical form of each step
}{
	{"empty", "", nil},
	{"comments and blanks are not steps", "# a note\n\n   \nload a.csv # the file", []string{"load a.csv"}},
	{
		"the sketch of a whole session",
		"memo title=\"Candle orders\" client=\"Wickery & Co.\"\nload shop-orders.csv value=units date=month\nsplit last=12\nsmooth centered width=12\nforecast moving-average width=12 as=ma12\nforecast seasonal-naive as=same-month\nevaluate by=mase\nsweep moving-average width=2..24 by=rmse\nbacktest origins=6 horizon=3\ncheck ma12\npick by=mase",
		[]string{`memo title="Candle orders" client="Wickery & Co."`, "load shop-orders.csv value=units date=month", "split last=12", "smooth centered width=12", "forecast moving-average width=12 as=ma12", "forecast seasonal-naive as=same-month", "evaluate by=mase", "sweep moving-average width=2..24 by=rmse", "backtest origins=6 horizon=3", "check ma12", "pick by=mase"},
	},
	{"horizon without split", "load a.csv\nforecast naive horizon=6", []string{"load a.csv", "forecast naive horizon=6"}},
	{"quoted column with escapes", `load "my file.csv" value="unit \"orders\""`, []string{`load "my file.csv" value="unit \"orders\""`}},
	{"split from a quarter", "load a.csv\nsplit from=2024-Q1", []string{"load a.csv", "split from=2024-Q1"}},
	{"tabs between words", "load\ta.csv\tvalue=u", []string{"load a.csv value=u"}},
}

func TestParse(t *testing.T) {
	t.Parallel()
	for _, tc := range parseTests {
		t.Run(tc.name, func(t *testing.T) {
			p := ParseText(docOf(tc.body))
			if len(p.Errors) > 0 {
				t.Fatalf("%q: unexpected errors:\n%v", tc.body, p.Errors)
			}
			if len(p.Steps) != len(tc.want) {
				t.Fatalf("%q: %d steps, want %d", tc.body, len(p.Steps), len(tc.want))
			}
			for i, s := range p.Steps {
				if got := s.Canonical(); got != tc.want[i] {
					t.Errorf("step %d: got %q, want %q", i+1, got, tc.want[i])
				}
				if s.N != i+1 {
					t.Errorf("step %d numbered %d", i+1, s.N)
				}
				// The canonical form reads back as the same step.
				again := ParseText(docOf(strings.Join(append(canonicalPrefix(p.Steps[:i]), s.Canonical()), "\n")))
				if got := again.Steps[i].Canonical(); got != tc.want[i] {
					t.Errorf("step %d: canonical form reads back as %q", i+1, got)
				}
			}
		})
	}
}

func canonicalPrefix(steps []*Step) []string {
	out := make([]string, len(steps))
	for i, s := range steps {
		out[i] = s.Canonical()
	}
	return out
}

func TestValues(t *testing.T) {
	t.Parallel()
	p := ParseText(docOf("load a.csv\nsplit last=4\nforecast naive interval=80,95 as=nv\nsweep moving-average width=2..24\ndifference lag=12,1"))
	if len(p.Errors) > 0 {
		t.Fatal(p.Errors)
	}
	iv, _ := p.Steps[2].Option("interval")
	if len(iv.Value.Nums) != 2 || iv.Value.Nums[0] != 80 || iv.Value.Nums[1] != 95 {
		t.Errorf("interval: got %v, want [80 95]", iv.Value.Nums)
	}
	w, _ := p.Steps[3].Option("width")
	if w.Value.Lo != 2 || w.Value.Hi != 24 {
		t.Errorf("width: got %v..%v, want 2..24", w.Value.Lo, w.Value.Hi)
	}
	lag, _ := p.Steps[4].Option("lag")
	if len(lag.Value.Nums) != 2 || lag.Value.Nums[0] != 12 {
		t.Errorf("lag: got %v, want [12 1]", lag.Value.Nums)
	}
}

func TestEveryLineReported(t *testing.T) {
	t.Parallel()
	// Three bad lines, one good: three errors, one per line, in order.
	p := ParseText(docOf("lod a.csv\nload a.csv\nsplit lst=3\nsmooth centered width=x"))
	if len(p.Errors) != 3 {
		t.Fatalf("got %d errors, want 3:\n%v", len(p.Errors), p.Errors)
	}
	for i, line := range []int{4, 6, 7} {
		if p.Errors[i].Line != line {
			t.Errorf("error %d on line %d, want %d", i, p.Errors[i].Line, line)
		}
	}
}

func FuzzParse(f *testing.F) {
	for _, tc := range parseErrorTests {
		text, _, _ := stripMarker(docOf(tc.body))
		f.Add(text)
	}
	for _, tc := range parseTests {
		f.Add(docOf(tc.body))
	}
	f.Fuzz(func(t *testing.T, text string) {
		doc := session.Parse(text)
		p := Parse(doc)
		lines := strings.Split(text, "\n")
		seen := map[int]bool{}
		for _, e := range p.Errors {
			if e.Line < 1 || e.Line > len(lines) {
				t.Fatalf("error line %d outside the %d-line input: %v", e.Line, len(lines), e)
			}
			if e.Column < 1 || e.Column > utf8.RuneCountInString(lines[e.Line-1])+1 {
				t.Fatalf("error column %d outside line %q: %v", e.Column, lines[e.Line-1], e)
			}
			if seen[e.Line] {
				t.Fatalf("two errors on line %d", e.Line)
			}
			seen[e.Line] = true
			if e.Msg == "" {
				t.Fatal("empty message")
			}
		}
		// Canonical forms of good steps read back unchanged.
		for _, s := range p.Steps {
			if s.Err != nil {
				continue
			}
			again := parseLine(s.Canonical(), newLang(DefaultCatalog()))
			if again.Err != nil || again.Canonical() != s.Canonical() {
				t.Fatalf("canonical %q of %q reads back as %q (%v)", s.Canonical(), s.Text, again.Canonical(), again.Err)
			}
		}
	})
}

func BenchmarkParse(b *testing.B) {
	lines := []string{"load shop-orders.csv value=units date=month", "split last=12", "smooth centered width=12",
		"forecast moving-average width=12 as=ma%d", "evaluate by=mase", "sweep moving-average width=2..24 by=rmse"}
	for _, n := range []int{10, 100, 1000} {
		var sb strings.Builder
		for i := range n {
			l := lines[i%len(lines)]
			if strings.Contains(l, "%d") {
				l = strings.Replace(l, "%d", itoa(i), 1)
			}
			sb.WriteString(l + "\n")
		}
		doc := session.Parse(docOf(sb.String()))
		b.Run(itoa(n)+"-steps", func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				Parse(doc)
			}
		})
	}
}

func TestFiles(t *testing.T) {
	t.Parallel()
	p := ParseText(docOf("load a.csv\nsplit last=3\nload b.csv value=x\nload a.csv"))
	got := p.Files()
	if len(got) != 2 || got[0] != "a.csv" || got[1] != "b.csv" {
		t.Errorf("got %v, want [a.csv b.csv]", got)
	}
}
