package runner

import (
	"fmt"
	"math"
	"strings"

	"quillcast/core/format"
	"quillcast/core/memo"
	"quillcast/core/session"
)

// Memo writes the forecast memo of the run: summary, data, partition,
// comparison, charts, forecasts, assumptions and cautions, the user's
// prose and an appendix with the steps. version is the program version
// written in the appendix. Tables and charts are the ones shown under the
// steps, with the same figures.
func (res *Result) Memo(version string) memo.Memo {
	st := res.final
	if st == nil {
		st = &state{}
	}
	m := memo.Memo{Title: st.meta.Title, PreparedBy: st.meta.By, Client: st.meta.Client, Date: st.meta.Date, Version: version}
	if m.Title == "" {
		m.Title = docTitle(res.doc)
	}
	rec := res.recommended()
	m.Sections = append(m.Sections,
		res.summarySection(rec),
		res.dataSection(),
		res.partitionSection(),
		res.comparisonSection(),
		res.chartsSection(rec),
		res.forecastSection(rec),
		res.cautionsSection(rec),
		res.notesSection(),
		res.appendixSection(version),
	)
	return m
}

// docTitle is the first level-one heading of the prose, or a plain title.
func docTitle(doc *session.Document) string {
	if doc != nil {
		for _, p := range doc.Parts {
			if p.Kind != session.Prose {
				continue
			}
			for _, l := range strings.Split(p.Raw, "\n") {
				if t, ok := strings.CutPrefix(strings.TrimSpace(l), "# "); ok {
					return strings.TrimSpace(t)
				}
			}
		}
	}
	return "Forecast memo"
}

// recommended returns the forecast the memo recommends: the pick step's
// choice, else the best by the last evaluation, else the only forecast.
func (res *Result) recommended() *fcast {
	st := res.final
	if st == nil || st.data == nil {
		return nil
	}
	if st.pick != nil {
		if f := st.forecastNamed(st.pick.label); f != nil {
			return f
		}
	}
	if st.eval != nil && st.eval.best != "" {
		if f := st.forecastNamed(st.eval.best); f != nil {
			return f
		}
	}
	if len(st.forecasts) == 1 {
		return st.forecasts[0]
	}
	return nil
}

func para(format string, args ...any) memo.Paragraph {
	return memo.Paragraph{Text: fmt.Sprintf(format, args...)}
}

func (res *Result) summarySection(rec *fcast) memo.Section {
	st := res.final
	s := memo.Section{Kind: memo.Summary}
	if rec == nil {
		s.Blocks = append(s.Blocks, para("No method is recommended: the session has no forecast scored on a validation period. Add `split`, `forecast` and `evaluate` or `pick` steps."))
		return s
	}
	why := ""
	switch {
	case st.pick != nil && st.pick.label == rec.label:
		why = " " + st.pick.why
	case st.eval != nil && st.eval.best == rec.label:
		why = fmt.Sprintf(" It has the best %s on the validation period among the forecasts compared.", strings.ToUpper(st.eval.by))
	}
	s.Blocks = append(s.Blocks, para("**Recommended method:** %s (%s).%s", rec.label, rec.title, why))
	labels := futureLabelsOf(st, len(rec.future))
	if len(rec.future) > 0 {
		head := fmt.Sprintf("**Headline forecast:** %s for %s", num(rec.future[0]), labels[0])
		if b := bandAt(rec, 80); b != nil {
			head += fmt.Sprintf(" (80%% interval %s to %s", num(b.lo[0]), num(b.hi[0]))
			if b95 := bandAt(rec, 95); b95 != nil {
				head += fmt.Sprintf("; 95%% interval %s to %s", num(b95.lo[0]), num(b95.hi[0]))
			}
			head += ")"
		}
		if len(rec.future) > 1 {
			total := 0.0
			for _, v := range rec.future {
				total += v
			}
			head += fmt.Sprintf("; %s in total over %s to %s", num(total), labels[0], labels[len(labels)-1])
		}
		s.Blocks = append(s.Blocks, para("%s.", head))
	}
	if acc := res.holdoutSentence(rec); acc != "" {
		s.Blocks = append(s.Blocks, para("%s", acc))
	}
	return s
}

// holdoutSentence states the recommended forecast's validation accuracy
// against the naive benchmarks.
func (res *Result) holdoutSentence(rec *fcast) string {
	st := res.final
	if st.eval == nil || st.split == nil {
		return ""
	}
	by := st.eval.by
	var own *scored
	var bench []string
	for i, r := range st.eval.rows {
		if r.label == rec.label {
			own = &st.eval.rows[i]
		}
		if r.method == "naive" || r.method == "seasonal-naive" {
			if v, ok := r.valid[by]; ok && r.label != rec.label {
				bench = append(bench, fmt.Sprintf("%s for the %s benchmark", validCell(st.eval.rows, by, v), strings.ReplaceAll(r.method, "-", " ")))
			}
		}
	}
	if own == nil {
		return ""
	}
	v, ok := own.valid[by]
	if !ok {
		return ""
	}
	d := st.data
	out := fmt.Sprintf("**Holdout accuracy:** %s %s on the validation period %s to %s (%s not used for fitting)",
		strings.ToUpper(by), validCell(st.eval.rows, by, v), d.periods[st.split.trainEnd], d.periods[len(d.y)-1], count(len(d.y)-st.split.trainEnd, "period", "periods"))
	if len(bench) > 0 {
		out += ", against " + joinWords(bench)
	}
	if mape, ok := own.valid["mape"]; ok {
		out += fmt.Sprintf("; MAPE %s", format.Percent(mape, 1))
	}
	return out + "."
}

func bandAt(f *fcast, level float64) *band {
	for i := range f.bands {
		if math.Abs(f.bands[i].level-level) < 1e-9 {
			return &f.bands[i]
		}
	}
	return nil
}

func futureLabelsOf(st *state, h int) []string {
	out := make([]string, h)
	for i := range out {
		out[i] = st.data.series.PeriodAt(len(st.data.y) + i).String()
	}
	return out
}
