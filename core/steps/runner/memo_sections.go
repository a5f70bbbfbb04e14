package runner

import (
	"fmt"
	"strings"

	"quillcast/core/format"
	"quillcast/core/memo"
)

// exhibits returns the table or chart blocks of the last successful step
// with the given verb.
func (res *Result) lastBlocks(verb, kind string) []Block {
	for i := len(res.Outputs) - 1; i >= 0; i-- {
		o := res.Outputs[i]
		if o.Verb != verb || o.Status != Done {
			continue
		}
		var out []Block
		for _, b := range o.Blocks {
			if b.Kind == kind {
				out = append(out, b)
			}
		}
		return out
	}
	return nil
}

func toTable(b Block) memo.Table {
	t := memo.Table{Number: b.Exhibit, Caption: b.Title, Rows: b.Table.Rows, Note: b.Text}
	for i, h := range b.Table.Headers {
		t.Columns = append(t.Columns, memo.Column{Header: h, Numeric: i < len(b.Table.Right) && b.Table.Right[i]})
	}
	return t
}

func toChart(b Block) memo.Chart {
	stem := strings.TrimSuffix(b.File, ".svg")
	if i := strings.Index(stem, "-"); i >= 0 {
		if j := strings.Index(stem[i+1:], "-"); j >= 0 {
			stem = stem[i+j+2:] // drop "exhibit-NN-"
		}
	}
	return memo.Chart{Number: b.Exhibit, Caption: b.Title, SVG: b.SVG, Stem: stem}
}

func (res *Result) dataSection() memo.Section {
	s := memo.Section{Kind: memo.Data}
	st := res.final
	if st == nil || st.data == nil {
		s.Blocks = append(s.Blocks, para("No data were loaded: the session has no successful `load` step."))
		return s
	}
	for _, b := range res.lastBlocks("load", TableBlock) {
		s.Blocks = append(s.Blocks, toTable(b))
	}
	var log []string
	ds := st.data.set
	for _, c := range ds.Changes {
		if c.Series == st.data.series.Name {
			log = append(log, c.String())
		}
	}
	for _, p := range ds.Problems {
		if p.Series == st.data.series.Name {
			log = append(log, p.String())
		}
	}
	if len(log) == 0 {
		s.Blocks = append(s.Blocks, para("Cleaning log: nothing was changed; the file has no gaps, duplicates or rows out of order in this series."))
	} else {
		s.Blocks = append(s.Blocks, para("Cleaning log:"), memo.List{Items: log})
	}
	s.Blocks = append(s.Blocks, para("The fingerprint identifies the exact file read: the same file always gives the same fingerprint, so a reader can check that a refresh used the data they expect. The data themselves are not part of this memo."))
	return s
}

func (res *Result) partitionSection() memo.Section {
	s := memo.Section{Kind: memo.Partition}
	st := res.final
	if st == nil || st.data == nil || st.split == nil {
		s.Blocks = append(s.Blocks, para("No validation period was held out, so no method was scored on periods it had not seen. Treat any accuracy figure from the training period as optimistic."))
		return s
	}
	d, te := st.data, st.split.trainEnd
	s.Blocks = append(s.Blocks, para("Training period: %s to %s (%s). Validation (holdout) period: %s to %s (%s). Every method was fitted on the training period only and scored on the validation period; the forecasts past the end of the data come from a refit on all %s.",
		d.periods[0], d.periods[te-1], count(te, "period", "periods"), d.periods[te], d.periods[len(d.y)-1], count(len(d.y)-te, "period", "periods"), count(len(d.y), "period", "periods")))
	return s
}

// numbersNote tells the reader why exhibit numbers skip and do not always
// rise: they are the numbers shown under the steps.
const numbersNote = "Exhibits keep the numbers they have under the steps of the session, so each can be found where it was made; the memo shows the ones a reader needs, so some numbers are skipped."

func (res *Result) comparisonSection() memo.Section {
	s := memo.Section{Kind: memo.Comparison}
	tables := res.lastBlocks("evaluate", TableBlock)
	if len(tables) == 0 {
		s.Blocks = append(s.Blocks, para("No comparison was made: the session has no successful `evaluate` step."))
	}
	s.Blocks = append(s.Blocks, para("%s", numbersNote))
	for _, b := range tables {
		s.Blocks = append(s.Blocks, toTable(b))
	}
	for _, verb := range []string{"backtest", "bakeoff"} {
		for _, b := range res.lastBlocks(verb, TableBlock) {
			s.Blocks = append(s.Blocks, toTable(b))
		}
	}
	return s
}

// chartsSection repeats the charts a reader needs: the series, the holdout
// comparison and errors, the sweeps, accuracy by horizon, the
// decomposition, residual checks and the recommended forecast (with its
// empirical intervals when a backtest gave them).
func (res *Result) chartsSection(rec *fcast) memo.Section {
	s := memo.Section{Kind: memo.Charts}
	recChart := ""
	if rec != nil {
		recChart = "forecast-" + fileSafe(rec.label)
		if len(rec.bands) > 0 && rec.bands[0].empirical {
			recChart += "-empirical"
		}
	}
	for _, o := range res.Outputs {
		if o.Status != Done {
			continue
		}
		for _, b := range o.Blocks {
			if b.Kind != ChartBlock {
				continue
			}
			switch o.Verb {
			case "split", "smooth", "difference":
				continue
			}
			if stem := toChart(b).Stem; strings.HasPrefix(stem, "forecast-") && stem != recChart {
				continue
			}
			s.Blocks = append(s.Blocks, toChart(b))
		}
	}
	if len(s.Blocks) == 0 {
		s.Blocks = append(s.Blocks, para("No charts: no step drew one."))
	}
	return s
}

// forecastSection shows the recommended forecast's table as it appears under
// its step (or under the backtest that gave it empirical intervals), with
// the same exhibit number; only a forecast whose table was never shown gets
// a table of its own.
func (res *Result) forecastSection(rec *fcast) memo.Section {
	s := memo.Section{Kind: memo.Forecasts}
	if rec == nil {
		s.Blocks = append(s.Blocks, para("No forecast is recommended, so no forecast table is given."))
		return s
	}
	if b, ok := res.forecastBlock(rec); ok {
		s.Blocks = append(s.Blocks, toTable(b))
		if len(rec.bands) == 0 {
			s.Blocks = append(s.Blocks, para("%s", intervalSource(rec)))
		}
		return s
	}
	st := res.final
	labels := futureLabelsOf(st, len(rec.future))
	t := memo.Table{Caption: "Forecast of " + rec.label + " (" + rec.title + ")",
		Columns: []memo.Column{{Header: "period"}, {Header: "forecast", Numeric: true}}}
	levels := []float64{80, 95}
	for _, l := range levels {
		t.Columns = append(t.Columns, memo.Column{Header: num0(l) + "% low", Numeric: true}, memo.Column{Header: num0(l) + "% high", Numeric: true})
	}
	dec := format.ColumnDecimals(rec.future)
	for i, v := range rec.future {
		row := []string{labels[i], numIn(v, dec)}
		for _, l := range levels {
			if b := bandAt(rec, l); b != nil {
				row = append(row, numIn(b.lo[i], dec), numIn(b.hi[i], dec))
			} else {
				row = append(row, format.Missing, format.Missing)
			}
		}
		t.Rows = append(t.Rows, row)
	}
	t.Note = intervalSource(rec)
	s.Blocks = append(s.Blocks, t)
	return s
}

// forecastBlock finds the table that shows f's forecast past the end of the
// data with the intervals f now carries: the backtest's table when the
// intervals are empirical, else the table under the step that made f.
func (res *Result) forecastBlock(f *fcast) (Block, bool) {
	prefix := "Forecast " + f.label + ", "
	if len(f.bands) > 0 && f.bands[0].empirical {
		prefix = "Forecast " + f.label + " with empirical intervals, "
	}
	for i := len(res.Outputs) - 1; i >= 0; i-- {
		o := res.Outputs[i]
		if o.Status != Done {
			continue
		}
		for _, b := range o.Blocks {
			if b.Kind == TableBlock && strings.HasPrefix(b.Title, prefix) {
				return b, true
			}
		}
	}
	return Block{}, false
}

func intervalSource(f *fcast) string {
	switch {
	case len(f.bands) == 0:
		return "No interval: the method has no formula for one and no backtest gave empirical intervals; a dash marks the missing bounds."
	case f.bands[0].empirical:
		return "Intervals are empirical: quantiles of the errors the method made at each horizon in the rolling-origin backtest."
	}
	return "Intervals come from the method's formula; stated intervals tend to be too narrow."
}

func (res *Result) cautionsSection(rec *fcast) memo.Section {
	st := res.final
	var items []string
	if rec != nil && rec.assumes != "" {
		items = append(items, fmt.Sprintf("The recommended method, %s (%s), assumes %s.", rec.label, rec.title, strings.TrimSuffix(rec.assumes, ".")))
	}
	if st != nil {
		items = append(items, st.cautions...)
		if st.data != nil && st.split == nil {
			items = append(items, "No validation period was held out: the accuracy of these forecasts on unseen periods is unknown.")
		}
	}
	for _, o := range res.Outputs {
		switch o.Status {
		case Failed:
			items = append(items, fmt.Sprintf("Step %d (`%s`) failed and its results are missing: %s", o.Step, o.Text, o.Error.Msg))
		case Waiting:
			items = append(items, fmt.Sprintf("Step %d (`%s`) did not run: it waits on step %d, which failed.", o.Step, o.Text, o.WaitsOn))
		}
	}
	return memo.CautionsSection(items...)
}
