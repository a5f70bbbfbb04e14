package chart

import (
	"fmt"
	"math"
	"math/rand/v2"
)

// This file builds the invented series the tests draw: a candle maker's
// monthly orders with a trend, a yearly season and seeded noise.

// monthLabels returns n monthly labels starting January of year.
func monthLabels(year, n int) []string {
	out := make([]string, n)
	for i := range out {
		out[i] = fmt.Sprintf("%04d-%02d", year+i/12, i%12+1)
	}
	return out
}

// orders returns n months of invented orders from a fixed seed.
func orders(n int, seed uint64) []float64 {
	r := rand.New(rand.NewPCG(seed, 7))
	out := make([]float64, n)
	for i := range out {
		out[i] = 1200 + 14*float64(i) + 260*math.Sin(2*math.Pi*float64(i)/12) + 60*r.NormFloat64()
	}
	return out
}

// nanBefore returns vs with NaN at positions before start.
func nanBefore(vs []float64, start int) []float64 {
	out := append([]float64(nil), vs...)
	for i := 0; i < start && i < len(out); i++ {
		out[i] = math.NaN()
	}
	return out
}

// scaled returns vs[i]*f + add, keeping NaN.
func scaled(vs []float64, f, add float64) []float64 {
	out := make([]float64, len(vs))
	for i, v := range vs {
		out[i] = v*f + add
	}
	return out
}

// centred returns the 2×12 centred moving average of vs, NaN where the
// window does not fit.
func centred(vs []float64) []float64 {
	out := make([]float64, len(vs))
	for i := range out {
		out[i] = math.NaN()
		if i < 6 || i+6 >= len(vs) {
			continue
		}
		s := (vs[i-6] + vs[i+6]) / 2
		for j := i - 5; j <= i+5; j++ {
			s += vs[j]
		}
		out[i] = s / 12
	}
	return out
}

// forecastLine builds the actual-versus-forecast chart over n months with a
// 12-month holdout.
func forecastLine(n int) Line {
	act := orders(n, 1)
	hold := n - 12
	fc := nanBefore(scaled(act, 0.97, 40), hold)
	return Line{
		Frame:   Frame{Title: "Candle orders and the Holt-Winters forecast", XTitle: "month", YTitle: "units"},
		Periods: monthLabels(2019, n),
		Series: []Series{
			{Name: "orders", Values: act},
			{Name: "centred 2×12", Values: centred(act), Role: Smoothed},
			{Name: "hw", Values: fc, Role: Forecast, Bands: []Band{
				{Level: 80, Lower: scaled(fc, 0.93, 0), Upper: scaled(fc, 1.07, 0)},
				{Level: 95, Lower: scaled(fc, 0.88, 0), Upper: scaled(fc, 1.12, 0)},
			}},
		},
		HoldoutStart: hold,
	}
}
