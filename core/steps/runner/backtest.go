package runner

import (
	"fmt"
	"math"
	"strconv"

	"quillcast/core/backtest"
	"quillcast/core/chart"
	"quillcast/core/format"
)

// intervalsNarrow is the standing caution about stated intervals.
const intervalsNarrow = "Prediction intervals stated by a method's formula tend to be too narrow: they leave out the uncertainty of the parameters and of the choice of method."

func (x *exec) backtest() error {
	d := x.st.data
	origins := x.intOption("origins", 6)
	h := x.intOption("horizon", 3)
	by := x.measure("mase")
	var chosen []*fcast
	if v, ok := x.option("of"); ok {
		for _, l := range v.Words {
			if f := x.st.forecastNamed(l); f != nil {
				chosen = append(chosen, f)
			}
		}
	} else {
		chosen = x.st.forecasts
	}
	levels := x.levelsFrom(chosen)
	fr := make([]float64, len(levels))
	for i, l := range levels {
		fr[i] = l / 100
	}
	var done []*backtest.Backtest
	var labels []string
	var later []Block
	for i, f := range chosen {
		x.progress(i, len(chosen))
		if f.model == nil {
			x.message(Warning, "%s cannot be backtested: it has no method to refit at each origin.", f.label)
			continue
		}
		bt, err := backtest.Run(x.ctx, d.y, d.season, f.model, backtest.Origins{Horizon: h, Last: origins}, fr...)
		if err != nil {
			return fmt.Errorf("the backtest of %s could not run: %s", f.label, err.Error())
		}
		done = append(done, bt)
		labels = append(labels, f.label)
		x.st.backtests[f.label] = bt
		later = append(later, x.withEmpirical(f, bt, levels)...)
	}
	if len(done) == 0 {
		return fmt.Errorf("no forecast could be backtested")
	}
	first := done[0].Folds[0]
	last := done[0].Folds[len(done[0].Folds)-1]
	x.message(Info, "Rolling origin: %s, each forecasting %s ahead; origins from %s to %s, every method refitted on the periods before each origin.",
		count(len(done[0].Folds), "origin", "origins"), count(h, "period", "periods"), x.label(first.TestStart), x.label(last.TestStart))
	name := measureHeader(by)
	t := &Table{Headers: []string{"horizon"}, Right: []bool{true}}
	for _, l := range labels {
		t.Headers = append(t.Headers, l+" "+name)
		t.Right = append(t.Right, true)
	}
	cols := make([][]float64, len(done))
	var series []chart.Series
	for j, bt := range done {
		cols[j] = nanSlice(h)
		for k, hs := range bt.ByHorizon {
			if k < h {
				if r := hs.Scores.Of(by); r.Defined {
					cols[j][k] = r.Value
				}
			}
		}
		series = append(series, chart.Series{Name: labels[j], Values: cols[j], Role: chart.Forecast})
	}
	for k := range h {
		row := []string{strconv.Itoa(k + 1)}
		for j := range done {
			row = append(row, numIn(cols[j][k], format.ColumnDecimals(cols[j])))
		}
		t.Rows = append(t.Rows, row)
	}
	x.table("Accuracy by horizon ("+name+")", t, "Errors usually grow with the horizon: the further ahead, the less the past tells.")
	hl := make([]string, h)
	for k := range hl {
		hl[k] = strconv.Itoa(k + 1)
	}
	x.chart("Accuracy by horizon", "horizon", chart.Bars{
		Frame:     chart.Frame{Title: "Accuracy by horizon", XTitle: "periods ahead", YTitle: name},
		Labels:    hl,
		Frequency: chart.Unlabelled,
		Series:    series,
	}.SVG(), "")
	x.table("Interval coverage on the backtest", coverageTable(labels, done), "Coverage is the share of actual values inside the interval; compare it with the level stated. The Winkler score adds a penalty to the width for every miss; lower is better.")
	for _, bt := range done {
		for _, n := range bt.Notes {
			x.message(Info, "%s", n)
		}
		for _, f := range bt.Failures {
			x.message(Warning, "%s", f)
		}
	}
	x.out.Blocks = append(x.out.Blocks, later...)
	for _, l := range labels {
		if f := x.st.forecastNamed(l); f != nil && len(f.bands) > 0 && f.bands[0].empirical {
			x.table("Forecast "+f.label+" with empirical intervals, "+x.futureSpan(len(f.future)), forecastTable(x, f), intervalSource(f))
			x.chart("Forecast "+f.label+" with empirical intervals", "forecast-"+fileSafe(f.label)+"-empirical", forecastChart(x, f), "")
		}
	}
	x.message(Warning, "%s", intervalsNarrow)
	x.st.addCaution(intervalsNarrow)
	return nil
}

// levelsFrom returns the interval levels of the forecasts, 80 and 95 by default.
func (x *exec) levelsFrom(fs []*fcast) []float64 {
	for _, f := range fs {
		if len(f.bands) > 0 {
			out := make([]float64, len(f.bands))
			for i, b := range f.bands {
				out[i] = b.level
			}
			return out
		}
	}
	return []float64{80, 95}
}

// withEmpirical gives a forecast without a formula interval empirical
// intervals from the backtest errors, where they reach its horizon.
func (x *exec) withEmpirical(f *fcast, bt *backtest.Backtest, levels []float64) []Block {
	if len(f.bands) > 0 && !f.bands[0].empirical {
		return nil
	}
	msg := func(format string, args ...any) Block {
		return Block{Kind: MessageBlock, Level: Info, Text: fmt.Sprintf(format, args...)}
	}
	var bands []band
	for _, l := range levels {
		lo, hi, err := bt.Errors.Interval(f.future, l/100)
		if err != nil {
			continue
		}
		bands = append(bands, band{level: l, lo: lo, hi: hi, empirical: true})
	}
	if len(bands) == 0 {
		if bt.Errors.Horizon() < len(f.future) {
			return []Block{msg("%s: the backtest horizon (%d) is shorter than the forecast (%d periods), so it gives no empirical intervals; backtest with horizon=%d for them.", f.label, bt.Errors.Horizon(), len(f.future), len(f.future))}
		}
		return nil
	}
	c := *f
	c.bands = bands
	for i, g := range x.st.forecasts {
		if g == f {
			x.st.forecasts[i] = &c
		}
	}
	out := []Block{msg("%s now has empirical %s intervals from the backtest errors; the memo's forecast table uses them.", f.label, joinWords(levelWords(bands)))}
	for _, l := range levels {
		if n := bt.Errors.Note(l / 100); n != "" {
			out = append(out, msg("%s", n))
			break
		}
	}
	return out
}

func levelWords(bs []band) []string {
	out := make([]string, len(bs))
	for i, b := range bs {
		out[i] = num0(b.level) + "%"
	}
	return out
}

func coverageTable(labels []string, done []*backtest.Backtest) *Table {
	t := &Table{Headers: []string{"forecast", "level", "coverage", "Winkler score", "mean width"}, Right: []bool{false, true, true, true, true}}
	for j, bt := range done {
		if len(bt.Intervals) == 0 {
			t.Rows = append(t.Rows, []string{labels[j], "—", "no formula interval", format.Missing, format.Missing})
			continue
		}
		for _, iv := range bt.Intervals {
			cov := format.Missing
			if iv.Coverage.Defined {
				cov = format.Percent(100*iv.Coverage.Value, 0)
			}
			t.Rows = append(t.Rows, []string{labels[j], format.Percent(100*iv.Level, 0), cov, resultText(iv.Winkler.Value, iv.Winkler.Defined), resultText(iv.Width.Value, iv.Width.Defined)})
		}
	}
	return t
}

func resultText(v float64, ok bool) string {
	if !ok || math.IsNaN(v) {
		return format.Missing
	}
	return num(v)
}
