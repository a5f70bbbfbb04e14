package forecast

import (
	"errors"
	"math"
	"strings"
	"testing"
)

// TestSmoothingIntervals checks the state-space intervals. Sources: cases
// pi_ses_nile (statsmodels 0.13.5 ETSModel (A,N,N), SES alpha 0.25,
// initial level y[0]) and pi_holt_nist_double (ETSModel (A,A,N), Holt alpha
// 0.5, beta 0.3, so the ETS trend constant is 0.15); sigma^2 = SSE/n.
func TestSmoothingIntervals(t *testing.T) {
	tests := []struct {
		file string
		m    func(p map[string]float64) Smoothing
	}{
		{"pi_ses_nile", func(p map[string]float64) Smoothing {
			return Smoothing{Alpha: ptr(p["alpha"]), Level0: ptr(p["initial_level"])}
		}},
		{"pi_holt_nist_double", func(p map[string]float64) Smoothing {
			return Smoothing{Trend: true, Alpha: ptr(p["alpha"]), Beta: ptr(p["beta"]),
				Level0: ptr(p["initial_level"]), Trend0: ptr(p["initial_trend"])}
		}},
	}
	for _, tt := range tests {
		t.Run(tt.file, func(t *testing.T) {
			var c struct {
				refCase
				Params   map[string]float64
				Expected struct {
					Sigma2 float64   `json:"sigma2"`
					Point  []float64 `json:"point"`
					HW80   []float64 `json:"half_width_80"`
					HW95   []float64 `json:"half_width_95"`
				}
			}
			readCase(t, tt.file, &c)
			f := mustFit(t, tt.m(c.Params), c.Data.Y, 0)
			abs, rel := c.Tolerance.Abs, c.Tolerance.Rel
			if s2, ok := f.Sigma2(); !ok || !within(s2, c.Expected.Sigma2, abs, rel) {
				t.Errorf("sigma2 = %.12g, want %.12g", s2, c.Expected.Sigma2)
			}
			h := len(c.Expected.Point)
			checkFloats(t, "point", f.Forecast(h), c.Expected.Point, abs, rel)
			for _, lv := range []struct {
				p    float64
				want []float64
			}{{0.8, c.Expected.HW80}, {0.95, c.Expected.HW95}} {
				lo, hi, err := f.Interval(h, lv.p)
				if err != nil {
					t.Fatal(err)
				}
				half := make([]float64, h)
				for i := range half {
					half[i] = (hi[i] - lo[i]) / 2
				}
				checkFloats(t, "half-width", half, lv.want, abs, rel)
			}
		})
	}
}

// TestAdditiveSeasonVariance compares the general variance sum with the
// closed form for the additive Holt-Winters model in R. J. Hyndman, A. B.
// Koehler, J. K. Ord and R. D. Snyder, Forecasting with Exponential
// Smoothing (2008), table 6.1 (recalled from memory):
// sigma^2 [1 + (h-1){a^2 + a b h + b^2 h(2h-1)/6} + g k {2a + g + b m (k+1)}]
// with b the ETS trend constant and k = floor((h-1)/m).
func TestAdditiveSeasonVariance(t *testing.T) {
	a, hb, g, m := 0.4, 0.25, 0.3, 4
	b := a * hb
	v, ok := etsVariance(esForm{trend: true, season: Additive, m: m}, [nConst]float64{a, hb, g, 1}, 2)(13)
	if !ok {
		t.Fatal("no variance")
	}
	for h := 1; h <= 13; h++ {
		fh, k := float64(h), float64((h-1)/m)
		want := 2 * (1 + (fh-1)*(a*a+a*b*fh+b*b*fh*(2*fh-1)/6) + g*k*(2*a+g+b*float64(m)*(k+1)))
		if !within(v[h-1], want, 1e-12, 1e-12) {
			t.Errorf("h=%d: variance %.15g, closed form %.15g", h, v[h-1], want)
		}
	}
}

// TestSmoothingMultiplicativeInterval: a multiplicative Holt-Winters fit
// has the approximate interval of smoothing_interval_mult.go, built from
// its own relative one-step errors and final states (recomputed here
// from the fit's components), and says that it is approximate.
func TestSmoothingMultiplicativeInterval(t *testing.T) {
	y := seededSeasonalFixed()
	f := mustFit(t, Smoothing{Trend: true, Season: Multiplicative}, y, 4)
	lo, hi, err := f.Interval(8, 0.95)
	if err != nil {
		t.Fatal(err)
	}
	rel2 := 0.0
	for i, v := range y {
		r := (v - f.Fitted[i]) / f.Fitted[i]
		rel2 += r * r / float64(len(y))
	}
	p := [nConst]float64{f.Params[0].Value, f.Params[1].Value, f.Params[2].Value, 1}
	n := len(y)
	last := esStates{level: f.Components["level"][n-1], trend: f.Components["trend"][n-1], season: f.Components["season"][n-4:]}
	v, _ := multSeasonVariance(esForm{trend: true, season: Multiplicative, m: 4}, p, last, n, rel2)(8)
	point := f.Forecast(8)
	q := 1.959963984540054 // standard normal 97.5% point (common practice)
	for h := range 8 {
		want := q * math.Sqrt(v[h])
		if !within(hi[h]-point[h], want, 1e-9, 1e-9) || !within(point[h]-lo[h], want, 1e-9, 1e-9) {
			t.Errorf("h=%d: interval %g..%g around %g, want half-width %g", h+1, lo[h], hi[h], point[h], want)
		}
	}
	found := false
	for _, note := range f.Notes {
		found = found || strings.Contains(note, "approximate")
	}
	if !found {
		t.Errorf("notes %q do not say the interval is approximate", f.Notes)
	}
}

func TestSmoothingIntervalLevel(t *testing.T) {
	y := seededSeasonalFixed()
	g := mustFit(t, Smoothing{}, y, 0)
	for _, level := range []float64{0, 1, -0.5, math.NaN()} {
		if _, _, err := g.Interval(3, level); err == nil || !strings.Contains(err.Error(), "between 0 and 1") {
			t.Errorf("level %g: error %v", level, err)
		}
	}
}

// seededSeasonalFixed is a short positive quarterly series (invented).
func seededSeasonalFixed() []float64 {
	return []float64{20, 26, 31, 22, 23, 29, 35, 25, 26, 32, 38, 27, 29, 35, 41, 30}
}

func TestSmoothingErrors(t *testing.T) {
	tests := []struct {
		name   string
		m      Smoothing
		y      []float64
		season int
		cause  error
		text   string
	}{
		{"ses one value", Smoothing{}, []float64{3}, 0, ErrTooShort, "at least 2"},
		{"holt two values", Smoothing{Trend: true}, []float64{3, 4}, 0, ErrTooShort, "at least 3"},
		{"hw no season", Smoothing{Trend: true, Season: Additive}, seededSeasonalFixed(), 1, ErrSeason, "season of at least 2"},
		{"hw one season", Smoothing{Trend: true, Season: Additive}, seededSeasonalFixed()[:6], 4, ErrTooShort, "two full seasons of 4"},
		{"hw season above half", Smoothing{Trend: true, Season: Additive, Cycle: 9}, seededSeasonalFixed(), 4, ErrTooShort, "longer than half"},
		{"multiplicative zero", Smoothing{Trend: true, Season: Multiplicative}, append([]float64{0}, seededSeasonalFixed()...), 4, ErrNotPositive, "value 1 of the training period is 0"},
		{"multiplicative negative", Smoothing{Trend: true, Season: Multiplicative}, append(seededSeasonalFixed(), -2), 4, ErrNotPositive, "is -2"},
		{"alpha above 1", Smoothing{Alpha: ptr(1.5)}, []float64{1, 2, 3}, 0, ErrSetting, "alpha=1.5"},
		{"phi zero", Smoothing{Trend: true, Damped: true, Phi: ptr(0)}, []float64{1, 2, 3}, 0, ErrSetting, "phi=0"},
		{"season0 length", Smoothing{Trend: true, Season: Additive, Season0: []float64{1, 2}}, seededSeasonalFixed(), 4, ErrSetting, "has 2 values"},
		{"nan", Smoothing{}, []float64{1, math.NaN(), 3}, 0, ErrBadValue, "value 2"},
		{"zero seasonal ratio", Smoothing{Trend: true, Season: Multiplicative, Alpha: ptr(0.5), Beta: ptr(0.1), Gamma: ptr(0.1), Season0: []float64{0, 1, 1, 1}}, seededSeasonalFixed(), 4, ErrNotPositive, "broke down"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			_, err := tt.m.Fit(tt.y, tt.season)
			if !errors.Is(err, tt.cause) || !strings.Contains(err.Error(), tt.text) {
				t.Errorf("error %v, want cause %v and text %q", err, tt.cause, tt.text)
			}
		})
	}
}

// TestSmoothingConstant: a constant series fits exactly, with finite
// forecasts and intervals, for every form.
func TestSmoothingConstant(t *testing.T) {
	y := make([]float64, 16)
	for i := range y {
		y[i] = 7
	}
	for _, m := range []Smoothing{{}, {Trend: true}, {Trend: true, Damped: true}, {Trend: true, Season: Additive}, {Trend: true, Season: Multiplicative}} {
		t.Run(m.Name()+" "+m.Season.String(), func(t *testing.T) {
			f := mustFit(t, m, y, 4)
			for i, v := range f.Forecast(8) {
				if !within(v, 7, 1e-9, 0) {
					t.Errorf("forecast %d = %g, want 7", i+1, v)
				}
			}
			for _, p := range append(f.Params, f.States...) {
				if math.IsNaN(p.Value) || math.IsInf(p.Value, 0) {
					t.Errorf("%s = %g", p.Name, p.Value)
				}
			}
			if !f.Converged {
				t.Error("not converged on a constant series")
			}
		})
	}
}
