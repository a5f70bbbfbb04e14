package main

import (
	"encoding/json"
	"fmt"
	"os"
	"path/filepath"

	"quillcast/core/cmd/benchtable/workload"
	"quillcast/core/series"
)

// inputs says what the prepared files hold; the page measurements read it
// from inputs.json so that both sides run the same work.
type inputs struct {
	Points      int    `json:"points"`      // values in walk.f64 and rows.csv
	Train       int    `json:"train"`       // training periods of the sweep
	From        int    `json:"from"`        // narrowest width of the sweep
	To          int    `json:"to"`          // widest width of the sweep
	Season      int    `json:"season"`      // season of the Holt-Winters fit
	HWPoints    int    `json:"hwPoints"`    // values in hw.f64
	HWSource    string `json:"hwSource"`    // where the Holt-Winters data came from
	Competition string `json:"competition"` // absolute path of the competition file
}

// Names of the prepared files inside the output folder.
const (
	walkFile   = "walk.f64" // the sweep's random walk, little-endian float64
	hwFile     = "hw.f64"   // the Holt-Winters series, little-endian float64
	rowsFile   = "rows.csv" // the same walk as a one-column data file
	inputsFile = "inputs.json"
	pageFile   = "page.json" // written by the page measurements
)

// prepare writes the shared inputs into dir.
func prepare(dir string, cfg config) (inputs, error) {
	in := inputs{Points: cfg.points, Train: cfg.points - 12, From: 1, To: 200, Season: 12, HWPoints: 144}
	if err := os.MkdirAll(dir, 0o755); err != nil {
		return in, err
	}
	comp, err := filepath.Abs(cfg.competition)
	if err != nil {
		return in, err
	}
	in.Competition = comp
	y := workload.RandomWalk(cfg.points, 7)
	hw, src, err := hwSeries(cfg.hwData, in.HWPoints)
	if err != nil {
		return in, err
	}
	in.HWSource = src
	meta, err := json.MarshalIndent(in, "", "  ")
	if err != nil {
		return in, err
	}
	for name, body := range map[string][]byte{
		walkFile:   workload.Floats(y),
		rowsFile:   workload.RowsCSV(y),
		hwFile:     workload.Floats(hw),
		inputsFile: meta,
	} {
		if err := os.WriteFile(filepath.Join(dir, name), body, 0o644); err != nil {
			return in, err
		}
	}
	return in, nil
}

// hwSeries reads the first n values of the first series of a data file.
func hwSeries(path string, n int) ([]float64, string, error) {
	raw, err := os.ReadFile(path)
	if err != nil {
		return nil, "", err
	}
	ds, err := series.Read(raw, filepath.Base(path), series.ReadOptions{})
	if err != nil {
		return nil, "", fmt.Errorf("%s: %w", path, err)
	}
	if len(ds.Series) == 0 || ds.Series[0].Len() < n {
		return nil, "", fmt.Errorf("%s has no series of at least %d values", path, n)
	}
	s := ds.Series[0]
	src := fmt.Sprintf("%s, column %s, %s to %s", filepath.Base(path), s.Name, s.Start, s.PeriodAt(n-1))
	return s.Values[:n], src, nil
}

// readInputs reads inputs.json from dir.
func readInputs(dir string) (inputs, error) {
	var in inputs
	b, err := os.ReadFile(filepath.Join(dir, inputsFile))
	if err != nil {
		return in, fmt.Errorf("%v; run benchtable -prepare first", err)
	}
	return in, json.Unmarshal(b, &in)
}
