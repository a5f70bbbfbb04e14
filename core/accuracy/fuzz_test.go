package accuracy

import (
	"encoding/binary"
	"math"
	"testing"
)

func floatsFrom(b []byte) []float64 {
	y := make([]float64, 0, len(b)/8)
	for len(b) >= 8 {
		y = append(y, math.Float64frombits(binary.LittleEndian.Uint64(b)))
		b = b[8:]
	}
	return y
}

func bytesOf(y ...float64) []byte {
	b := make([]byte, 0, 8*len(y))
	for _, v := range y {
		b = binary.LittleEndian.AppendUint64(b, math.Float64bits(v))
	}
	return b
}

// FuzzEvaluate checks that no input makes a result NaN or infinite, and
// that every undefined result carries a reason.
func FuzzEvaluate(f *testing.F) {
	f.Add(bytesOf(1, 2, 3, 4), bytesOf(1, 2, 2, 5), 1)
	f.Add(bytesOf(0, 0, 1e308, -1e308), bytesOf(0, 1, -1e308, 1e308), 2)
	f.Add(bytesOf(math.NaN(), math.Inf(1)), bytesOf(1, 2), 0)
	f.Add(bytesOf(5e-324, 0), bytesOf(0, 5e-324), 1)
	f.Fuzz(func(t *testing.T, a, b []byte, lag int) {
		actual, forecast := floatsFrom(a), floatsFrom(b)
		n := min(len(actual), len(forecast))
		scale := NaiveScale(actual, lag%20)
		ok := func(name string, r Result) {
			if !finite(r.Value) || (!r.Defined && r.Reason == "") || (r.Defined && r.Reason != "") {
				t.Fatalf("%s = %+v", name, r)
			}
		}
		s := Evaluate(actual[:n], forecast[:n], scale)
		for _, m := range Measures() {
			ok(m.String(), s.Of(m))
		}
		if scale.Defined && !(scale.Value > 0 && finite(scale.Value)) {
			t.Fatalf("scale %+v", scale)
		}
		if n >= 2 {
			iv := ScoreIntervals(actual[:n/2], forecast[:n/2], forecast[n/2:n/2*2], 0.9)
			ok("coverage", iv.Coverage)
			ok("winkler", iv.Winkler)
			ok("width", iv.Width)
		}
	})
}
