package diagnose

import (
	"math"
	"math/rand/v2"
	"testing"
)

// tol is a reference case tolerance: pass when |got-want| <= Abs + Rel*|want|.
type tol struct{ Abs, Rel float64 }

func (c tol) near(got, want float64) bool {
	return math.Abs(got-want) <= c.Abs+c.Rel*math.Abs(want)
}

// compareNullable compares got with a reference array in which nil means
// "undefined": got must be NaN exactly there and within c elsewhere.
func compareNullable(t *testing.T, name string, got []float64, want []*float64, c tol) {
	t.Helper()
	if len(got) != len(want) {
		t.Fatalf("%s: got %d values, want %d", name, len(got), len(want))
	}
	for i, w := range want {
		switch {
		case w == nil && !math.IsNaN(got[i]):
			t.Errorf("%s[%d] = %v, want undefined (NaN)", name, i, got[i])
		case w != nil && !c.near(got[i], *w):
			t.Errorf("%s[%d] = %.15g, want %.15g", name, i, got[i], *w)
		}
	}
}

func compareSlice(t *testing.T, name string, got, want []float64, c tol) {
	t.Helper()
	if len(got) != len(want) {
		t.Fatalf("%s: got %d values, want %d", name, len(got), len(want))
	}
	for i := range want {
		if !c.near(got[i], want[i]) {
			t.Errorf("%s[%d] = %.15g, want %.15g", name, i, got[i], want[i])
		}
	}
}

// seasonalSeries returns n values of a rising series with a season of
// length m and Gaussian noise from a fixed seed; it stays above zero.
func seasonalSeries(n, m int, seed uint64) []float64 {
	rng := rand.New(rand.NewPCG(seed, 7))
	y := make([]float64, n)
	for t := range y {
		y[t] = 200 + 0.5*float64(t) + 30*math.Sin(2*math.Pi*float64(t%max(m, 1))/float64(max(m, 1))) + 5*rng.NormFloat64()
	}
	return y
}

// benchSizes are the series lengths used by the benchmarks.
var benchSizes = []struct {
	name string
	n    int
}{{"n=100", 100}, {"n=1000", 1000}, {"n=10000", 10000}, {"n=100000", 100000}}
