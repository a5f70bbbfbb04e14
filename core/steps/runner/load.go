package runner

import (
	"fmt"
	"math"
	"slices"
	"strings"

	"quillcast/core/backtest"
	"quillcast/core/chart"
	"quillcast/core/format"
	"quillcast/core/series"
)

// readOptions turns the load step's options into the reader's.
func (x *exec) readOptions() series.ReadOptions {
	var o series.ReadOptions
	if v, ok := x.option("value"); ok {
		o.Values = []string{v.Raw}
	}
	if v, ok := x.option("date"); ok {
		o.Date = v.Raw
	}
	if v, ok := x.option("every"); ok {
		o.Frequency, _ = series.ParseFrequency(v.Raw)
	}
	switch x.wordOption("fill", "") {
	case "linear":
		o.Fill = series.Linear
	case "carry":
		o.Fill = series.CarryForward
	case "seasonal":
		o.Fill = series.Seasonal
	}
	switch x.wordOption("duplicates", "") {
	case "sum":
		o.Duplicates = series.Sum
	case "mean":
		o.Duplicates = series.Mean
	}
	o.Sort = x.wordOption("sort", "no") == "yes"
	return o
}

// dataset returns the attached file the load step names, read.
func (x *exec) dataset() (*series.Dataset, error) {
	name := x.s.Subject
	if ds, ok := x.data.Sets[name]; ok && ds != nil {
		return ds, nil
	}
	b, ok := x.data.Files[name]
	if !ok {
		return nil, x.errAtSubject("no file named %q is attached; %s", name, attachedHint(x.data))
	}
	return series.Read(b, name, x.readOptions())
}

func attachedHint(d Data) string {
	var names []string
	for k := range d.Files {
		names = append(names, k)
	}
	for k := range d.Sets {
		if _, dup := d.Files[k]; !dup {
			names = append(names, k)
		}
	}
	slices.Sort(names)
	if len(names) == 0 {
		return "attach the data file first (nothing is attached yet)"
	}
	return "the files attached are " + strings.Join(names, ", ") + "; write one of them, or attach the file"
}

func (x *exec) load() error {
	ds, err := x.dataset()
	if err != nil {
		return err
	}
	if len(ds.Series) == 0 {
		return fmt.Errorf("%s holds no series of numbers; check that it has a column of values", ds.Name)
	}
	name := ds.Series[0].Name
	if v, ok := x.option("series"); ok {
		name = v.Raw
	}
	s, err := ds.Lookup(name)
	if err != nil {
		return err
	}
	y := slices.Clone(s.Values)
	missing := 0
	first := -1
	for i, v := range y {
		if math.IsNaN(v) || math.IsInf(v, 0) {
			missing++
			if first < 0 {
				first = i
			}
		}
	}
	if missing > 0 {
		return fmt.Errorf("series %q has %s (the first at %s); fill them with fill=linear, fill=carry or fill=seasonal on this step, or correct the file",
			s.Name, count(missing, "missing value", "missing values"), s.PeriodAt(first))
	}
	if len(y) < 3 {
		return fmt.Errorf("series %q has %s; forecasting needs at least 3", s.Name, count(len(y), "value", "values"))
	}
	season := s.Season
	if v, ok := x.option("season"); ok {
		season = v.Int()
	}
	if season < 2 {
		season = 0
	}
	periods := make([]string, len(y))
	for i := range periods {
		periods[i] = s.PeriodAt(i).String()
	}
	x.st.data = &loaded{step: x.s.N, file: ds.Name, set: ds, series: s, y: y, season: season, periods: periods}
	x.st.split, x.st.forecasts, x.st.eval, x.st.pick = nil, nil, nil, nil
	x.st.broken = map[string]int{}
	x.st.cautions = nil
	x.st.backtests = map[string]*backtest.Backtest{}

	rows := [][]string{
		{"file", ds.Name},
		{"series", s.Name},
		{"periods", x.span(0, len(y))},
		{"values", format.Int(len(y))},
		{"frequency", s.Frequency().String()},
		{"season", seasonWords(season)},
		{"fingerprint", ds.Fingerprint},
	}
	if len(ds.Series) > 1 {
		rows = append(rows, []string{"series in the file", format.Int(len(ds.Series))})
	}
	x.table("The data", &Table{Headers: []string{"item", "value"}, Rows: rows, Right: []bool{false, false}}, "")
	for _, d := range ds.Decisions {
		x.message(Info, "%s", d)
	}
	for _, p := range ds.Problems {
		if p.Series == s.Name {
			x.message(Warning, "%s", p.String())
		}
	}
	for _, c := range ds.Changes {
		if c.Series == s.Name {
			x.message(Info, "Changed: %s.", c.String())
		}
	}
	svg := chart.Line{
		Frame:   chart.Frame{Title: s.Name, YTitle: s.Name, XTitle: s.Frequency().String()},
		Periods: periods,
		Series:  []chart.Series{{Name: s.Name, Values: y, Role: chart.Actual}},
	}.SVG()
	x.chart("The series "+s.Name, "series", svg, "")
	return nil
}

func seasonWords(season int) string {
	if season < 2 {
		return "none"
	}
	return count(season, "period", "periods")
}
