package forecast

import (
	"encoding/binary"
	"math"
	"testing"
)

// FuzzFit feeds arbitrary series to every catalogue method. Properties: no
// panic; a fit either returns an error or finite fitted values (NaN only
// where a method has none yet), forecasts and intervals.
func FuzzFit(f *testing.F) {
	f.Add([]byte{1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12, 13, 14, 15, 16}, uint8(4))
	f.Add([]byte{0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0}, uint8(2))
	f.Add([]byte{255, 1, 255, 1, 255, 1, 255, 1, 255, 1}, uint8(3))
	f.Add([]byte{1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12, 13, 14, 15, 16, 17, 18}, uint8(16*15+4))
	extra := []struct {
		name string
		s    Settings
	}{
		{"holt-winters", Settings{"season": {Word: "multiplicative"}, "damped": {Word: "yes"}}},
		{"holt-winters", Settings{"season": {Word: "multiplicative"}, "alpha": {Number: 1}, "beta": {Number: 1}, "gamma": {Number: 1}}},
		{"holt-winters", Settings{"season": {Word: "multiplicative"}, "start": {Word: "estimated"}}},
		{"damped", Settings{"start": {Word: "estimated"}}},
		{"regression", Settings{"trend": {Word: "exponential"}}},
		{"regression", Settings{"trend": {Word: "quadratic"}}},
	}
	f.Fuzz(func(t *testing.T, data []byte, season uint8) {
		// Two bytes per value: a signed 16-bit integer scaled to about
		// +-330, times 10^(12k) for k = season/16 (0 to 15) to reach values
		// whose squares overflow.
		scale := math.Pow(10, float64(12*(season/16)))
		y := make([]float64, 0, len(data)/2)
		for i := 0; i+1 < len(data) && len(y) < 200; i += 2 {
			y = append(y, float64(int16(binary.LittleEndian.Uint16(data[i:])))/100*scale)
		}
		m := int(season % 16 % 13)
		var methods []Method
		for _, sp := range Catalog() {
			method, err := sp.New(nil)
			if err != nil {
				t.Fatal(err)
			}
			methods = append(methods, method)
		}
		for _, e := range extra {
			sp, _ := Lookup(e.name)
			method, err := sp.New(e.s)
			if err != nil {
				t.Fatal(err)
			}
			methods = append(methods, method)
		}
		for _, method := range methods {
			sp := struct{ Name string }{method.Name()}
			fit, err := method.Fit(y, m)
			if err != nil {
				continue
			}
			for _, v := range fit.Forecast(2 * max(m, 4)) {
				if math.IsNaN(v) || math.IsInf(v, 0) {
					t.Fatalf("%s on %v (season %d): forecast %g", sp.Name, y, m, v)
				}
			}
			for _, v := range fit.Fitted {
				if math.IsInf(v, 0) {
					t.Fatalf("%s on %v (season %d): fitted %g", sp.Name, y, m, v)
				}
			}
			if lo, hi, err := fit.Interval(4, 0.9); err == nil {
				for i := range lo {
					if math.IsNaN(lo[i]) || math.IsNaN(hi[i]) || math.IsInf(lo[i], 0) || math.IsInf(hi[i], 0) || lo[i] > hi[i] {
						t.Fatalf("%s on %v (season %d): interval [%g, %g]", sp.Name, y, m, lo[i], hi[i])
					}
				}
			}
		}
	})
}
