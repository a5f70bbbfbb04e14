// Package memo holds the forecast memo as a document model and writes it
// out as Markdown, as standalone HTML and as a zip of the Markdown, the
// charts and the forecasts as CSV.
//
// # Where to start
//
// The step runner fills a [Memo]: title, who prepared it, for which client,
// the date (a string the caller gives; this package never reads the clock),
// and an ordered list of [Section] values, each with a [Kind] and blocks:
// [Paragraph] (Markdown text), [Table], [Chart], [List] and [Steps].
// [Memo.Missing] lists the kinds of section a complete memo has and this one
// lacks. The cautions section is required: build it with [CautionsSection],
// which carries [StandingCaution]; every renderer returns an error without
// it.
//
// Tables and charts are exhibits, numbered in order of appearance across
// the whole memo ("Exhibit 3 — holdout accuracy"); [Memo.Exhibits] gives the
// same numbers to the page.
//
// Renderers: [Markdown] (CommonMark with GFM tables; charts as image links
// to charts/NN-stem.svg), [HTML] (one self-contained page; Markdown text
// goes through goldmark with raw HTML left out and only http, https, mailto
// and relative links kept; charts are inlined by this package) and [Zip]
// (memo.md, charts/*.svg and forecasts.csv, with fixed file times so the
// same memo gives the same bytes). [WriteCSV] writes a [Sheet] with cells a
// spreadsheet would run as formulas guarded.
//
// Numbers are formatted by the caller with package quillcast/core/format,
// the same functions the page uses, so the memo shows the numbers on screen.
package memo
