// Package steps is the step language of a Quillcast session: one analysis
// step per line, each a verb, an optional subject and key=value options.
//
//	load shop-orders.csv value=units date=month   # pick the series
//	split last=12                                 # hold out the last year
//	smooth centered width=12
//	forecast moving-average width=12 as=ma12
//	forecast holt-winters season=multiplicative as=hw
//	evaluate by=mase
//	sweep moving-average width=2..24 by=rmse
//	backtest origins=6 horizon=3
//	check hw
//
// Values are numbers (12, 0.3), words (mase), quoted text ("Wickery & Co."),
// ranges (2..24), lists (80,95 or hw,ma12) and periods (2024-03, 2024-Q1,
// 2024-W05). A # starts a comment outside quoted text.
//
// # Where to start
//
// [Verbs] returns the definition of every verb: its subject, options, their
// kinds, defaults and help text. That one table drives [Parse] (and its
// checking pass), [Complete] and [Help], so the parser, the errors, the
// completion list and the help page never disagree. The options of
// `forecast METHOD` and `sweep METHOD` come from the forecasting catalogue.
//
// [Parse] reads the steps of a session document and reports every problem
// it finds, at most one per line, as [*Error] values that carry the step
// number and the line and column in the whole document.
package steps
