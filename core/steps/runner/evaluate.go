package runner

import (
	"fmt"
	"math"
	"slices"

	"quillcast/core/accuracy"
	"quillcast/core/chart"
	"quillcast/core/forecast"
	"quillcast/core/format"
)

// tableMeasures returns the validation measures every comparison shows.
func tableMeasures() []accuracy.Measure {
	return []accuracy.Measure{accuracy.ME, accuracy.MAE, accuracy.RMSE, accuracy.MAPE, accuracy.MASE}
}

// measure reads the by= option.
func (x *exec) measure(def string) accuracy.Measure {
	m, err := accuracy.ParseMeasure(x.wordOption("by", def))
	if err != nil {
		return accuracy.MASE
	}
	return m
}

// scale is the MASE scale of the training period: the mean absolute
// difference at the season's lag (lag 1 without a season).
func (st *state) scale() accuracy.Scale {
	return accuracy.NaiveScale(st.data.y[:st.trainEnd()], max(st.data.season, 1))
}

// benchmarks fits the naive benchmarks the comparison always shows,
// unless a forecast of the same method is there already.
func (x *exec) benchmarks() []*fcast {
	d := x.st.data
	names := []string{"naive"}
	if d.season > 1 {
		names = append(names, "seasonal-naive")
	}
	var out []*fcast
	te := x.st.trainEnd()
	for _, name := range names {
		have := false
		for _, f := range x.st.forecasts {
			if f.method == name {
				have = true
			}
		}
		if have {
			continue
		}
		var m forecast.Method = forecast.Naive{}
		if name == "seasonal-naive" {
			m = forecast.SeasonalNaive{}
		}
		fit, err := m.Fit(d.y[:te], d.season)
		if err != nil {
			continue
		}
		out = append(out, &fcast{label: name + " (benchmark)", method: name, fitted: fit.Fitted, valid: fit.Forecast(len(d.y) - te)})
	}
	return out
}

// score scores one forecast on training and validation.
func (x *exec) score(f *fcast, bench bool) scored {
	d := x.st.data
	te := x.st.trainEnd()
	sc := x.st.scale()
	tr := accuracy.Evaluate(d.y[:te], f.fitted, sc)
	va := accuracy.Evaluate(d.y[te:], f.valid, sc)
	row := scored{label: f.label, method: f.method, benchmark: bench,
		train: map[string]float64{}, valid: map[string]float64{}, reasons: map[string]string{}}
	for _, m := range accuracy.Measures() {
		if r := tr.Of(m); r.Defined {
			row.train[m.String()] = r.Value
		}
		if r := va.Of(m); r.Defined {
			row.valid[m.String()] = r.Value
		} else {
			row.reasons[m.String()] = r.Reason
		}
	}
	return row
}

func (x *exec) evaluate() error {
	by := x.measure("mase")
	var rows []scored
	var all []*fcast
	for _, f := range x.st.forecasts {
		rows = append(rows, x.score(f, false))
		all = append(all, f)
	}
	for _, b := range x.benchmarks() {
		rows = append(rows, x.score(b, true))
		all = append(all, b)
	}
	best := bestRow(rows, by)
	x.st.eval = &evaluation{step: x.s.N, by: by.String(), rows: rows, best: best}
	x.table("Accuracy on the training and validation periods", comparisonTable(rows, by), evalNote(x, rows, by, best))
	for _, l := range x.missingLabels() {
		x.message(Warning, "The forecast %s is missing from this comparison because its step failed.", l)
	}
	x.chart("Actual values and forecasts of the validation period", "holdout", holdoutChart(x, all), "")
	x.chart("Forecast errors on the validation period (actual minus forecast)", "errors", errorChart(x, all),
		"Bars above zero: the forecast was too low; below zero: too high.")
	return nil
}

// missingLabels lists forecast labels whose step failed.
func (x *exec) missingLabels() []string {
	var out []string
	for k := range x.st.broken {
		if len(k) > 6 && k[:6] == "label:" {
			out = append(out, k[6:])
		}
	}
	slices.Sort(out)
	return out
}

// bestRow returns the label of the row with the best validation value of
// by, or "" when none is defined.
func bestRow(rows []scored, by accuracy.Measure) string {
	best, label := accuracy.Result{}, ""
	for _, r := range rows {
		v, ok := r.valid[by.String()]
		res := accuracy.Result{Value: v, Defined: ok}
		if res.Better(by, best) {
			best, label = res, r.label
		}
	}
	return label
}

// measureHeader is the column title of a measure.
func measureHeader(m accuracy.Measure) string {
	name := map[accuracy.Measure]string{accuracy.ME: "ME", accuracy.MAE: "MAE", accuracy.MSE: "MSE", accuracy.RMSE: "RMSE",
		accuracy.MAPE: "MAPE", accuracy.MPE: "MPE", accuracy.SMAPE: "sMAPE", accuracy.MASE: "MASE"}[m]
	if m.Percent() {
		name += " %"
	}
	return name
}

// comparisonTable puts training and validation side by side for the
// measure by, then the validation period's other measures.
func comparisonTable(rows []scored, by accuracy.Measure) *Table {
	cols := []struct {
		m     accuracy.Measure
		train bool
	}{{by, true}, {by, false}}
	for _, m := range tableMeasures() {
		if m != by {
			cols = append(cols, struct {
				m     accuracy.Measure
				train bool
			}{m, false})
		}
	}
	t := &Table{Headers: []string{"forecast", "method"}, Right: []bool{false, false}}
	for _, c := range cols {
		when := "validation"
		if c.train {
			when = "training"
		}
		t.Headers = append(t.Headers, measureHeader(c.m)+" "+when)
		t.Right = append(t.Right, true)
	}
	cells := make([][]string, len(rows))
	for i, r := range rows {
		cells[i] = []string{r.label, r.method}
	}
	for _, c := range cols {
		vals := make([]float64, len(rows))
		for i, r := range rows {
			src := r.valid
			if c.train {
				src = r.train
			}
			v, ok := src[c.m.String()]
			if !ok {
				v = math.NaN()
			}
			vals[i] = v
		}
		dec := format.ColumnDecimals(vals)
		for i, v := range vals {
			cells[i] = append(cells[i], numIn(v, dec))
		}
	}
	t.Rows = cells
	return t
}

// validCell formats v, a validation-period figure of measure by, exactly as
// the comparison table's column shows it, so prose that quotes a figure
// repeats the cell character for character.
func validCell(rows []scored, by string, v float64) string {
	vals := make([]float64, len(rows))
	for i, r := range rows {
		x, ok := r.valid[by]
		if !ok {
			x = math.NaN()
		}
		vals[i] = x
	}
	return numIn(v, format.ColumnDecimals(vals))
}

func evalNote(x *exec, rows []scored, by accuracy.Measure, best string) string {
	if best == "" {
		note := fmt.Sprintf("No forecast has a defined %s on the validation period.", measureHeader(by))
		seen := map[string]bool{}
		for _, r := range rows {
			if reason := r.reasons[by.String()]; reason != "" && !seen[reason] {
				seen[reason] = true
				note += " " + reason + "."
			}
		}
		return note
	}
	var bestV float64
	var bench []string
	for _, r := range rows {
		if r.label == best {
			bestV = r.valid[by.String()]
		}
		if r.benchmark || r.method == "naive" || r.method == "seasonal-naive" {
			if v, ok := r.valid[by.String()]; ok {
				bench = append(bench, fmt.Sprintf("%s %s", r.method, validCell(rows, by.String(), v)))
			}
		}
	}
	note := fmt.Sprintf("Best on the validation period by %s: %s (%s).", measureHeader(by), best, validCell(rows, by.String(), bestV))
	if len(bench) > 0 {
		note += " Naive benchmarks: " + joinWords(bench) + "."
	}
	for _, r := range rows {
		if reason, ok := r.reasons[by.String()]; ok && reason != "" {
			note += " " + r.label + ": " + reason + "."
		}
	}
	return note
}

// holdoutChart draws the actual series with every forecast of the
// validation period.
func holdoutChart(x *exec, all []*fcast) string {
	d := x.st.data
	te := x.st.trainEnd()
	series := []chart.Series{{Name: d.series.Name, Values: d.y, Role: chart.Actual}}
	for _, f := range all {
		v := nanSlice(len(d.y))
		copy(v[te:], f.valid)
		series = append(series, chart.Series{Name: f.label, Values: v, Role: chart.Forecast})
	}
	return chart.Line{
		Frame:        chart.Frame{Title: "Actual values and validation forecasts", YTitle: d.series.Name},
		Periods:      d.periods,
		Series:       series,
		HoldoutStart: te,
		HoldoutLabel: "validation from " + x.label(te),
	}.SVG()
}

// errorChart draws the validation errors of every forecast as bars.
func errorChart(x *exec, all []*fcast) string {
	d := x.st.data
	te := x.st.trainEnd()
	var series []chart.Series
	for _, f := range all {
		e := make([]float64, len(d.y)-te)
		for i := range e {
			e[i] = d.y[te+i] - f.valid[i]
		}
		series = append(series, chart.Series{Name: f.label, Values: e, Role: chart.Forecast})
	}
	return chart.Bars{
		Frame:  chart.Frame{Title: "Forecast errors on the validation period", YTitle: "actual minus forecast"},
		Labels: d.periods[te:],
		Series: series,
	}.SVG()
}
