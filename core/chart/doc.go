// Package chart draws the notebook's charts as SVG text: standard library
// only, deterministic output, every number written with at most two
// decimals, every piece of caller text escaped.
//
// # Where to start
//
// Fill one of the chart values and call its SVG method:
//
//   - [Line]: series over periods: the actual series, smoothed lines,
//     forecasts with prediction-interval bands, the holdout marked by a
//     labelled divider and a light tint. With ZeroLine it also serves for
//     forecast errors over time drawn as lines.
//   - [Bars]: grouped bars around zero: forecast errors over time, accuracy
//     by horizon.
//   - [Sweep]: an accuracy measure against a parameter, training and
//     validation lines, the best value marked, the under- and
//     over-smoothing sides named.
//   - [ACF]: autocorrelation bars by lag with ± bounds.
//   - [Panels]: stacked panels sharing the period axis, such as the
//     observed, trend, seasonal and remainder parts of a decomposition.
//
// Inputs are plain data: periods are positions 0, 1, 2, … whose labels the
// caller gives as strings ("2024-03", "2024-Q1", "2024-W05", "2024-03-15",
// "2024"); values are float64 with NaN for a gap. Ticks on the period axis
// are thinned from the label shape (years for monthly data over several
// years, quarters over a short span, …) unless [Frequency] says otherwise.
// Value ticks are "nice" numbers with thousands separators.
//
// # Long series
//
// A series with more than 4 positions per pixel of plot width (about 2,600
// positions in a 720-unit chart) is drawn from the first, lowest, highest
// and last value of each pixel column, so a chart of 1,000,000 points is
// about 30 KB rather than 14 MB and looks the same; bands are thinned the
// same way and bars become one bar per column from zero to its extremes.
// Gaps wider than a column stay gaps, the holdout marks do not move, and
// shorter series are drawn point for point. See decimate.go.
//
// # Look
//
// Colours come from one palette of our own, defined once in palette.go,
// applied by CSS classes (prefix "qc-") and an embedded style sheet with a
// dark-scheme variant, so the same SVG reads inline in the page and in a
// standalone memo. Every coloured line also has its own dash pattern and
// marker shape, so nothing depends on telling hues apart. A host page may
// restyle the classes: qc-c0…qc-c5 (stroke) and qc-f0…qc-f5 (fill) for the
// six series colours, qc-ink and qc-text for the text colour, qc-muted,
// qc-grid and qc-axis for the furniture, qc-bg for the background.
//
// # Safety
//
// SVG methods never panic and never fail: missing values, unequal lengths
// (missing positions count as gaps), empty input and infinities draw what
// can be drawn and say "no data" where nothing can. Titles, names and labels
// are escaped for XML, and characters XML cannot carry are replaced by
// U+FFFD.
package chart
