package backtest

import (
	"fmt"
	"math"
	"slices"
	"strings"

	"quillcast/core/accuracy"
	"quillcast/core/forecast"
)

// AutoSpec returns the catalogue entry of [Auto], so that the step language
// can offer "forecast auto" beside the methods of forecast.Catalog (which
// cannot list it: package forecast does not know package backtest). Its New
// checks every setting and returns an error naming the setting, what was
// found and what is accepted.
func AutoSpec() forecast.Spec {
	sp := forecast.Spec{
		Name:    "auto",
		Title:   "Automatic choice",
		Summary: "Ranks candidate methods by their accuracy on rolling origins inside the training period and averages the best few with equal weights.",
		Source:  "L. J. Tashman (2000), International Journal of Forecasting 16(4), 437-450 (rolling origin); S. Makridakis and M. Hibon (2000), International Journal of Forecasting 16(4), 451-476 (combinations)",
		Assumes: "that the methods that did best on the latest past origins will do well next; what the chosen methods assume",
		Follows: forecast.Patterns{Level: true, Trend: true, Season: true},
		Params: []forecast.ParamSpec{
			{Name: "of", Kind: forecast.List, Help: "candidate methods separated by commas; by default ses, holt, damped, theta and drift, plus seasonal naive and Holt-Winters with a season"},
			{Name: "combine", Kind: forecast.Whole, Min: 1, Max: 10, Default: fmt.Sprint(DefaultCombine), Help: "how many of the best-ranked methods to average; 1 picks the single best"},
			{Name: "origins", Kind: forecast.Whole, Min: 1, Max: 500, Help: "rolling origins to rank on; by default those in the later half of the training period, at most 30"},
			{Name: "horizon", Kind: forecast.Whole, Min: 1, Max: math.Inf(1), Help: "periods ahead to rank on; by default two seasons, or 6 without a season"},
			{Name: "by", Kind: forecast.Choice, Choices: []string{"mase", "smape", "mae", "rmse", "mape"}, Default: "mase", Help: "the accuracy measure to rank by"},
		},
	}
	sp.New = func(st forecast.Settings) (forecast.Method, error) { return newAuto(sp, st) }
	return sp
}

// newAuto builds an [Auto] from checked settings.
func newAuto(sp forecast.Spec, st forecast.Settings) (forecast.Method, error) {
	var a Auto
	names := make([]string, 0, len(st))
	for name := range st {
		names = append(names, name)
	}
	slices.Sort(names)
	for _, name := range names {
		v := st[name]
		i := slices.IndexFunc(sp.Params, func(p forecast.ParamSpec) bool { return p.Name == name })
		if i < 0 {
			return nil, &forecast.Error{Cause: forecast.ErrSetting, Msg: fmt.Sprintf("auto has no parameter %q; it accepts of, combine, origins, horizon and by", name)}
		}
		p := sp.Params[i]
		switch p.Kind {
		case forecast.Whole:
			x := v.Number
			if math.IsNaN(x) || x != math.Trunc(x) || x < p.Min || x > p.Max {
				return nil, &forecast.Error{Cause: forecast.ErrSetting, Msg: fmt.Sprintf("%s=%v for auto is not accepted; write a whole number from %v to %v", name, x, p.Min, p.Max)}
			}
		case forecast.Choice:
			if !slices.Contains(p.Choices, v.Word) {
				return nil, &forecast.Error{Cause: forecast.ErrSetting, Msg: fmt.Sprintf("by=%q for auto is not accepted; write one of %s", v.Word, strings.Join(p.Choices, ", "))}
			}
		}
		switch name {
		case "of":
			for _, c := range strings.Split(v.Word, ",") {
				c = strings.TrimSpace(c)
				if _, ok := forecast.Lookup(c); !ok {
					return nil, &forecast.Error{Cause: forecast.ErrSetting, Msg: fmt.Sprintf("of=%s: %q is not a method auto can rank; write catalogue names such as ses,holt,damped", v.Word, c)}
				}
				a.Candidates = append(a.Candidates, c)
			}
		case "combine":
			a.Combine = int(v.Number)
		case "origins":
			a.Origins = int(v.Number)
		case "horizon":
			a.Horizon = int(v.Number)
		case "by":
			m, err := accuracy.ParseMeasure(v.Word)
			if err != nil {
				return nil, err
			}
			a.By = m
		}
	}
	return a, nil
}
