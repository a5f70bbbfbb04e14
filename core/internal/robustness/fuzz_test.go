package robustness

import (
	"math"
	"testing"

	"quillcast/core/forecast"
)

// FuzzMethodsFinite fits every method, parameters left to the data, on a
// series built from the fuzzer's numbers: a base shape scaled by a power
// of ten from 1e-12 to 1e12, shifted, and cut to a length from 1 to 60.
// Every fit either fails with a message or forecasts and bounds finitely.
func FuzzMethodsFinite(f *testing.F) {
	f.Add(int8(0), 0.0, uint8(48), uint8(0))
	f.Add(int8(-11), 0.0, uint8(48), uint8(1))
	f.Add(int8(10), 0.0, uint8(48), uint8(2))
	f.Add(int8(0), -500.0, uint8(30), uint8(0))
	f.Add(int8(0), 0.0, uint8(3), uint8(3))
	f.Add(int8(5), 1e9, uint8(25), uint8(1))
	f.Fuzz(func(t *testing.T, exp int8, shift float64, n uint8, kind uint8) {
		if math.IsNaN(shift) || math.IsInf(shift, 0) || math.Abs(shift) > 1e12 {
			return
		}
		k := math.Pow(10, float64(max(-12, min(12, int(exp)))))
		length := int(n)%60 + 1
		var y []float64
		switch kind % 4 {
		case 0:
			y = scaled(base(length), k)
		case 1:
			y = constant(length, k)
		case 2:
			y = scaled(base(length), -k)
		default:
			y = make([]float64, length)
			for i := range y {
				y[i] = k * float64(i%3-1)
			}
		}
		for i := range y {
			y[i] += shift
		}
		for _, sp := range forecast.Catalog() {
			m, err := sp.New(nil)
			if err != nil {
				t.Fatal(err)
			}
			fit, err := m.Fit(y, 12)
			if err != nil {
				checkMessage(t, sp.Name, err.Error())
				continue
			}
			if v, ok := allFinite(fit.Forecast(6)); !ok {
				t.Fatalf("%s forecasts %v on %v", sp.Name, v, y)
			}
			if !fit.HasInterval() {
				continue
			}
			lo, hi, err := fit.Interval(6, 0.9)
			if err != nil {
				checkMessage(t, sp.Name+" interval", err.Error())
				continue
			}
			if v, ok := allFinite(lo, hi); !ok {
				t.Fatalf("%s bounds hold %v on %v", sp.Name, v, y)
			}
		}
	})
}
