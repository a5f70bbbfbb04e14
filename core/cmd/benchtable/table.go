package main

import (
	"fmt"
	"io"
	"strings"
)

// row is one line of the table: our figure, the comparison measured in the
// same run, their ratio and the target.
type row struct {
	Item   string // issue row: 1 payload ... 7 memory
	What   string
	Ours   sample
	Other  sample // the comparison; empty when there is none
	Versus string // what the comparison is
	Ratio  string // how ours compares, in words the target uses
	Target string
	Met    string // "yes", "no" or "" when the row has no target
	Note   string
}

// verdict returns "yes" or "no" for a condition, or "" when the figure is
// missing.
func verdict(measured, ok bool) string {
	switch {
	case !measured:
		return "not measured"
	case ok:
		return "yes"
	}
	return "no"
}

// faster describes how many times faster ours is than the comparison
// (their median over ours).
func faster(ours, other sample) (string, float64) {
	if !ours.ok() || !other.ok() || ours.median() <= 0 {
		return "", 0
	}
	r := other.median() / ours.median()
	if r < 1 {
		return fmt.Sprintf("%s× slower", times(1/r)), r
	}
	return fmt.Sprintf("%s× faster", times(r)), r
}

// times shows a ratio with two decimals below 10 (so that 1.78 is not
// shown as the 1.8 it misses) and one above.
func times(r float64) string {
	if r < 10 {
		return fmt.Sprintf("%.2f", r)
	}
	return fmt.Sprintf("%.1f", r)
}

// writeTable prints rows as a markdown table followed by the notes.
func writeTable(w io.Writer, rows []row) error {
	var b strings.Builder
	b.WriteString("| # | what | ours: median (min–max, runs) | comparison, same run | ratio | target | met |\n")
	b.WriteString("|---|---|---|---|---|---|---|\n")
	for _, r := range rows {
		other := "—"
		if r.Versus != "" {
			other = r.Versus
			if r.Other.ok() {
				other += ": " + r.Other.String()
			}
		}
		fmt.Fprintf(&b, "| %s | %s | %s | %s | %s | %s | %s |\n", r.Item, r.What, r.Ours, other, dash(r.Ratio), dash(r.Target), dash(r.Met))
	}
	notes := false
	for _, r := range rows {
		if r.Note == "" {
			continue
		}
		if !notes {
			b.WriteString("\nNotes:\n\n")
			notes = true
		}
		fmt.Fprintf(&b, "- %s %s: %s\n", r.Item, r.What, r.Note)
	}
	_, err := io.WriteString(w, b.String())
	return err
}

func dash(s string) string {
	if s == "" {
		return "—"
	}
	return s
}
