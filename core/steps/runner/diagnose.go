package runner

import (
	"fmt"
	"math"
	"strconv"

	"quillcast/core/chart"
	"quillcast/core/diagnose"
	"quillcast/core/format"
)

func (x *exec) difference() error {
	d := x.st.data
	lags := []float64{1}
	if v, ok := x.option("lag"); ok {
		lags = v.Nums
	}
	y := d.y
	var names []string
	for _, l := range lags {
		var err error
		y, err = diagnose.Difference(y, int(l))
		if err != nil {
			return err
		}
		names = append(names, "lag "+strconv.Itoa(int(l)))
	}
	skip := len(d.y) - len(y)
	vals := nanSlice(len(d.y))
	copy(vals[skip:], y)
	what := "Differences at " + joinWords(names)
	x.chart(what, "difference", chart.Line{
		Frame:    chart.Frame{Title: what + " of " + d.series.Name, YTitle: "change"},
		Periods:  d.periods,
		Series:   []chart.Series{{Name: what, Values: vals, Role: chart.Actual}},
		ZeroLine: true,
	}.SVG(), "A lag-1 difference removes a steady trend; a difference at the season's lag removes a steady season.")
	x.acfExhibit(y, "the differenced series", 0, true)
	return nil
}

// acfExhibit charts the autocorrelations of y and states the Ljung-Box
// test in plain words; fitted is the number of estimated parameters.
func (x *exec) acfExhibit(y []float64, what string, fitted int, test bool) {
	d := x.st.data
	lag := x.intOption("lags", diagnose.ResidualLag(len(y), d.season))
	lag = min(lag, len(y)-1)
	if lag < 1 {
		x.message(Info, "Too few values (%d) to look at autocorrelations of %s.", len(y), what)
		return
	}
	r, err := diagnose.ACF(y, lag)
	if err != nil {
		x.message(Info, "No autocorrelations of %s: %s", what, err.Error())
		return
	}
	x.chart("Autocorrelations of "+what, "acf", chart.ACF{
		Frame:  chart.Frame{Title: "Autocorrelations of " + what},
		Values: r[1:],
		Bound:  diagnose.ACFBound(len(y)),
	}.SVG(), "Bars past the dashed bounds are larger than noise alone usually gives.")
	if !test {
		return
	}
	fitted = min(fitted, lag-1)
	lb, err := diagnose.LjungBox(y, lag, fitted)
	if err != nil {
		x.message(Info, "No Ljung-Box test of %s: %s", what, err.Error())
		return
	}
	words := "look like noise up to this lag"
	level := Info
	if lb.P < diagnose.Significance {
		words = "do not look like noise: a pattern is left that a better method could use"
		level = Warning
	}
	x.message(level, "Ljung-Box test of %s up to lag %d: Q = %s with %d degrees of freedom, p = %s; the autocorrelations %s.",
		what, lb.Lag, format.Number(lb.Q, 2), lb.DF, pText(lb.P), words)
}

func pText(p float64) string {
	if p < 0.001 {
		return "< 0.001"
	}
	return format.Number(p, 3)
}

func (x *exec) decompose() error {
	d := x.st.data
	if d.season < 2 {
		return fmt.Errorf("the series has no season to decompose; give season= on the load step if it has one")
	}
	kind, name := diagnose.Additive, "additive"
	if x.s.Subject == "multiplicative" {
		kind, name = diagnose.Multiplicative, "multiplicative"
	}
	dc, err := diagnose.Decompose(d.y, d.season, kind)
	if err != nil {
		return err
	}
	x.chart("Classical "+name+" decomposition", "decomposition", chart.Panels{
		Frame:   chart.Frame{Title: "Classical " + name + " decomposition of " + d.series.Name},
		Periods: d.periods,
		Parts: []chart.Panel{
			{Name: "observed", Values: d.y},
			{Name: "trend", Values: dc.Trend},
			{Name: "season", Values: dc.Seasonal},
			{Name: "remainder", Values: dc.Remainder, Bars: true},
		},
	}.SVG(), "")
	rows := make([][]string, len(dc.Indices))
	dec := format.ColumnDecimals(dc.Indices)
	for i, v := range dc.Indices {
		rows[i] = []string{d.periods[i], numIn(v, dec)}
	}
	note := "Indices are counted from the first period; additive ones sum to zero (units above or below the trend)."
	if kind == diagnose.Multiplicative {
		note = "Indices are counted from the first period; multiplicative ones average 1 (1.20 means 20% above the trend)."
	}
	x.table("Seasonal indices ("+name+")", &Table{Headers: []string{"season position (first at)", "index"}, Rows: rows, Right: []bool{false, true}}, note)
	if s := diagnose.SeasonalStrength(dc); !math.IsNaN(s) {
		x.message(Info, "Seasonal strength %s on a scale from 0 (no season) to 1 (season explains all variation beyond the trend).", format.Number(s, 2))
	}
	return nil
}

func (x *exec) check() error {
	d := x.st.data
	if x.s.Subject == "" {
		for _, fd := range diagnose.Check(d.y[:x.st.trainEnd()], d.season, diagnose.Assumes{}) {
			x.finding(fd)
		}
		return nil
	}
	f := x.st.forecastNamed(x.s.Subject)
	if f == nil {
		return fmt.Errorf("no forecast is labelled %q", x.s.Subject)
	}
	if f.fit == nil {
		return fmt.Errorf("%s is a combination and has no residuals of its own to check; check the forecasts it combines", f.label)
	}
	res := f.fit.Residuals()
	var r []float64
	for _, v := range res {
		if !math.IsNaN(v) && !math.IsInf(v, 0) {
			r = append(r, v)
		}
	}
	estimated := 0
	for _, p := range f.fit.Params {
		if p.Estimated {
			estimated++
		}
	}
	for _, fd := range diagnose.CheckResiduals(res, d.season, estimated) {
		x.finding(fd)
		if fd.Severity == diagnose.Warning {
			x.st.addCaution(f.label + ": " + fd.Text)
		}
	}
	te := x.st.trainEnd()
	vals := nanSlice(len(d.y))
	copy(vals, res[:min(len(res), te)])
	x.chart("Residuals of "+f.label, "residuals-"+fileSafe(f.label), chart.Line{
		Frame:    chart.Frame{Title: "One-step residuals of " + f.label + " on the training period", YTitle: "actual minus fitted"},
		Periods:  d.periods[:te],
		Series:   []chart.Series{{Name: "residual", Values: vals[:te], Role: chart.Forecast}},
		ZeroLine: true,
	}.SVG(), "")
	x.acfExhibit(r, "the residuals of "+f.label, estimated, false)
	return nil
}

func (x *exec) finding(fd diagnose.Finding) {
	level := Info
	if fd.Severity == diagnose.Warning {
		level = Warning
	}
	text := fd.Text
	if fd.Evidence != "" {
		text += " Evidence: " + fd.Evidence + "."
	}
	x.message(level, "%s", text)
}
