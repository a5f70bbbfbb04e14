package robustness

import (
	"fmt"
	"math"
	"math/rand/v2"
	"strconv"
	"strings"
)

// shape is one series the tests run every method and verb on.
type shape struct {
	name   string
	values []float64
}

// base is a monthly series with a level, a trend, a yearly season and a
// little noise, from a fixed seed: the shape the scaled cases multiply.
func base(n int) []float64 {
	r := rand.New(rand.NewPCG(6, 1))
	y := make([]float64, n)
	for i := range y {
		y[i] = 100 + 0.8*float64(i) + 15*math.Sin(2*math.Pi*float64(i)/12) + r.NormFloat64()
	}
	return y
}

// scaled returns y times k.
func scaled(y []float64, k float64) []float64 {
	out := make([]float64, len(y))
	for i, v := range y {
		out[i] = v * k
	}
	return out
}

// constant returns n copies of v.
func constant(n int, v float64) []float64 {
	y := make([]float64, n)
	for i := range y {
		y[i] = v
	}
	return y
}

// shapes returns the hard series: scaled, negative, zero, constant, short
// and crossing zero. Each has 48 monthly points unless its name says
// otherwise.
func shapes() []shape {
	b := base(48)
	cross := make([]float64, 48)
	for i := range cross {
		cross[i] = 10 * math.Sin(2*math.Pi*float64(i)/12)
	}
	return []shape{
		{"ordinary", b},
		{"tiny 1e-9", scaled(b, 1e-11)},
		{"huge 1e12", scaled(b, 1e10)},
		{"negative", scaled(b, -1)},
		{"all zero", constant(48, 0)},
		{"constant", constant(48, 42)},
		{"crossing zero", cross},
		{"one point", []float64{5}},
		{"three points", []float64{5, 7, 6}},
		{"three equal points", []float64{3, 3, 3}},
		{"two seasons and one", b[:25]},
	}
}

// monthlyCSV writes y as a monthly CSV file with a month and a units
// column, starting January 2019. Numbers are written with every digit so
// the file reads back to the same values.
func monthlyCSV(y []float64) []byte {
	var sb strings.Builder
	sb.WriteString("month,units\n")
	for i, v := range y {
		fmt.Fprintf(&sb, "%04d-%02d,%s\n", 2019+i/12, i%12+1, formatFull(v))
	}
	return []byte(sb.String())
}

// formatFull writes v in plain decimal form with the shortest digits that
// read back to v (no exponent: data files from the trade seldom have one).
func formatFull(v float64) string {
	return strconv.FormatFloat(v, 'f', -1, 64)
}
