package chart

import (
	"strings"

	"quillcast/core/format"
)

// This file writes the descriptions screen readers read for each chart.

// describe writes the screen-reader description of a line chart.
func (l Line) describe(labels []string, vr valueRange) string {
	var d strings.Builder
	d.WriteString("Line chart")
	describePeriods(&d, labels)
	describeSeries(&d, l.Series)
	if l.HoldoutStart > 0 && l.HoldoutStart < len(labels) {
		d.WriteString(" The holdout begins at " + labels[l.HoldoutStart] + ".")
	}
	describeRange(&d, vr)
	return d.String()
}

func describePeriods(d *strings.Builder, labels []string) {
	switch len(labels) {
	case 0:
		d.WriteString(" with no periods.")
	case 1:
		d.WriteString(" of one period, " + labels[0] + ".")
	default:
		d.WriteString(" over " + format.Int(len(labels)) + " periods from " +
			labels[0] + " to " + labels[len(labels)-1] + ".")
	}
}

func describeSeries(d *strings.Builder, series []Series) {
	if len(series) == 0 {
		return
	}
	d.WriteString(" Series: ")
	for i, s := range series {
		if i > 0 {
			d.WriteString("; ")
		}
		d.WriteString(s.Name)
		switch s.Role {
		case Actual:
			d.WriteString(" (actual)")
		case Smoothed:
			d.WriteString(" (smoothed)")
		case Forecast:
			d.WriteString(" (forecast")
			for j, b := range sortedBands(s.Bands) {
				if j == 0 {
					d.WriteString(" with ")
				} else {
					d.WriteString(" and ")
				}
				d.WriteString(format.Number(b.Level, levelDecimals(b.Level)) + "%")
			}
			if len(s.Bands) > 0 {
				d.WriteString(" intervals")
			}
			d.WriteString(")")
		}
	}
	d.WriteString(".")
}

func describeRange(d *strings.Builder, vr valueRange) {
	if vr.ok {
		d.WriteString(" Values range from " + format.Auto(vr.lo) + " to " + format.Auto(vr.hi) + ".")
	}
}
