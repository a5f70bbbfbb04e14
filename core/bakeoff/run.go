package bakeoff

import (
	"context"
	"fmt"
	"math"
	"runtime"
	"sync"

	"quillcast/core/accuracy"
	"quillcast/core/backtest"
	"quillcast/core/forecast"
	"quillcast/core/series"
)

// Options are the settings of a bake-off. The zero value means: season
// from the period labels, MASE scaled at lag 1, every method of the
// catalogue plus auto, one worker per core.
type Options struct {
	// Season is the season length given to every method; 0 detects it per
	// series from its period labels (4 for quarters such as 1984-Q1, 12
	// for months such as 2024-03, none for plain positions); 1 means no
	// season.
	Season int
	// Lag is the lag of the in-sample differences that scale MASE; 0 means
	// 1 (the naive scale, as the competition's scorer uses by default).
	Lag int
	// Methods are the labels to run, in table order; nil means every
	// method of the catalogue followed by auto.
	Methods []string
	// Workers is the number of series forecast at once; 0 means one per
	// core.
	Workers int
	// Progress, when set, is called after each series with the number of
	// series done and the total (after each part, with a pool). Calls come
	// one at a time, in no fixed order of series.
	Progress func(done, total int)
	// Pool, when set and of size above 0, runs parts of the series on
	// other engines instead of Workers goroutines (see [Pool]).
	Pool Pool
}

// Forecast is one row of the forecasts output: the forecast of a method
// for one test period of a series. Horizon 1 is the first test period.
type Forecast struct {
	Series  string
	Method  string
	Horizon int
	Period  string
	Value   float64
}

// Skip records a method that could not forecast a series, and why.
type Skip struct {
	Series, Method, Reason string
}

// Score is the accuracy of one method over every series it forecast.
type Score struct {
	Method string
	Series int // series forecast
	Points int // test periods scored
	// SMAPE and MASE are means over every test period of every series
	// forecast, as the competition's scorer computes them; undefined with a
	// reason when no period could be scored.
	SMAPE, MASE accuracy.Result
	Skipped     int // series the method could not forecast (see Result.Skips)
	// SMAPEOut and MASEOut count the series forecast whose sMAPE or MASE
	// is undefined (a constant fit part leaves MASE without a scale), left
	// out of the means; SMAPEWhy and MASEWhy give the first reason.
	SMAPEOut, MASEOut int
	SMAPEWhy, MASEWhy string
}

// Result is the outcome of a bake-off.
type Result struct {
	Series    int        // series in the data
	Scores    []Score    // one per method, best mean sMAPE first
	Forecasts []Forecast // in series order, then method order, then horizon
	Skips     []Skip     // in series order, then method order
	// Engines is the number of places of Options.Pool that forecast at
	// least one part (0 without a pool); PoolNote says why a part was
	// forecast here instead, the first time one was ("" when none was).
	Engines  int
	PoolNote string
}

// Run forecasts the fit part of every series for as many periods as it has
// test rows, with every method of o.Methods, and scores the forecasts
// against the test values. Series are shared among o.Workers goroutines;
// the result does not depend on their number. With o.Pool, parts of the
// series run on the pool's engines instead, with the same result. Run returns an error for an
// unknown method label, or when ctx is cancelled (wrapping ctx.Err()).
func Run(ctx context.Context, data []Series, o Options) (*Result, error) {
	methods, err := o.methods()
	if err != nil {
		return nil, err
	}
	if o.Pool != nil && o.Pool.Size() > 0 && len(data) > 0 {
		p, err := runPooled(ctx, data, methods, o, o.Pool)
		if err != nil {
			return nil, err
		}
		r := collect(data, methods, p.outcomes, max(o.Lag, 1))
		r.Engines, r.PoolNote = p.engines, p.note
		return r, nil
	}
	outcomes := make([]seriesOutcome, len(data))
	jobs := make(chan int)
	done := make(chan struct{})
	var wg sync.WaitGroup
	for range o.workers(len(data)) {
		wg.Add(1)
		go func() {
			defer wg.Done()
			for i := range jobs {
				outcomes[i] = forecastSeries(data[i], methods, o)
				done <- struct{}{}
			}
		}()
	}
	go func() {
		defer close(jobs)
		for i := range data {
			select {
			case jobs <- i:
			case <-ctx.Done():
				return
			}
		}
	}()
	go func() { wg.Wait(); close(done) }()
	finished := 0
	for range done {
		finished++
		if o.Progress != nil {
			o.Progress(finished, len(data))
		}
	}
	if err := ctx.Err(); err != nil {
		return nil, fmt.Errorf("bake-off stopped after %d of %d series: %w", finished, len(data), err)
	}
	return collect(data, methods, outcomes, max(o.Lag, 1)), nil
}

// namedMethod is a method with its label in the output.
type namedMethod struct {
	label string
	build func(horizon int) (forecast.Method, error)
}

func (o Options) methods() ([]namedMethod, error) {
	labels := o.Methods
	if labels == nil {
		for _, sp := range forecast.Catalog() {
			labels = append(labels, sp.Name)
		}
		labels = append(labels, "auto")
	}
	out := make([]namedMethod, 0, len(labels))
	for _, label := range labels {
		if label == "auto" {
			out = append(out, namedMethod{label: label, build: func(h int) (forecast.Method, error) {
				return backtest.Auto{Horizon: h}, nil
			}})
			continue
		}
		sp, ok := forecast.Lookup(label)
		if !ok {
			return nil, fmt.Errorf("%q is not a method; use one of the catalogue's labels or auto", label)
		}
		m, err := sp.New(nil)
		if err != nil {
			return nil, err
		}
		out = append(out, namedMethod{label: label, build: func(int) (forecast.Method, error) { return m, nil }})
	}
	return out, nil
}

func (o Options) workers(series int) int {
	w := o.Workers
	if w <= 0 {
		w = runtime.GOMAXPROCS(0)
	}
	return max(1, min(w, series))
}

// SeasonOf returns the season length for s: o.Season when set, else the
// usual season of the frequency its first period label shows (4 for
// quarters, 12 for months), else 1.
func (o Options) seasonOf(s Series) int {
	if o.Season > 0 {
		return o.Season
	}
	if len(s.FitPeriods) > 0 {
		if p, err := series.ParsePeriod(s.FitPeriods[0]); err == nil {
			if m := p.Freq.DefaultSeason(); m > 1 {
				return m
			}
		}
	}
	return 1
}

// seriesOutcome is what every method made of one series.
type seriesOutcome struct {
	forecasts [][]float64 // by method; nil when skipped
	skips     []string    // by method; "" when it ran
}

func forecastSeries(s Series, methods []namedMethod, o Options) seriesOutcome {
	h := len(s.Test)
	season := o.seasonOf(s)
	out := seriesOutcome{forecasts: make([][]float64, len(methods)), skips: make([]string, len(methods))}
	for j, nm := range methods {
		f, err := forecastOne(nm, s.Fit, season, h)
		if err != nil {
			out.skips[j] = err.Error()
			continue
		}
		out.forecasts[j] = f
	}
	return out
}

// forecastOne fits one method and forecasts h periods. A panic inside the
// method becomes an error so that one faulty method cannot stop the
// bake-off (it runs in goroutines, out of reach of any caller's recover).
func forecastOne(nm namedMethod, y []float64, season, h int) (f []float64, err error) {
	defer func() {
		if r := recover(); r != nil {
			f, err = nil, fmt.Errorf("%s failed unexpectedly on this series (%v); please report it", nm.label, r)
		}
	}()
	if h < 1 {
		return nil, fmt.Errorf("the series has no held-out periods for %s to forecast", nm.label)
	}
	m, err := nm.build(h)
	if err != nil {
		return nil, err
	}
	fit, err := m.Fit(y, season)
	if err != nil {
		return nil, err
	}
	f = fit.Forecast(h)
	if len(f) != h {
		return nil, fmt.Errorf("%s gave %d forecasts instead of %d", nm.label, len(f), h)
	}
	for i, v := range f {
		if math.IsNaN(v) || math.IsInf(v, 0) {
			return nil, fmt.Errorf("%s gave no usable forecast at horizon %d", nm.label, i+1)
		}
	}
	return f, nil
}
