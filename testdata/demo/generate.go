//go:build ignore

// Command generate writes the demo data of Quillcast: invented figures for
// Wickery & Co., an invented small chain of candle shops. The numbers come
// from a fixed seed, so every run writes the same bytes.
//
// Run from the repository root:
//
//	go run testdata/demo/generate.go
//
// Each series is a trend times a seasonal factor times noise (a
// multiplicative season: the December peak grows with the level).
package main

import (
	"bytes"
	"flag"
	"fmt"
	"log"
	"math"
	"math/rand/v2"
	"os"
	"path/filepath"
	"time"
)

// seed fixes every random draw; change it and every file changes.
const seed = 20240301

// monthFactor is the share of an average month's orders in each calendar
// month: candles sell most before the winter holidays. The factors average 1.
var monthFactor = [12]float64{0.82, 0.78, 0.86, 0.84, 0.80, 0.72, 0.70, 0.76, 0.92, 1.10, 1.40, 1.30}

// quarterFactor is the same for quarters (they average 1).
var quarterFactor = [4]float64{0.82, 0.76, 0.86, 1.56}

// shops of the long-form file: invented names, levels and growth.
var shops = []struct {
	name   string
	level  float64 // units in January 2020
	growth float64 // units added per month
}{
	{"Harbour Row", 420, 2.5},
	{"Old Mill", 310, 1.2},
	{"Station Arcade", 520, -0.8},
	{"Linden Square", 260, 3.1},
	{"Quayside", 380, 0.4},
}

func main() {
	dir := flag.String("dir", "testdata/demo", "folder to write the files into")
	flag.Parse()
	rng := rand.New(rand.NewPCG(seed, seed^0x5eed))
	files := []struct {
		name string
		data []byte
	}{
		{"wickery-monthly-orders.csv", monthlyOrders(rng)},
		{"wickery-weekly-online.csv", weeklyOnline(rng)},
		{"wickery-quarterly-revenue.csv", quarterlyRevenue(rng)},
		{"wickery-shops-monthly.csv", shopsMonthly(rng)},
	}
	for _, f := range files {
		if err := os.WriteFile(filepath.Join(*dir, f.name), f.data, 0o644); err != nil {
			log.Fatal(err)
		}
	}
}

// noise returns a multiplicative noise factor with the given spread
// (the standard deviation of its logarithm).
func noise(rng *rand.Rand, spread float64) float64 {
	return math.Exp(spread * rng.NormFloat64())
}

// monthlyOrders: unit orders of the whole chain, January 2017 to December
// 2024 (96 months).
func monthlyOrders(rng *rand.Rand) []byte {
	var b bytes.Buffer
	b.WriteString("month,units\n")
	for t := range 96 {
		y, m := 2017+t/12, t%12
		level := 1800 + 14*float64(t)
		units := level * monthFactor[m] * noise(rng, 0.04)
		fmt.Fprintf(&b, "%d-%02d,%.0f\n", y, m+1, units)
	}
	return b.Bytes()
}

// weeklyOnline: orders placed in the online shop, ISO weeks 2020-W01 to
// 2022-W52 (157 weeks; 2020 has a week 53).
func weeklyOnline(rng *rand.Rand) []byte {
	var b bytes.Buffer
	b.WriteString("week,online_orders\n")
	monday := time.Date(2019, 12, 30, 0, 0, 0, 0, time.UTC) // Monday of 2020-W01
	for t := range 157 {
		day := monday.AddDate(0, 0, 7*t)
		y, w := day.ISOWeek()
		level := 140 + 0.9*float64(t)
		yearPart := float64(day.YearDay()) / 365.25
		season := 1 + 0.25*math.Cos(2*math.Pi*(yearPart-0.95))
		orders := level * season * noise(rng, 0.08)
		fmt.Fprintf(&b, "%d-W%02d,%.0f\n", y, w, orders)
	}
	return b.Bytes()
}

// quarterlyRevenue: revenue in euros, 2015-Q1 to 2024-Q4 (40 quarters).
func quarterlyRevenue(rng *rand.Rand) []byte {
	var b bytes.Buffer
	b.WriteString("quarter,revenue_eur\n")
	for t := range 40 {
		y, q := 2015+t/4, t%4
		level := 96000 + 1650*float64(t)
		revenue := level * quarterFactor[q] * noise(rng, 0.03)
		fmt.Fprintf(&b, "%d-Q%d,%.2f\n", y, q+1, revenue)
	}
	return b.Bytes()
}

// shopsMonthly: unit orders of each shop, January 2020 to December 2024
// (60 months per shop), in the long layout for a bake-off across shops.
func shopsMonthly(rng *rand.Rand) []byte {
	var b bytes.Buffer
	b.WriteString("shop,month,units\n")
	for _, s := range shops {
		for t := range 60 {
			y, m := 2020+t/12, t%12
			level := s.level + s.growth*float64(t)
			units := level * monthFactor[m] * noise(rng, 0.07)
			fmt.Fprintf(&b, "%s,%d-%02d,%.0f\n", s.name, y, m+1, units)
		}
	}
	return b.Bytes()
}
