package runner

import (
	"strings"

	"quillcast/core/backtest"
	"quillcast/core/chart"
)

func (x *exec) split() error {
	d := x.st.data
	var h backtest.Holdout
	if v, ok := x.option("last"); ok {
		h.Last = v.Int()
	}
	if v, ok := x.option("from"); ok {
		i, ok := d.series.IndexOf(v.Period)
		if !ok {
			return x.errAtOption("from", "%s is not a period of the series, which runs %s (%s); give a period inside it", v.Raw, x.span(0, len(d.y)), d.series.Frequency().Plural())
		}
		if i == 0 {
			return x.errAtOption("from", "%s is the first period, which leaves no training period; give a later period", v.Raw)
		}
		h.Start = i
	}
	sp, err := h.Split(len(d.y))
	if err != nil {
		return err
	}
	x.st.split = &partition{step: x.s.N, trainEnd: sp.TrainEnd}
	if len(x.st.forecasts) > 0 {
		x.message(Info, "The %s made before this split %s set aside: %s fitted on other periods. Forecast again after the split to compare on this holdout.",
			count(len(x.st.forecasts), "forecast", "forecasts"), plural(len(x.st.forecasts), "is", "are"), plural(len(x.st.forecasts), "it was", "they were"))
	}
	x.st.forecasts, x.st.eval, x.st.pick = nil, nil, nil
	x.st.backtests = map[string]*backtest.Backtest{}
	for k := range x.st.broken {
		if strings.HasPrefix(k, "label:") {
			delete(x.st.broken, k)
		}
	}
	delete(x.st.broken, "split")
	n := len(d.y)
	x.message(Info, "Training: %s (%s). Validation (holdout): %s (%s). Methods are fitted on the training period only and scored on the validation period they have not seen.",
		x.span(0, sp.TrainEnd), count(sp.TrainEnd, "period", "periods"), x.span(sp.TrainEnd, n), count(n-sp.TrainEnd, "period", "periods"))
	if d.season > 1 && sp.TrainEnd < 2*d.season {
		x.message(Warning, "The training period is shorter than two seasons (%s); seasonal methods need two full seasons to start.", count(2*d.season, "period", "periods"))
	}
	svg := chart.Line{
		Frame:        chart.Frame{Title: "Training and validation periods", YTitle: d.series.Name},
		Periods:      d.periods,
		Series:       []chart.Series{{Name: d.series.Name, Values: d.y, Role: chart.Actual}},
		HoldoutStart: sp.TrainEnd,
		HoldoutLabel: "validation from " + x.label(sp.TrainEnd),
	}.SVG()
	x.chart("Training and validation periods", "partition", svg, "")
	return nil
}
