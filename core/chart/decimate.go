package chart

import (
	"math"
	"slices"
)

// This file chooses which positions of a long series are drawn. A series
// with more than [pointsPerPixel] positions per pixel of plot width is drawn
// from a bounded number of points that keep what the eye sees: for each
// pixel column (a bucket of consecutive positions) its first, lowest,
// highest and last value, in time order. A polyline through these points
// covers the same pixels as one through every point, because within one
// column the full line only runs between the column's extremes and enters
// and leaves it at the first and last value. This is the M4 aggregation.
//
// References:
//
//	Jugel, U., Jerzak, Z., Hackenbroich, G. and Markl, V. (2014). M4: A
//	Visualization-Oriented Time Series Data Aggregation. Proceedings of the
//	VLDB Endowment 7(10), 797–808, section 4 (first, last, minimum and
//	maximum per pixel column).
//
// Gaps stay gaps: a bucket is split where values are missing. The piece
// that continues the line from the previous bucket and the piece that goes
// on into the next keep their four points each; the pieces lying wholly
// inside the bucket (narrower than a pixel together) are drawn as one
// stroke from their lowest to their highest value, or a dot when there is
// one value. Shorter series are drawn point for point, unchanged.

// pointsPerPixel is the threshold: a series is thinned only when it has
// more positions than this many per pixel of plot width, so that charts of
// a few thousand periods or fewer are drawn from every point.
const pointsPerPixel = 4

// gap marks a lift of the pen in a list of drawn positions.
const gap = -1

// thinned reports whether n positions over a plot width px wide are drawn
// from a bounded number of points, and how many pixel columns then split
// them.
func thinned(n int, width float64) (bool, int) {
	cols := int(math.Ceil(width))
	if cols < 1 || n <= pointsPerPixel*cols {
		return false, 0
	}
	return true, cols
}

// maxDrawn is the most positions one series draws over n positions and a
// plot width px wide; it sizes buffers.
func maxDrawn(n int, width float64) int {
	if ok, cols := thinned(n, width); ok {
		return 10 * cols
	}
	return n
}

// drawnPositions returns the positions of one series to draw, in time
// order, with [gap] wherever the pen lifts: consecutive positions in the
// list are joined by a line. valid reports whether position i has a value
// and value returns it. For a short series the list is every valid
// position, with a gap at each run of missing ones.
func drawnPositions(n int, width float64, valid func(int) bool, value func(int) float64) []int {
	thin, cols := thinned(n, width)
	if !thin {
		out := make([]int, 0, n)
		for i := 0; i < n; i++ {
			if valid(i) {
				out = append(out, i)
			} else if len(out) > 0 && out[len(out)-1] != gap {
				out = append(out, gap)
			}
		}
		return trimGap(out)
	}
	d := decimator{valid: valid, value: value, out: make([]int, 0, 4*cols+8)}
	for b := 0; b < cols; b++ {
		d.bucket(b*n/cols, (b+1)*n/cols)
	}
	return trimGap(d.out)
}

func trimGap(out []int) []int {
	if len(out) > 0 && out[len(out)-1] == gap {
		out = out[:len(out)-1]
	}
	return out
}

// decimator collects the drawn positions bucket by bucket.
type decimator struct {
	valid func(int) bool
	value func(int) float64
	out   []int
}

// bucket adds the points of positions lo..hi-1 (one pixel column).
func (d *decimator) bucket(lo, hi int) {
	aEnd := lo
	for aEnd < hi && d.valid(aEnd) {
		aEnd++
	}
	if aEnd == hi { // no gap: the line runs through the whole column
		d.extremes(lo, hi, true)
		return
	}
	d.extremes(lo, aEnd, true)
	d.lift()
	cStart := hi
	for cStart > aEnd && d.valid(cStart-1) {
		cStart--
	}
	d.extremes(aEnd, cStart, false)
	d.lift()
	d.extremes(cStart, hi, true)
}

// extremes adds, in time order and without repeats, the lowest and highest
// valid values of lo..hi-1 and, when ends is set, the first and last
// position (which are then valid).
func (d *decimator) extremes(lo, hi int, ends bool) {
	imin, imax := -1, -1
	for i := lo; i < hi; i++ {
		if !d.valid(i) {
			continue
		}
		v := d.value(i)
		if imin < 0 || v < d.value(imin) {
			imin = i
		}
		if imax < 0 || v > d.value(imax) {
			imax = i
		}
	}
	if imin < 0 {
		return
	}
	pts := [4]int{imin, imax, imin, imax}
	if ends {
		pts[2], pts[3] = lo, hi-1
	}
	slices.Sort(pts[:])
	for k, i := range pts {
		if k == 0 || i != pts[k-1] {
			d.out = append(d.out, i)
		}
	}
}

// lift ends the current piece of line, if one is open.
func (d *decimator) lift() {
	if len(d.out) > 0 && d.out[len(d.out)-1] != gap {
		d.out = append(d.out, gap)
	}
}

// pieces calls f with each run of drawn positions between gaps.
func pieces(drawn []int, f func(run []int)) {
	start := 0
	for k := 0; k <= len(drawn); k++ {
		if k == len(drawn) || drawn[k] == gap {
			if k > start {
				f(drawn[start:k])
			}
			start = k + 1
		}
	}
}

// span is a bar drawn for the positions lo..hi-1 of a long series: it
// reaches from zero to the lowest and highest value among them.
type span struct {
	lo, hi   int
	min, max float64
}

// barSpans returns, when n positions are too many for a plot width px
// wide, one span per pixel column that has values, and ok true; short
// series return ok false and are drawn bar by bar.
func barSpans(n int, width float64, values []float64) ([]span, bool) {
	thin, cols := thinned(n, width)
	if !thin {
		return nil, false
	}
	out := make([]span, 0, cols)
	for b := 0; b < cols; b++ {
		s := span{lo: b * n / cols, hi: (b + 1) * n / cols, min: math.Inf(1), max: math.Inf(-1)}
		for i := s.lo; i < s.hi; i++ {
			if v := at(values, i); finite(v) {
				s.min, s.max = min(s.min, v), max(s.max, v)
			}
		}
		if s.min <= s.max {
			s.min, s.max = min(s.min, 0), max(s.max, 0)
			out = append(out, s)
		}
	}
	return out, true
}
