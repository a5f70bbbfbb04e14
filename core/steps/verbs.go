package steps

import (
	"quillcast/core/accuracy"
)

// measureNames lists the accuracy measures as written in steps.
func measureNames() []string {
	ms := accuracy.Measures()
	out := make([]string, len(ms))
	for i, m := range ms {
		out[i] = m.String()
	}
	return out
}

func byOption(def string) OptionDef {
	return opt("by", Word, "the accuracy measure that ranks the methods", def, "rmse").choices(measureNames()...)
}

func horizonOption(help string) OptionDef {
	return opt("horizon", Whole, help, "", "12").between(1, 1000)
}

// Verbs returns the definition of every verb of the language, in the order
// a forecaster uses them. Each call returns a fresh slice.
func Verbs() []VerbDef {
	return []VerbDef{
		{
			Name:    "memo",
			Summary: "Sets the memo's title, client, author and date; a later memo step overrides what an earlier one set.",
			Options: []OptionDef{
				opt("title", Text, "the memo's title", "", `"Candle orders, next year"`),
				opt("client", Text, "who the memo is for", "", `"Wickery & Co."`),
				opt("by", Text, "who prepared the memo", "", `"R. Osei"`),
				opt("date", Text, "the date written on the memo", "", "2026-12-01"),
			},
			Example: `memo title="Candle orders, next year" client="Wickery & Co." by="R. Osei" date=2026-12-01`,
		},
		{
			Name:    "load",
			Summary: "Picks the series to forecast from an attached data file: the column of values, the column of dates and the period.",
			Subject: SubjectDef{What: "file name", Required: true, Help: "the attached file, as named when it was attached"},
			Options: []OptionDef{
				opt("value", Name, "the column holding the values; by default the first column of numbers", "", "units"),
				opt("date", Name, "the column holding the dates or periods; by default the first column of dates", "", "month"),
				opt("every", Word, "the period of the series when the dates do not make it plain", "", "month").
					choices("day", "week", "month", "quarter", "year"),
				opt("season", Whole, "periods in one seasonal cycle; by default 12 for months, 4 for quarters, 52 for weeks, none for years", "", "12").between(1, 366),
				opt("series", Name, "which series of a file holding several to forecast; by default the first", "", `"Harbour Row"`),
				opt("fill", Word, "how to fill missing values inside the series; by default they are refused", "", "linear").
					choices("linear", "carry", "seasonal"),
				opt("duplicates", Word, "how to combine several rows for one period; by default they are refused", "", "sum").
					choices("sum", "mean"),
				opt("sort", Word, "put rows that are out of order at their periods", "no", "yes").choices("yes", "no"),
			},
			Example: "load shop-orders.csv value=units date=month",
		},
		{
			Name:    "split",
			Summary: "Divides the series into a training period, on which methods are fitted, and a validation (holdout) period on which they are scored.",
			Options: []OptionDef{
				opt("last", Whole, "hold out the last N periods", "", "12").between(1, 100000),
				opt("from", Period, "hold out the periods from this one to the end", "", "2024-01"),
			},
			Example: "split last=12",
			Needs:   []string{"data"},
		},
		{
			Name:    "smooth",
			Summary: "Draws a smoothed line over the series for display; an even centred width uses the two-step centred average.",
			Subject: SubjectDef{What: "kind of average", Choices: []string{"centered", "trailing"}, Help: "centered (for seeing the trend) or trailing (what a moving-average forecast uses)"},
			Options: []OptionDef{
				opt("width", Whole, "how many periods each average spans", "", "12").between(1, 10000).required(),
			},
			Example: "smooth centered width=12",
			Needs:   []string{"data"},
		},
		{
			Name:    "forecast",
			Summary: "Fits a method on the training period, forecasts the validation period and the periods past the end of the data; parameters left out are estimated on the training data and reported.",
			Subject: SubjectDef{What: "method", Required: true, Help: "a forecasting method of the catalogue"},
			Options: []OptionDef{
				horizonOption("periods to forecast past the end of the data; by default the length of the validation period, or one season"),
				opt("as", Name, "the label the forecast goes by in tables and later steps", "the method's name", "hw"),
				opt("difference", Whole, "fit on lag differences (1, or the season length) and add them back", "", "1").between(1, 366),
				opt("interval", Numbers, "the prediction-interval levels in percent", "80,95", "80,95").between(50, 99.9),
			},
			Example: "forecast holt-winters season=multiplicative as=hw",
			Needs:   []string{"data"},
			Methods: true,
		},
		{
			Name:    "combine",
			Summary: "Averages earlier forecasts with equal weights into a new forecast.",
			Options: []OptionDef{
				opt("of", Names, "the labels of the forecasts to average", "", "hw,ma12").required(),
				opt("as", Name, "the label of the combination", "combination", "blend"),
			},
			Example: "combine of=hw,ses as=blend",
			Needs:   []string{"data", "forecast"},
		},
		{
			Name:    "evaluate",
			Summary: "Scores every forecast so far on the training and the validation periods side by side, with the naive benchmarks, and draws the actual-versus-forecast and error charts.",
			Options: []OptionDef{byOption("mase")},
			Example: "evaluate by=mase",
			Needs:   []string{"data", "split", "forecast"},
		},
		{
			Name:    "sweep",
			Summary: "Scores a method over a range of one parameter and marks the best value, explaining under- and over-smoothing.",
			Subject: SubjectDef{What: "method", Required: true, Help: "moving-average, or a method with a smoothing constant"},
			Options: []OptionDef{
				byOption("rmse"),
				opt("step", Number, "the spacing of the values tried within a range", "1 for whole numbers, 0.05 otherwise", "0.05").between(1e-6, 1000),
			},
			Example: "sweep moving-average width=2..24 by=rmse",
			Needs:   []string{"data", "split"},
			Methods: true,
		},
		{
			Name:    "backtest",
			Summary: "Rolls the forecast origin through the series and scores every forecast at each horizon, with how often the intervals covered the truth.",
			Options: []OptionDef{
				opt("origins", Whole, "how many forecast origins to roll through", "6", "8").between(1, 1000),
				horizonOption("how many periods ahead each origin forecasts; by default 3"),
				opt("of", Names, "the labels of the forecasts to test; by default all of them", "", "hw,ma12"),
				byOption("mase"),
			},
			Example: "backtest origins=8 horizon=4",
			Needs:   []string{"data", "forecast"},
		},
		{
			Name:    "difference",
			Summary: "Shows the series after lag differences, with its autocorrelations; it does not change the series later steps use.",
			Options: []OptionDef{
				opt("lag", Numbers, "the lags to difference at, in order (1 removes a trend, the season length removes a season)", "1", "12,1").between(1, 366).whole(),
			},
			Example: "difference lag=12,1",
			Needs:   []string{"data"},
		},
		{
			Name:    "decompose",
			Summary: "Splits the series into trend, season and remainder by classical decomposition.",
			Subject: SubjectDef{What: "kind of season", Choices: []string{"additive", "multiplicative"}, Help: "additive (a season of fixed size) or multiplicative (a season that grows with the level); additive by default"},
			Example: "decompose multiplicative",
			Needs:   []string{"data"},
		},
		{
			Name:    "check",
			Summary: "Checks the assumptions a forecast rests on: its residuals should look like noise. Without a label it checks the series for trend and season.",
			Subject: SubjectDef{What: "forecast label", Help: "the label of an earlier forecast"},
			Options: []OptionDef{
				opt("lags", Whole, "how many lags the autocorrelation test looks at", "twice the season, or 10", "24").between(1, 1000),
			},
			Example: "check hw",
			Needs:   []string{"data"},
		},
		{
			Name:    "pick",
			Summary: "Chooses the forecast with the best validation score as the memo's recommendation.",
			Options: []OptionDef{
				byOption("mase"),
				opt("among", Names, "the labels to choose among; by default every forecast", "", "hw,ses"),
			},
			Example: "pick by=mase",
			Needs:   []string{"data", "split", "forecast"},
		},
		{
			Name:    "bakeoff",
			Summary: "Runs several methods on every series of a multi-series file and counts which wins most often on the holdout.",
			Options: []OptionDef{
				opt("methods", Names, "the methods to compare", "naive,seasonal-naive,ses,holt-winters", "naive,ses,holt-winters"),
				opt("last", Whole, "how many periods of each series to hold out; by default the current split, or one season", "", "12").between(1, 100000),
				byOption("mase"),
			},
			Example: "bakeoff methods=naive,ses,holt-winters by=mase",
			Needs:   []string{"data"},
		},
	}
}

// Lookup returns the definition of the verb named name.
func Lookup(name string) (VerbDef, bool) {
	for _, v := range Verbs() {
		if v.Name == name {
			return v, true
		}
	}
	return VerbDef{}, false
}

func verbNames() []string {
	vs := Verbs()
	out := make([]string, len(vs))
	for i, v := range vs {
		out[i] = v.Name
	}
	return out
}
