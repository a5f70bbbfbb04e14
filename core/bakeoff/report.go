package bakeoff

import (
	"cmp"
	"encoding/csv"
	"fmt"
	"io"
	"slices"
	"strconv"
	"strings"
	"text/tabwriter"

	"quillcast/core/accuracy"
)

// collect scores every method and lays out the forecasts in a fixed order.
func collect(data []Series, methods []namedMethod, outcomes []seriesOutcome, lag int) *Result {
	type sums struct {
		smape, mase       float64
		nSMAPE, nMASE     int
		series, points    int
		skipped           int
		smapeOut, maseOut int
		smapeWhy, maseWhy string
	}
	tot := make([]sums, len(methods))
	r := &Result{Series: len(data)}
	for i, s := range data {
		scale := accuracy.NaiveScale(s.Fit, lag)
		oc := outcomes[i]
		for j, nm := range methods {
			t := &tot[j]
			f := oc.forecasts[j]
			if f == nil {
				t.skipped++
				r.Skips = append(r.Skips, Skip{Series: s.Name, Method: nm.label, Reason: oc.skips[j]})
				continue
			}
			for h, v := range f {
				r.Forecasts = append(r.Forecasts, Forecast{Series: s.Name, Method: nm.label, Horizon: h + 1, Period: s.TestPeriods[h], Value: v})
			}
			sc := accuracy.Evaluate(s.Test, f, scale)
			t.series++
			t.points += sc.N
			if res := sc.Of(accuracy.SMAPE); res.Defined {
				t.smape += res.Value * float64(sc.N)
				t.nSMAPE += sc.N
			} else {
				t.smapeOut++
				if t.smapeWhy == "" {
					t.smapeWhy = fmt.Sprintf("series %s: %s", s.Name, res.Reason)
				}
			}
			if res := sc.Of(accuracy.MASE); res.Defined {
				t.mase += res.Value * float64(sc.N)
				t.nMASE += sc.N
			} else {
				t.maseOut++
				if t.maseWhy == "" {
					t.maseWhy = fmt.Sprintf("series %s: %s", s.Name, res.Reason)
				}
			}
		}
	}
	for j, nm := range methods {
		t := tot[j]
		sc := Score{Method: nm.label, Series: t.series, Points: t.points, Skipped: t.skipped,
			SMAPEOut: t.smapeOut, MASEOut: t.maseOut}
		if t.smapeOut > 0 {
			sc.SMAPEWhy = t.smapeWhy
		}
		if t.maseOut > 0 {
			sc.MASEWhy = t.maseWhy
		}
		sc.SMAPE = mean(t.smape, t.nSMAPE, t.smapeWhy, "sMAPE")
		sc.MASE = mean(t.mase, t.nMASE, t.maseWhy, "MASE")
		r.Scores = append(r.Scores, sc)
	}
	slices.SortStableFunc(r.Scores, func(a, b Score) int {
		switch {
		case a.SMAPE.Defined && b.SMAPE.Defined:
			return cmp.Compare(a.SMAPE.Value, b.SMAPE.Value)
		case a.SMAPE.Defined:
			return -1
		case b.SMAPE.Defined:
			return 1
		}
		return 0
	})
	return r
}

func mean(sum float64, n int, why, name string) accuracy.Result {
	if n == 0 {
		if why == "" {
			why = "no series could be forecast"
		}
		return accuracy.Result{Reason: name + " undefined: " + why}
	}
	return accuracy.Result{Value: sum / float64(n), Defined: true}
}

// WriteTable writes the methods by mean sMAPE as an aligned text table:
// method, series forecast, mean sMAPE (percent), mean MASE and, for
// methods that skipped series, how many and the first reason.
func (r *Result) WriteTable(w io.Writer) error {
	tw := tabwriter.NewWriter(w, 0, 0, 2, ' ', tabwriter.AlignRight)
	fmt.Fprintln(tw, "method\tseries\tsMAPE\tMASE\t")
	for _, s := range r.Scores {
		fmt.Fprintf(tw, "%s\t%d\t%s\t%s\t\n", s.Method, s.Series, cell(s.SMAPE, 2), cell(s.MASE, 3))
	}
	if err := tw.Flush(); err != nil {
		return err
	}
	for _, s := range r.Scores {
		if s.Skipped == 0 {
			continue
		}
		reason := ""
		for _, k := range r.Skips {
			if k.Method == s.Method {
				reason = k.Reason
				break
			}
		}
		if _, err := fmt.Fprintf(w, "%s skipped %d of %d series, for example: %s\n", s.Method, s.Skipped, r.Series, oneLine(reason)); err != nil {
			return err
		}
	}
	for _, s := range r.Scores {
		for _, out := range []struct {
			name string
			n    int
			why  string
		}{{"sMAPE", s.SMAPEOut, s.SMAPEWhy}, {"MASE", s.MASEOut, s.MASEWhy}} {
			if out.n == 0 || s.Series == out.n {
				continue
			}
			if _, err := fmt.Fprintf(w, "%s: the mean %s leaves out %d %s where it is undefined, for example %s\n", s.Method, out.name, out.n, plural(out.n, "series", "series"), oneLine(out.why)); err != nil {
				return err
			}
		}
	}
	return nil
}

func cell(res accuracy.Result, digits int) string {
	if !res.Defined {
		return "-"
	}
	return strconv.FormatFloat(res.Value, 'f', digits, 64)
}

func plural(n int, one, many string) string {
	if n == 1 {
		return one
	}
	return many
}

func oneLine(s string) string { return strings.Join(strings.Fields(s), " ") }

// WriteForecasts writes every forecast as CSV with the header
// series,method,horizon,period,forecast, in the order of r.Forecasts.
// Forecasts are written in the shortest decimal form that reads back to
// the same number.
func (r *Result) WriteForecasts(w io.Writer) error {
	cw := csv.NewWriter(w)
	if err := cw.Write([]string{"series", "method", "horizon", "period", "forecast"}); err != nil {
		return err
	}
	for _, f := range r.Forecasts {
		rec := []string{f.Series, f.Method, strconv.Itoa(f.Horizon), f.Period, strconv.FormatFloat(f.Value, 'f', -1, 64)}
		if err := cw.Write(rec); err != nil {
			return err
		}
	}
	cw.Flush()
	return cw.Error()
}
