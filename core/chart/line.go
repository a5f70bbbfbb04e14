package chart

import (
	"math"
	"strconv"
)

// Line draws series over periods: the actual data, smoothed lines and
// forecasts with prediction-interval bands, the holdout marked by a tint and
// a labelled divider. With ZeroLine set it draws forecast errors over time
// as lines around zero.
type Line struct {
	Frame
	// Periods labels each position; its length is the number of positions.
	// When empty, the longest series decides the count and positions are
	// labelled 1, 2, 3, ….
	Periods []string
	// Frequency decides the period ticks; the zero value infers it.
	Frequency Frequency
	// Series are drawn in order, later ones on top.
	Series []Series
	// HoldoutStart is the position (counted from 0) of the first holdout
	// period. 0, or a position outside the periods, marks no holdout.
	HoldoutStart int
	// HoldoutEnd is the position just after the last holdout period, where
	// forecasts past the data begin; 0, or a position outside the periods,
	// tints the holdout to the end of the chart.
	HoldoutEnd int
	// HoldoutLabel is written beside the divider; empty means
	// "holdout begins".
	HoldoutLabel string
	// ZeroLine draws a line at zero and keeps zero in the value range.
	ZeroLine bool
}

// SVG returns the chart as a standalone SVG document. It never fails.
func (l Line) SVG() string {
	labels, n := positions(l.Periods, l.Series)
	w, h := frameSize(l.Frame, 720, 360)
	items := seriesLegend(l.Series)
	var vr valueRange
	for _, s := range l.Series {
		addUpTo(&vr, s.Values, n)
		for _, b := range s.Bands {
			addUpTo(&vr, b.Lower, n)
			addUpTo(&vr, b.Upper, n)
		}
	}
	if l.ZeroLine {
		vr.add(0)
	}
	c := newCanvas(l.Frame, w, h, l.describe(labels, vr), 64*min(n, 10*w)*max(len(l.Series), 1))
	ax, p := drawOverPeriods(c, l.Frame, w, h, items, vr, n, holdout{l.HoldoutStart, l.HoldoutEnd, l.HoldoutLabel}, !vr.ok)
	ar := p.ar
	for i, s := range l.Series {
		drawBands(c, p, ax, s, slotOf(l.Series, i))
	}
	if l.ZeroLine && ax.lo < 0 && ax.hi > 0 {
		y := ax.y(0, ar)
		c.line(ar.left, y, ar.right, y, "qc-zero")
	}
	for i, s := range l.Series {
		drawSeriesLine(c, p, ax, s, slotOf(l.Series, i), s.Role == Forecast)
	}
	drawPeriodAxis(c, p, labels, l.Frequency, l.XTitle)
	return c.finish()
}

// positions returns the period labels and their count: the given labels, or
// 1, 2, 3, … up to the longest series when none are given.
func positions(periods []string, series []Series) ([]string, int) {
	if len(periods) > 0 {
		return periods, len(periods)
	}
	n := 0
	for _, s := range series {
		n = max(n, len(s.Values))
	}
	labels := make([]string, n)
	for i := range labels {
		labels[i] = strconv.Itoa(i + 1)
	}
	return labels, n
}

// at returns vs[i], or NaN when i is past the end.
func at(vs []float64, i int) float64 {
	if i < 0 || i >= len(vs) {
		return math.NaN()
	}
	return vs[i]
}

func finite(v float64) bool { return !math.IsNaN(v) && !math.IsInf(v, 0) }

func addUpTo(r *valueRange, vs []float64, n int) {
	r.addAll(vs[:min(len(vs), n)])
}
