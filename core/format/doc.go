// Package format turns numbers into the text people read: in tables on the
// page, in chart ticks and in the memo. Every place that shows a number
// calls this package, so the page and the memo always show the same figures.
//
// Display forms use a comma as thousands separator and a point as decimal
// mark:
//
//	Number(1234.5, 1)    "1,234.5"
//	Number(-0.004, 2)    "0.00"   (no negative zero)
//	Auto(98765.4)        "98,765"
//	Auto(12.345)         "12.3"
//	Percent(12.345, 1)   "12.3%"
//	Int(-1234567)        "-1,234,567"
//
// [Plain] writes a number with fixed decimals and no separators, for files a
// program reads back (CSV).
//
// Missing values (NaN) show as [Missing]; infinities as "∞" and "-∞".
package format
