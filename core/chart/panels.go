package chart

import (
	"strings"
)

// Panels draws stacked panels that share the period axis, each with its own
// value scale: the observed series, trend, seasonal and remainder parts of a
// decomposition, or any set of series best read one above the other.
type Panels struct {
	Frame
	// Periods labels each position, as in [Line]. Height 0 in the Frame
	// gives each panel 120 units.
	Periods []string
	// Frequency decides the period ticks; the zero value infers it.
	Frequency Frequency
	// Parts are drawn top to bottom.
	Parts []Panel
}

// Panel is one part of a [Panels] chart.
type Panel struct {
	// Name is written at the panel's top left: "observed", "trend", ….
	Name   string
	Values []float64
	// Bars draws the values as bars from zero (suits a remainder) instead
	// of a line.
	Bars bool
}

const panelHeight = 120.0

// SVG returns the chart as a standalone SVG document. It never fails.
func (ps Panels) SVG() string {
	series := make([]Series, len(ps.Parts))
	for i, p := range ps.Parts {
		series[i] = Series{Name: p.Name, Values: p.Values}
	}
	labels, n := positions(ps.Periods, series)
	top := 10.0
	if ps.Title != "" {
		top = titleHeight
	}
	k := max(len(ps.Parts), 1)
	bottomRoom := 28.0
	if ps.XTitle != "" {
		bottomRoom += 18
	}
	w, h := frameSize(ps.Frame, 720, int(top+panelHeight*float64(k)+bottomRoom))
	c := newCanvas(ps.Frame, w, h, ps.describe(labels), 64*min(n, 10*w)*k)
	slotH := (float64(h) - top - bottomRoom) / float64(k)
	// Every panel shares the left margin of the widest tick labels.
	axes := make([]axis, len(ps.Parts))
	left := 36.0
	for i, p := range ps.Parts {
		var vr valueRange
		addUpTo(&vr, p.Values, n)
		if p.Bars {
			vr.add(0)
		}
		axes[i] = niceAxis(vr, 3)
		left = max(left, valueAxisWidth(axes[i], ps.YTitle))
	}
	var last area
	if len(ps.Parts) == 0 {
		last = area{left: left, top: top + 8, right: float64(w) - 18, bottom: float64(h) - bottomRoom}
		c.noData(last)
	}
	for i, p := range ps.Parts {
		ar := area{left: left, top: top + float64(i)*slotH + 22, right: float64(w) - 18,
			bottom: top + float64(i+1)*slotH - 14}
		last = ar
		c.text(ar.left, ar.top-6, "qc-text", "start", p.Name)
		ax := axes[i]
		for _, t := range ax.ticks {
			y := ax.y(t, ar)
			c.line(ar.left, y, ar.right, y, "qc-grid")
			c.text(ar.left-6, y+4, "qc-muted", "end", ax.label(t))
		}
		pa := periodAxis{n: n, ar: ar}
		var vr valueRange
		addUpTo(&vr, p.Values, n)
		if !vr.ok {
			c.noData(ar)
		}
		if p.Bars {
			y0 := ax.y(0, ar)
			c.s(`<g class="` + fill(i) + ` qc-bar">` + "\n")
			bw := max(pa.step()*0.6, 0.8)
			spans, long := barSpans(n, ar.width(), p.Values)
			drawSpans(c, pa, ax, spans, 0, 1, fill(i))
			for j := 0; j < n && !long; j++ {
				v := at(p.Values, j)
				if finite(v) {
					c.rect(pa.x(j)-bw/2, y0, bw, clampY(ax.y(v, ar), ar)-y0, fill(i))
				}
			}
			c.s("</g>\n")
			c.line(ar.left, y0, ar.right, y0, "qc-zero")
			continue
		}
		role, slot := Forecast, i-1
		if i == 0 {
			role = Actual
		}
		drawSeriesLine(c, pa, ax, Series{Values: p.Values, Role: role}, slot, false)
	}
	if ps.YTitle != "" {
		c.vtext(14, (top+float64(h)-bottomRoom)/2, "qc-muted", ps.YTitle)
	}
	drawPeriodAxis(c, periodAxis{n: n, ar: last}, labels, ps.Frequency, ps.XTitle)
	return c.finish()
}

func (ps Panels) describe(labels []string) string {
	var d strings.Builder
	d.WriteString("Stacked panels")
	describePeriods(&d, labels)
	if len(ps.Parts) > 0 {
		d.WriteString(" From top to bottom: ")
		for i, p := range ps.Parts {
			if i > 0 {
				d.WriteString("; ")
			}
			d.WriteString(p.Name)
		}
		d.WriteString(".")
	}
	return d.String()
}
