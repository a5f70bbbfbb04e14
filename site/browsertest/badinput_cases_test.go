package browsertest

import (
	"encoding/binary"
	"fmt"
	"strings"
	"unicode/utf16"
)

// badCase is one entry of the bad-input catalogue, driven through the
// engine's page API. Exactly one of file, lines and call is set.
type badCase struct {
	name string
	// file is attached under fileName; the answer's error, or the
	// preview's problems, decisions and first rows, must contain want.
	file     []byte
	fileName string
	// lines are step lines run as one session; the first failed step's
	// error ("line L, column C: message"), or any output text, must
	// contain want.
	lines []string
	// call is a page API function with its arguments (JSON values); its
	// error must contain want.
	call string
	args []any
	want string
}

// monthRows writes a monthly CSV with a month and a units column from
// January 2020, one row per value.
func monthRows(values ...string) []byte {
	var b strings.Builder
	b.WriteString("month,units\n")
	for i, v := range values {
		fmt.Fprintf(&b, "%d-%02d,%s\n", 2020+i/12, i%12+1, v)
	}
	return []byte(b.String())
}

// repeated returns n copies of v.
func repeated(n int, v string) []string {
	out := make([]string, n)
	for i := range out {
		out[i] = v
	}
	return out
}

// utf16LE encodes s as UTF-16 little-endian, with a byte-order mark when bom.
func utf16LE(s string, bom bool) []byte {
	var b []byte
	if bom {
		b = append(b, 0xFF, 0xFE)
	}
	for _, u := range utf16.Encode([]rune(s)) {
		b = binary.LittleEndian.AppendUint16(b, u)
	}
	return b
}

// The demo files the page stores on first start; step cases load them.
const (
	demoMonthly   = "wickery-monthly-orders.csv"
	demoQuarterly = "wickery-quarterly-revenue.csv"
)

// loaderCases are files the reader must refuse, or read while saying what
// it did or what is wrong. Messages: the reader's own (core/series).
func loaderCases() []badCase {
	plain := "month,units\n2024-01,1\n2024-02,2\n2024-03,3\n"
	return []badCase{
		{name: "empty file", file: []byte{}, want: "the file is empty"},
		{name: "only blank lines", file: []byte("  \n\t\n\n"), want: "the file is empty"},
		{name: "header only", file: []byte("month,units\n"), want: "column names but no rows of data"},
		{name: "mixed date orders", file: []byte("date,units\n2024-01-15,1\n15/02/2024,2\n03/15/2024,3\n2024-04-15,4\n"), want: "puts the month first"},
		{name: "ambiguous date order", file: []byte("date,units\n01/02/2024,1\n02/02/2024,2\n03/02/2024,3\n04/02/2024,4\n"), want: "could be day-first or month-first"},
		{name: "months and quarters mixed", file: []byte("period,units\n2024-01,1\n2024-Q2,2\n2024-03,3\n"), want: "is a quarter, but the column holds months"},
		{name: "month 13", file: []byte("month,units\n2024-13,1\n2024-14,2\n2024-15,3\n"), want: `"2024-13" is not a period`},
		{name: "February 30", file: []byte("day,units\n2024-02-28,1\n2024-02-29,2\n2024-02-30,3\n2024-03-01,4\n"), want: "February 2024 has only 29 days"},
		{name: "week 53 in a year of 52", file: []byte("week,units\n2021-W51,1\n2021-W52,2\n2021-W53,3\n2022-W01,4\n"), want: "ISO year 2021 has 52 weeks, not 53"},
		{name: "a gap of one month", file: []byte("month,units\n2024-01,1\n2024-02,2\n2024-04,4\n2024-05,5\n"), want: "has no row for 2024-03"},
		{name: "a gap of days", file: []byte("day,units\n2024-01-01,1\n2024-01-02,2\n2024-01-05,5\n2024-01-06,6\n"), want: "no rows for 2024-01-03 to 2024-01-04"},
		{name: "duplicate period", file: []byte("month,units\n2024-01,1\n2024-02,2\n2024-02,3\n2024-03,4\n"), want: "2024-02 appears again"},
		{name: "unsorted rows", file: []byte("month,units\n2024-01,1\n2024-03,3\n2024-02,2\n2024-04,4\n"), want: "2024-02 comes after 2024-03"},
		{name: "an empty value cell", file: []byte("month,units\n2024-01,1\n2024-02,\n2024-03,3\n2024-04,4\n"), want: "has no value for 2024-02"},
		{name: "decimal marks mixed", file: []byte("month;units\n2024-01;1.234,5\n2024-02;1,234.5\n2024-03;12,5\n2024-04;1.5\n"), want: "writes the decimal mark as a point"},
		{name: "thousands separator undecided", file: []byte("month,units\n2024-01,\"1,200\"\n2024-02,1300\n2024-03,1400\n"), want: "thousands separator or a number with three decimals"},
		{name: "currency signs", file: []byte("month,units\n2024-01,$1200\n2024-02,€1300\n2024-03,£1250\n2024-04,1400\n"), want: "currency signs in 3 cells are left out"},
		{name: "percent signs", file: []byte("month,share\n2024-01,12%\n2024-02,13%\n2024-03,14%\n2024-04,15%\n"), want: "percent signs in 4 cells are left out"},
		{name: "parenthesised negatives", file: []byte("month,units\n2024-01,(120)\n2024-02,130\n2024-03,(14)\n2024-04,15\n"), want: "-120"},
		{name: "UTF-16 with a byte-order mark", file: utf16LE(plain, true), want: "saved as UTF-16 text"},
		{name: "UTF-16 without a byte-order mark", file: utf16LE(plain, false), want: "looks like UTF-16 text"},
		{name: "Windows-1252 text", file: []byte("month,caf\xe9\n2024-01,1\n2024-02,2\n2024-03,3\n"), want: "line 1: the file is not UTF-8 text"},
		{name: "an image", file: []byte{0x89, 'P', 'N', 'G', 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 'I', 'H', 'D', 'R'}, fileName: "chart.png", want: "binary data, not text"},
		{name: "a workbook", file: []byte("PK\x03\x04\x14\x00\x06\x00rest of a zip"), fileName: "orders.xlsx", want: "a workbook or another zipped file"},
		{name: "a row with too many cells", file: []byte("month,units\n2024-01,1\n2024-02,2,9\n2024-03,3\n2024-04,4\n"), want: "line 3: this line has 3 cells but the first line has 2"},
		{name: "a row with too few cells", file: []byte("month,units,price\n2024-01,1,2\n2024-02,2\n2024-03,3,4\n"), want: "line 3"},
		{name: "a quoted newline in a note column", file: []byte("month,units,note\n2024-01,1,\"two\nlines\"\n2024-02,2,x\n2024-03,3,y\n"), want: `column "note" holds text`},
		{name: "a quote never closed", file: []byte("month,units\n2024-01,\"1\n2024-02,2\n2024-03,3\n"), want: "line 2: a quote opens a cell here but is never closed"},
		{name: "words for numbers", file: []byte("month,units\n2024-01,one\n2024-02,two\n2024-03,three\n"), want: "no column holds numbers"},
		{name: "a number too large", file: []byte("month,units\n2024-01,1e400\n2024-02,2\n2024-03,3\n"), want: `"1e400" is not a number (too large)`},
		{name: "an infinity", file: []byte("month,units\n2024-01,Inf\n2024-02,2\n2024-03,3\n2024-04,4\n"), want: `"Inf" is not a number`},
		{name: "five thousand digits", file: []byte("month,units\n2024-01," + strings.Repeat("9", 5000) + "\n2024-02,2\n2024-03,3\n"), want: "more digits than a number can hold"},
		{name: "JSON instead of CSV", file: []byte(`[{"month":"2024-01","units":1},{"month":"2024-02","units":2}]` + "\n"), fileName: "orders.json", want: "text after its closing quote"},
		{name: "a page of HTML", file: []byte("<!doctype html><html><body><p>1</p></body></html>\n"), fileName: "orders.html", want: "column names but no rows of data"},
		// Short series read; the load step says they are too short
		// (see the step cases).
		{name: "one-point series", file: monthRows("5"), want: `"count":"1"`},
		{name: "three-point series", file: monthRows("5", "7", "6"), want: `"count":"3"`},
		{name: "constant series", file: monthRows(repeated(24, "42")...), want: "42"},
		{name: "a repeated column name", file: []byte("month,units,units\n2024-01,1,2\n2024-02,2,3\n2024-03,3,4\n"), want: `is called "units (2)"`},
	}
}

// stepCases are sessions with a bad step. Messages: the step language's
// and the runner's own (core/steps, core/steps/runner).
func stepCases() []badCase {
	load := "load " + demoMonthly + " value=units date=month"
	with := func(lines ...string) []string { return append([]string{load}, lines...) }
	return []badCase{
		{name: "unknown verb", lines: with("fetch everything"), want: "line 3, column 1: unknown verb `fetch`"},
		{name: "unknown option", lines: with("split last=12", "forecast ses widht=3"), want: "unknown option `widht` for `forecast ses`"},
		{name: "unknown method", lines: with("split last=12", "forecast bogus"), want: "unknown method `bogus`"},
		{name: "word for a number", lines: with("smooth centered width=twelve"), want: "line 3, column 23: `twelve` is not a whole number"},
		{name: "unknown choice", lines: with("split last=12", "forecast holt-winters season=sideways"), want: "`sideways` is not accepted for `season`"},
		{name: "unknown measure", lines: with("split last=12", "forecast naive", "evaluate by=accuracy"), want: "`accuracy` is not accepted for `by`"},
		{name: "option given twice", lines: with("split last=12 last=6"), want: "option `last` is given twice"},
		{name: "text without an option", lines: []string{"load " + demoMonthly + " extra"}, want: "expected an option written key=value"},
		{name: "unclosed quote in a step", lines: []string{"load " + demoMonthly + ` value="units`}, want: "has no closing `\"`"},
		{name: "a backwards range", lines: with("split last=12", "sweep ses alpha=0.5..0.1"), want: "runs backwards"},
		{name: "validation longer than the series", lines: with("split last=200"), want: "cannot hold out the last 200 periods of a 96-period series"},
		{name: "validation of zero periods", lines: with("split last=0"), want: "`0` is out of range for `last`"},
		{name: "horizon too long", lines: with("forecast naive horizon=100000"), want: "`100000` is out of range for `horizon`"},
		{name: "split from a period after the data", lines: with("split from=2099-01"), want: "2099-01 is not a period of the series"},
		{name: "split from a week in a monthly series", lines: with("split from=2024-W05"), want: "2024-W05 is not a period of the series"},
		{name: "smoothing wider than the series", lines: with("smooth centered width=10000"), want: "a width of 10000 is longer than the series"},
		{name: "interval level over 100", lines: with("forecast naive horizon=3 interval=150"), want: "`150` is out of range for `interval`"},
		{name: "a label used twice", lines: with("split last=12", "forecast naive as=x", "forecast ses as=x"), want: "the label `x` is already used by step 3"},
		{name: "check of a label never made", lines: with("split last=12", "forecast naive", "check nothing"), want: "no forecast is labelled `nothing`"},
		{name: "combine with no forecast", lines: with("split last=12", "combine of=a,b"), want: "`combine` needs a `forecast` first"},
		{name: "evaluate with no forecast", lines: with("split last=12", "evaluate"), want: "`evaluate` needs a `forecast` first"},
		{name: "split with no data", lines: []string{"split last=12"}, want: "`split` needs data first"},
		{name: "a file never attached", lines: []string{"load missing-orders.csv"}, want: `no file named "missing-orders.csv" is attached`},
		{name: "a column that is not there", lines: []string{"load " + demoMonthly + " value=revenue"}, want: `there is no column "revenue" for the values`},
		{name: "forecast with no split", lines: with("forecast holt-winters"), want: "`forecast` needs a `split` first"},
		{name: "multiplicative season on zeros", lines: []string{"load zeros.csv", "split last=6", "forecast holt-winters season=multiplicative"}, want: "holt-winters needs positive values"},
		{name: "multiplicative season on negatives", lines: []string{"load negative.csv", "decompose multiplicative"}, want: "needs values above zero"},
		{name: "MAPE on zeros", lines: []string{"load zeros.csv", "split last=6", "forecast naive", "evaluate by=mape"}, want: "No forecast has a defined MAPE % on the validation period"},
		{name: "MASE on a constant series", lines: []string{"load constant.csv", "split last=6", "forecast naive", "evaluate by=mase"}, want: "No forecast has a defined MASE on the validation period"},
		{name: "one-point series loaded", lines: []string{"load one-point.csv"}, want: "has 1 value; forecasting needs at least 3"},
		{name: "three-point series held out", lines: []string{"load three-point.csv", "split last=2"}, want: "so hold out at most 1"},
		{name: "holt-winters on a quarterly series too short", lines: []string{"load three-point.csv", "split last=1", "forecast holt-winters"}, want: "holt-winters needs at least"},
		{name: "a step waits on a failed one", lines: []string{"load missing-orders.csv", "split last=12"}, want: `no file named "missing-orders.csv"`},
	}
}

// stepFiles are attached before the step cases run; the catalogue
// removes them afterwards.
func stepFiles() map[string][]byte {
	return map[string][]byte{
		"zeros.csv":       monthRows(repeated(36, "0")...),
		"constant.csv":    monthRows(repeated(36, "42")...),
		"negative.csv":    monthRows(repeated(36, "-5")...),
		"one-point.csv":   monthRows("5"),
		"three-point.csv": monthRows("5", "7", "6"),
	}
}

// callCases misuse the page API and the store: each answer must be an
// error in plain words, never a fault. Messages: wasm (the bridge) and
// wasm/store.
func callCases() []badCase {
	return []badCase{
		{name: "open a session that is not stored", call: "openSession", args: []any{"0000000000000000"}, want: "it may have been deleted in another tab"},
		{name: "rename a session that is not stored", call: "renameSession", args: []any{"0000000000000000", "New title"}, want: "not found"},
		{name: "copy a session that is not stored", call: "duplicateSession", args: []any{"0000000000000000", "Copy"}, want: "not found"},
		{name: "save a session that is not JSON", call: "saveSession", args: []any{"{not json"}, want: "the session"},
		{name: "save over a newer version", call: "saveSession", args: []any{"$STALE"}, want: "another tab saved this session"},
		{name: "run a session that is not JSON", call: "run", args: []any{"[{"}, want: "the engine cannot read"},
		{name: "run a part of unknown kind", call: "run", args: []any{`[{"kind":"video","lines":null}]`}, want: `a part of kind "video"`},
		{name: "preview a dataset never attached", call: "preview", args: []any{"never-attached.csv"}, want: "never-attached.csv"},
		{name: "attach text instead of bytes", call: "attach", args: []any{"month,units", "x.csv"}, want: "did not pass the file's contents as bytes"},
		{name: "memo in an unknown format", call: "memo", args: []any{"docx"}, want: "docx"},
		{name: "export a session that is not JSON", call: "exportSession", args: []any{"nope", false}, want: "the engine cannot read"},
	}
}
