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

// drawSeriesLine writes the line of s, broken at gaps, then a dot for any
// lone point between gaps and, when markers is set, the slot's marker at
// every point of a short series or every k-th point of a long one.
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
