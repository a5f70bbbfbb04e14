package runner

import (
	"context"
	"fmt"
	"math"
	"strings"

	"quillcast/core/format"
	"quillcast/core/steps"
)

// exec is one step being run: the state it changes and the output it fills.
type exec struct {
	r    *Runner
	ctx  context.Context
	st   *state
	s    *steps.Step
	data Data
	out  *Output
	// rep reports the parts of a long step; index is the step's place
	// among the session's steps, from 0.
	rep   reporter
	index int
}

// run dispatches on the verb.
func (x *exec) run() error {
	switch x.s.Verb {
	case "memo":
		return x.memo()
	case "load":
		return x.load()
	case "split":
		return x.split()
	case "smooth":
		return x.smooth()
	case "forecast":
		return x.forecast()
	case "combine":
		return x.combine()
	case "evaluate":
		return x.evaluate()
	case "sweep":
		return x.sweep()
	case "backtest":
		return x.backtest()
	case "difference":
		return x.difference()
	case "decompose":
		return x.decompose()
	case "check":
		return x.check()
	case "pick":
		return x.pick()
	case "bakeoff":
		return x.bakeoff()
	}
	return fmt.Errorf("the verb %q has no runner", x.s.Verb)
}

// message adds a message block.
func (x *exec) message(level, format string, args ...any) {
	x.out.Blocks = append(x.out.Blocks, Block{Kind: MessageBlock, Level: level, Text: fmt.Sprintf(format, args...)})
}

// table adds a numbered table exhibit and returns its number.
func (x *exec) table(title string, t *Table, note string) int {
	x.st.exhibits++
	x.out.Blocks = append(x.out.Blocks, Block{Kind: TableBlock, Exhibit: x.st.exhibits, Title: title, Table: t, Text: note})
	return x.st.exhibits
}

// chart adds a numbered chart exhibit; file is the chart's base name.
func (x *exec) chart(title, file, svg, note string) int {
	x.st.exhibits++
	name := fmt.Sprintf("exhibit-%02d-%s.svg", x.st.exhibits, file)
	x.out.Blocks = append(x.out.Blocks, Block{Kind: ChartBlock, Exhibit: x.st.exhibits, Title: title, SVG: svg, File: name, Text: note})
	return x.st.exhibits
}

// placedError is a run error that points at a column of the step (the
// subject or an option's value) rather than at the verb.
type placedError struct {
	col int
	msg string
}

func (e *placedError) Error() string { return e.msg }

// errAtSubject returns an error pointing at the step's subject.
func (x *exec) errAtSubject(format string, args ...any) error {
	return &placedError{col: x.s.SubjCol, msg: fmt.Sprintf(format, args...)}
}

// errAtOption returns an error pointing at the value of option key.
func (x *exec) errAtOption(key, format string, args ...any) error {
	col := x.s.Column
	if o, ok := x.s.Option(key); ok {
		col = o.ValueCol
	}
	return &placedError{col: col, msg: fmt.Sprintf(format, args...)}
}

// option returns the value of option key, if given.
func (x *exec) option(key string) (steps.Value, bool) {
	o, ok := x.s.Option(key)
	return o.Value, ok
}

func (x *exec) intOption(key string, def int) int {
	if v, ok := x.option(key); ok {
		return v.Int()
	}
	return def
}

func (x *exec) wordOption(key, def string) string {
	if v, ok := x.option(key); ok {
		return v.Raw
	}
	return def
}

// num formats a value with the decimals that suit it: the page and the
// memo both call this, so they show the same figures.
func num(v float64) string {
	if math.IsNaN(v) || math.IsInf(v, 0) {
		return format.Missing
	}
	return format.Auto(v)
}

// value formats a parameter value: whole numbers without decimals.
func value(v float64) string {
	if v == math.Trunc(v) && math.Abs(v) < 1e15 {
		return format.Number(v, 0)
	}
	return num(v)
}

// decimals returns the decimals for a column: none when every value is a
// whole number, else those of [format.ColumnDecimals].
func decimals(vs []float64) int {
	for _, v := range vs {
		if !math.IsNaN(v) && !math.IsInf(v, 0) && v != math.Trunc(v) {
			return format.ColumnDecimals(vs)
		}
	}
	return 0
}

// numIn formats v with the decimals of a column.
func numIn(v float64, decimals int) string {
	if math.IsNaN(v) || math.IsInf(v, 0) {
		return format.Missing
	}
	return format.Number(v, decimals)
}

// count writes "12 periods" or "1 period".
func count(n int, one, many string) string {
	if n == 1 {
		return "1 " + one
	}
	return format.Int(n) + " " + many
}

// label returns the label of position i of the loaded series, or of a
// period past its end.
func (x *exec) label(i int) string {
	d := x.st.data
	if i >= 0 && i < len(d.periods) {
		return d.periods[i]
	}
	return d.series.PeriodAt(i).String()
}

// span writes "2024-01 to 2024-12".
func (x *exec) span(from, to int) string {
	if to-from == 1 {
		return x.label(from)
	}
	return x.label(from) + " to " + x.label(to-1)
}

// futureLabels returns the labels of the h periods after the data.
func (x *exec) futureLabels(h int) []string {
	d := x.st.data
	out := make([]string, h)
	for i := range out {
		out[i] = d.series.PeriodAt(len(d.y) + i).String()
	}
	return out
}

func joinWords(words []string) string {
	switch len(words) {
	case 0:
		return ""
	case 1:
		return words[0]
	}
	return strings.Join(words[:len(words)-1], ", ") + " and " + words[len(words)-1]
}

func nanSlice(n int) []float64 {
	out := make([]float64, n)
	for i := range out {
		out[i] = math.NaN()
	}
	return out
}
