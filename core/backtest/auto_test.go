package backtest

import (
	"context"
	"errors"
	"math/rand/v2"
	"slices"
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

func TestAutoFolds(t *testing.T) {
	t.Parallel()
	tests := []struct {
		name      string
		a         Auto
		n, season int
		// first fold and number of folds
		wantFirst Fold
		wantK     int
		wantNote  string
	}{
		// Hand calculation: 69 periods, horizon 8: origins from 69/2 = 34 to
		// 69-8 = 61, that is 28 origins, first training [0, 34).
		{name: "later half", a: Auto{Horizon: 8}, n: 69, wantFirst: Fold{0, 34, 34, 42}, wantK: 28},
		// Hand calculation: 120 periods, horizon 6: 120-6-60+1 = 55 origins,
		// capped at 30: origins 85..114.
		{name: "capped at MaxOrigins", a: Auto{Horizon: 6}, n: 120, wantFirst: Fold{0, 85, 85, 91}, wantK: 30},
		// Hand calculation: 16 quarters, horizon 8, two seasons = 8 training
		// periods at least: one origin at 8.
		{name: "short quarterly", a: Auto{Horizon: 8}, n: 16, season: 4, wantFirst: Fold{0, 8, 8, 16}, wantK: 1},
		// Hand calculation: 12 periods, at least 8 to train, horizon cut to 4.
		{name: "horizon shortened", a: Auto{Horizon: 8}, n: 12, wantFirst: Fold{0, 8, 8, 12}, wantK: 1, wantNote: "4 periods ahead instead of 8"},
		// Hand calculation: 20 origins asked on 30 periods with horizon 6:
		// 30-6-8+1 = 17 fit.
		{name: "origins shortened", a: Auto{Horizon: 6, Origins: 20}, n: 30, wantFirst: Fold{0, 8, 8, 14}, wantK: 17, wantNote: "17 rolling origins"},
		// Hand calculation: no season, horizon defaults to 6.
		{name: "default horizon", a: Auto{Origins: 2}, n: 40, wantFirst: Fold{0, 33, 33, 39}, wantK: 2},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			folds, notes, err := tt.a.folds(tt.n, tt.season)
			if err != nil {
				t.Fatal(err)
			}
			if folds[0] != tt.wantFirst || len(folds) != tt.wantK {
				t.Errorf("first fold %v of %d, want %v of %d (hand calculation)", folds[0], len(folds), tt.wantFirst, tt.wantK)
			}
			if got := strings.Join(notes, " "); !strings.Contains(got, tt.wantNote) || (tt.wantNote == "" && got != "") {
				t.Errorf("notes %q, want %q", got, tt.wantNote)
			}
		})
	}
	if _, _, err := (Auto{}).folds(8, 0); err == nil || !strings.Contains(err.Error(), "at least 9 training periods") {
		t.Errorf("8 periods: error %v, want a plain minimum", err)
	}
}

// trendSeries is a seeded straight-line trend with small noise.
func trendSeries(n int) []float64 {
	r := rand.New(rand.NewPCG(5, 5))
	y := make([]float64, n)
	for i := range y {
		y[i] = 100 + 3*float64(i) + r.NormFloat64()
	}
	return y
}

func TestAutoRankTrend(t *testing.T) {
	t.Parallel()
	y := trendSeries(60)
	r, err := Auto{Horizon: 6}.Rank(context.Background(), y, 0)
	if err != nil {
		t.Fatal(err)
	}
	var order []string
	for _, e := range r.Entries {
		order = append(order, e.Label)
	}
	// Common practice: on a steady trend, methods that follow a trend beat
	// simple smoothing, which lags behind it.
	if slices.Index(order, "ses") < slices.Index(order, "holt") || slices.Index(order, "ses") < slices.Index(order, "drift") {
		t.Errorf("ranking %v puts ses ahead of a trend method", order)
	}
	if len(r.Choice.Members) != 3 || slices.Contains(r.Choice.Members, "ses") {
		t.Errorf("choice %v, want the best three, without ses", r.Choice.Members)
	}
	why := r.Why()
	for _, want := range []string{"rolling origins", "6 periods ahead", "averaged with equal weights"} {
		if !strings.Contains(why, want) {
			t.Errorf("Why() lacks %q: %s", want, why)
		}
	}
	fit, err := Auto{Horizon: 6}.Fit(y, 0)
	if err != nil {
		t.Fatal(err)
	}
	if fit.Method != "auto" || !strings.HasPrefix(fit.Notes[0], "auto chose comb-") {
		t.Errorf("fit %q with notes %q, want auto naming the combination", fit.Method, fit.Notes)
	}
	// Common practice: forecasts continue the trend, about 3 per period:
	// the next value is near 100 + 3*60 = 280.
	if f := fit.Forecast(1); !scalar.EqualWithinAbs(f[0], 280, 6) {
		t.Errorf("first forecast %v, want near 280", f[0])
	}
	single, err := Auto{Horizon: 6, Combine: 1}.Fit(y, 0)
	if err != nil {
		t.Fatal(err)
	}
	if !strings.HasPrefix(single.Notes[0], "auto chose "+r.Entries[0].Label+";") {
		t.Errorf("single choice notes %q, want the best entry %s", single.Notes[0], r.Entries[0].Label)
	}
}

func TestAutoErrors(t *testing.T) {
	t.Parallel()
	y := trendSeries(40)
	cancelled, cancel := context.WithCancel(context.Background())
	cancel()
	if _, err := (Auto{}).Rank(cancelled, y, 0); !errors.Is(err, context.Canceled) {
		t.Errorf("cancelled: error %v", err)
	}
	tests := []struct {
		name string
		a    Auto
		y    []float64
		want string
	}{
		{"unknown candidate", Auto{Candidates: []string{"ses", "hunch"}}, y, `cannot rank "hunch"`},
		{"too short", Auto{}, y[:5], "at least 9 training periods"},
		{"no candidate fits", Auto{Candidates: []string{"holt-winters"}}, y, "no candidate method could be fitted"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			_, err := tt.a.Fit(tt.y, 0)
			if err == nil || !strings.Contains(err.Error(), tt.want) {
				t.Errorf("error = %v, want one containing %q", err, tt.want)
			}
		})
	}
}

func TestAutoDroppedNote(t *testing.T) {
	t.Parallel()
	fit, err := Auto{Candidates: []string{"ses", "seasonal-naive", "drift"}}.Fit(trendSeries(40), 0)
	if err != nil {
		t.Fatal(err)
	}
	notes := strings.Join(fit.Notes, "\n")
	if !strings.Contains(notes, "Left out of the ranking") || !strings.Contains(notes, "seasonal-naive:") {
		t.Errorf("notes do not say seasonal-naive was left out:\n%s", notes)
	}
	if !strings.Contains(fit.Notes[0], "auto chose comb-") {
		t.Errorf("first note %q, want the combination of the two methods left", fit.Notes[0])
	}
}
