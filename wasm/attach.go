//go:build js && wasm

package main

import (
	"fmt"
	"syscall/js"

	"quillcast/core/chart"
	"quillcast/core/format"
	"quillcast/core/series"
	"quillcast/core/steps"
)

// headRows is how many rows of each series the preview shows.
const headRows = 12

// preview is what the page shows after a file is attached: what the reader
// understood and every problem, with its place in the file.
type preview struct {
	Name       string          `json:"name"`
	Layout     string          `json:"layout"`
	Frequency  string          `json:"frequency"`
	Columns    []string        `json:"columns"`
	DateColumn string          `json:"dateColumn"`
	Rows       int             `json:"rows"`
	Decisions  []string        `json:"decisions"`
	Problems   []problem       `json:"problems"`
	Changes    []string        `json:"changes"`
	Series     []seriesPreview `json:"series"`
	// Bakeoff holds the step lines that compare methods on every series
	// of a file holding several; empty otherwise.
	Bakeoff   []string `json:"bakeoff,omitempty"`
	NotStored string   `json:"notStored,omitempty"` // why the file was not kept in the browser
}

// problem is one [series.Problem] as the page lists it.
type problem struct {
	Series   string `json:"series"`
	Line     int    `json:"line"`
	Column   int    `json:"column"`
	Text     string `json:"text"`
	Blocking bool   `json:"blocking"`
}

// seriesPreview is one series of the file: its range, a chart and its
// first rows, every number already formatted by the engine.
type seriesPreview struct {
	Name   string     `json:"name"`
	First  string     `json:"first"`
	Last   string     `json:"last"`
	Count  string     `json:"count"`
	Season int        `json:"season"`
	Chart  string     `json:"chart"`
	Head   [][]string `json:"head"` // rows of [period, value]
	Step   string     `json:"step"` // the load step that picks this series
}

// attach(bytes Uint8Array, name string) reads a data file and keeps it under
// its name, in the engine and in the browser's store, replacing an earlier
// file of the same name. It answers with a
// [preview]; a file that cannot be read at all answers with the error and
// its line and column.
func (a *app) attach(args []js.Value) (any, error) {
	data, err := bytesArg(args, 0, "the file's contents")
	if err != nil {
		return nil, err
	}
	name, err := stringArg(args, 1, "the file name")
	if err != nil {
		return nil, err
	}
	// A file over the reader's limit is refused before it is kept: no
	// step can read it, and storing it would only fill the browser's
	// storage.
	if len(data) > series.DefaultMaxBytes {
		_, err := series.Read(data, name, series.ReadOptions{})
		return nil, err
	}
	// Keep the bytes even when the default reading fails: a load step with
	// the right options (date order, decimal mark) may still read them.
	a.openStore()
	a.mu.Lock()
	a.files[name] = data
	a.mu.Unlock()
	_, storeErr := a.sets.Put(name, data)
	ds, err := series.Read(data, name, series.ReadOptions{})
	if err != nil {
		return nil, err
	}
	a.mu.Lock()
	a.datasets[name] = ds
	a.mu.Unlock()
	p := previewOf(ds)
	if storeErr != nil {
		p.NotStored = "This file is attached for now but was not stored in the browser: " + storeErr.Error()
	}
	return p, nil
}

// previewOf describes a dataset for the page.
func previewOf(ds *series.Dataset) preview {
	p := preview{
		Name:       ds.Name,
		Layout:     ds.Layout.String(),
		Frequency:  ds.Frequency.String(),
		Columns:    ds.Columns,
		DateColumn: ds.DateColumn,
		Rows:       ds.Rows,
		Decisions:  ds.Decisions,
		Problems:   []problem{},
		Changes:    []string{},
		Series:     []seriesPreview{},
	}
	for _, pr := range ds.Problems {
		p.Problems = append(p.Problems, problem{Series: pr.Series, Line: pr.Line, Column: pr.Column, Text: pr.String(), Blocking: pr.Blocking})
	}
	for _, c := range ds.Changes {
		p.Changes = append(p.Changes, c.String())
	}
	for _, s := range ds.Series {
		sp := seriesPreviewOf(s, ds.DateColumn)
		sp.Step = loadStep(ds, s.Name, ds.Layout == series.Long)
		p.Series = append(p.Series, sp)
	}
	if len(ds.Series) > 1 {
		p.Bakeoff = []string{loadStep(ds, "", false), (&steps.Step{Verb: "bakeoff"}).Canonical()}
	}
	return p
}

// loadStep writes the load step for a dataset: with series=NAME for one
// series of a long file, value=NAME for one column of a wide file, and
// neither when name is empty.
func loadStep(ds *series.Dataset, name string, long bool) string {
	st := &steps.Step{Verb: "load", Subject: ds.Name}
	opt := func(k, v string) { st.Options = append(st.Options, steps.Option{Key: k, Value: steps.Value{Raw: v}}) }
	switch {
	case name == "":
	case long:
		opt("series", name)
	default:
		opt("value", name)
	}
	if ds.DateColumn != "" {
		opt("date", ds.DateColumn)
	}
	return st.Canonical()
}

// seriesPreviewOf charts one series and formats its first rows.
func seriesPreviewOf(s *series.Series, dateColumn string) seriesPreview {
	labels := make([]string, s.Len())
	for i := range labels {
		labels[i] = s.PeriodAt(i).String()
	}
	xTitle := dateColumn
	if xTitle == "" {
		xTitle = s.Frequency().String()
	}
	svg := chart.Line{
		Frame:   chart.Frame{Title: s.Name, XTitle: xTitle, YTitle: s.Name},
		Periods: labels,
		Series:  []chart.Series{{Name: s.Name, Values: s.Values, Role: chart.Actual}},
	}.SVG()
	decimals := format.ColumnDecimals(s.Values)
	n := min(headRows, s.Len())
	head := make([][]string, n)
	for i := range head {
		head[i] = []string{labels[i], format.Number(s.Values[i], decimals)}
	}
	sp := seriesPreview{Name: s.Name, Count: format.Int(s.Len()), Season: s.Season, Chart: svg, Head: head}
	if s.Len() > 0 {
		sp.First, sp.Last = labels[0], labels[len(labels)-1]
	}
	return sp
}

// preview(name string) reads an attached file again with default options
// and answers with a [preview].
func (a *app) preview(args []js.Value) (any, error) {
	name, err := stringArg(args, 0, "the dataset name")
	if err != nil {
		return nil, err
	}
	a.mu.Lock()
	data, ok := a.files[name]
	a.mu.Unlock()
	if !ok {
		return nil, fmt.Errorf("no file named %q is attached; attach it again", name)
	}
	ds, err := series.Read(data, name, series.ReadOptions{})
	if err != nil {
		return nil, err
	}
	return previewOf(ds), nil
}
