package chart

import (
	"math"
	"strconv"
)

// canvas accumulates the text of one SVG document.
type canvas struct {
	b    []byte
	w, h float64
}

// area is a rectangle in SVG user units: left, top, right, bottom.
type area struct {
	left, top, right, bottom float64
}

func (a area) width() float64  { return a.right - a.left }
func (a area) height() float64 { return a.bottom - a.top }

// frameSize returns the viewBox size for f, with defaults and floors.
func frameSize(f Frame, defW, defH int) (int, int) {
	w, h := f.Width, f.Height
	if w <= 0 {
		w = defW
	}
	if h <= 0 {
		h = defH
	}
	return max(w, 240), max(h, 160)
}

// newCanvas opens the SVG element and writes the title, the description and
// the style sheet. desc is used when f.Desc is empty.
func newCanvas(f Frame, w, h int, desc string, sizeHint int) *canvas {
	c := &canvas{b: make([]byte, 0, 4096+sizeHint), w: float64(w), h: float64(h)}
	c.s(`<svg xmlns="http://www.w3.org/2000/svg" class="qc" role="img" viewBox="0 0 `)
	c.int(w)
	c.s(" ")
	c.int(h)
	c.s(`"`)
	if f.FixedSize {
		c.s(` width="`)
		c.int(w)
		c.s(`" height="`)
		c.int(h)
		c.s(`"`)
	}
	c.s(">\n<title>")
	title := f.Title
	if title == "" {
		title = "Chart"
	}
	c.esc(title)
	c.s("</title>\n<desc>")
	if f.Desc != "" {
		desc = f.Desc
	}
	c.esc(desc)
	c.s("</desc>\n<style>")
	c.s(StyleSheet)
	c.s("</style>\n")
	c.s(`<rect class="qc-bg" x="0" y="0" width="`)
	c.int(w)
	c.s(`" height="`)
	c.int(h)
	c.s(`"/>` + "\n")
	if f.Title != "" {
		c.text(16, 22, "qc-title", "start", f.Title)
	}
	return c
}

// finish closes the SVG element and returns the document.
func (c *canvas) finish() string {
	c.s("</svg>\n")
	return string(c.b)
}

func (c *canvas) s(s string)   { c.b = append(c.b, s...) }
func (c *canvas) esc(s string) { c.b = appendEscaped(c.b, s) }
func (c *canvas) int(n int)    { c.b = strconv.AppendInt(c.b, int64(n), 10) }

// num appends v rounded to two decimals, without trailing zeros and without
// a negative zero. Non-finite values (which callers filter out) write 0.
func (c *canvas) num(v float64) {
	c.b = appendCoord(c.b, v)
}

func appendCoord(dst []byte, v float64) []byte {
	if math.IsNaN(v) || math.IsInf(v, 0) {
		return append(dst, '0')
	}
	r := math.Round(v*100) / 100
	if r == 0 {
		return append(dst, '0')
	}
	start := len(dst)
	dst = strconv.AppendFloat(dst, r, 'f', 2, 64)
	end := len(dst)
	for end > start && dst[end-1] == '0' {
		end--
	}
	if end > start && dst[end-1] == '.' {
		end--
	}
	return dst[:end]
}

// text writes a single-line text element; anchor is start, middle or end.
func (c *canvas) text(x, y float64, class, anchor, s string) {
	c.s(`<text x="`)
	c.num(x)
	c.s(`" y="`)
	c.num(y)
	c.s(`" class="`)
	c.s(class)
	c.s(`"`)
	if anchor != "start" {
		c.s(` text-anchor="`)
		c.s(anchor)
		c.s(`"`)
	}
	c.s(">")
	c.esc(s)
	c.s("</text>\n")
}

// vtext writes a text element rotated a quarter turn anticlockwise about
// its anchor, for the value-axis title.
func (c *canvas) vtext(x, y float64, class, s string) {
	c.s(`<text x="`)
	c.num(x)
	c.s(`" y="`)
	c.num(y)
	c.s(`" class="`)
	c.s(class)
	c.s(`" text-anchor="middle" transform="rotate(-90 `)
	c.num(x)
	c.s(" ")
	c.num(y)
	c.s(`)">`)
	c.esc(s)
	c.s("</text>\n")
}

// line writes a straight segment.
func (c *canvas) line(x1, y1, x2, y2 float64, class string) {
	c.s(`<line x1="`)
	c.num(x1)
	c.s(`" y1="`)
	c.num(y1)
	c.s(`" x2="`)
	c.num(x2)
	c.s(`" y2="`)
	c.num(y2)
	c.s(`" class="`)
	c.s(class)
	c.s(`"/>` + "\n")
}

// rect writes a rectangle; a negative height or width is normalised.
func (c *canvas) rect(x, y, w, h float64, class string) {
	if w < 0 {
		x, w = x+w, -w
	}
	if h < 0 {
		y, h = y+h, -h
	}
	c.s(`<rect x="`)
	c.num(x)
	c.s(`" y="`)
	c.num(y)
	c.s(`" width="`)
	c.num(w)
	c.s(`" height="`)
	c.num(h)
	c.s(`" class="`)
	c.s(class)
	c.s(`"/>` + "\n")
}

// dashAttr writes a stroke-dasharray attribute for slot, if it has one.
func (c *canvas) dashAttr(slot int) {
	if d := dashes[slot%slots]; d != "" {
		c.s(` stroke-dasharray="`)
		c.s(d)
		c.s(`"`)
	}
}

// marker writes the marker of slot centred on (x, y) with half-size r.
func (c *canvas) marker(slot int, x, y, r float64) {
	shape := markerShape(slot % slots)
	if shape == markCircle {
		c.s(`<circle cx="`)
		c.num(x)
		c.s(`" cy="`)
		c.num(y)
		c.s(`" r="`)
		c.num(r)
		c.s(`" class="`)
		c.s(fill(slot))
		c.s(`"/>` + "\n")
		return
	}
	c.s(`<path class="`)
	if shape == markPlus {
		c.s(stroke(slot))
		c.s(`" stroke-width="1.6" fill="none`)
	} else {
		c.s(fill(slot))
	}
	c.s(`" d="`)
	switch shape {
	case markSquare:
		c.moveTo(x-r, y-r)
		c.lineTo(x+r, y-r)
		c.lineTo(x+r, y+r)
		c.lineTo(x-r, y+r)
		c.s("Z")
	case markTriangle:
		c.moveTo(x, y-r*1.2)
		c.lineTo(x+r*1.1, y+r*0.8)
		c.lineTo(x-r*1.1, y+r*0.8)
		c.s("Z")
	case markDiamond:
		c.moveTo(x, y-r*1.3)
		c.lineTo(x+r*1.1, y)
		c.lineTo(x, y+r*1.3)
		c.lineTo(x-r*1.1, y)
		c.s("Z")
	case markTriangleDown:
		c.moveTo(x, y+r*1.2)
		c.lineTo(x+r*1.1, y-r*0.8)
		c.lineTo(x-r*1.1, y-r*0.8)
		c.s("Z")
	case markPlus:
		c.moveTo(x-r*1.2, y)
		c.lineTo(x+r*1.2, y)
		c.moveTo(x, y-r*1.2)
		c.lineTo(x, y+r*1.2)
	}
	c.s(`"/>` + "\n")
}

func (c *canvas) moveTo(x, y float64) {
	c.s("M")
	c.num(x)
	c.s(",")
	c.num(y)
}

func (c *canvas) lineTo(x, y float64) {
	c.s("L")
	c.num(x)
	c.s(",")
	c.num(y)
}

// noData writes a centred "no data to draw" note inside a.
func (c *canvas) noData(a area) {
	c.text((a.left+a.right)/2, (a.top+a.bottom)/2, "qc-muted", "middle", "no data to draw")
}
