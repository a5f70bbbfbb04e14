package chart

import (
	"fmt"
	"math"
	"testing"
)

var benchSizes = []int{24, 120, 1200, 12000}

func BenchmarkLine(b *testing.B) {
	for _, n := range benchSizes {
		l := forecastLine(n)
		b.Run(fmt.Sprintf("n=%d", n), func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				_ = l.SVG()
			}
		})
	}
}

func BenchmarkBars(b *testing.B) {
	for _, n := range benchSizes {
		bars := Bars{Labels: monthLabels(2000, n), HoldoutStart: n / 2, Series: []Series{
			{Name: "a", Values: scaled(orders(n, 1), 0.1, -100)},
			{Name: "b", Values: scaled(orders(n, 2), 0.1, -100)},
		}}
		b.Run(fmt.Sprintf("n=%d", n), func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				_ = bars.SVG()
			}
		})
	}
}

func BenchmarkSweep(b *testing.B) {
	for _, n := range []int{12, 48, 240} {
		s := Sweep{Param: "width", Measure: "RMSE"}
		for i := 0; i < n; i++ {
			x := float64(i + 2)
			s.Values = append(s.Values, x)
			s.Training = append(s.Training, 100+3*x)
			s.Validation = append(s.Validation, 100+math.Abs(x-float64(n)/3)*4)
		}
		b.Run(fmt.Sprintf("n=%d", n), func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				_ = s.SVG()
			}
		})
	}
}

func BenchmarkACF(b *testing.B) {
	for _, n := range []int{12, 36, 120} {
		a := ACF{Bound: 0.2, Values: make([]float64, n)}
		for i := range a.Values {
			a.Values[i] = math.Cos(float64(i)) * math.Exp(-float64(i)/20)
		}
		b.Run(fmt.Sprintf("lags=%d", n), func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				_ = a.SVG()
			}
		})
	}
}

func BenchmarkPanels(b *testing.B) {
	for _, n := range benchSizes {
		act := orders(n, 1)
		p := Panels{Periods: monthLabels(2000, n), Parts: []Panel{
			{Name: "observed", Values: act},
			{Name: "trend", Values: centred(act)},
			{Name: "remainder", Values: scaled(act, 0.01, -12), Bars: true},
		}}
		b.Run(fmt.Sprintf("n=%d", n), func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				_ = p.SVG()
			}
		})
	}
}

// BenchmarkLineLong draws the actual series alone over long spans, as the
// load and split steps do for a large file: above four points per plot
// pixel the line is drawn from a bounded number of points.
func BenchmarkLineLong(b *testing.B) {
	for _, n := range []int{1000, 10000, 100000, 1000000} {
		l := Line{Frame: Frame{Title: "orders"}, Series: []Series{{Name: "orders", Values: orders(n, 1)}}, HoldoutStart: n - n/5}
		b.Run(fmt.Sprintf("n=%d", n), func(b *testing.B) {
			b.ReportAllocs()
			size := 0
			for b.Loop() {
				size = len(l.SVG())
			}
			b.ReportMetric(float64(size), "svg-bytes")
		})
	}
}
