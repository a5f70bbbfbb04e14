package memo

import (
	"fmt"
	"strings"
)

// Exhibit is a numbered table or chart of the memo.
type Exhibit struct {
	// Number is the exhibit's number: the Number its [Table] or [Chart]
	// carries, or, when that is 0, the next number after the highest one
	// given, counted in reading order.
	Number  int
	Caption string
	// Section and Block locate the exhibit: m.Sections[Section].Blocks[Block].
	Section, Block int
	// File is the chart's path inside the zip ("charts/03-errors.svg"); ""
	// for a table.
	File string
}

// Exhibits returns the memo's tables and charts in reading order with their
// numbers. Exhibits that carry a Number keep it, so a memo written from a
// session uses the numbers shown under the steps (and may skip those it
// leaves out); the others are numbered after the highest number given, in
// reading order. With no numbers given, exhibits count from 1.
func (m Memo) Exhibits() []Exhibit {
	next := 1
	for _, s := range m.Sections {
		for _, b := range s.Blocks {
			if n := givenNumber(b); n >= next {
				next = n + 1
			}
		}
	}
	var out []Exhibit
	for si, s := range m.Sections {
		for bi, b := range s.Blocks {
			n := givenNumber(b)
			number := func() int {
				if n > 0 {
					return n
				}
				next++
				return next - 1
			}
			switch b := b.(type) {
			case Table:
				out = append(out, Exhibit{Number: number(), Caption: b.Caption, Section: si, Block: bi})
			case Chart:
				n = number()
				out = append(out, Exhibit{Number: n, Caption: b.Caption, Section: si, Block: bi, File: chartFile(n, b.Stem)})
			}
		}
	}
	return out
}

// givenNumber returns the number a table or chart carries; 0 for any other
// block and for exhibits to be numbered in reading order.
func givenNumber(b Block) int {
	switch b := b.(type) {
	case Table:
		return b.Number
	case Chart:
		return b.Number
	}
	return 0
}

// ExhibitTitle returns "Exhibit n — caption", or "Exhibit n" when the
// caption is empty.
func ExhibitTitle(n int, caption string) string {
	if strings.TrimSpace(caption) == "" {
		return fmt.Sprintf("Exhibit %d", n)
	}
	return fmt.Sprintf("Exhibit %d — %s", n, caption)
}

// chartFile returns the zip path of chart exhibit n.
func chartFile(n int, stem string) string {
	return fmt.Sprintf("charts/%02d-%s.svg", n, cleanStem(stem))
}

// cleanStem keeps a-z and 0-9 (upper case lowered), turns runs of anything
// else into one hyphen, trims hyphens and cuts to 40 bytes.
func cleanStem(stem string) string {
	var b strings.Builder
	hyphen := false
	for _, r := range strings.ToLower(stem) {
		if (r >= 'a' && r <= 'z') || (r >= '0' && r <= '9') {
			if hyphen && b.Len() > 0 {
				b.WriteByte('-')
			}
			hyphen = false
			b.WriteRune(r)
			if b.Len() >= 40 {
				break
			}
			continue
		}
		hyphen = true
	}
	if b.Len() == 0 {
		return "chart"
	}
	return b.String()
}
