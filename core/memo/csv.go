package memo

import (
	"encoding/csv"
	"io"
	"regexp"
	"strings"
)

// Sheet is a table for a CSV file: a header row and rows of already
// formatted cells (numbers written by format.Plain, so a program can read
// them back).
type Sheet struct {
	Header []string
	Rows   [][]string
}

// ForecastHeader returns the header of the forecasts file:
// period, method, forecast and the 80% and 95% interval bounds.
func ForecastHeader() []string {
	return []string{"period", "method", "forecast", "lo80", "hi80", "lo95", "hi95"}
}

// plainNumber matches a decimal number a spreadsheet reads as a number and
// never as a formula: "-12.5", "+3", "1e-4", ".5".
var plainNumber = regexp.MustCompile(`^[+-]?(?:[0-9]+(?:\.[0-9]*)?|\.[0-9]+)(?:[eE][+-]?[0-9]+)?$`)

// GuardCell returns s made safe to open in a spreadsheet: a cell starting
// with =, +, -, @, a tab or a carriage return (or their full-width forms)
// would be run as a formula, so it gets a single quote in front; a plain
// number such as -12.5 stays as it is so it still reads as a number.
func GuardCell(s string) string {
	if s == "" || plainNumber.MatchString(s) {
		return s
	}
	switch s[0] {
	case '=', '+', '-', '@', '\t', '\r':
		return "'" + s
	}
	for _, p := range []string{"＝", "＋", "－", "＠"} {
		if strings.HasPrefix(s, p) {
			return "'" + s
		}
	}
	return s
}

// WriteCSV writes s as comma-separated values with every cell passed
// through [GuardCell]; cells holding commas, quotes or line breaks are
// quoted. Rows may differ in length from the header.
func WriteCSV(w io.Writer, s Sheet) error {
	cw := csv.NewWriter(w)
	guard := func(row []string) []string {
		out := make([]string, len(row))
		for i, c := range row {
			out[i] = GuardCell(c)
		}
		return out
	}
	if len(s.Header) > 0 {
		if err := cw.Write(guard(s.Header)); err != nil {
			return err
		}
	}
	for _, row := range s.Rows {
		if err := cw.Write(guard(row)); err != nil {
			return err
		}
	}
	cw.Flush()
	return cw.Error()
}
