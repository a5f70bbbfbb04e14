package diagnose

import (
	"encoding/binary"
	"math"
	"strings"
	"testing"
)

// floatsFrom reads little-endian float64 values from b, for fuzzing.
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

// FuzzCheck feeds arbitrary series to the checks: they must never panic,
// every finding must say something with evidence, and no sentence may
// show NaN or an infinity.
func FuzzCheck(f *testing.F) {
	f.Add(bytesOf(1, 2, 3, 4, 5, 6, 7, 8, 9, 10), 4)
	f.Add(bytesOf(0, 0, 0, 0, 0, 0), 2)
	f.Add(bytesOf(math.NaN(), 1, math.Inf(1), 2, 3, -4, 5), 3)
	f.Add(bytesOf(1e308, -1e308, 1e308, -1e308, 1e308, -1e308, 1e308), 2)
	f.Add(bytesOf(5e-324, 0, 5e-324, 0, 5e-324, 0, 5e-324, 0, 5e-324), 2)
	f.Add(bytesOf(seasonalSeries(40, 4, 1)...), 4)
	f.Fuzz(func(t *testing.T, data []byte, season int) {
		y := floatsFrom(data)
		season %= 64
		check := func(fs []Finding) {
			for _, fd := range fs {
				if fd.Text == "" || fd.Evidence == "" || fd.Topic == "" || (fd.Severity != Info && fd.Severity != Warning) {
					t.Fatalf("incomplete finding %+v", fd)
				}
				if strings.Contains(fd.Text, "NaN") || strings.Contains(fd.Text, "Inf") {
					t.Fatalf("finding shows a non-number: %q", fd.Text)
				}
			}
		}
		check(Check(y, season, Assumes{NoTrend: true, NoSeason: true, Positive: true}))
		check(CheckResiduals(y, season, 2))
		if d, err := Decompose(y, season, Additive); err == nil {
			if s := SeasonalStrength(d); !(s >= 0 && s <= 1) {
				t.Fatalf("seasonal strength %v outside 0..1", s)
			}
		}
		if _, stat := SeasonalityTest(y, season); !isFinite(stat) {
			t.Fatalf("seasonality statistic %v", stat)
		}
	})
}
