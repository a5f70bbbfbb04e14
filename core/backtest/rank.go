package backtest

import (
	"cmp"
	"context"
	"fmt"
	"slices"
	"strings"

	"quillcast/core/accuracy"
	"quillcast/core/forecast"
)

// Ranking is the evidence behind an automatic choice: every candidate's
// rolling-origin accuracy inside the training data, best first.
type Ranking struct {
	By      accuracy.Measure // the measure ranked by
	Horizon int              // periods ahead forecast from each origin
	Folds   []Fold           // the rolling origins, all inside the training data
	Entries []RankEntry      // single candidates, best first
	// Choice is the entry chosen: the equal-weight combination of the best
	// few entries, or the best entry alone when only one is combined.
	Choice  RankEntry
	Dropped []string // candidates left out and why, in plain words
	// Notes are plain-words remarks, such as a horizon shortened to fit a
	// short series.
	Notes []string
}

// RankEntry is one candidate of a ranking: a single method, or an
// equal-weight combination of several.
type RankEntry struct {
	Label   string   // the method's name, or "comb-" and the members' names joined by "-"
	Members []string // the methods averaged; one for a single method
	// Score is the mean of By over every horizon of every fold.
	Score accuracy.Result
	// SMAPE and MASE are the same forecasts' mean sMAPE and MASE, shown
	// beside Score whatever By is.
	SMAPE, MASE accuracy.Result
}

// Why says in plain words which entry was chosen and on what evidence.
func (r *Ranking) Why() string {
	var b strings.Builder
	fmt.Fprintf(&b, "ranked by mean %s over %d rolling %s forecasting %d periods ahead inside the training data: ",
		r.By, len(r.Folds), plural(len(r.Folds), "origin", "origins"), r.Horizon)
	for i, e := range r.Entries {
		if i > 0 {
			b.WriteString(", ")
		}
		fmt.Fprintf(&b, "%s %s", e.Label, scoreText(e.Score))
	}
	if c := r.Choice; len(c.Members) > 1 {
		fmt.Fprintf(&b, ". The best %d are averaged with equal weights (%s %s on the same origins), because a combination of good methods is usually more reliable than the single best on past origins.",
			len(c.Members), r.By, scoreText(c.Score))
	} else {
		b.WriteString(".")
	}
	return b.String()
}

func scoreText(r accuracy.Result) string {
	if !r.Defined {
		return "undefined"
	}
	return num(r.Value)
}

// candidate is a method with its forecasts on every fold of a ranking.
type candidate struct {
	name   string
	method forecast.Method
	folds  [][]float64
}

// rank scores the candidates on folds of y, best first, and chooses the
// equal-weight combination of the best combine of them.
func rank(ctx context.Context, y []float64, season int, cands []candidate, folds []Fold, h int, by accuracy.Measure, combine int) (*Ranking, error) {
	r := &Ranking{By: by, Horizon: h, Folds: folds}
	scale := accuracy.NaiveScale(y, 1)
	var kept []candidate
	for _, c := range cands {
		c.folds = make([][]float64, len(folds))
		var failed error
		for k, f := range folds {
			if err := ctx.Err(); err != nil {
				return nil, fmt.Errorf("automatic choice stopped: %w", err)
			}
			fit, err := c.method.Fit(y[f.TrainStart:f.TrainEnd], season)
			if err != nil {
				failed = err
				break
			}
			c.folds[k] = fit.Forecast(h)
		}
		if failed != nil {
			r.Dropped = append(r.Dropped, fmt.Sprintf("%s: %v", c.name, failed))
			continue
		}
		kept = append(kept, c)
	}
	if len(kept) == 0 {
		return nil, fmt.Errorf("no candidate method could be fitted on the rolling origins inside the training data; %s", strings.Join(r.Dropped, "; "))
	}
	for _, c := range kept {
		r.Entries = append(r.Entries, score(y, folds, []candidate{c}, scale, by))
	}
	sortEntries(r.Entries, by)
	// The choice: the equal-weight combination of the best few.
	var members []candidate
	for _, e := range r.Entries[:min(max(combine, 1), len(r.Entries))] {
		if !e.Score.Defined {
			break
		}
		for _, c := range kept {
			if c.name == e.Label {
				members = append(members, c)
			}
		}
	}
	if len(members) == 0 {
		return nil, fmt.Errorf("no candidate method could be scored by %s on the rolling origins: %s", by, r.Entries[0].Score.Reason)
	}
	r.Choice = score(y, folds, members, scale, by)
	return r, nil
}

// score evaluates the equal-weight average of the members' fold forecasts.
func score(y []float64, folds []Fold, members []candidate, scale accuracy.Scale, by accuracy.Measure) RankEntry {
	var t accuracy.Tally
	e := RankEntry{}
	for _, m := range members {
		e.Members = append(e.Members, m.name)
	}
	e.Label = e.Members[0]
	if len(members) > 1 {
		e.Label = "comb-" + strings.Join(e.Members, "-")
	}
	for k, f := range folds {
		for h := range f.TestEnd - f.TestStart {
			var sum float64
			for _, m := range members {
				sum += m.folds[k][h]
			}
			t.Add(y[f.TestStart+h], sum/float64(len(members)))
		}
	}
	s := t.Scores(scale)
	e.Score, e.SMAPE, e.MASE = s.Of(by), s.Of(accuracy.SMAPE), s.Of(accuracy.MASE)
	return e
}

// sortEntries orders entries best first; undefined scores go last and ties
// keep their order.
func sortEntries(es []RankEntry, by accuracy.Measure) {
	slices.SortStableFunc(es, func(a, b RankEntry) int {
		switch {
		case a.Score.Better(by, b.Score):
			return -1
		case b.Score.Better(by, a.Score):
			return 1
		}
		return cmp.Compare(len(a.Members), len(b.Members))
	})
}
