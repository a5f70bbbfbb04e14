package chart

import "strings"

// Bars draws grouped bars from zero, one group per label and one bar per
// series in each group: forecast errors over time (labels are periods) or
// accuracy by horizon (labels are "1", "2", … with Frequency Unlabelled).
type Bars struct {
	Frame
	// Labels names each group; its length is the number of groups. When
	// empty, the longest series decides the count and groups are
	// labelled 1, 2, 3, ….
	Labels []string
	// Frequency decides the label ticks; the zero value infers it.
	Frequency Frequency
	// Series give one bar per group each; NaN leaves the place empty.
	// Bands are ignored.
	Series []Series
	// HoldoutStart, HoldoutEnd and HoldoutLabel mark the holdout as in
	// [Line].
	HoldoutStart, HoldoutEnd int
	HoldoutLabel             string
}

// SVG returns the chart as a standalone SVG document. It never fails.
func (b Bars) SVG() string {
	labels, n := positions(b.Labels, b.Series)
	w, h := frameSize(b.Frame, 720, 360)
	var items []legendItem
	for i, s := range b.Series {
		items = append(items, legendItem{name: s.Name, kind: swatchBar, slot: i, marker: len(b.Series) > 1})
	}
	var vr valueRange
	for _, s := range b.Series {
		addUpTo(&vr, s.Values, n)
	}
	empty := !vr.ok
	desc := b.describe(labels, vr)
	vr.add(0)
	c := newCanvas(b.Frame, w, h, desc, 96*min(n, 4*w)*max(len(b.Series), 1))
	ax, p := drawOverPeriods(c, b.Frame, w, h, items, vr, n, holdout{b.HoldoutStart, b.HoldoutEnd, b.HoldoutLabel}, empty)
	ar := p.ar
	drawBarGroups(c, p, ax, b.Series)
	y0 := ax.y(0, ar)
	c.line(ar.left, y0, ar.right, y0, "qc-zero")
	drawPeriodAxis(c, p, labels, b.Frequency, b.XTitle)
	return c.finish()
}

// drawBarGroups writes the bars; when bars are wide enough each carries its
// series' marker at its end, so series differ by shape as well as colour.
func drawBarGroups(c *canvas, p periodAxis, ax axis, series []Series) {
	k := len(series)
	if k == 0 || p.n == 0 {
		return
	}
	group := p.step() * 0.8
	bw := group / float64(k)
	y0 := ax.y(0, p.ar)
	for j, s := range series {
		slot := j
		c.s(`<g class="` + fill(slot) + ` qc-bar">` + "\n")
		if spans, ok := barSpans(p.n, p.ar.width(), s.Values); ok {
			drawSpans(c, p, ax, spans, j, k, "")
			c.s("</g>\n")
			continue
		}
		for i := 0; i < p.n; i++ {
			v := at(s.Values, i)
			if !finite(v) {
				continue
			}
			x := p.x(i) - group/2 + float64(j)*bw
			y := clampY(ax.y(v, p.ar), p.ar)
			c.s(`<rect x="`)
			c.num(x)
			c.s(`" y="`)
			c.num(min(y, y0))
			c.s(`" width="`)
			c.num(max(bw-0.6, 0.4))
			c.s(`" height="`)
			c.num(max(abs(y-y0), 0.5))
			c.s(`"/>` + "\n")
		}
		c.s("</g>\n")
		if k > 1 && bw >= 7 {
			for i := 0; i < p.n; i++ {
				v := at(s.Values, i)
				if !finite(v) {
					continue
				}
				x := p.x(i) - group/2 + (float64(j)+0.5)*bw
				y := clampY(ax.y(v, p.ar), p.ar)
				off := -6.0
				if v < 0 {
					off = 6
				}
				c.marker(slot, x, y+off, 3)
			}
		}
	}
}

// drawSpans writes the bars of a long series, one per pixel column from
// zero to the column's extremes (see decimate.go); series j of k takes the
// j-th share of the column. class is written on each bar when not empty.
func drawSpans(c *canvas, p periodAxis, ax axis, spans []span, j, k int, class string) {
	for _, sp := range spans {
		left, right := p.edge(sp.lo), p.edge(sp.hi)
		w := (right - left) / float64(k)
		top := clampY(ax.y(sp.max, p.ar), p.ar)
		bottom := clampY(ax.y(sp.min, p.ar), p.ar)
		c.s(`<rect x="`)
		c.num(left + float64(j)*w)
		c.s(`" y="`)
		c.num(top)
		c.s(`" width="`)
		c.num(max(w, 0.4))
		c.s(`" height="`)
		c.num(max(bottom-top, 0.5))
		if class != "" {
			c.s(`" class="`)
			c.s(class)
		}
		c.s(`"/>` + "\n")
	}
}

func abs(v float64) float64 {
	if v < 0 {
		return -v
	}
	return v
}

func (b Bars) describe(labels []string, vr valueRange) string {
	var d strings.Builder
	d.WriteString("Bar chart")
	describePeriods(&d, labels)
	if len(b.Series) > 0 {
		d.WriteString(" Bars: ")
		for i, s := range b.Series {
			if i > 0 {
				d.WriteString("; ")
			}
			d.WriteString(s.Name)
		}
		d.WriteString(".")
	}
	if b.HoldoutStart > 0 && b.HoldoutStart < len(labels) {
		d.WriteString(" The holdout begins at " + labels[b.HoldoutStart] + ".")
	}
	describeRange(&d, vr)
	return d.String()
}
