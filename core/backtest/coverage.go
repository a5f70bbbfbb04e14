package backtest

import (
	"fmt"
	"math"

	"quillcast/core/accuracy"
)

// intervalNotes reads the coverage of the stated intervals in plain words.
func intervalNotes(b *Backtest) []string {
	if len(b.Intervals) == 0 {
		return []string{fmt.Sprintf("%s states no analytic prediction interval; use the empirical intervals from these backtest errors instead.", b.Method)}
	}
	var notes []string
	for _, iv := range b.Intervals {
		if !iv.Coverage.Defined {
			notes = append(notes, iv.Coverage.Reason)
			continue
		}
		notes = append(notes, coverageNote(b.Method, iv))
	}
	return notes
}

// coverageNote compares the coverage of one level with what it states. The
// gap counts as more than chance when it exceeds two binomial standard
// errors, sqrt(L(1-L)/N) (common practice).
func coverageNote(method string, iv accuracy.IntervalScores) string {
	level, got := iv.Level, iv.Coverage.Value
	head := fmt.Sprintf("The %s%% intervals stated by %s covered %s%% of %d actual values (Winkler score %s).",
		num(100*level), method, num(100*got), iv.N, winklerText(iv))
	if got >= level {
		return head + " They covered as often as stated on these folds; stated intervals still tend to be too narrow on new data, so keep watching."
	}
	se := math.Sqrt(level * (1 - level) / float64(iv.N))
	tail := " The shortfall is within what chance allows for this many forecasts, but stated intervals tend to be too narrow: they leave out the uncertainty of the parameters and of the choice of method."
	if level-got > 2*se {
		tail = " They are too narrow: stated intervals leave out the uncertainty of the parameters and of the choice of method. Prefer the empirical intervals from these backtest errors, or widen the stated ones."
	}
	return head + tail
}

func winklerText(iv accuracy.IntervalScores) string {
	if !iv.Winkler.Defined {
		return "undefined"
	}
	return num(iv.Winkler.Value)
}
