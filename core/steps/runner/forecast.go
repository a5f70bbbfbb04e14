package runner

import (
	"errors"
	"fmt"
	"math"
	"strings"
	"unicode"

	"quillcast/core/chart"
	"quillcast/core/diagnose"
	"quillcast/core/forecast"
	"quillcast/core/format"
	"quillcast/core/steps"
)

// levels returns the interval levels the step asks for, in percent.
func (x *exec) levels() []float64 {
	if v, ok := x.option("interval"); ok {
		return v.Nums
	}
	return []float64{80, 95}
}

// trainEnd is the length of the training period: the split's, or the
// whole series when there is none.
func (st *state) trainEnd() int {
	if st.split != nil {
		return st.split.trainEnd
	}
	return len(st.data.y)
}

func (x *exec) forecast() error {
	d := x.st.data
	sp, ok := x.r.cat.Lookup(x.s.Subject)
	if !ok {
		return fmt.Errorf("unknown method %q", x.s.Subject)
	}
	m, err := sp.New(steps.Settings(sp, x.s))
	if err != nil {
		return err
	}
	if v, ok := x.option("difference"); ok {
		m = forecast.Differenced{Lag: v.Int(), Inner: m}
	}
	label := steps.Label(x.s)
	te := x.st.trainEnd()
	train := d.y[:te]
	fit, err := m.Fit(train, d.season)
	if err != nil {
		return fmt.Errorf("%s could not be fitted on the training period: %s", sp.Name, plainErr(err))
	}
	nv := len(d.y) - te
	h := x.intOption("horizon", 0)
	if h == 0 {
		h = nv
		if h == 0 {
			h = max(d.season, 1)
		}
	}
	f := &fcast{step: x.s.N, label: label, method: sp.Name, title: sp.Title, assumes: sp.Assumes, text: x.s.Canonical(), model: m,
		fit: fit, fitted: fit.Fitted, valid: fit.Forecast(nv), horizon: h, params: fit.Params, notes: fit.Notes}
	// The forecast past the end of the data comes from a refit on every
	// period, so it starts from the latest level.
	full := fit
	if nv > 0 {
		full, err = m.Fit(d.y, d.season)
		if err != nil {
			return fmt.Errorf("%s could not be fitted on the whole series: %s", sp.Name, plainErr(err))
		}
	}
	f.future = full.Forecast(h)
	f.refitted = full.Params
	for _, lv := range x.levels() {
		lo, hi, err := full.Interval(h, lv/100)
		if err == nil {
			f.bands = append(f.bands, band{level: lv, lo: lo, hi: hi})
		}
	}
	f.findings = x.assumptionFindings(label, sp, fit)
	x.st.forecasts = append(x.st.forecasts, f)
	delete(x.st.broken, "label:"+label)
	x.showForecast(f, sp)
	return nil
}

// plainErr returns the message of an error from the engine.
func plainErr(err error) string {
	var fe *forecast.Error
	if errors.As(err, &fe) {
		return fe.Msg
	}
	return err.Error()
}

// assumptionFindings checks the training data against what the method
// assumes and returns the warnings, each with its evidence. They are also
// kept as cautions for the memo.
func (x *exec) assumptionFindings(label string, sp forecast.Spec, fit *forecast.Fit) []string {
	d := x.st.data
	a := diagnose.Assumes{
		Name:     "the " + lowerFirst(sp.Title),
		NoTrend:  !fit.Follows.Trend,
		NoSeason: !fit.Follows.Season,
	}
	var out []string
	for _, fd := range diagnose.Check(d.y[:x.st.trainEnd()], d.season, a) {
		if fd.Severity != diagnose.Warning {
			continue
		}
		text := fd.Text
		if fd.Evidence != "" {
			text += " Evidence: " + fd.Evidence + "."
		}
		out = append(out, text)
		x.st.addCaution(label + ": " + text)
	}
	return out
}

func (st *state) addCaution(text string) {
	for _, c := range st.cautions {
		if c == text {
			return
		}
	}
	st.cautions = append(st.cautions, text)
}

func lowerFirst(s string) string {
	r := []rune(s)
	if len(r) > 1 && unicode.IsUpper(r[0]) && !unicode.IsUpper(r[1]) {
		r[0] = unicode.ToLower(r[0])
	}
	return string(r)
}

// showForecast writes the forecast step's output: parameters, findings,
// the forecast table and the chart.
func (x *exec) showForecast(f *fcast, sp forecast.Spec) {
	d := x.st.data
	if len(f.params) > 0 {
		rows := make([][]string, 0, len(f.params))
		for i, p := range f.params {
			how := "given"
			if p.Estimated {
				how = "estimated on the training period"
			}
			row := []string{p.Name, value(p.Value), how}
			if i < len(f.refitted) && f.refitted[i].Estimated && len(d.y) > x.st.trainEnd() {
				row[2] += "; " + value(f.refitted[i].Value) + " when refitted on all data"
			}
			rows = append(rows, row)
		}
		x.table("Parameters of "+f.label+" ("+sp.Title+")", &Table{Headers: []string{"parameter", "value", "how it was set"}, Rows: rows, Right: []bool{false, true, false}}, f.fit.Init)
	}
	for _, n := range f.notes {
		x.message(Info, "%s", n)
	}
	for _, fd := range f.findings {
		x.message(Warning, "%s", fd)
	}
	x.table("Forecast "+f.label+", "+x.futureSpan(f.horizon), forecastTable(x, f), intervalNote(f))
	x.chart("Forecast "+f.label, "forecast-"+fileSafe(f.label), forecastChart(x, f), "")
}

func (x *exec) futureSpan(h int) string {
	labels := x.futureLabels(h)
	if h == 1 {
		return labels[0]
	}
	return labels[0] + " to " + labels[h-1]
}

func intervalNote(f *fcast) string {
	if len(f.bands) == 0 {
		return "This method has no formula for prediction intervals; a backtest gives empirical intervals from its past errors."
	}
	return "Intervals from the method's own formula; such stated intervals tend to be too narrow, and a backtest shows how often they covered the truth."
}

// forecastTable lists the forecast past the end of the data with its
// intervals.
func forecastTable(x *exec, f *fcast) *Table {
	headers := []string{"period", "forecast"}
	right := []bool{false, true}
	for _, b := range f.bands {
		headers = append(headers, fmt.Sprintf("%s%% low", num0(b.level)), fmt.Sprintf("%s%% high", num0(b.level)))
		right = append(right, true, true)
	}
	dec := format.ColumnDecimals(f.future)
	labels := x.futureLabels(f.horizon)
	rows := make([][]string, len(f.future))
	for i, v := range f.future {
		row := []string{labels[i], numIn(v, dec)}
		for _, b := range f.bands {
			row = append(row, numIn(b.lo[i], dec), numIn(b.hi[i], dec))
		}
		rows[i] = row
	}
	return &Table{Headers: headers, Rows: rows, Right: right}
}

func num0(level float64) string {
	if level == math.Trunc(level) {
		return fmt.Sprintf("%d", int(level))
	}
	return fmt.Sprintf("%g", level)
}

// forecastChart draws the actual series, the fitted values and validation
// forecasts, and the forecast past the end with its bands.
func forecastChart(x *exec, f *fcast) string {
	d := x.st.data
	n := len(d.y)
	periods := append(append([]string{}, d.periods...), x.futureLabels(f.horizon)...)
	actual := append(append([]float64{}, d.y...), nanSlice(f.horizon)...)
	past := nanSlice(n + f.horizon)
	copy(past, f.fitted)
	copy(past[len(f.fitted):], f.valid)
	ahead := nanSlice(n + f.horizon)
	copy(ahead[n:], f.future)
	var bands []chart.Band
	for _, b := range f.bands {
		lo, hi := nanSlice(n+f.horizon), nanSlice(n+f.horizon)
		copy(lo[n:], b.lo)
		copy(hi[n:], b.hi)
		bands = append(bands, chart.Band{Level: b.level, Lower: lo, Upper: hi})
	}
	te := x.st.trainEnd()
	hs := 0
	if te < n {
		hs = te
	}
	return chart.Line{
		Frame:   chart.Frame{Title: "Forecast " + f.label, YTitle: d.series.Name},
		Periods: periods,
		Series: []chart.Series{
			{Name: d.series.Name, Values: actual, Role: chart.Actual},
			{Name: f.label + " (fitted and holdout)", Values: past, Role: chart.Forecast},
			{Name: f.label + " (ahead)", Values: ahead, Role: chart.Forecast, Bands: bands},
		},
		HoldoutStart: hs,
		HoldoutEnd:   n,
		HoldoutLabel: "validation",
	}.SVG()
}

// fileSafe turns a label into a piece of a file name.
func fileSafe(s string) string {
	var b strings.Builder
	for _, r := range strings.ToLower(s) {
		if (r >= 'a' && r <= 'z') || (r >= '0' && r <= '9') || r == '-' {
			b.WriteRune(r)
		} else {
			b.WriteByte('-')
		}
	}
	if b.Len() == 0 {
		return "x"
	}
	return b.String()
}
