package memo

import (
	"errors"
	"fmt"
	"strings"
)

// StandingCaution returns the caution every memo carries: the figures are
// estimates for a responsible professional to review, and stated intervals
// tend to be too narrow.
func StandingCaution() string {
	return "The figures in this memo are estimates made by statistical methods from past data, " +
		"not guarantees. A responsible professional should review them, and the assumptions " +
		"they rest on, before any decision depends on them. Stated prediction intervals tend " +
		"to be too narrow: they leave out the uncertainty of choosing the method and its " +
		"settings and of changes the past data do not show, so expect actual values to fall " +
		"outside them more often than their stated level suggests."
}

// CautionsSection returns the assumptions-and-cautions section: the given
// cautions (Markdown lines generated from the checks) as a bullet list,
// followed by [StandingCaution].
func CautionsSection(cautions ...string) Section {
	s := Section{Kind: Cautions}
	if len(cautions) > 0 {
		s.Blocks = append(s.Blocks, List{Items: append([]string(nil), cautions...)})
	}
	s.Blocks = append(s.Blocks, Paragraph{Text: StandingCaution()})
	return s
}

// ErrNoCautions is returned by the renderers when the memo has no section of
// kind [Cautions], or when that section lacks [StandingCaution].
var ErrNoCautions = errors.New("the memo has no assumptions-and-cautions section with the standing caution; add one with memo.CautionsSection")

// Missing returns, in order, the kinds from [Summary] to [Appendix] that
// have no section in m. A complete memo returns none.
func (m Memo) Missing() []Kind {
	var out []Kind
	for k := Summary; k <= Appendix; k++ {
		found := false
		for _, s := range m.Sections {
			if s.Kind == k {
				found = true
				break
			}
		}
		if !found {
			out = append(out, k)
		}
	}
	return out
}

// Check returns the first reason the memo cannot be written: no title, no
// cautions section with the standing caution, a table row whose length
// differs from the columns, or a chart that is not a plain SVG drawing.
// The renderers call it first.
func (m Memo) Check() error {
	if strings.TrimSpace(m.Title) == "" {
		return errors.New("the memo has no title; give it one")
	}
	if !hasStandingCaution(m) {
		return ErrNoCautions
	}
	for _, ex := range m.Exhibits() {
		block := m.Sections[ex.Section].Blocks[ex.Block]
		switch b := block.(type) {
		case Table:
			if len(b.Columns) == 0 {
				return fmt.Errorf("%s has no columns", ExhibitTitle(ex.Number, b.Caption))
			}
			for i, row := range b.Rows {
				if len(row) != len(b.Columns) {
					return fmt.Errorf("%s, row %d: %d cells for %d columns; give every row one cell per column",
						ExhibitTitle(ex.Number, b.Caption), i+1, len(row), len(b.Columns))
				}
			}
		case Chart:
			if err := checkSVG(b.SVG); err != nil {
				return fmt.Errorf("%s: %w", ExhibitTitle(ex.Number, b.Caption), err)
			}
		}
	}
	return nil
}

func hasStandingCaution(m Memo) bool {
	want := StandingCaution()
	for _, s := range m.Sections {
		if s.Kind != Cautions {
			continue
		}
		for _, b := range s.Blocks {
			switch b := b.(type) {
			case Paragraph:
				if strings.Contains(b.Text, want) {
					return true
				}
			case List:
				for _, it := range b.Items {
					if strings.Contains(it, want) {
						return true
					}
				}
			}
		}
	}
	return false
}
