package series

import (
	"bytes"
	"fmt"
	"unicode/utf8"
)

// This file looks at the raw bytes before anything is split: size,
// encoding, and which character separates cells.

// delimiters are the cell separators detected, in order of preference when
// several fit the first lines equally well.
var delimiters = [...]byte{'\t', ';', '|', ','}

// delimiterName returns the plain name of a delimiter.
func delimiterName(d byte) string {
	switch d {
	case '\t':
		return "tabs"
	case ';':
		return "semicolons"
	case '|':
		return "vertical bars"
	case ',':
		return "commas"
	}
	return "nothing (one column)"
}

// checkBytes refuses files that are too large, empty, or not UTF-8 text,
// and returns data without a UTF-8 byte-order mark.
func checkBytes(data []byte, limit int) ([]byte, error) {
	if len(data) > limit {
		return nil, &ParseError{Err: ErrTooLarge, Msg: fmt.Sprintf(
			"the file holds %s, more than the %s this page reads at once; split it into smaller files or keep only the columns you need",
			sizeText(len(data)), sizeText(limit))}
	}
	if bytes.HasPrefix(data, []byte{0xFF, 0xFE}) || bytes.HasPrefix(data, []byte{0xFE, 0xFF}) {
		return nil, &ParseError{Err: ErrEncoding, Msg: "the file is saved as UTF-16 text; save it again as UTF-8 (often called \"CSV UTF-8\") and load it again"}
	}
	if bytes.HasPrefix(data, []byte("PK\x03\x04")) {
		return nil, &ParseError{Err: ErrEncoding, Msg: "the file is a workbook or another zipped file, not text; save the sheet as CSV and load that"}
	}
	data = bytes.TrimPrefix(data, []byte{0xEF, 0xBB, 0xBF})
	head := data[:min(len(data), 4096)]
	if z := bytes.Count(head, []byte{0}); z > 0 {
		if z*3 >= len(head) {
			return nil, &ParseError{Err: ErrEncoding, Msg: "the file looks like UTF-16 text without a byte-order mark; save it again as UTF-8 (often called \"CSV UTF-8\") and load it again"}
		}
		return nil, &ParseError{Line: 1 + countBreaks(head[:bytes.IndexByte(head, 0)]), Err: ErrEncoding,
			Msg: "the file holds binary data, not text; export the data as CSV or TSV and load that"}
	}
	if bytes.IndexByte(data, 0) >= 0 {
		i := bytes.IndexByte(data, 0)
		return nil, &ParseError{Line: 1 + countBreaks(data[:i]), Err: ErrEncoding,
			Msg: "the file holds binary data, not text; export the data as CSV or TSV and load that"}
	}
	if !utf8.Valid(data) {
		i := invalidUTF8(data)
		return nil, &ParseError{Line: 1 + countBreaks(data[:i]), Err: ErrEncoding,
			Msg: "the file is not UTF-8 text (it may be saved in an older encoding such as Windows-1252); save it again as UTF-8 (often called \"CSV UTF-8\") and load it again"}
	}
	if len(bytes.TrimSpace(data)) == 0 {
		return nil, &ParseError{Err: ErrEmpty, Msg: "the file is empty; load a file with a header line and at least one row of data"}
	}
	return data, nil
}

// invalidUTF8 returns the offset of the first byte of data that does not
// start valid UTF-8, or len(data).
func invalidUTF8(data []byte) int {
	for i := 0; i < len(data); {
		r, size := utf8.DecodeRune(data[i:])
		if r == utf8.RuneError && size <= 1 {
			return i
		}
		i += size
	}
	return len(data)
}

// sizeText writes a byte count for people: "312 bytes", "4.2 MB".
func sizeText(n int) string {
	switch {
	case n < 1000:
		return fmt.Sprintf("%d bytes", n)
	case n < 1000*1000:
		return fmt.Sprintf("%.1f kB", float64(n)/1e3)
	}
	return fmt.Sprintf("%.1f MB", float64(n)/1e6)
}

// maxTitleLines is the most lines above a table that are taken for a title
// and left out.
const maxTitleLines = 5

// sniffDelimiter picks the delimiter from the first lines of data: the
// candidate that appears the same number of times (outside quotes) on every
// sampled line (title lines at the top aside), preferring more columns,
// then tab, semicolon, bar, comma.
// It returns 0 when no candidate appears: a file of one column.
func sniffDelimiter(data []byte) byte {
	const sample = 40
	var counts [sample][len(delimiters)]int
	var letters [sample]bool
	lines := 0
	inQuote := false
	blank := true
	for i := 0; i < len(data) && lines < sample; i++ {
		c := data[i]
		if c|0x20 >= 'a' && c|0x20 <= 'z' {
			letters[lines] = true
		}
		if c == '"' {
			inQuote = !inQuote
			blank = false
			continue
		}
		if inQuote {
			continue
		}
		if c == '\n' || c == '\r' {
			if !blank {
				lines++
			}
			blank = true
			continue
		}
		if c != ' ' {
			blank = false
		}
		for k, d := range delimiters {
			if c == d {
				counts[lines][k]++
			}
		}
	}
	if !blank && lines < sample {
		lines++
	}
	best, bestCols := byte(0), 0
	for k, d := range delimiters {
		// Title lines above the table may lack the delimiter.
		// They must sit above a line of column names.
		top := 0
		for top < min(lines-1, maxTitleLines) && counts[top][k] == 0 {
			top++
		}
		if top > 0 && !letters[top] {
			continue
		}
		n := counts[top][k]
		same := n > 0
		for l := top + 1; l < lines && same; l++ {
			same = counts[l][k] == n
		}
		if same && n > bestCols {
			best, bestCols = d, n
		}
	}
	if best != 0 {
		return best
	}
	// No candidate is even on every line (ragged rows): take the one most
	// frequent on the first line, so that the rows can be reported.
	for k, d := range delimiters {
		if n := counts[0][k]; n > bestCols {
			best, bestCols = d, n
		}
	}
	return best
}
