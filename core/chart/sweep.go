package chart

import (
	"math"
	"strings"

	"quillcast/core/format"
)

// Sweep draws an accuracy measure against a parameter: one line for the
// training period and one for the validation period, the best value marked,
// and the regions on either side of it named (too little smoothing chases
// noise, too much flattens the pattern).
type Sweep struct {
	Frame
	// Param names the parameter, for example "width"; it titles the
	// horizontal axis unless XTitle is set.
	Param string
	// Measure names the measure, for example "RMSE"; it titles the
	// vertical axis unless YTitle is set. Lower is better.
	Measure string
	// Values are the parameter values tried, in increasing order.
	Values []float64
	// Training and Validation hold the measure at each parameter value;
	// NaN or a missing position is a gap. Either may be empty.
	Training, Validation []float64
	// LowSide and HighSide name the regions below and above the best
	// value. Empty means "under-smoothing: chases noise" below and
	// "over-smoothing: flattens the pattern" above, which suits a window
	// width; for a smoothing constant, where a small value smooths more,
	// the caller swaps them.
	LowSide, HighSide string
}

// Best returns the position in Values of the lowest validation measure, or
// of the lowest training measure when there is no validation value; the
// first one on a tie. ok is false when no measure is finite.
func (s Sweep) Best() (pos int, ok bool) {
	for _, vs := range [][]float64{s.Validation, s.Training} {
		pos, ok = -1, false
		for i := range s.Values {
			v := at(vs, i)
			if finite(v) && (!ok || v < vs[pos]) {
				pos, ok = i, true
			}
		}
		if ok {
			return pos, true
		}
	}
	return -1, false
}

// SVG returns the chart as a standalone SVG document. It never fails.
func (s Sweep) SVG() string {
	w, h := frameSize(s.Frame, 720, 360)
	low, high := s.LowSide, s.HighSide
	if low == "" {
		low = "under-smoothing: chases noise"
	}
	if high == "" {
		high = "over-smoothing: flattens the pattern"
	}
	xt, yt := s.XTitle, s.YTitle
	if xt == "" {
		xt = s.Param
	}
	if yt == "" {
		yt = s.Measure
	}
	lines := []struct {
		name string
		vs   []float64
	}{{"training", s.Training}, {"validation", s.Validation}}
	var items []legendItem
	var xr, vr valueRange
	n := len(s.Values)
	for slot, l := range lines {
		if len(l.vs) > 0 {
			items = append(items, legendItem{name: l.name, kind: swatchLine, slot: slot, marker: true})
		}
		addUpTo(&vr, l.vs, n)
	}
	xr.addAll(s.Values)
	best, hasBest := s.Best()
	c := newCanvas(s.Frame, w, h, s.describe(best, hasBest), 200*n)
	top := 10.0
	if s.Title != "" {
		top = titleHeight
	}
	lh := legendHeight(items, float64(w))
	ar := area{top: top + lh + 8, right: float64(w) - 18, bottom: float64(h) - 28}
	if xt != "" {
		ar.bottom -= 18
	}
	ax := niceAxis(vr, max(3, int(ar.height()/48)))
	ar.left = valueAxisWidth(ax, yt)
	xa := niceAxis(xr, max(3, int(ar.width()/70)))
	drawLegend(c, items, top, float64(w))
	if hasBest && finite(s.Values[best]) {
		drawRegions(c, xa.x(s.Values[best], ar), ar, low, high)
	}
	drawValueAxis(c, ax, ar, yt)
	if !vr.ok || !xr.ok {
		c.noData(ar)
	}
	for slot, l := range lines {
		drawSweepLine(c, s.Values, l.vs, slot, xa, ax, ar)
	}
	if hasBest && finite(s.Values[best]) {
		bx := xa.x(s.Values[best], ar)
		v := at(s.Validation, best)
		if !finite(v) {
			v = at(s.Training, best)
		}
		by := ax.y(v, ar)
		c.s(`<circle cx="`)
		c.num(bx)
		c.s(`" cy="`)
		c.num(by)
		c.s(`" r="8" class="qc-ink qc-best"/>` + "\n")
		label := "best " + nameOr(s.Param, "value") + " " + paramText(s.Values[best]) + ": " +
			nameOr(s.Measure, "measure") + " " + format.Auto(v)
		anchor, lx := "start", bx+12
		if lx+float64(len([]rune(label)))*charWidth > ar.right {
			anchor, lx = "end", bx-12
		}
		c.text(lx, math.Max(by-12, ar.top+30), "qc-text", anchor, label)
	}
	c.line(ar.left, ar.bottom, ar.right, ar.bottom, "qc-axis")
	for _, t := range xa.ticks {
		x := xa.x(t, ar)
		c.line(x, ar.bottom, x, ar.bottom+4, "qc-axis")
		c.text(x, ar.bottom+17, "qc-muted", "middle", xa.label(t))
	}
	if xt != "" {
		c.text((ar.left+ar.right)/2, ar.bottom+36, "qc-muted", "middle", xt)
	}
	return c.finish()
}

func nameOr(s, fallback string) string {
	if s == "" {
		return fallback
	}
	return s
}

// drawRegions shades the region below the best value and names both sides.
func drawRegions(c *canvas, bx float64, ar area, low, high string) {
	c.rect(ar.left, ar.top, bx-ar.left, ar.height(), "qc-region")
	c.line(bx, ar.top, bx, ar.bottom, "qc-axis qc-divider")
	lowText, highText := "← "+low, high+" →"
	if bx-ar.left > 40 {
		if float64(len([]rune(lowText)))*charWidth < bx-ar.left-8 {
			c.text(bx-6, ar.top+12, "qc-muted", "end", lowText)
		} else {
			c.text(ar.left+4, ar.top+12, "qc-muted", "start", lowText)
		}
	}
	if ar.right-bx > 40 {
		if float64(len([]rune(highText)))*charWidth < ar.right-bx-8 {
			c.text(bx+6, ar.top+12, "qc-muted", "start", highText)
		} else {
			c.text(ar.right-4, ar.top+26, "qc-muted", "end", highText)
		}
	}
}

func drawSweepLine(c *canvas, xs, vs []float64, slot int, xa, ax axis, ar area) {
	if len(vs) == 0 {
		return
	}
	c.s(`<path class="qc-line ` + stroke(slot) + `"`)
	c.dashAttr(slot)
	c.s(` d="`)
	down := false
	for i, x := range xs {
		v := at(vs, i)
		if !finite(v) || !finite(x) {
			down = false
			continue
		}
		if down {
			c.lineTo(xa.x(x, ar), clampY(ax.y(v, ar), ar))
		} else {
			c.moveTo(xa.x(x, ar), clampY(ax.y(v, ar), ar))
		}
		down = true
	}
	c.s(`"/>` + "\n")
	stride := max(1, (len(xs)+29)/30)
	for i, x := range xs {
		v := at(vs, i)
		if finite(v) && finite(x) && i%stride == 0 {
			c.marker(slot, xa.x(x, ar), clampY(ax.y(v, ar), ar), 3)
		}
	}
}

func (s Sweep) describe(best int, ok bool) string {
	var d strings.Builder
	d.WriteString("Sweep chart of " + nameOr(s.Measure, "the measure") + " against " + nameOr(s.Param, "the parameter"))
	if len(s.Values) > 0 {
		d.WriteString(" from " + paramText(s.Values[0]) + " to " + paramText(s.Values[len(s.Values)-1]))
	}
	d.WriteString(", training and validation.")
	if ok {
		which := "validation"
		v := at(s.Validation, best)
		if !finite(v) {
			which, v = "training", at(s.Training, best)
		}
		d.WriteString(" The lowest " + which + " " + nameOr(s.Measure, "measure") + ", " + format.Auto(v) +
			", is at " + nameOr(s.Param, "value") + " " + paramText(s.Values[best]) + ".")
	}
	return d.String()
}

// paramText prints a parameter value: whole numbers without decimals.
func paramText(v float64) string {
	if finite(v) && v == math.Trunc(v) && math.Abs(v) < 1e15 {
		return format.Number(v, 0)
	}
	return format.Auto(v)
}
