package chart

import "math"

// This file lays out the legend and the period axis, shared by the charts
// drawn over periods.

// swatchKind is how a legend entry shows its series.
type swatchKind int

const (
	swatchLine swatchKind = iota
	swatchBand
	swatchBar
)

// legendItem is one entry of a legend.
type legendItem struct {
	name   string
	kind   swatchKind
	slot   int    // palette slot; -1 is the text colour (actual data)
	class  string // extra classes for the swatch (qc-smooth, qc-band80, …)
	marker bool   // the swatch also shows the slot's marker
}

const (
	legendRow    = 18.0
	swatchWidth  = 26.0
	legendGap    = 16.0
	titleHeight  = 34.0
	legendIndent = 16.0
)

// legendHeight returns the height the legend needs across width w.
func legendHeight(items []legendItem, w float64) float64 {
	if len(items) == 0 {
		return 0
	}
	rows := 1
	x := legendIndent
	for _, it := range items {
		iw := itemWidth(it)
		if x+iw > w-legendIndent && x > legendIndent {
			rows++
			x = legendIndent
		}
		x += iw
	}
	return float64(rows)*legendRow + 4
}

func itemWidth(it legendItem) float64 {
	return swatchWidth + 6 + float64(len([]rune(it.name)))*charWidth + legendGap
}

// drawLegend writes the legend in rows starting at top, across width w.
func drawLegend(c *canvas, items []legendItem, top, w float64) {
	if len(items) == 0 {
		return
	}
	c.s(`<g class="qc-legend">` + "\n")
	x, y := legendIndent, top+legendRow/2
	for _, it := range items {
		iw := itemWidth(it)
		if x+iw > w-legendIndent && x > legendIndent {
			x = legendIndent
			y += legendRow
		}
		switch it.kind {
		case swatchLine:
			drawLineSwatch(c, it, x, y)
		case swatchBand:
			c.rect(x, y-6, swatchWidth, 12, fill(it.slot)+" "+it.class)
		case swatchBar:
			if it.marker {
				c.rect(x, y-6, 12, 12, fill(it.slot)+" qc-bar")
				c.marker(it.slot, x+20, y, 3)
			} else {
				c.rect(x+swatchWidth/2-6, y-6, 12, 12, fill(it.slot)+" qc-bar")
			}
		}
		c.text(x+swatchWidth+6, y+4, "qc-text", "start", it.name)
		x += iw
	}
	c.s("</g>\n")
}

func drawLineSwatch(c *canvas, it legendItem, x, y float64) {
	c.s(`<path d="`)
	c.moveTo(x, y)
	c.lineTo(x+swatchWidth, y)
	c.s(`" class="qc-line `)
	if it.slot < 0 {
		c.s("qc-ink qc-actual")
	} else {
		c.s(stroke(it.slot))
	}
	if it.class != "" {
		c.s(" ")
		c.s(it.class)
	}
	c.s(`"`)
	if it.slot >= 0 {
		c.dashAttr(it.slot)
	}
	c.s("/>\n")
	if it.marker && it.slot >= 0 {
		c.marker(it.slot, x+swatchWidth/2, y, 3.2)
	}
}

// periodAxis places n positions across an area, each in the middle of an
// equal slot, so bars and points line up and a divider falls between two
// periods.
type periodAxis struct {
	n  int
	ar area
}

func (p periodAxis) step() float64 { return p.ar.width() / float64(max(p.n, 1)) }

// x returns the centre of position i.
func (p periodAxis) x(i int) float64 {
	return p.ar.left + (float64(i)+0.5)*p.step()
}

// edge returns the boundary before position i.
func (p periodAxis) edge(i int) float64 {
	return p.ar.left + float64(i)*p.step()
}

// drawPeriodAxis writes the baseline, the thinned tick labels and the axis
// title below ar.
func drawPeriodAxis(c *canvas, p periodAxis, labels []string, f Frequency, title string) {
	ar := p.ar
	c.line(ar.left, ar.bottom, ar.right, ar.bottom, "qc-axis")
	widest := 4
	for _, l := range labels {
		widest = max(widest, len([]rune(l)))
	}
	maxTicks := int(math.Floor(ar.width() / (float64(min(widest, 24))*charWidth + 14)))
	for _, t := range periodTicks(labels, f, maxTicks) {
		x := p.x(t.pos)
		c.line(x, ar.bottom, x, ar.bottom+4, "qc-axis")
		c.text(x, ar.bottom+17, "qc-muted", "middle", t.label)
	}
	if title != "" {
		c.text((ar.left+ar.right)/2, ar.bottom+36, "qc-muted", "middle", title)
	}
}

// drawHoldout tints the holdout from position start up to position end
// (exclusive; 0 or past the last position means to the end of the plot)
// and writes the divider with its label.
func drawHoldout(c *canvas, p periodAxis, start, end int, label string) {
	if start <= 0 || start >= p.n {
		return
	}
	if label == "" {
		label = "holdout begins"
	}
	ar := p.ar
	x := p.edge(start)
	right := ar.right
	if end > start && end < p.n {
		right = p.edge(end)
	}
	c.rect(x, ar.top, right-x, ar.height(), fill(holdoutSlot)+" qc-holdout")
	c.line(x, ar.top, x, ar.bottom, stroke(holdoutSlot)+" qc-divider")
	text := label + " →"
	if x+8+float64(len([]rune(text)))*charWidth > ar.right {
		c.text(x-4, ar.top+12, "qc-text", "end", "← "+label)
		return
	}
	c.text(x+4, ar.top+12, "qc-text", "start", text)
}
