package series

import "bytes"

// This file holds what every cell reader shares: trimming and the markers
// of a missing value.

// isMissing reports whether a trimmed cell means "no value": empty, NA,
// N/A, NaN, null, none, missing, #N/A, -, --, a dash, ".", "?", or one of
// the extra markers given.
func isMissing(b []byte, extra []string) bool {
	switch {
	case len(b) == 0:
		return true
	case b[0] >= '0' && b[0] <= '9':
		return false
	case len(b) == 1:
		return b[0] == '-' || b[0] == '.' || b[0] == '?'
	}
	if len(b) <= 8 {
		var low [8]byte
		for i, c := range b {
			if c >= 'A' && c <= 'Z' {
				c += 'a' - 'A'
			}
			low[i] = c
		}
		switch string(low[:len(b)]) {
		case "na", "n/a", "n.a.", "nan", "null", "none", "missing", "#n/a", "--", "\u2013", "\u2014":
			return true
		}
	}
	for _, m := range extra {
		if len(m) == len(b) && bytes.EqualFold(b, []byte(m)) {
			return true
		}
	}
	return false
}

// trimCell trims ASCII spaces, tabs and no-break spaces from both ends.
func trimCell(b []byte) []byte {
	if n := len(b); n == 0 || b[0] > ' ' && b[0] != 0xC2 && b[n-1] > ' ' && b[n-1] != 0xA0 {
		return b
	}
	return trimSpaces(b)
}

// trimSpaces is trimCell for cells that may start or end with a space.
func trimSpaces(b []byte) []byte {
	for len(b) > 0 {
		if b[0] == ' ' || b[0] == '\t' {
			b = b[1:]
		} else if len(b) >= 2 && b[0] == 0xC2 && b[1] == 0xA0 {
			b = b[2:]
		} else {
			break
		}
	}
	for len(b) > 0 {
		if c := b[len(b)-1]; c == ' ' || c == '\t' {
			b = b[:len(b)-1]
		} else if len(b) >= 2 && b[len(b)-2] == 0xC2 && b[len(b)-1] == 0xA0 {
			b = b[:len(b)-2]
		} else {
			break
		}
	}
	return b
}
