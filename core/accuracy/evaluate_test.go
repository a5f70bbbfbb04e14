package accuracy

import (
	"math"
	"math/rand/v2"
	"strings"
	"testing"
)

func TestEvaluateEdges(t *testing.T) {
	t.Parallel()
	nan, inf := math.NaN(), math.Inf(1)
	scale := NaiveScale([]float64{1, 3, 2, 4}, 1) // hand calculation: (2+1+2)/3 = 5/3
	tests := []struct {
		name     string
		actual   []float64
		forecast []float64
		scale    Scale
		n, skip  int
		want     map[Measure]float64 // defined values
		reasons  map[Measure]string  // undefined measures: text the reason must contain
	}{
		{
			// Hand calculation: errors 1, -1, 2; ME 2/3, MAE 4/3, MSE 2,
			// MAPE 100*(1/2+1/4+2/6)/3, MPE 100*(1/2-1/4+2/6)/3,
			// sMAPE 100*(2/3+2/9+4/10)/3, MASE (4/3)/(5/3) = 0.8.
			name: "hand", actual: []float64{2, 4, 6}, forecast: []float64{1, 5, 4}, scale: scale, n: 3,
			want: map[Measure]float64{ME: 2.0 / 3, MAE: 4.0 / 3, MSE: 2, RMSE: math.Sqrt(2),
				MAPE: 100 * (0.5 + 0.25 + 2.0/6) / 3, MPE: 100 * (0.5 - 0.25 + 2.0/6) / 3,
				SMAPE: 100 * (2.0/3 + 2.0/9 + 0.4) / 3, MASE: 0.8},
		},
		{
			// The NaN and Inf periods are left out; the rest is the hand case.
			name: "nan and inf skipped", actual: []float64{2, nan, 4, 9, 6}, forecast: []float64{1, 3, 5, -inf, 4},
			scale: scale, n: 3, skip: 2,
			want: map[Measure]float64{ME: 2.0 / 3, MAE: 4.0 / 3, MASE: 0.8},
		},
		{
			name: "perfect constant forecast", actual: []float64{5, 5, 5}, forecast: []float64{5, 5, 5}, scale: scale, n: 3,
			want: map[Measure]float64{ME: 0, MAE: 0, MSE: 0, RMSE: 0, MAPE: 0, MPE: 0, SMAPE: 0, MASE: 0},
		},
		{
			name: "both zero", actual: []float64{0, 1}, forecast: []float64{0, 2}, scale: scale, n: 2,
			want:    map[Measure]float64{MAE: 0.5},
			reasons: map[Measure]string{MAPE: "MAPE undefined: 1 actual value is zero", SMAPE: "sMAPE undefined: in 1 period the actual value and the forecast are both zero"},
		},
		{
			// Hand calculation: sMAPE = 100*(2+2+2+2/3)/4 = 166.67.
			name: "three zero actuals", actual: []float64{0, 0, 0, 2}, forecast: []float64{1, 1, 1, 1}, scale: scale, n: 4,
			want:    map[Measure]float64{SMAPE: 100 * (6 + 2.0/3) / 4},
			reasons: map[Measure]string{MAPE: "MAPE undefined: 3 actual values are zero", MPE: "3 actual values are zero"},
		},
		{
			name: "empty", scale: scale,
			reasons: map[Measure]string{ME: "ME undefined: there is no period to score", MASE: "no period to score"},
		},
		{
			name: "all missing", actual: []float64{nan, 1}, forecast: []float64{1, inf}, scale: scale, skip: 2,
			reasons: map[Measure]string{RMSE: "RMSE undefined: no period has both an actual value and a forecast (2 periods have a missing value)"},
		},
		{
			name: "lengths differ", actual: []float64{1, 2}, forecast: []float64{1}, scale: scale,
			reasons: map[Measure]string{MAE: "MAE undefined: the forecast covers 1 period but 2 actual values were given"},
		},
		{
			name: "no scale", actual: []float64{1}, forecast: []float64{2}, n: 1,
			want:    map[Measure]float64{MAE: 1},
			reasons: map[Measure]string{MASE: "MASE undefined: no training series was given to scale it"},
		},
		{
			name: "constant training series", actual: []float64{1}, forecast: []float64{2}, scale: NaiveScale([]float64{3, 3, 3}, 1), n: 1,
			reasons: map[Measure]string{MASE: "MASE undefined: the training series is constant"},
		},
		{
			name: "overflow", actual: []float64{1e200, -1e200}, forecast: []float64{-1e200, 1e200}, scale: scale, n: 2,
			want:    map[Measure]float64{ME: 0, MAE: 2e200, SMAPE: 200},
			reasons: map[Measure]string{MSE: "MSE undefined: the errors are too large to add up", RMSE: "too large"},
		},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			t.Parallel()
			s := Evaluate(tc.actual, tc.forecast, tc.scale)
			if s.N != tc.n || s.Skipped != tc.skip {
				t.Errorf("N, Skipped = %d, %d; want %d, %d", s.N, s.Skipped, tc.n, tc.skip)
			}
			for _, m := range Measures() {
				r := s.Of(m)
				if !finite(r.Value) || (r.Defined && r.Reason != "") || (!r.Defined && (r.Reason == "" || r.Value != 0)) {
					t.Errorf("%v = %+v: a result is either a finite value or a reason", m, r)
				}
			}
			for m, want := range tc.want {
				r := s.Of(m)
				if !r.Defined || math.Abs(r.Value-want) > 1e-12*math.Max(1, math.Abs(want)) {
					t.Errorf("%v = %+v, want %.15g", m, r, want)
				}
			}
			for m, want := range tc.reasons {
				if r := s.Of(m); r.Defined || !strings.Contains(r.Reason, want) {
					t.Errorf("%v = %+v, want undefined with reason containing %q", m, r, want)
				}
			}
			if r := s.Of(Measure(0)); r.Defined || r.Reason == "" {
				t.Errorf("Of(0) = %+v, want undefined with a reason", r)
			}
		})
	}
}

func TestScoreMatchesEvaluate(t *testing.T) {
	t.Parallel()
	actual, forecast := series(50, 1), series(50, 2)
	scale := NaiveScale(series(80, 3), 4)
	s := Evaluate(actual, forecast, scale)
	for _, m := range Measures() {
		if got := Score(m, actual, forecast, scale); got != s.Of(m) {
			t.Errorf("Score(%v) = %+v, Evaluate gives %+v", m, got, s.Of(m))
		}
	}
}

func TestNaiveScale(t *testing.T) {
	t.Parallel()
	nan := math.NaN()
	tests := []struct {
		name   string
		train  []float64
		lag    int
		value  float64
		n      int
		reason string
	}{
		// Hand calculation: |3-1|, |2-3|, |6-2| average 7/3.
		{"lag one", []float64{1, 3, 2, 6}, 1, 7.0 / 3, 3, ""},
		// Hand calculation: |2-1|, |6-3| average 2.
		{"lag two", []float64{1, 3, 2, 6}, 2, 2, 2, ""},
		{"nan left out", []float64{1, 3, nan, 6, 8}, 1, 2, 2, ""},
		{"constant", []float64{4, 4, 4}, 1, 0, 2, "MASE undefined: the training series is constant"},
		{"repeating", []float64{1, 2, 1, 2, 1, 2}, 2, 0, 4, "repeats exactly every 2 periods"},
		{"too short", []float64{1, 2}, 4, 0, 0, "MASE undefined: the training series has 2 values; scaling at lag 4 needs at least 5"},
		{"empty", nil, 1, 0, 0, "has 0 values; scaling at lag 1 needs at least 2"},
		{"all gaps", []float64{nan, nan, nan}, 1, 0, 0, "no two values 1 period apart"},
		{"lag zero", []float64{1, 2}, 0, 0, 0, "at least 1 period; 0 was given"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			t.Parallel()
			s := NaiveScale(tc.train, tc.lag)
			if s.Lag != tc.lag || s.N != tc.n {
				t.Errorf("Lag, N = %d, %d; want %d, %d", s.Lag, s.N, tc.lag, tc.n)
			}
			if tc.reason == "" {
				if !s.Defined || math.Abs(s.Value-tc.value) > 1e-12 {
					t.Errorf("NaiveScale = %+v, want %v", s, tc.value)
				}
				return
			}
			if s.Defined || !strings.Contains(s.Reason, tc.reason) {
				t.Errorf("NaiveScale = %+v, want undefined with %q", s, tc.reason)
			}
		})
	}
}

// series returns n positive values from a fixed seed.
func series(n int, seed uint64) []float64 {
	rng := rand.New(rand.NewPCG(seed, 99))
	y := make([]float64, n)
	for i := range y {
		y[i] = 100 + 10*rng.NormFloat64()
	}
	return y
}

var benchSizes = []struct {
	name string
	n    int
}{{"n=12", 12}, {"n=100", 100}, {"n=1000", 1000}, {"n=100000", 100000}}

func BenchmarkEvaluate(b *testing.B) {
	for _, size := range benchSizes {
		actual, forecast := series(size.n, 1), series(size.n, 2)
		scale := NaiveScale(series(size.n, 3), 1)
		b.Run(size.name, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				Evaluate(actual, forecast, scale)
			}
		})
	}
}

func BenchmarkScore(b *testing.B) {
	for _, m := range Measures() {
		for _, size := range benchSizes {
			actual, forecast := series(size.n, 1), series(size.n, 2)
			scale := NaiveScale(series(size.n, 3), 1)
			b.Run(m.String()+"/"+size.name, func(b *testing.B) {
				b.ReportAllocs()
				for b.Loop() {
					Score(m, actual, forecast, scale)
				}
			})
		}
	}
}

func BenchmarkNaiveScale(b *testing.B) {
	for _, size := range benchSizes {
		train := series(size.n, 3)
		b.Run(size.name, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				NaiveScale(train, 12)
			}
		})
	}
}
