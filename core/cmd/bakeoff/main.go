// Command bakeoff forecasts every series of a file in the competition
// layout with every method and prints a table of methods by mean sMAPE and
// MASE.
//
// Usage:
//
//	go run ./core/cmd/bakeoff -data m3-quarterly.csv -forecasts build/bakeoff/forecasts.csv
//
// The data file has the columns series,category,period,value,role with
// role fit (history a method may see) or test (held-out periods, scored).
// Each series' fit part is forecast for as many periods as it has test
// rows. The forecasts go to the -forecasts file as
// series,method,horizon,period,forecast rows (the folder is created).
//
// Flags:
//
//	-data path       the competition-layout file to read (required)
//	-forecasts path  where to write the forecasts (default build/bakeoff/forecasts.csv)
//	-season n        season length for every series; 0 (default) detects it from
//	                 the period labels: 4 for 1984-Q1, 12 for 2024-03, else none
//	-lag n           lag of the in-sample differences that scale MASE (default 1)
//	-methods list    comma-separated method labels (default: all, plus auto)
//	-workers n       series forecast at once (default: one per core)
package main

import (
	"bufio"
	"context"
	"errors"
	"flag"
	"fmt"
	"io"
	"os"
	"os/signal"
	"path/filepath"
	"strings"

	"quillcast/core/bakeoff"
)

func main() {
	ctx, stop := signal.NotifyContext(context.Background(), os.Interrupt)
	err := run(ctx, os.Args[1:], os.Stdout, os.Stderr)
	stop()
	if err != nil {
		fmt.Fprintln(os.Stderr, "bakeoff:", err)
		os.Exit(1)
	}
}

func run(ctx context.Context, args []string, stdout, stderr io.Writer) error {
	fs := flag.NewFlagSet("bakeoff", flag.ContinueOnError)
	fs.SetOutput(stderr)
	data := fs.String("data", "", "the competition-layout file to read (series,category,period,value,role)")
	out := fs.String("forecasts", filepath.Join("build", "bakeoff", "forecasts.csv"), "where to write the forecasts")
	season := fs.Int("season", 0, "season length; 0 detects it from the period labels (1984-Q1: 4, 2024-03: 12)")
	lag := fs.Int("lag", 1, "lag of the in-sample differences that scale MASE")
	methods := fs.String("methods", "", "comma-separated method labels; empty runs every method and auto")
	workers := fs.Int("workers", 0, "series forecast at once; 0 means one per core")
	if err := fs.Parse(args); err != nil {
		return err
	}
	switch {
	case *data == "":
		return errors.New("no data file given; name one with -data path.csv")
	case *season < 0:
		return fmt.Errorf("-season %d is not a season length; give 0 to detect it, 1 for none, or the periods per cycle such as 4", *season)
	case *lag < 1:
		return fmt.Errorf("-lag %d is not a lag; give a whole number of periods of at least 1", *lag)
	}
	f, err := os.Open(*data)
	if err != nil {
		return fmt.Errorf("cannot open the data file: %w", err)
	}
	series, err := bakeoff.Read(bufio.NewReader(f))
	f.Close()
	if err != nil {
		return fmt.Errorf("%s: %w", *data, err)
	}
	o := bakeoff.Options{Season: *season, Lag: *lag, Workers: *workers}
	if *methods != "" {
		for _, m := range strings.Split(*methods, ",") {
			o.Methods = append(o.Methods, strings.TrimSpace(m))
		}
	}
	res, err := bakeoff.Run(ctx, series, o)
	if err != nil {
		return err
	}
	if err := res.WriteTable(stdout); err != nil {
		return err
	}
	if err := writeFile(*out, res.WriteForecasts); err != nil {
		return err
	}
	_, err = fmt.Fprintf(stdout, "%d series; %d forecasts written to %s\n", res.Series, len(res.Forecasts), *out)
	return err
}

// writeFile creates path, and its folder, and fills it with write.
func writeFile(path string, write func(io.Writer) error) error {
	if err := os.MkdirAll(filepath.Dir(path), 0o755); err != nil {
		return fmt.Errorf("cannot create the folder for the forecasts: %w", err)
	}
	f, err := os.Create(path)
	if err != nil {
		return fmt.Errorf("cannot write the forecasts: %w", err)
	}
	w := bufio.NewWriter(f)
	if err := write(w); err != nil {
		f.Close()
		return fmt.Errorf("writing %s: %w", path, err)
	}
	if err := w.Flush(); err != nil {
		f.Close()
		return fmt.Errorf("writing %s: %w", path, err)
	}
	return f.Close()
}
