package steps

import (
	"math"
	"strconv"
	"strings"

	"quillcast/core/series"
)

// Kind says how an option's value is written.
type Kind int

// The kinds of value.
const (
	Number  Kind = iota // any finite number: 0.3, -2, 1500
	Whole               // a whole number: 12
	Word                // one word of the option's Choices: mase
	Name                // a name chosen by the user (a label, a column): hw, "unit orders"
	Text                // free text, quoted when it has spaces: "Wickery & Co."
	Range               // a range of numbers: 2..24, 0.1..0.9
	Numbers             // a list of numbers: 80,95
	Names               // a list of names: hw,ma12
	Period              // a period of the calendar: 2024-03, 2024-Q1, 2024-W05
)

// String names the kind as help and errors show it.
func (k Kind) String() string {
	switch k {
	case Number:
		return "number"
	case Whole:
		return "whole number"
	case Word:
		return "word"
	case Name:
		return "name"
	case Text:
		return "text"
	case Range:
		return "range"
	case Numbers:
		return "list of numbers"
	case Names:
		return "list of names"
	case Period:
		return "period"
	}
	return "value"
}

// Value is an option's value as read from a step. Raw is always set; the
// other fields are filled according to the option's [Kind].
type Value struct {
	Raw    string        `json:"raw"`             // as written, quotes removed
	Num    float64       `json:"num,omitempty"`   // Number, Whole; the single value of a one-value Range
	Lo     float64       `json:"lo,omitempty"`    // Range
	Hi     float64       `json:"hi,omitempty"`    // Range
	Nums   []float64     `json:"nums,omitempty"`  // Numbers
	Words  []string      `json:"words,omitempty"` // Names
	Period series.Period `json:"-"`               // Period
}

// Int returns the value as a whole number (Number or Whole kinds).
func (v Value) Int() int { return int(math.Round(v.Num)) }

// readValue reads raw as kind k for option o. It returns the value, or a
// message (without position) saying what is wrong and how to fix it, and
// the 0-based character offset inside raw where the problem lies.
func readValue(o OptionDef, raw string) (Value, string, int) {
	v := Value{Raw: raw}
	if raw == "" {
		return v, "no value after " + quote(o.Name+"=") + "; write " + example(o), 0
	}
	switch o.Kind {
	case Number, Whole:
		x, ok := number(raw)
		if !ok {
			return v, quote(raw) + " is not a " + o.Kind.String() + "; write " + example(o), 0
		}
		if msg := inRange(o, x); msg != "" {
			return v, msg, 0
		}
		v.Num = x
	case Word:
		if !contains(o.Choices, raw) {
			return v, quote(raw) + " is not accepted for " + quote(o.Name) + didYouMean(raw, o.Choices) + choicesText(o.Choices), 0
		}
	case Name, Text:
	case Range:
		lo, hi, found := strings.Cut(raw, "..")
		if !found {
			x, ok := number(raw)
			if !ok {
				return v, quote(raw) + " is not a range; write " + example(o), 0
			}
			lo, hi = raw, raw
			v.Num = x
		}
		a, okA := number(lo)
		if !okA {
			return v, quote(lo) + " is not a number; write a range such as " + o.Example, 0
		}
		b, okB := number(hi)
		if !okB {
			return v, quote(hi) + " is not a number; write a range such as " + o.Example, len([]rune(lo)) + 2
		}
		if b < a {
			return v, "the range " + quote(raw) + " runs backwards; write the smaller end first, such as " + trimNum(b) + ".." + trimNum(a), 0
		}
		for i, x := range []float64{a, b} {
			if msg := inRange(o, x); msg != "" {
				at := 0
				if i == 1 {
					at = len([]rune(lo)) + 2
				}
				return v, msg, at
			}
		}
		v.Lo, v.Hi = a, b
	case Numbers:
		at := 0
		for _, part := range strings.Split(raw, ",") {
			x, ok := number(part)
			if !ok {
				return v, quote(part) + " is not a number; write numbers separated by commas, such as " + o.Example, at
			}
			if msg := inRange(o, x); msg != "" {
				return v, msg, at
			}
			v.Nums = append(v.Nums, x)
			at += len([]rune(part)) + 1
		}
	case Names:
		at := 0
		for _, part := range strings.Split(raw, ",") {
			if part == "" {
				return v, "an empty name in the list " + quote(raw) + "; write names separated by commas, such as " + o.Example, at
			}
			v.Words = append(v.Words, part)
			at += len([]rune(part)) + 1
		}
	case Period:
		p, err := series.ParsePeriod(raw)
		if err != nil {
			return v, quote(raw) + " is not a period; write one such as 2024-03 (month), 2024-Q1 (quarter) or 2024-W05 (week)", 0
		}
		v.Period = p
	}
	return v, "", 0
}

// number reads a finite decimal number; "NaN", "Inf" and hex forms are
// refused, and so are Go's underscores.
func number(s string) (float64, bool) {
	if s == "" || strings.ContainsAny(s, "_xXpPnNiI") {
		return 0, false
	}
	x, err := strconv.ParseFloat(s, 64)
	if err != nil || math.IsNaN(x) || math.IsInf(x, 0) {
		return 0, false
	}
	return x, true
}

func inRange(o OptionDef, x float64) string {
	if o.Kind == Whole || (o.Whole && (o.Kind == Range || o.Kind == Numbers)) {
		if x != math.Trunc(x) {
			return quote(trimNum(x)) + " is not a whole number; write " + example(o)
		}
	}
	if x < o.Min || x > o.Max {
		return quote(trimNum(x)) + " is out of range for " + quote(o.Name) + "; write a value " + rangeWords(o.Min, o.Max)
	}
	return ""
}

func rangeWords(lo, hi float64) string {
	switch {
	case math.IsInf(lo, -1) && math.IsInf(hi, 1):
		return "that is a finite number"
	case math.IsInf(hi, 1):
		return "of at least " + trimNum(lo)
	case math.IsInf(lo, -1):
		return "of at most " + trimNum(hi)
	}
	return "from " + trimNum(lo) + " to " + trimNum(hi)
}

func trimNum(x float64) string { return strconv.FormatFloat(x, 'g', -1, 64) }

func contains(list []string, s string) bool {
	for _, c := range list {
		if c == s {
			return true
		}
	}
	return false
}

func choicesText(choices []string) string {
	if len(choices) == 0 {
		return ""
	}
	return " (write one of " + strings.Join(choices, ", ") + ")"
}

// example is the fix a message proposes for option o.
func example(o OptionDef) string {
	if o.Example != "" {
		return "a " + o.Kind.String() + " such as " + o.Name + "=" + o.Example
	}
	return "a " + o.Kind.String()
}
