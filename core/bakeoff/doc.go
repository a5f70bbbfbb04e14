// Package bakeoff runs every forecasting method on many series at once and
// ranks the methods by their accuracy on held-out periods, as forecasting
// competitions do.
//
// # Where to start
//
// [Read] reads a file in the competition layout (series, category,
// period, value and role fit or test); [Run] forecasts each series' fit
// part for as many periods as it has test rows with every method of the
// forecast catalogue and the automatic choice of package backtest, on all
// cores, and scores the forecasts; [Result.WriteTable] prints the methods
// by mean sMAPE and MASE and [Result.WriteForecasts] writes one row per
// forecast. Run takes a context for cancellation and reports progress
// through [Options.Progress], so that a page can run it off the main
// thread with a progress bar and a cancel button.
//
// A host whose engine runs on one thread (a page's Web Worker) passes a
// [Pool] in [Options.Pool]: Run then sends parts of the series as text to
// other engines, which answer with [RunPart], and merges the answers in
// series order, so the result is the same as a run without a pool.
//
// # Scores
//
// sMAPE is 200|a-f|/(|a|+|f|) percent and MASE is |a-f| over the mean
// absolute lag-L difference of the series' fit part (L = 1 unless
// [Options.Lag] says otherwise), both averaged over every test period of
// every series a method forecast, as the M3 competition's scorer does
// (Makridakis and Hibon 2000, International Journal of Forecasting 16(4),
// 451-476; Hyndman and Koehler 2006, International Journal of Forecasting
// 22(4), 679-688, for MASE).
package bakeoff
