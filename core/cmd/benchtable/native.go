package main

import (
	"bytes"
	"context"
	"fmt"
	"math"
	"os"
	"strings"
	"time"

	"quillcast/core/backtest"
	"quillcast/core/bakeoff"
	"quillcast/core/cmd/benchtable/workload"
	"quillcast/core/forecast"
	"quillcast/core/session"
	"quillcast/core/steps/runner"
)

// timed runs f reps times and returns the durations in seconds; the first
// error stops it.
func timed(reps int, f func() error) (sample, error) {
	s := sample{Unit: "s"}
	for range reps {
		start := time.Now()
		if err := f(); err != nil {
			return s, err
		}
		s.Values = append(s.Values, time.Since(start).Seconds())
	}
	return s, nil
}

// nativeSweep times the running-sum sweep of widths over the training
// part of y, and returns the last sweep for the cross-check with numpy.
func nativeSweep(y []float64, train int, widths backtest.Range, reps int) (sample, *backtest.WidthSweep, error) {
	var last *backtest.WidthSweep
	s, err := timed(reps, func() (err error) {
		last, err = backtest.SweepMovingAverage(y, train, widths)
		return err
	})
	return s, last, err
}

// nativePlain times the O(n·w) baseline.
func nativePlain(y []float64, train int, widths backtest.Range, reps int) (sample, error) {
	return timed(reps, func() error {
		_, err := workload.PlainSweep(y, train, widths)
		return err
	})
}

// hwFit is the timing and outcome of the additive Holt-Winters fit.
type hwFit struct {
	Time  sample  // seconds per fit
	SSE   float64 // in-sample sum of squared one-step errors
	Evals int     // SSE evaluations per fit
}

// nativeHoltWinters times the additive Holt-Winters fit with every
// constant and initial state estimated, as the library default it is
// compared with does. Each measurement is the mean of batch fits.
func nativeHoltWinters(y []float64, season, reps, batch int, estimate bool) (hwFit, error) {
	m := forecast.Smoothing{Trend: true, Season: forecast.Additive, EstimateStates: estimate}
	var f *forecast.Fit
	s, err := timed(reps, func() (err error) {
		for range batch {
			if f, err = m.Fit(y, season); err != nil {
				return err
			}
		}
		return nil
	})
	if err != nil {
		return hwFit{}, err
	}
	for i := range s.Values {
		s.Values[i] /= float64(batch)
	}
	return hwFit{Time: s, SSE: sse(f.Residuals()), Evals: f.Evaluations}, nil
}

// sse sums the squares of the finite residuals.
func sse(r []float64) float64 {
	var s float64
	for _, e := range r {
		if !math.IsNaN(e) {
			s += e * e
		}
	}
	return s
}

// nativeBakeoff times the bake-off of every series in the competition
// file with every method, across one goroutine per core.
func nativeBakeoff(path string, reps int) (sample, int, error) {
	raw, err := os.ReadFile(path)
	if err != nil {
		return sample{}, 0, err
	}
	data, err := bakeoff.Read(bytes.NewReader(raw))
	if err != nil {
		return sample{}, 0, fmt.Errorf("%s: %w", path, err)
	}
	s, err := timed(reps, func() error {
		_, err := bakeoff.Run(context.Background(), data, bakeoff.Options{})
		return err
	})
	return s, len(data), err
}

// lastEdit and its undo: the edit of the demo session's last step that the
// page measurement makes too.
const lastStep, lastStepEdited = "pick by=mase", "pick by=rmse"

// nativeRerun times a re-run of the demo session after editing its last
// step, alternating between the edited and the original text so that
// every run follows a real edit.
func nativeRerun(sessionPath, dataDir string, reps int) (sample, error) {
	text, err := os.ReadFile(sessionPath)
	if err != nil {
		return sample{}, err
	}
	if !strings.Contains(string(text), lastStep) {
		return sample{}, fmt.Errorf("%s has no step %q to edit", sessionPath, lastStep)
	}
	files, err := demoFiles(dataDir)
	if err != nil {
		return sample{}, err
	}
	docs := []*session.Document{
		session.Parse(strings.Replace(string(text), lastStep, lastStepEdited, 1)),
		session.Parse(string(text)),
	}
	r := runner.New()
	data := runner.Data{Files: files}
	r.Run(context.Background(), docs[1], data)
	i := 0
	return timed(reps, func() error {
		res := r.Run(context.Background(), docs[i%2], data)
		i++
		if len(res.Errors) > 0 {
			return fmt.Errorf("the demo session failed after the edit: %v", res.Errors[0])
		}
		return nil
	})
}

// demoFiles reads every .csv file of the demo folder by name.
func demoFiles(dir string) (map[string][]byte, error) {
	entries, err := os.ReadDir(dir)
	if err != nil {
		return nil, err
	}
	files := map[string][]byte{}
	for _, e := range entries {
		if strings.HasSuffix(e.Name(), ".csv") {
			b, err := os.ReadFile(dir + "/" + e.Name())
			if err != nil {
				return nil, err
			}
			files[e.Name()] = b
		}
	}
	return files, nil
}
