package runner

import (
	"fmt"
	"math"

	"quillcast/core/accuracy"
	"quillcast/core/backtest"
	"quillcast/core/chart"
	"quillcast/core/format"
	"quillcast/core/steps"
)

// maxGrid is the most values a sweep tries.
const maxGrid = 500

// sweptOption returns the option given as a range.
func (x *exec) sweptOption() (steps.Option, bool) {
	for _, o := range x.s.Options {
		if o.Value.Hi > o.Value.Lo {
			return o, true
		}
	}
	return steps.Option{}, false
}

func (x *exec) sweep() error {
	d := x.st.data
	o, ok := x.sweptOption()
	if !ok {
		return fmt.Errorf("say which parameter to sweep over a range, such as width=2..24")
	}
	by := x.measure("rmse")
	te := x.st.trainEnd()
	if x.s.Subject == "moving-average" && o.Key == "width" && (by == accuracy.RMSE || by == accuracy.MAE || by == accuracy.MSE) {
		return x.widthSweep(int(o.Value.Lo), int(o.Value.Hi), by)
	}
	step := 1.0
	whole := o.Value.Lo == math.Trunc(o.Value.Lo) && o.Value.Hi == math.Trunc(o.Value.Hi)
	if !whole {
		step = 0.05
	}
	if v, ok := x.option("step"); ok {
		step = v.Num
	}
	var grid []float64
	for i := 0; ; i++ {
		v := o.Value.Lo + float64(i)*step
		if v > o.Value.Hi+step*1e-9 {
			break
		}
		if len(grid) == maxGrid {
			return fmt.Errorf("the range %s with step %s gives more than %d values; use a larger step= or a shorter range", o.Value.Raw, num(step), maxGrid)
		}
		grid = append(grid, math.Round(v*1e9)/1e9)
	}
	sp, _ := x.r.cat.Lookup(x.s.Subject)
	base := steps.Settings(sp, x.s)
	delete(base, o.Key)
	g, err := backtest.SweepGrid(x.ctx, d.y, te, d.season, x.s.Subject, base, o.Key, grid, by)
	if err != nil {
		return err
	}
	values := make([]float64, len(g.Rows))
	train, valid := nanSlice(len(g.Rows)), nanSlice(len(g.Rows))
	for i, r := range g.Rows {
		values[i] = r.Value
		if r.Failed != "" {
			continue
		}
		if v := r.Training.Of(by); v.Defined {
			train[i] = v.Value
		}
		if v := r.Validation.Of(by); v.Defined {
			valid[i] = v.Value
		}
	}
	low, high := "", ""
	if !whole {
		// A small smoothing constant smooths more.
		low, high = "over-smoothing", "under-smoothing: chases noise"
	}
	x.showSweep(o.Key, by, values, train, valid, g.Best, g.BestValidation, g.HasValidation, g.Explanation, low, high)
	for _, r := range g.Rows {
		if r.Failed != "" {
			x.message(Warning, "%s=%s could not be fitted: %s", o.Key, num(r.Value), r.Failed)
		}
	}
	return nil
}

// widthSweep runs the running-sum moving-average sweep.
func (x *exec) widthSweep(lo, hi int, by accuracy.Measure) error {
	d := x.st.data
	s, err := backtest.SweepMovingAverage(d.y, x.st.trainEnd(), backtest.Range{From: lo, To: hi})
	if err != nil {
		return err
	}
	pick := func(e backtest.Errors) float64 {
		if e.N == 0 {
			return math.NaN()
		}
		switch by {
		case accuracy.MAE:
			return e.MAE
		case accuracy.MSE:
			return e.MSE
		}
		return e.RMSE
	}
	values := make([]float64, len(s.Rows))
	train, valid := make([]float64, len(s.Rows)), make([]float64, len(s.Rows))
	bestT, bestV := 0, -1
	for i, r := range s.Rows {
		values[i] = float64(r.Width)
		train[i], valid[i] = pick(r.Common), pick(r.Validation)
		if train[i] < train[bestT] {
			bestT = i
		}
		if !math.IsNaN(valid[i]) && (bestV < 0 || valid[i] < valid[bestV]) {
			bestV = i
		}
	}
	bv := 0.0
	if bestV >= 0 {
		bv = values[bestV]
	}
	x.showSweep("width", by, values, train, valid, values[bestT], bv, bestV >= 0, s.Explanation, "", "")
	return nil
}

// showSweep writes the sweep's chart, table and explanation.
func (x *exec) showSweep(param string, by accuracy.Measure, values, train, valid []float64, best, bestValid float64, hasValid bool, explain, low, high string) {
	name := measureHeader(by)
	svg := chart.Sweep{
		Frame:      chart.Frame{Title: fmt.Sprintf("%s against %s, %s", name, param, x.s.Subject)},
		Param:      param,
		Measure:    name,
		Values:     values,
		Training:   train,
		Validation: valid,
		LowSide:    low,
		HighSide:   high,
	}.SVG()
	x.chart(fmt.Sprintf("Sweep of %s for %s", param, x.s.Subject), "sweep-"+fileSafe(x.s.Subject+"-"+param), svg, "")
	dt, dv := format.ColumnDecimals(train), format.ColumnDecimals(valid)
	dp := decimals(values)
	rows := make([][]string, len(values))
	for i, v := range values {
		mark := ""
		if near(v, best) {
			mark = "best on training"
		}
		if hasValid && near(v, bestValid) {
			if mark != "" {
				mark += "; "
			}
			mark += "best on validation"
		}
		rows[i] = []string{numIn(v, dp), numIn(train[i], dt), numIn(valid[i], dv), mark}
	}
	x.table(fmt.Sprintf("%s by %s, %s", name, param, x.s.Subject),
		&Table{Headers: []string{param, name + " training", name + " validation", ""}, Rows: rows, Right: []bool{true, true, true, false}}, "")
	if hasValid {
		x.message(Info, "Best %s on the training period: %s; on the validation period: %s (marked on the chart).", param, numIn(best, dp), numIn(bestValid, dp))
	} else {
		x.message(Info, "Best %s on the training period: %s (marked on the chart).", param, numIn(best, dp))
	}
	if explain != "" {
		x.message(Info, "%s", explain)
	}
}

func near(a, b float64) bool { return math.Abs(a-b) <= 1e-9*math.Max(1, math.Abs(b)) }
