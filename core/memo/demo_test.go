package memo

import (
	"fmt"
	"math"

	"quillcast/core/chart"
	"quillcast/core/format"
)

// This file builds the memo the golden tests write: an invented scenario,
// a small chain of candle shops forecasting monthly orders. Every figure is
// made up for the test; none is a check of a method.

func demoLabels(n int) []string {
	out := make([]string, n)
	for i := range out {
		out[i] = fmt.Sprintf("%04d-%02d", 2022+i/12, i%12+1)
	}
	return out
}

func demoOrders(n int) []float64 {
	out := make([]float64, n)
	for i := range out {
		out[i] = 1200 + 15*float64(i) + 240*math.Sin(2*math.Pi*float64(i)/12) + 35*math.Cos(float64(i)*1.7)
	}
	return out
}

// demoMemo returns a complete memo with rows forecast rows.
func demoMemo(rows int) (Memo, Sheet) {
	labels := demoLabels(36 + rows)
	act := demoOrders(36)
	fc := make([]float64, 36+rows)
	for i := range fc {
		fc[i] = math.NaN()
		if i >= 24 {
			fc[i] = 1200 + 15*float64(i) + 230*math.Sin(2*math.Pi*float64(i)/12)
		}
	}
	line := chart.Line{
		Frame:   chart.Frame{Title: "Orders and the Holt-Winters forecast", YTitle: "units"},
		Periods: labels,
		Series: []chart.Series{
			{Name: "orders", Values: act},
			{Name: "hw", Role: chart.Forecast, Values: fc},
		},
		HoldoutStart: 24,
		HoldoutEnd:   36,
	}
	errs := chart.Bars{
		Frame:  chart.Frame{Title: "Holdout errors", YTitle: "units"},
		Labels: labels[24:36],
	}
	errVals := make([]float64, 12)
	for i := range errVals {
		errVals[i] = act[24+i] - fc[24+i]
	}
	errs.Series = []chart.Series{{Name: "hw", Values: errVals}}

	forecastTable := Table{
		Caption: "Forecasts with 80% and 95% intervals",
		Columns: []Column{{Header: "Month"}, {Header: "Forecast", Numeric: true}, {Header: "80% low", Numeric: true},
			{Header: "80% high", Numeric: true}, {Header: "95% low", Numeric: true}, {Header: "95% high", Numeric: true}},
	}
	sheet := Sheet{Header: ForecastHeader()}
	for i := 0; i < rows; i++ {
		v := fc[36+i]
		w := 80 * math.Sqrt(float64(i+1))
		forecastTable.Rows = append(forecastTable.Rows, []string{labels[36+i], format.Auto(v),
			format.Auto(v - w), format.Auto(v + w), format.Auto(v - 1.53*w), format.Auto(v + 1.53*w)})
		sheet.Rows = append(sheet.Rows, []string{labels[36+i], "hw", format.Plain(v, 1),
			format.Plain(v-w, 1), format.Plain(v+w, 1), format.Plain(v-1.53*w, 1), format.Plain(v+1.53*w, 1)})
	}
	m := Memo{
		Title:      "Lanternfield Candles: monthly orders, next year",
		PreparedBy: "R. Okafor, independent analyst",
		Client:     "Lanternfield Candles Ltd",
		Date:       "2 December 2026",
		Version:    "0.1.0",
		Sections: []Section{
			{Kind: Summary, Blocks: []Block{Paragraph{Text: "We recommend **Holt-Winters** with a multiplicative season. " +
				"Orders for January 2025 are forecast at 1,874 units (80% interval 1,794 to 1,954). " +
				"On the 12-month holdout its MASE was 0.42 against 1.00 for the seasonal naive benchmark."}}},
			{Kind: Data, Blocks: []Block{List{Items: []string{
				"File: `shop-orders.csv`, column `units`, monthly from 2022-01 to 2024-12 (36 values).",
				"Cleaning: one duplicate row for 2023-07 dropped; no gaps.",
				"Fingerprint: `5f2c9a1e`.",
			}}}},
			{Kind: Partition, Blocks: []Block{Paragraph{Text: "Training: 2022-01 to 2023-12 (24 months). Holdout: 2024-01 to 2024-12 (12 months)."}}},
			{Kind: Comparison, Blocks: []Block{Table{
				Caption: "Holdout accuracy",
				Columns: []Column{{Header: "Method"}, {Header: "MAE", Numeric: true}, {Header: "RMSE", Numeric: true},
					{Header: "MAPE", Numeric: true}, {Header: "MASE", Numeric: true}},
				Rows: [][]string{
					{"hw", format.Auto(41.25), format.Auto(52.8), format.Percent(2.71, 1), format.Number(0.42, 2)},
					{"seasonal naive", format.Auto(98.4), format.Auto(121.37), format.Percent(6.05, 1), format.Number(1, 2)},
					{"ma12 | trailing", format.Auto(1210.5), format.Auto(1388.2), format.Percent(71.3, 1), format.Number(5.11, 2)},
				},
				Note: "MASE scaled by the in-sample seasonal naive error; lower is better.",
			}}},
			{Kind: Charts, Blocks: []Block{
				Chart{Caption: "Actual versus forecast", SVG: line.SVG(), Stem: "actual-vs-forecast"},
				Chart{Caption: "Forecast errors over the holdout", SVG: errs.SVG(), Stem: "Holdout Errors!"},
			}},
			{Kind: Forecasts, Blocks: []Block{forecastTable}},
			CautionsSection("The series has a trend and a yearly season; a moving average follows neither.",
				"Residuals of `hw` show no autocorrelation past the bounds."),
			{Kind: Notes, Blocks: []Block{Paragraph{Text: "The spring catalogue launch moved some orders from April to March;\n" +
				"we left the data as recorded.\n\nSee the [shop list](https://example.com/shops) for store counts."}}},
			{Kind: Appendix, Blocks: []Block{
				Steps{Info: "steps", Text: "load shop-orders.csv value=units date=month\nsplit last=12\nforecast holt-winters season=multiplicative as=hw\nevaluate by=mase\n"},
				Table{Caption: "Settings", Columns: []Column{{Header: "Setting"}, {Header: "Value"}},
					Rows: [][]string{{"season", "12"}, {"intervals", "80, 95"}}},
			}},
		},
	}
	return m, sheet
}
