package runner

import (
	"fmt"

	"quillcast/core/forecast"
	"quillcast/core/steps"
)

// combine averages earlier forecasts with equal weights: the members are
// refitted together, so the combination can be backtested like any method.
func (x *exec) combine() error {
	d := x.st.data
	v, _ := x.option("of")
	var members []*fcast
	for _, l := range v.Words {
		f := x.st.forecastNamed(l)
		if f == nil {
			return fmt.Errorf("no forecast is labelled %q", l)
		}
		if f.model == nil {
			return fmt.Errorf("%s cannot be combined: it has no method to refit", l)
		}
		members = append(members, f)
	}
	if len(members) < 2 {
		return fmt.Errorf("a combination needs at least two forecasts, such as of=hw,ses")
	}
	models := make([]forecast.Method, len(members))
	h := 0
	for i, f := range members {
		models[i] = f.model
		h = max(h, f.horizon)
	}
	m := forecast.Combination{Methods: models}
	te := x.st.trainEnd()
	fit, err := m.Fit(d.y[:te], d.season)
	if err != nil {
		return fmt.Errorf("the combination could not be fitted on the training period: %s", plainErr(err))
	}
	nv := len(d.y) - te
	full := fit
	if nv > 0 {
		if full, err = m.Fit(d.y, d.season); err != nil {
			return fmt.Errorf("the combination could not be fitted on the whole series: %s", plainErr(err))
		}
	}
	label := steps.Label(x.s)
	f := &fcast{step: x.s.N, label: label, method: "combination", title: "Equal-weight combination of " + joinWords(v.Words),
		text: x.s.Canonical(), model: m, fit: fit, fitted: fit.Fitted, valid: fit.Forecast(nv), future: full.Forecast(h),
		horizon: h, params: fit.Params, refitted: full.Params, notes: fit.Notes}
	x.st.forecasts = append(x.st.forecasts, f)
	delete(x.st.broken, "label:"+label)
	x.message(Info, "%s averages %s with equal weights; each member is refitted with its own settings.", label, joinWords(v.Words))
	x.table("Forecast "+label+", "+x.futureSpan(h), forecastTable(x, f), intervalNote(f))
	x.chart("Forecast "+label, "forecast-"+fileSafe(label), forecastChart(x, f), "")
	return nil
}
