//go:build js && wasm && bench

package main

// This file exists only in the engine built with the bench tag (make
// bench): it adds globalThis.quillcastBench, whose functions run the heavy
// work of the speed measurements inside the page on the same inputs as the
// native runs (see core/cmd/benchtable). The shipped engine leaves it out,
// so it costs the page nothing. Every function answers through a Promise
// with the usual JSON envelope.
//
//	load(walk Uint8Array)              keep a series of little-endian float64 values
//	sweep(from, to, train)             running-sum width sweep on the kept series
//	plain(from, to, train)             the plain O(n·w) loop on the kept series
//	holtWinters(y Uint8Array, season, batch)
//	                                   batch additive fits, constants and
//	                                   initial states estimated
//	bakeoff(file Uint8Array, part, parts)
//	                                   the bake-off of series part, part+parts, ...

import (
	"bytes"
	"context"
	"errors"
	"math"
	"sync"
	"syscall/js"
	"time"

	"quillcast/core/backtest"
	"quillcast/core/bakeoff"
	"quillcast/core/cmd/benchtable/workload"
	"quillcast/core/forecast"
)

func init() {
	b := &bench{}
	api := js.Global().Get("Object").New()
	for name, h := range map[string]handler{
		"load":        b.load,
		"sweep":       b.sweep,
		"plain":       b.plain,
		"holtWinters": b.holtWinters,
		"bakeoff":     b.bakeoff,
	} {
		api.Set(name, asyncFunc("bench "+name, h))
	}
	js.Global().Set("quillcastBench", api)
}

// bench holds the series kept by load between calls.
type bench struct {
	mu   sync.Mutex
	walk []float64
}

func (b *bench) load(args []js.Value) (any, error) {
	raw, err := bytesArg(args, 0, "the series")
	if err != nil {
		return nil, err
	}
	y, err := workload.ParseFloats(raw)
	if err != nil {
		return nil, err
	}
	b.mu.Lock()
	b.walk = y
	b.mu.Unlock()
	return len(y), nil
}

// widths reads the arguments from, to and train.
func (b *bench) widths(args []js.Value) ([]float64, backtest.Range, int, error) {
	from, err1 := intArg(args, 0, "the narrowest width")
	to, err2 := intArg(args, 1, "the widest width")
	train, err3 := intArg(args, 2, "the training length")
	if err := errors.Join(err1, err2, err3); err != nil {
		return nil, backtest.Range{}, 0, err
	}
	b.mu.Lock()
	y := b.walk
	b.mu.Unlock()
	if y == nil {
		return nil, backtest.Range{}, 0, errors.New("no series was loaded; call load first")
	}
	return y, backtest.Range{From: from, To: to}, train, nil
}

func (b *bench) sweep(args []js.Value) (any, error) {
	y, w, train, err := b.widths(args)
	if err != nil {
		return nil, err
	}
	sw, err := backtest.SweepMovingAverage(y, train, w)
	if err != nil {
		return nil, err
	}
	return sw.Best, nil
}

func (b *bench) plain(args []js.Value) (any, error) {
	y, w, train, err := b.widths(args)
	if err != nil {
		return nil, err
	}
	rows, err := workload.PlainSweep(y, train, w)
	if err != nil {
		return nil, err
	}
	return len(rows), nil
}

// fitTiming is the answer of holtWinters.
type fitTiming struct {
	Seconds float64 `json:"seconds"` // per fit, the mean over the batch
	SSE     float64 `json:"sse"`
	Evals   int     `json:"evals"`
}

func (b *bench) holtWinters(args []js.Value) (any, error) {
	raw, err := bytesArg(args, 0, "the series")
	if err != nil {
		return nil, err
	}
	y, err := workload.ParseFloats(raw)
	if err != nil {
		return nil, err
	}
	season, err1 := intArg(args, 1, "the season")
	batch, err2 := intArg(args, 2, "the batch size")
	if err := errors.Join(err1, err2); err != nil {
		return nil, err
	}
	m := forecast.Smoothing{Trend: true, Season: forecast.Additive, EstimateStates: true}
	var f *forecast.Fit
	start := time.Now()
	for range max(batch, 1) {
		if f, err = m.Fit(y, season); err != nil {
			return nil, err
		}
	}
	per := time.Since(start).Seconds() / float64(max(batch, 1))
	var sse float64
	for _, e := range f.Residuals() {
		if !math.IsNaN(e) {
			sse += e * e
		}
	}
	return fitTiming{Seconds: per, SSE: sse, Evals: f.Evaluations}, nil
}

func (b *bench) bakeoff(args []js.Value) (any, error) {
	raw, err := bytesArg(args, 0, "the competition file")
	if err != nil {
		return nil, err
	}
	part, err1 := intArg(args, 1, "the part")
	parts, err2 := intArg(args, 2, "the number of parts")
	if err := errors.Join(err1, err2); err != nil {
		return nil, err
	}
	data, err := bakeoff.Read(bytes.NewReader(raw))
	if err != nil {
		return nil, err
	}
	var mine []bakeoff.Series
	for i := part; i < len(data); i += max(parts, 1) {
		mine = append(mine, data[i])
	}
	if _, err := bakeoff.Run(context.Background(), mine, bakeoff.Options{Workers: 1}); err != nil {
		return nil, err
	}
	return len(mine), nil
}
