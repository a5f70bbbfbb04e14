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
//   - [ACF] with its white-noise band [ACFBound], [LjungBox] and
//     [BoxPierce] look at autocorrelation.
//   - [MannKendall] tests for a monotonic trend and estimates its slope,
//     [SeasonalKendall] does so within the positions of a season;
//     [SeasonalStrength] and [TrendStrength] measure how much of the
//     variation a season or a trend accounts for.
//   - [Check] and [CheckResiduals] return [Finding] values to show under a
//     forecast: plain sentences with the figures behind them.
//
// # Assumption checks
//
// A forecasting method describes what it takes for granted with [Assumes];
// [Check] tests the training series and says, with the evidence, where the
// data contradict it:
//
//	findings := diagnose.Check(train, 12, diagnose.Assumes{
//		Name: "a moving average", NoTrend: true, NoSeason: true})
//	// warning trend: The series rises by about 2.1% a period (Mann-Kendall
//	//   p < 0.001): a moving average assumes no trend, lags behind it and
//	//   will under-forecast.
//
// [CheckResiduals] does the same for the one-step residuals of a fit: are
// they like noise, and do they average zero?
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
