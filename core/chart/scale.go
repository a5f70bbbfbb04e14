package chart

import (
	"math"

	"quillcast/core/format"
)

// valueRange collects the smallest and largest finite values seen.
type valueRange struct {
	lo, hi float64
	ok     bool
}

func (r *valueRange) add(v float64) {
	if math.IsNaN(v) || math.IsInf(v, 0) {
		return
	}
	if !r.ok {
		r.lo, r.hi, r.ok = v, v, true
		return
	}
	r.lo = min(r.lo, v)
	r.hi = max(r.hi, v)
}

func (r *valueRange) addAll(vs []float64) {
	for _, v := range vs {
		r.add(v)
	}
}

// axis is a value axis: a nice domain, its ticks and how to print them.
type axis struct {
	lo, hi   float64 // domain, both on ticks
	step     float64
	ticks    []float64
	decimals int
}

// niceAxis returns an axis covering r with about want ticks (at least 2) whose
// step is 1, 2, 2.5 or 5 times a power of ten. A range of one value is
// widened around it; an empty range becomes 0..1.
func niceAxis(r valueRange, want int) axis {
	lo, hi := 0.0, 1.0
	if r.ok {
		lo, hi = r.lo, r.hi
	}
	if hi-lo <= 0 || (hi-lo) < 1e-9*math.Max(math.Abs(lo), math.Abs(hi)) {
		pad := math.Abs(lo) * 0.1
		if pad == 0 {
			pad = 1
		}
		lo, hi = lo-pad, hi+pad
	}
	want = max(want, 2)
	rough := (hi - lo) / float64(want-1)
	mag := math.Pow(10, math.Floor(math.Log10(rough)))
	var nice float64
	extra := 0
	switch f := rough / mag; {
	case f <= 1:
		nice = 1
	case f <= 2:
		nice = 2
	case f <= 2.5:
		nice, extra = 2.5, 1
	case f <= 5:
		nice = 5
	default:
		nice = 10
	}
	step := nice * mag
	k0 := math.Floor(lo/step + 1e-9)
	k1 := math.Ceil(hi/step - 1e-9)
	a := axis{lo: k0 * step, hi: k1 * step, step: step}
	for k := k0; k <= k1; k++ {
		v := k * step
		if math.Abs(v) < step*1e-9 {
			v = 0
		}
		a.ticks = append(a.ticks, v)
	}
	a.decimals = max(0, -int(math.Floor(math.Log10(step)+1e-9))+extra)
	return a
}

// label prints a tick value with thousands separators.
func (a axis) label(v float64) string {
	return format.Number(v, a.decimals)
}

// widestLabel returns the length in characters of the longest tick label.
func (a axis) widestLabel() int {
	n := 0
	for _, t := range a.ticks {
		n = max(n, len([]rune(a.label(t))))
	}
	return n
}

// y maps a value to a vertical position inside ar (larger values higher).
func (a axis) y(v float64, ar area) float64 {
	return ar.bottom - (v-a.lo)/(a.hi-a.lo)*ar.height()
}

// x maps a value to a horizontal position inside ar.
func (a axis) x(v float64, ar area) float64 {
	return ar.left + (v-a.lo)/(a.hi-a.lo)*ar.width()
}

// clampY keeps a mapped position within a little of the area, so that
// extreme values cannot write huge coordinates.
func clampY(y float64, ar area) float64 {
	return math.Max(ar.top-ar.height(), math.Min(ar.bottom+ar.height(), y))
}

// charWidth is the assumed average width of one character of 12px text.
const charWidth = 6.6

// drawValueAxis writes the horizontal grid lines, the tick labels to the
// left of ar and the rotated axis title.
func drawValueAxis(c *canvas, a axis, ar area, title string) {
	for _, t := range a.ticks {
		y := a.y(t, ar)
		c.line(ar.left, y, ar.right, y, "qc-grid")
		c.text(ar.left-6, y+4, "qc-muted", "end", a.label(t))
	}
	if title != "" {
		c.vtext(14, (ar.top+ar.bottom)/2, "qc-muted", title)
	}
}

// valueAxisWidth is the room left of the plot for tick labels and title.
func valueAxisWidth(a axis, title string) float64 {
	w := float64(a.widestLabel())*charWidth + 12
	if title != "" {
		w += 20
	}
	return math.Max(w, 36)
}
