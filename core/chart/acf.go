package chart

import (
	"strconv"
	"strings"

	"quillcast/core/format"
)

// ACF draws autocorrelations as bars by lag, with dashed lines at ±Bound.
// Bars that reach past a bound carry a marker, so they stand out without
// relying on colour.
type ACF struct {
	Frame
	// Values[k-1] is the autocorrelation at lag k (lag 0 is not drawn).
	Values []float64
	// Bound is the half-width of the band within which autocorrelations of
	// pure noise usually fall (1.96/√n for n values, common practice);
	// 0, a negative value or NaN draws no bounds.
	Bound float64
}

// SVG returns the chart as a standalone SVG document. It never fails.
// The axes are titled "lag" and "autocorrelation" unless the Frame says
// otherwise.
func (a ACF) SVG() string {
	w, h := frameSize(a.Frame, 720, 300)
	xt, yt := nameOr(a.XTitle, "lag"), nameOr(a.YTitle, "autocorrelation")
	n := len(a.Values)
	labels := make([]string, n)
	for i := range labels {
		labels[i] = strconv.Itoa(i + 1)
	}
	bound := a.Bound
	hasBound := finite(bound) && bound > 0
	var vr valueRange
	vr.addAll(a.Values)
	empty := !vr.ok
	vr.add(0)
	if hasBound {
		vr.add(bound)
		vr.add(-bound)
	}
	c := newCanvas(a.Frame, w, h, a.describe(hasBound), 96*n)
	top := 10.0
	if a.Title != "" {
		top = titleHeight
	}
	ar := area{top: top + 18, right: float64(w) - 18, bottom: float64(h) - 46}
	ax := niceAxis(vr, max(3, int(ar.height()/44)))
	ar.left = valueAxisWidth(ax, yt)
	p := periodAxis{n: n, ar: ar}
	drawValueAxis(c, ax, ar, yt)
	if empty {
		c.noData(ar)
	}
	if hasBound {
		for _, b := range [2]float64{bound, -bound} {
			y := ax.y(b, ar)
			c.line(ar.left, y, ar.right, y, stroke(holdoutSlot)+" qc-divider")
		}
		c.text(ar.right, ar.top-6, "qc-muted", "end", "dashed lines at ±"+format.Number(bound, 3))
	}
	y0 := ax.y(0, ar)
	bw := max(p.step()*0.45, 1)
	c.s(`<g class="` + fill(0) + ` qc-bar">` + "\n")
	for i, v := range a.Values {
		if !finite(v) {
			continue
		}
		y := clampY(ax.y(v, ar), ar)
		c.rect(p.x(i)-bw/2, y0, bw, y-y0, fill(0))
	}
	c.s("</g>\n")
	if hasBound {
		for i, v := range a.Values {
			if finite(v) && (v > bound || v < -bound) {
				off := -6.0
				if v < 0 {
					off = 6
				}
				c.marker(3, p.x(i), clampY(ax.y(v, ar), ar)+off, 3)
			}
		}
	}
	c.line(ar.left, y0, ar.right, y0, "qc-zero")
	drawPeriodAxis(c, p, labels, Unlabelled, xt)
	return c.finish()
}

func (a ACF) describe(hasBound bool) string {
	var d strings.Builder
	switch len(a.Values) {
	case 0:
		d.WriteString("Autocorrelation bars: no lags to show.")
		return d.String()
	case 1:
		d.WriteString("Autocorrelation bar for lag 1.")
	default:
		d.WriteString("Autocorrelation bars for lags 1 to " + strconv.Itoa(len(a.Values)) + ".")
	}
	if hasBound {
		var outside []string
		for i, v := range a.Values {
			if finite(v) && (v > a.Bound || v < -a.Bound) {
				outside = append(outside, strconv.Itoa(i+1))
			}
		}
		d.WriteString(" Bounds at ±" + format.Number(a.Bound, 3) + ".")
		switch len(outside) {
		case 0:
			d.WriteString(" No lag reaches past the bounds.")
		case 1:
			d.WriteString(" Lag " + outside[0] + " reaches past the bounds.")
		default:
			d.WriteString(" Lags " + strings.Join(outside, ", ") + " reach past the bounds.")
		}
	}
	return d.String()
}
