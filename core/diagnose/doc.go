// Package diagnose looks at a series before and after a forecast: it shows
// its patterns (smoothed lines, differences, classical decomposition), tests
// for trend and season, measures how much a season explains, checks whether
// residuals look like noise, and turns the evidence into plain-words findings
// about the assumptions a forecasting method rests on.
//
// # Where to start
//
//   - [Decompose] splits a series into trend, season and remainder by the
//     classical method; [SeasonalityTest] says whether a season is there.
//   - [CenteredMovingAverage] and [TrailingMovingAverage] draw smoothed lines
//     for display; [Difference] takes lag differences.
//   - [ACF], [LjungBox] and [BoxPierce] look at autocorrelation.
//   - [MannKendall] tests for a monotonic trend; [SeasonalStrength] measures
//     how much of the variation a season accounts for.
//   - [Check] and [CheckResiduals] return [Finding] values to show under a
//     forecast.
//
// # Conventions
//
// Series positions are 0-based periods in time order, oldest first. A season
// is the number of periods in one cycle (12 for monthly data, 4 for
// quarterly). Undefined values in a returned series (the ends of a centred
// average, for example) are NaN; a value that is not a finite number in the
// input is refused with an [*InputError] naming its 1-based position, unless
// a function's comment says it passes such values through.
//
// Package diagnose knows nothing about forecasting methods: a method states
// what it assumes through [Assumes], so that the forecasting package may
// import this one and never the reverse.
package diagnose
