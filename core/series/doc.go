// Package series holds the time index of Quillcast and reads the files
// users attach: periods, regular series, and a reader for delimited text
// that turns real-world exports into clean series or says exactly what is
// wrong, line by line.
//
// # Periods
//
// A [Period] is a frequency and an ordinal, so stepping is one addition:
//
//	p, _ := series.ParsePeriod("2024-03")  // month
//	p.Add(12).String()                       // "2025-03"
//
// Canonical labels are 2024-03-01 (day), 2024-W05 (ISO 8601 week),
// 2024-03 (month), 2024-Q1 (quarter), 2024 (year) and 17 (a position in a
// series without dates). [Frequency.DefaultSeason] gives the usual season
// length (12 for months, 4 for quarters, 52 for weeks, 7 for days).
//
// # Series
//
// A [Series] has one value per period from its Start on; NaN marks a
// missing value. Every other package works on it.
//
// # Reading files
//
// [Read] takes the bytes of a CSV or TSV file and detects, unless
// [ReadOptions] says otherwise: the delimiter (comma, semicolon, tab,
// vertical bar), whether the first line holds column names, the period
// column and how its dates are written, the frequency, the value columns,
// each column's decimal mark, and whether the file is wide, long or across:
//
//	month,units,returns            wide: one series per value column
//	2024-01,1 204,12
//	2024-02,1 187,9
//
//	shop;month;units               long: one series per shop
//	Harbour;2024-01;412,5
//	Harbour;2024-02;398
//	Old Town;2024-01;377
//
//	shop,2024-01,2024-02           across: one series per row,
//	Harbour,412.5,398              one column per period
//	Old Town,377,360
//
// Numbers may carry a decimal comma, thousands separators (1,234.5;
// 1.234,5; 1 234,5), currency signs, percent signs and negatives in
// parentheses; the decimal mark is decided per column from all of its
// cells and the decision is stated. Dates may be written 2024-03-01,
// 2024-03, 2024-Q1, 2024Q1, Q1 2024, 2024-W05, 2024, 03/2024, 01/02/2024
// (day or month first, decided once per column), Mar 2024, March 2024,
// 1 Mar 2024 or Mar 1, 2024, with or without a time of day. Full dates that
// all fall on the same day of the month are read as months (or quarters or
// years), on the same weekday as ISO weeks. A year column beside a quarter
// or month column gives the periods together. Up to five title lines above
// the table are left out.
//
// What Read decided is in [Dataset.Decisions]; gaps, missing values,
// duplicate periods and rows out of order are in [Dataset.Problems] with
// their lines and what to do. Read changes nothing unless asked:
// [ReadOptions.Sort], [ReadOptions.Duplicates] and [ReadOptions.Fill]
// place rows, combine duplicates and fill gaps, and every change is listed
// in [Dataset.Changes]. Input that cannot be read at all gives an
// [ErrorList] of [*ParseError], each with its line, column and cell.
//
// [ProfileOf] and [Dataset.ProfileOf] summarise a series: its periods,
// gaps, duplicates, range, mean, zeros and negatives.
package series
