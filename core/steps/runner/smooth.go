package runner

import (
	"fmt"

	"quillcast/core/chart"
	"quillcast/core/diagnose"
)

func (x *exec) smooth() error {
	d := x.st.data
	kind := x.s.Subject
	if kind == "" {
		kind = "centered"
	}
	w := x.intOption("width", 0)
	if w > len(d.y) {
		return x.errAtOption("width", "a width of %d is longer than the series (%s); give a width of at most %d", w, count(len(d.y), "value", "values"), len(d.y))
	}
	var line []float64
	var err error
	name := fmt.Sprintf("%s average, width %d", kind, w)
	if kind == "trailing" {
		line, err = diagnose.TrailingMovingAverage(d.y, w)
	} else {
		line, err = diagnose.CenteredMovingAverage(d.y, w)
		if w%2 == 0 {
			name = fmt.Sprintf("centred 2×%d average", w)
		} else {
			name = fmt.Sprintf("centred average, width %d", w)
		}
	}
	if err != nil {
		return err
	}
	svg := chart.Line{
		Frame:   chart.Frame{Title: d.series.Name + " with a " + name, YTitle: d.series.Name},
		Periods: d.periods,
		Series: []chart.Series{
			{Name: d.series.Name, Values: d.y, Role: chart.Actual},
			{Name: name, Values: line, Role: chart.Smoothed},
		},
	}.SVG()
	note := "The smoothed line is for seeing the pattern; it is not a forecast."
	if kind == "centered" {
		note += fmt.Sprintf(" A centred average has no value for the first and last %s.", count(w/2, "period", "periods"))
		if w == d.season {
			note += " Its width equals the season, so the season averages out and the trend shows."
		}
	}
	x.chart(d.series.Name+" with a "+name, "smooth", svg, note)
	return nil
}
