package runner

import (
	"fmt"
	"math"
	"slices"
	"strings"

	"quillcast/core/accuracy"
	"quillcast/core/bakeoff"
	"quillcast/core/format"
)

// bakeoff runs several methods on every series of the loaded file.
func (x *exec) bakeoff() error {
	d := x.st.data
	by := x.measure("mase")
	last := x.intOption("last", 0)
	if last == 0 {
		switch {
		case x.st.split != nil:
			last = len(d.y) - x.st.split.trainEnd
		case d.season > 1:
			last = d.season
		default:
			last = 1
		}
	}
	methods := []string{"naive", "ses"}
	if d.season > 1 {
		methods = []string{"naive", "seasonal-naive", "ses", "holt-winters"}
	}
	if v, ok := x.option("methods"); ok {
		methods = v.Words
	}
	for _, m := range methods {
		if _, ok := x.r.cat.Lookup(m); !ok && m != "auto" {
			return fmt.Errorf("unknown method %q in methods=; the methods are %s", m, strings.Join(catNames(x), ", "))
		}
	}
	var data []bakeoff.Series
	for _, s := range d.set.Series {
		n := len(s.Values)
		if n-last < 2 || slices.ContainsFunc(s.Values, func(v float64) bool { return math.IsNaN(v) || math.IsInf(v, 0) }) {
			x.message(Warning, "Series %q is left out: it has missing values or too few periods to hold out %d.", s.Name, last)
			continue
		}
		labels := make([]string, n)
		for i := range labels {
			labels[i] = s.PeriodAt(i).String()
		}
		data = append(data, bakeoff.Series{Name: s.Name, FitPeriods: labels[:n-last], Fit: s.Values[:n-last], TestPeriods: labels[n-last:], Test: s.Values[n-last:]})
	}
	if len(data) == 0 {
		return fmt.Errorf("no series of %s can be held out %d periods", d.file, last)
	}
	// A host whose engine uses one core (the page) supplies a pool of
	// further engines in the context; elsewhere goroutines share the work.
	pool := bakeoff.PoolFrom(x.ctx)
	res, err := bakeoff.Run(x.ctx, data, bakeoff.Options{Season: max(d.season, 1), Lag: max(d.season, 1), Methods: methods, Progress: x.progress, Pool: pool})
	if err != nil {
		return err
	}
	wins := x.bakeoffWins(data, res, by)
	t := &Table{Headers: []string{"method", "series forecast", "periods scored", "mean sMAPE %", "mean MASE", "wins by " + measureHeader(by)},
		Right: []bool{false, true, true, true, true, true}}
	for _, s := range res.Scores {
		t.Rows = append(t.Rows, []string{s.Method, format.Int(s.Series), format.Int(s.Points),
			resultText(s.SMAPE.Value, s.SMAPE.Defined), resultText(s.MASE.Value, s.MASE.Defined), format.Int(wins[s.Method])})
	}
	x.table(fmt.Sprintf("Bake-off over %s of %s, last %s held out", count(len(data), "series", "series"), d.file, count(last, "period", "periods")), t,
		"Each method is fitted on every series' training part and scored on its held-out periods; a win is the best score on one series.")
	x.bakeoffSpread(pool, res)
	for _, sk := range res.Skips {
		x.message(Warning, "%s could not forecast %q: %s", sk.Method, sk.Series, sk.Reason)
	}
	return nil
}

// bakeoffSpread says where the series of a bake-off were forecast when the
// host offered a pool of further engines.
func (x *exec) bakeoffSpread(pool bakeoff.Pool, res *bakeoff.Result) {
	switch {
	case pool == nil:
	case pool.Size() <= 0:
		x.message(Info, "The bake-off ran in one worker: %s.", pool.Why())
	case res.PoolNote != "":
		x.message(Info, "Part of the bake-off ran in one worker because another worker could not run it: %s.", res.PoolNote)
	case res.Engines > 0:
		x.message(Info, "The bake-off was shared among %s.", count(res.Engines, "worker", "workers"))
	}
}

func catNames(x *exec) []string {
	out := make([]string, len(x.r.cat))
	for i, sp := range x.r.cat {
		out[i] = sp.Name
	}
	return out
}

// bakeoffWins counts, per method, the series on which it scored best.
func (x *exec) bakeoffWins(data []bakeoff.Series, res *bakeoff.Result, by accuracy.Measure) map[string]int {
	fc := map[string]map[string][]float64{} // series → method → forecasts
	for _, f := range res.Forecasts {
		if fc[f.Series] == nil {
			fc[f.Series] = map[string][]float64{}
		}
		fc[f.Series][f.Method] = append(fc[f.Series][f.Method], f.Value)
	}
	wins := map[string]int{}
	for _, s := range data {
		scale := accuracy.NaiveScale(s.Fit, max(x.st.data.season, 1))
		best, bestM := accuracy.Result{}, ""
		for _, sc := range res.Scores {
			f := fc[s.Name][sc.Method]
			if len(f) != len(s.Test) {
				continue
			}
			r := accuracy.Score(by, s.Test, f, scale)
			if r.Better(by, best) {
				best, bestM = r, sc.Method
			}
		}
		if bestM != "" {
			wins[bestM]++
		}
	}
	return wins
}
