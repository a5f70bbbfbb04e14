package diagnose

import (
	"errors"
	"fmt"
	"math"
	"strings"
	"testing"

	"quillcast/core/internal/refdata"
)

type decomposeCase struct {
	Data struct {
		Y []float64 `json:"y"`
	} `json:"data"`
	Params struct {
		Period int    `json:"period"`
		Model  string `json:"model"`
	} `json:"params"`
	Expected struct {
		Trend    []*float64 `json:"trend"`
		Seasonal []*float64 `json:"seasonal"`
		Resid    []*float64 `json:"resid"`
		Indices  []float64  `json:"indices"`
		Adjusted []*float64 `json:"adjusted"`
	} `json:"expected"`
	Tolerance tol `json:"tolerance"`
}

// TestDecomposeReference checks classical decomposition against the
// reference cases decompose_*: statsmodels 0.13.5 seasonal_decompose
// (two-sided filter, no extrapolation) on the NIST/SEMATECH e-Handbook
// 6.4.3.6 quarterly sales and on the Eurostat electrical equipment index,
// tolerance abs 1e-9, rel 1e-9 as the case files state.
func TestDecomposeReference(t *testing.T) {
	t.Parallel()
	for _, name := range []string{
		"decompose_additive_nist_sales",
		"decompose_multiplicative_nist_sales",
		"decompose_additive_elec",
		"decompose_multiplicative_elec",
	} {
		t.Run(name, func(t *testing.T) {
			t.Parallel()
			var c decomposeCase
			refdata.ReadJSON(t, "reference/cases/"+name+".json", &c)
			kind := Additive
			if c.Params.Model == "multiplicative" {
				kind = Multiplicative
			}
			d, err := Decompose(c.Data.Y, c.Params.Period, kind)
			if err != nil {
				t.Fatalf("Decompose: %v", err)
			}
			if d.Kind != kind || d.Season != c.Params.Period {
				t.Errorf("Kind, Season = %v, %d; want %v, %d", d.Kind, d.Season, kind, c.Params.Period)
			}
			compareNullable(t, "trend", d.Trend, c.Expected.Trend, c.Tolerance)
			compareNullable(t, "seasonal", d.Seasonal, c.Expected.Seasonal, c.Tolerance)
			compareNullable(t, "remainder", d.Remainder, c.Expected.Resid, c.Tolerance)
			compareNullable(t, "adjusted", d.Adjusted, c.Expected.Adjusted, c.Tolerance)
			compareSlice(t, "indices", d.Indices, c.Expected.Indices, c.Tolerance)
		})
	}
}

// TestDecomposeHand checks a small case worked by hand.
func TestDecomposeHand(t *testing.T) {
	t.Parallel()
	// Hand calculation: y = 10,20,30,40,50,60 with season 2. The 2×2 trend
	// at t is (y[t-1]/2 + y[t] + y[t+1]/2)/2 = y[t] on a straight line, so
	// trend = NaN,20,30,40,50,NaN, the detrended values are 0 and every
	// index is 0; the remainder is 0 inside and the adjusted series is y.
	y := []float64{10, 20, 30, 40, 50, 60}
	d, err := Decompose(y, 2, Additive)
	if err != nil {
		t.Fatal(err)
	}
	nan := math.NaN()
	c := tol{Abs: 1e-12}
	nullable := func(v []float64) []*float64 {
		out := make([]*float64, len(v))
		for i := range v {
			if !math.IsNaN(v[i]) {
				out[i] = &v[i]
			}
		}
		return out
	}
	compareNullable(t, "trend", d.Trend, nullable([]float64{nan, 20, 30, 40, 50, nan}), c)
	compareSlice(t, "indices", d.Indices, []float64{0, 0}, c)
	compareNullable(t, "remainder", d.Remainder, nullable([]float64{nan, 0, 0, 0, 0, nan}), c)
	compareSlice(t, "adjusted", d.Adjusted, y, c)

	// Hand calculation: a constant positive series decomposes into a flat
	// trend, indices of exactly 1 and remainders of 1.
	m, err := Decompose([]float64{5, 5, 5, 5, 5, 5, 5, 5}, 4, Multiplicative)
	if err != nil {
		t.Fatal(err)
	}
	compareSlice(t, "indices", m.Indices, []float64{1, 1, 1, 1}, c)
	compareNullable(t, "remainder", m.Remainder, nullable([]float64{nan, nan, 1, 1, 1, 1, nan, nan}), c)
}

func TestDecomposeErrors(t *testing.T) {
	t.Parallel()
	tests := []struct {
		name   string
		y      []float64
		season int
		kind   Kind
		cause  error
		pos    int
		text   string
	}{
		{"empty", nil, 4, Additive, ErrTooShort, 0, "two full seasons (8 values for a season of 4); the series has 0"},
		{"short", []float64{1, 2, 3, 4, 5, 6, 7}, 4, Additive, ErrTooShort, 0, "the series has 7"},
		{"season one", []float64{1, 2, 3}, 1, Additive, ErrBadSeason, 0, "at least 2 periods"},
		{"season zero", []float64{1, 2, 3}, 0, Multiplicative, ErrBadSeason, 0, "0 was given"},
		{"nan", []float64{1, 2, math.NaN(), 4, 5, 6, 7, 8}, 4, Additive, ErrNotFinite, 3, "period 3 has no value"},
		{"inf", []float64{1, 2, 3, 4, math.Inf(1), 6, 7, 8}, 4, Additive, ErrNotFinite, 5, "period 5 holds an infinite value"},
		{"minus inf", []float64{math.Inf(-1), 2, 3, 4, 5, 6, 7, 8}, 4, Additive, ErrNotFinite, 1, "period 1"},
		{"zero multiplicative", []float64{1, 2, 0, 4, 5, 0, 7, 8}, 4, Multiplicative, ErrNotPositive, 3, "2 values are zero or negative (the first at period 3)"},
		{"negative multiplicative", []float64{1, 2, 3, 4, 5, 6, 7, -8}, 4, Multiplicative, ErrNotPositive, 8, "1 value is zero or negative"},
		{"bad kind", []float64{1, 2, 3, 4}, 2, Kind(0), ErrBadSeason, 0, "either additive or multiplicative"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			t.Parallel()
			d, err := Decompose(tc.y, tc.season, tc.kind)
			if err == nil {
				t.Fatalf("Decompose(%v, %d, %v) = %+v, want an error", tc.y, tc.season, tc.kind, d)
			}
			var ie *InputError
			if !errors.As(err, &ie) || !errors.Is(err, tc.cause) || ie.Pos != tc.pos {
				t.Errorf("error %q: want cause %v at position %d, got %#v", err, tc.cause, tc.pos, err)
			}
			if !strings.Contains(err.Error(), tc.text) {
				t.Errorf("error %q does not contain %q", err, tc.text)
			}
		})
	}
}

func TestDecomposeNegativeAdditive(t *testing.T) {
	t.Parallel()
	// An additive decomposition accepts zeros and negative values.
	y := []float64{-3, 0, 4, -1, -2, 1, 5, 0, -1, 2, 6, 1}
	d, err := Decompose(y, 4, Additive)
	if err != nil {
		t.Fatal(err)
	}
	var sum float64
	for _, v := range d.Indices {
		sum += v
	}
	if math.Abs(sum) > 1e-12 {
		t.Errorf("additive indices sum to %g, want 0 (by construction)", sum)
	}
	for i, v := range d.Adjusted {
		if !isFinite(v) {
			t.Errorf("adjusted[%d] = %v, want a finite value", i, v)
		}
	}
}

func TestKindString(t *testing.T) {
	t.Parallel()
	for k, want := range map[Kind]string{Additive: "additive", Multiplicative: "multiplicative", Kind(9): "unknown"} {
		if got := k.String(); got != want {
			t.Errorf("Kind(%d).String() = %q, want %q", int(k), got, want)
		}
	}
}

func BenchmarkDecompose(b *testing.B) {
	for _, kind := range []Kind{Additive, Multiplicative} {
		for _, size := range benchSizes {
			y := seasonalSeries(size.n, 12, 1)
			b.Run(fmt.Sprintf("%v/%s", kind, size.name), func(b *testing.B) {
				b.ReportAllocs()
				for b.Loop() {
					if _, err := Decompose(y, 12, kind); err != nil {
						b.Fatal(err)
					}
				}
			})
		}
	}
}
