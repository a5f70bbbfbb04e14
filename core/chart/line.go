package chart

import (
	"math"
	"strconv"
	"strings"

	"quillcast/core/format"
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
	c := newCanvas(l.Frame, w, h, l.describe(labels, vr), 64*n*max(len(l.Series), 1))
	top := 10.0
	if l.Title != "" {
		top = titleHeight
	}
	lh := legendHeight(items, float64(w))
	ar := area{top: top + lh + 8, right: float64(w) - 18, bottom: float64(h) - 28}
	if l.XTitle != "" {
		ar.bottom -= 18
	}
	ax := niceAxis(vr, max(3, int(ar.height()/48)))
	ar.left = valueAxisWidth(ax, l.YTitle)
	p := periodAxis{n: n, ar: ar}
	drawLegend(c, items, top, float64(w))
	drawHoldout(c, p, l.HoldoutStart, l.HoldoutLabel)
	drawValueAxis(c, ax, ar, l.YTitle)
	if n == 0 || !vr.ok {
		c.noData(ar)
	}
	for i, s := range l.Series {
		drawBands(c, p, ax, s, slotOf(l.Series, i))
	}
	if l.ZeroLine && ax.lo < 0 && ax.hi > 0 {
		y := ax.y(0, ar)
		c.line(ar.left, y, ar.right, y, "qc-zero")
	}
	for i, s := range l.Series {
		drawSeriesLine(c, p, ax, s, slotOf(l.Series, i))
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

// slotOf returns the palette slot of series i: -1 for actual data, else the
// count of non-actual series before it.
func slotOf(series []Series, i int) int {
	if series[i].Role == Actual {
		return -1
	}
	slot := 0
	for _, s := range series[:i] {
		if s.Role != Actual {
			slot++
		}
	}
	return slot
}

// seriesLegend lists every series, then every band, in order.
func seriesLegend(series []Series) []legendItem {
	var items []legendItem
	for i, s := range series {
		it := legendItem{name: s.Name, kind: swatchLine, slot: slotOf(series, i)}
		switch s.Role {
		case Smoothed:
			it.class = "qc-smooth"
		case Forecast:
			it.marker = true
		}
		items = append(items, it)
	}
	for i, s := range series {
		for _, b := range sortedBands(s.Bands) {
			slot := max(slotOf(series, i), 0)
			items = append(items, legendItem{
				name: s.Name + " " + format.Number(b.Level, levelDecimals(b.Level)) + "%",
				kind: swatchBand, slot: slot, class: bandClass(b.Level),
			})
		}
	}
	return items
}

func levelDecimals(level float64) int {
	if math.Abs(level-math.Round(level)) < 1e-9 {
		return 0
	}
	return 1
}

// sortedBands returns the bands widest level first, so narrower ones are
// drawn on top.
func sortedBands(bands []Band) []Band {
	out := append([]Band(nil), bands...)
	for i := 1; i < len(out); i++ {
		for j := i; j > 0 && out[j].Level > out[j-1].Level; j-- {
			out[j], out[j-1] = out[j-1], out[j]
		}
	}
	return out
}

func bandClass(level float64) string {
	if level >= 90 {
		return "qc-band95"
	}
	return "qc-band80"
}

// drawBands shades each band of s over the runs where both bounds exist.
func drawBands(c *canvas, p periodAxis, ax axis, s Series, slot int) {
	slot = max(slot, 0)
	for _, b := range sortedBands(s.Bands) {
		var runs [][2]int
		start := -1
		for i := 0; i <= p.n; i++ {
			ok := i < p.n && finite(at(b.Lower, i)) && finite(at(b.Upper, i))
			if ok && start < 0 {
				start = i
			}
			if !ok && start >= 0 {
				runs = append(runs, [2]int{start, i})
				start = -1
			}
		}
		if len(runs) == 0 {
			continue
		}
		c.s(`<path class="`)
		c.s(fill(slot))
		c.s(" ")
		c.s(bandClass(b.Level))
		c.s(`" d="`)
		for _, r := range runs {
			half := 0.0
			if r[1]-r[0] == 1 {
				half = p.step() * 0.3 // a lone period still shows a sliver
			}
			c.moveTo(p.x(r[0])-half, clampY(ax.y(b.Upper[r[0]], p.ar), p.ar))
			for i := r[0]; i < r[1]; i++ {
				c.lineTo(p.x(i)+half, clampY(ax.y(b.Upper[i], p.ar), p.ar))
			}
			for i := r[1] - 1; i >= r[0]; i-- {
				c.lineTo(p.x(i)+half, clampY(ax.y(b.Lower[i], p.ar), p.ar))
				if i == r[0] && half > 0 {
					c.lineTo(p.x(i)-half, clampY(ax.y(b.Lower[i], p.ar), p.ar))
				}
			}
			c.s("Z")
		}
		c.s(`"/>` + "\n")
	}
}

// drawSeriesLine writes the line of s, broken at gaps, then its markers:
// every point of a forecast with few points, every k-th of a long one, and
// a dot for any lone point between gaps.
func drawSeriesLine(c *canvas, p periodAxis, ax axis, s Series, slot int) {
	class := "qc-line "
	switch {
	case slot < 0:
		class += "qc-ink qc-actual"
	case s.Role == Smoothed:
		class += stroke(slot) + " qc-smooth"
	default:
		class += stroke(slot)
	}
	c.s(`<path class="`)
	c.s(class)
	c.s(`"`)
	if slot >= 0 {
		c.dashAttr(slot)
	}
	c.s(` d="`)
	down := false
	var lone []int
	points := 0
	for i := 0; i < p.n; i++ {
		v := at(s.Values, i)
		if !finite(v) {
			down = false
			continue
		}
		points++
		y := clampY(ax.y(v, p.ar), p.ar)
		if down {
			c.lineTo(p.x(i), y)
		} else {
			c.moveTo(p.x(i), y)
			if !finite(at(s.Values, i+1)) {
				lone = append(lone, i)
			}
		}
		down = true
	}
	c.s(`"/>` + "\n")
	stride := 0
	if s.Role == Forecast && slot >= 0 {
		stride = 1
		if points > 36 {
			stride = (points + 23) / 24
		}
	}
	k := 0
	for i := 0; i < p.n; i++ {
		v := at(s.Values, i)
		if !finite(v) {
			continue
		}
		isLone := len(lone) > 0 && lone[0] == i
		if isLone {
			lone = lone[1:]
		}
		if (stride > 0 && k%stride == 0) || isLone {
			y := clampY(ax.y(v, p.ar), p.ar)
			if slot < 0 {
				c.s(`<circle cx="`)
				c.num(p.x(i))
				c.s(`" cy="`)
				c.num(y)
				c.s(`" r="2" class="qc-inkf"/>` + "\n")
			} else {
				c.marker(slot, p.x(i), y, 3.2)
			}
		}
		k++
	}
}

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
