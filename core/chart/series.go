package chart

import (
	"math"

	"quillcast/core/format"
)

// This file draws series: their lines, markers and interval bands, and
// their legend entries.

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

// drawBands shades each band of s over the runs where both bounds exist;
// a long series is shaded between its thinned bounds (see decimate.go).
func drawBands(c *canvas, p periodAxis, ax axis, s Series, slot int) {
	slot = max(slot, 0)
	for _, b := range sortedBands(s.Bands) {
		valid := func(i int) bool { return finite(at(b.Lower, i)) && finite(at(b.Upper, i)) }
		upper := drawnPositions(p.n, p.ar.width(), valid, func(i int) float64 { return b.Upper[i] })
		if len(upper) == 0 {
			continue
		}
		lower := drawnPositions(p.n, p.ar.width(), valid, func(i int) float64 { return b.Lower[i] })
		var lowRuns [][]int
		pieces(lower, func(run []int) { lowRuns = append(lowRuns, run) })
		c.s(`<path class="`)
		c.s(fill(slot))
		c.s(" ")
		c.s(bandClass(b.Level))
		c.s(`" d="`)
		k := 0
		pieces(upper, func(up []int) {
			low := lowRuns[min(k, len(lowRuns)-1)]
			k++
			half := 0.0
			if len(up) == 1 && len(low) == 1 {
				half = p.step() * 0.3 // a lone period still shows a sliver
			}
			c.moveTo(p.x(up[0])-half, clampY(ax.y(b.Upper[up[0]], p.ar), p.ar))
			for _, i := range up {
				c.lineTo(p.x(i)+half, clampY(ax.y(b.Upper[i], p.ar), p.ar))
			}
			for j := len(low) - 1; j >= 0; j-- {
				i := low[j]
				c.lineTo(p.x(i)+half, clampY(ax.y(b.Lower[i], p.ar), p.ar))
				if j == 0 && half > 0 {
					c.lineTo(p.x(i)-half, clampY(ax.y(b.Lower[i], p.ar), p.ar))
				}
			}
			c.s("Z")
		})
		c.s(`"/>` + "\n")
	}
}

// drawSeriesLine writes the line of s, broken at gaps, then a dot for any
// lone point between gaps and, when markers is set, the slot's marker at
// every point of a short series or every k-th point of a long one. A long
// series is drawn through its thinned points (see decimate.go).
func drawSeriesLine(c *canvas, p periodAxis, ax axis, s Series, slot int, markers bool) {
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
	drawn := drawnPositions(p.n, p.ar.width(), func(i int) bool { return finite(at(s.Values, i)) },
		func(i int) float64 { return s.Values[i] })
	var lone []int
	pieces(drawn, func(run []int) {
		c.moveTo(p.x(run[0]), clampY(ax.y(s.Values[run[0]], p.ar), p.ar))
		if len(run) == 1 {
			lone = append(lone, run[0])
		}
		for _, i := range run[1:] {
			c.lineTo(p.x(i), clampY(ax.y(s.Values[i], p.ar), p.ar))
		}
	})
	c.s(`"/>` + "\n")
	points := 0
	for i := 0; i < p.n; i++ {
		if finite(at(s.Values, i)) {
			points++
		}
	}
	stride := 0
	if markers && slot >= 0 {
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
