package backtest

import "math"

// blockWidths is how many widths one pass over the data scores at once.
// Each width keeps its own running sum, so the pass carries four
// independent chains of additions that the processor overlaps, and the
// data is read once per four widths instead of once per width: the sweep
// of widths 1..200 over 1,000,000 points takes about a third of the time
// of one pass per width (BenchmarkMovingAverageSweep).
const blockWidths = 4

// widthRows scores the widths from..to, blockWidths at a time, with the
// same sequence of operations per width as [widthRow], so the results are
// the same to the last bit.
func widthRows(y []float64, trainEnd int, widths Range) []WidthRow {
	rows := make([]WidthRow, 0, widths.To-widths.From+1)
	w := widths.From
	for ; w+blockWidths-1 <= widths.To; w += blockWidths {
		rows = append(rows, widthBlock(y, trainEnd, w, widths.To)...)
	}
	for ; w <= widths.To; w++ {
		rows = append(rows, widthRow(y, trainEnd, w, widths.To))
	}
	return rows
}

// widthBlock scores the widths w0..w0+3 in one pass. Periods before the
// widest width's first forecast are scored width by width; from there on
// the four widths advance together.
func widthBlock(y []float64, trainEnd, w0, common int) []WidthRow {
	const k = blockWidths
	var sum, inv [k]float64
	var early, com [k]accumulator
	wk := w0 + k - 1
	split := min(common, trainEnd)
	for i := range k {
		w := w0 + i
		for _, v := range y[:w] {
			sum[i] += v
		}
		inv[i] = 1 / float64(w)
		// Periods w..wk-1, forecast by this width only; all lie before
		// split, since split >= common >= wk.
		for t := w; t < wk; t++ {
			e := y[t] - sum[i]*inv[i]
			early[i].sq += e * e
			early[i].abs += math.Abs(e)
			sum[i] += y[t] - y[t-w]
		}
	}
	var sq, ab [k]float64
	for i := range k {
		sq[i], ab[i] = early[i].sq, early[i].abs
	}
	blockPass(y, wk, split, w0, &sum, inv, &sq, &ab) // early part
	for i := range k {
		early[i].sq, early[i].abs = sq[i], ab[i]
	}
	sq, ab = [k]float64{}, [k]float64{}
	blockPass(y, split, trainEnd, w0, &sum, inv, &sq, &ab) // common part
	for i := range k {
		com[i].sq, com[i].abs = sq[i], ab[i]
	}
	rows := make([]WidthRow, k)
	for i := range k {
		w := w0 + i
		early[i].n, com[i].n = split-w, trainEnd-split
		rows[i] = finishRow(y, trainEnd, w, early[i], com[i])
	}
	return rows
}

// blockPass scores the forecasts of periods from..to-1 for the widths
// w0..w0+3, advancing their running sums, adding to their squared and
// absolute errors. The loop keeps everything in locals so that the four
// chains stay in registers.
func blockPass(y []float64, from, to, w0 int, sum *[blockWidths]float64, inv [blockWidths]float64, sq, ab *[blockWidths]float64) {
	if to <= from {
		return
	}
	cur := y[from:to]
	n := len(cur)
	old0 := y[from-w0:][:n]
	old1 := y[from-w0-1:][:n]
	old2 := y[from-w0-2:][:n]
	old3 := y[from-w0-3:][:n]
	s0, s1, s2, s3 := sum[0], sum[1], sum[2], sum[3]
	i0, i1, i2, i3 := inv[0], inv[1], inv[2], inv[3]
	q0, q1, q2, q3 := sq[0], sq[1], sq[2], sq[3]
	a0, a1, a2, a3 := ab[0], ab[1], ab[2], ab[3]
	for j, v := range cur {
		e0 := v - s0*i0
		e1 := v - s1*i1
		e2 := v - s2*i2
		e3 := v - s3*i3
		q0 += e0 * e0
		q1 += e1 * e1
		q2 += e2 * e2
		q3 += e3 * e3
		a0 += math.Abs(e0)
		a1 += math.Abs(e1)
		a2 += math.Abs(e2)
		a3 += math.Abs(e3)
		s0 += v - old0[j]
		s1 += v - old1[j]
		s2 += v - old2[j]
		s3 += v - old3[j]
	}
	sum[0], sum[1], sum[2], sum[3] = s0, s1, s2, s3
	sq[0], sq[1], sq[2], sq[3] = q0, q1, q2, q3
	ab[0], ab[1], ab[2], ab[3] = a0, a1, a2, a3
}
