package chart

// This file holds the frame shared by the charts drawn over periods ([Line]
// and [Bars]): the legend, the plot area, the holdout tint and divider, the
// value axis, and a note when there is nothing to draw.

// holdout marks the holdout of a chart over periods, as the Holdout fields
// of [Line] document.
type holdout struct {
	start, end int
	label      string
}

// drawOverPeriods lays out a chart of n periods on c: it writes the legend,
// the holdout and the value axis for the values in vr, and the "no data"
// note when n is 0 or blank is true. It returns the value axis and the
// period axis on which the chart places its marks.
func drawOverPeriods(c *canvas, f Frame, w, h int, items []legendItem, vr valueRange, n int, hold holdout, blank bool) (axis, periodAxis) {
	top := 10.0
	if f.Title != "" {
		top = titleHeight
	}
	lh := legendHeight(items, float64(w))
	ar := area{top: top + lh + 8, right: float64(w) - 18, bottom: float64(h) - 28}
	if f.XTitle != "" {
		ar.bottom -= 18
	}
	ax := niceAxis(vr, max(3, int(ar.height()/48)))
	ar.left = valueAxisWidth(ax, f.YTitle)
	p := periodAxis{n: n, ar: ar}
	drawLegend(c, items, top, float64(w))
	drawHoldout(c, p, hold.start, hold.end, hold.label)
	drawValueAxis(c, ax, ar, f.YTitle)
	if n == 0 || blank {
		c.noData(ar)
	}
	return ax, p
}
