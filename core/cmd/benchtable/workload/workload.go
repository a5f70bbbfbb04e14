// Package workload builds the inputs of the speed and size measurements
// and the naive baseline they are compared with, so that the native
// measurements (command benchtable) and the page's (the engine built with
// the bench tag) work on the very same data.
//
// Start with [RandomWalk] for the window sweep input, [PlainSweep] for the
// O(n·w) baseline and [Floats]/[ParseFloats] to hand a series to another
// program as raw little-endian float64 values.
package workload

import (
	"encoding/binary"
	"fmt"
	"math"
	"math/rand/v2"
	"strconv"

	"quillcast/core/backtest"
)

// RandomWalk returns n points of a random walk around 1000 with standard
// normal steps, from a PCG generator seeded with seed.
func RandomWalk(n int, seed uint64) []float64 {
	r := rand.New(rand.NewPCG(seed, 1))
	y := make([]float64, n)
	v := 1000.0
	for i := range y {
		v += r.NormFloat64()
		y[i] = v
	}
	return y
}

// PlainSweep scores the trailing moving average of every width in widths
// on the training periods [w, trainEnd) of y, each one-step forecast
// re-adding its w values: O(n·w) per width, the straightforward loop the
// running-sum sweep of package backtest is measured against. Row i holds
// width widths.From+i; its errors match that sweep's Own errors.
func PlainSweep(y []float64, trainEnd int, widths backtest.Range) ([]backtest.Errors, error) {
	if widths.From < 1 || widths.To < widths.From || widths.To >= trainEnd || trainEnd > len(y) {
		return nil, fmt.Errorf("widths %d..%d do not fit a training period of %d values", widths.From, widths.To, trainEnd)
	}
	out := make([]backtest.Errors, 0, widths.To-widths.From+1)
	for w := widths.From; w <= widths.To; w++ {
		var sq, abs float64
		for t := w; t < trainEnd; t++ {
			var s float64
			for _, v := range y[t-w : t] {
				s += v
			}
			e := y[t] - s/float64(w)
			sq += e * e
			abs += math.Abs(e)
		}
		n := trainEnd - w
		mse := sq / float64(n)
		out = append(out, backtest.Errors{N: n, MSE: mse, RMSE: math.Sqrt(mse), MAE: abs / float64(n)})
	}
	return out, nil
}

// Floats encodes y as consecutive little-endian float64 values, the layout
// numpy's fromfile and JavaScript's Float64Array read.
func Floats(y []float64) []byte {
	b := make([]byte, 8*len(y))
	for i, v := range y {
		binary.LittleEndian.PutUint64(b[8*i:], math.Float64bits(v))
	}
	return b
}

// ParseFloats decodes the layout of [Floats]. It returns an error when the
// length is not a whole number of values.
func ParseFloats(b []byte) ([]float64, error) {
	if len(b)%8 != 0 {
		return nil, fmt.Errorf("%d bytes are not a whole number of 8-byte values", len(b))
	}
	y := make([]float64, len(b)/8)
	for i := range y {
		y[i] = math.Float64frombits(binary.LittleEndian.Uint64(b[8*i:]))
	}
	return y, nil
}

// RowsCSV returns a data file of one column named value holding y, one
// row per value with four decimals: the shape of a long export without a
// date column, which the reader numbers 1, 2, 3, ...
func RowsCSV(y []float64) []byte {
	b := make([]byte, 0, 16*len(y)+8)
	b = append(b, "value\n"...)
	for _, v := range y {
		b = strconv.AppendFloat(b, v, 'f', 4, 64)
		b = append(b, '\n')
	}
	return b
}
