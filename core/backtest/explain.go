package backtest

import (
	"fmt"
	"strings"
)

// smoothingNote is the general lesson of every smoothing sweep, shown under
// the chart and written into the memo.
const smoothingNote = "Too little smoothing chases noise: the forecast jumps with every random rise and fall and those jumps become errors. " +
	"Too much smoothing flattens the pattern: the forecast ignores real changes in level and lags behind a trend."

// explainWidths writes the plain-words reading of a moving-average sweep.
func explainWidths(s *WidthSweep, widths Range) string {
	var b strings.Builder
	fmt.Fprintf(&b, "On the training periods that every width can forecast, width %d has the lowest RMSE (%s).", s.Best, num(rowFor(s.Rows, s.Best).Common.RMSE))
	if s.BestOwn != s.Best {
		fmt.Fprintf(&b, " Scored on each width's own periods it is width %d, but wider windows are then scored on fewer, later periods, so that comparison is not like for like.", s.BestOwn)
	}
	if s.BestValidation > 0 {
		fmt.Fprintf(&b, " On the validation period width %d does best (RMSE %s); choosing the width by the validation period uses it up, so it no longer tests the choice honestly.", s.BestValidation, num(rowFor(s.Rows, s.BestValidation).Validation.RMSE))
	}
	b.WriteString(" Narrow windows (such as width 1, which repeats the last value) chase noise; wide windows flatten the pattern and lag behind a trend.")
	b.WriteString(edgeNote("width", s.Best == widths.From, s.Best == widths.To, widths.From == 1))
	return b.String()
}

// edgeNote warns when the best value sits on the edge of the grid.
func edgeNote(what string, low, high, lowIsNatural bool) string {
	switch {
	case low && !lowIsNatural:
		return fmt.Sprintf(" The best %s is the smallest one tried; try smaller values too.", what)
	case high:
		return fmt.Sprintf(" The best %s is the largest one tried; try larger values too, and check whether the series has a trend or season that smoothing cannot follow.", what)
	}
	return ""
}

func rowFor(rows []WidthRow, w int) WidthRow {
	for _, r := range rows {
		if r.Width == w {
			return r
		}
	}
	return WidthRow{}
}

// num formats a score for text: four significant digits, no exponent for
// everyday sizes.
func num(v float64) string {
	return strings.TrimSuffix(strings.TrimRight(fmt.Sprintf("%.4g", v), "."), ".")
}
