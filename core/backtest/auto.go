package backtest

import (
	"context"
	"fmt"
	"slices"
	"strings"

	"quillcast/core/accuracy"
	"quillcast/core/forecast"
)

// Defaults of [Auto].
const (
	// MaxOrigins is the largest number of rolling origins an automatic
	// choice scores candidates on when the caller states none.
	MaxOrigins = 30
	// DefaultCombine is how many of the best-ranked methods an automatic
	// choice averages.
	DefaultCombine = 3
	// minAutoTraining is the fewest training periods of the first origin.
	minAutoTraining = 8
)

// Auto is the forecast method named "auto": it ranks candidate methods by
// rolling-origin accuracy inside the training series it is given (so never
// on a validation period, which the caller keeps out of y), then fits the
// equal-weight combination of the best few on the whole training series.
// Averaging the best-ranked methods rather than trusting the single best
// is more reliable, because the ranking on past origins is itself noisy
// (Makridakis and Hibon 2000, "The M3-Competition", International Journal
// of Forecasting 16(4), 451-476: combinations beat their members; common
// practice).
//
// The rolling origins lie in the later half of y: the first origin leaves
// at least half of the series for training, so that each candidate is
// judged on fits of a sensible length, and at most [MaxOrigins] origins
// one period apart are used.
//
// The zero value is ready to use.
type Auto struct {
	// Candidates are catalogue labels; nil means [DefaultCandidates].
	Candidates []string
	// Horizon is how many periods ahead each origin forecasts; 0 means two
	// seasons, or 6 periods without a season. It is shortened, with a note,
	// when the series is too short.
	Horizon int
	// Origins is the number of rolling origins, one period apart; 0 means
	// as many as the later half of the series holds, at most [MaxOrigins].
	// Fewer are used, with a note, on a short series.
	Origins int
	// By is the measure ranked by; 0 means MASE (MAE when the series is
	// constant and MASE has no scale).
	By accuracy.Measure
	// Combine is how many of the best-ranked methods are averaged; 0 means
	// [DefaultCombine]; 1 picks the single best.
	Combine int
}

// DefaultCandidates returns the methods an automatic choice ranks when none
// are given: simple, Holt and damped exponential smoothing, Theta and
// drift, and with a season also seasonal naive and Holt-Winters; only
// those the forecast catalogue holds.
func DefaultCandidates(season int) []string {
	c := []string{"ses", "holt", "damped", "theta", "drift"}
	if season > 1 {
		c = append(c, "seasonal-naive", "holt-winters")
	}
	return slices.DeleteFunc(c, func(name string) bool {
		_, ok := forecast.Lookup(name)
		return !ok
	})
}

// Name returns "auto".
func (a Auto) Name() string { return "auto" }

// Fit ranks the candidates with [Auto.Rank] and fits the chosen entry on
// the whole of y. The returned fit is the chosen method's or combination's,
// named "auto", with notes saying what was chosen and why. It returns an
// error when no candidate can be ranked or fitted.
func (a Auto) Fit(y []float64, season int) (*forecast.Fit, error) {
	return a.FitContext(context.Background(), y, season)
}

// FitContext is [Auto.Fit] with a context that can stop the ranking.
func (a Auto) FitContext(ctx context.Context, y []float64, season int) (*forecast.Fit, error) {
	r, err := a.Rank(ctx, y, season)
	if err != nil {
		return nil, err
	}
	w := r.Choice
	fit, err := fitEntry(w, y, season)
	if err != nil {
		return nil, fmt.Errorf("auto chose %s, but it could not be fitted on the whole training series: %w", w.Label, err)
	}
	fit.Method = a.Name()
	notes := []string{"auto chose " + w.Label + "; " + r.Why()}
	notes = append(notes, r.Notes...)
	if len(r.Dropped) > 0 {
		notes = append(notes, "Left out of the ranking because they could not be fitted on every origin: "+strings.Join(r.Dropped, "; ")+".")
	}
	fit.Notes = append(notes, fit.Notes...)
	return fit, nil
}

// Rank scores every candidate on rolling origins inside y and returns the
// ranking, best first. Candidates that cannot be fitted on every origin
// are left out and listed in Dropped. It returns an error for an unknown
// candidate label, when y is too short to hold even one origin, when no
// candidate can be fitted, or when ctx is cancelled.
func (a Auto) Rank(ctx context.Context, y []float64, season int) (*Ranking, error) {
	if err := checkFinite(y); err != nil {
		return nil, err
	}
	names := a.Candidates
	if names == nil {
		names = DefaultCandidates(season)
	}
	cands := make([]candidate, 0, len(names))
	for _, name := range names {
		m, err := build(name)
		if err != nil {
			return nil, err
		}
		cands = append(cands, candidate{name: name, method: m})
	}
	folds, notes, err := a.folds(len(y), season)
	if err != nil {
		return nil, err
	}
	by := a.By
	if by == 0 {
		by = accuracy.MASE
		if !accuracy.NaiveScale(y, 1).Defined {
			by = accuracy.MAE
		}
	}
	combine := a.Combine
	if combine == 0 {
		combine = DefaultCombine
	}
	r, err := rank(ctx, y, season, cands, folds, folds[0].TestEnd-folds[0].TestStart, by, combine)
	if err != nil {
		return nil, err
	}
	r.Notes = append(notes, r.Notes...)
	return r, nil
}

// folds lays the rolling origins at the end of a series of n periods,
// shortening the origins and then the horizon on a short series.
func (a Auto) folds(n, season int) ([]Fold, []string, error) {
	h := a.Horizon
	if h <= 0 {
		h = 6
		if season > 1 {
			h = 2 * season
		}
	}
	minTrain := max(minAutoTraining, 2*season)
	k := a.Origins
	if k <= 0 {
		k = min(MaxOrigins, max(1, n-h-max(n/2, minTrain)+1))
	}
	var notes []string
	if n-h-(k-1) < minTrain {
		k = max(1, n-h-minTrain+1)
		if n-h < minTrain {
			if n-minTrain < 1 {
				return nil, nil, fmt.Errorf("auto needs at least %d training periods to rank methods on past forecasts, but the series has %d", minTrain+1, n)
			}
			notes = append(notes, fmt.Sprintf("The series is short, so methods were ranked on forecasts %d periods ahead instead of %d.", n-minTrain, h))
			h = n - minTrain
		}
		notes = append(notes, fmt.Sprintf("The series is short, so methods were ranked on %d rolling %s.", k, plural(k, "origin", "origins")))
	}
	folds, err := Folds(n, Origins{Horizon: h, Last: k, Initial: n - h - (k - 1)})
	return folds, notes, err
}

// build makes the catalogue method name with its default settings.
func build(name string) (forecast.Method, error) {
	sp, ok := forecast.Lookup(name)
	if !ok {
		return nil, fmt.Errorf("auto cannot rank %q: there is no method of that name", name)
	}
	return sp.New(nil)
}

func plural(n int, one, many string) string {
	if n == 1 {
		return one
	}
	return many
}

// fitEntry fits a ranking entry on the whole of y: the single method, or
// the equal-weight [forecast.Combination] of the members.
func fitEntry(e RankEntry, y []float64, season int) (*forecast.Fit, error) {
	ms := make([]forecast.Method, len(e.Members))
	for i, name := range e.Members {
		m, err := build(name)
		if err != nil {
			return nil, err
		}
		ms[i] = m
	}
	if len(ms) == 1 {
		return ms[0].Fit(y, season)
	}
	return forecast.Combination{Methods: ms}.Fit(y, season)
}
