package chart

import "unicode/utf8"

// appendEscaped appends s to dst escaped for XML text and attribute values.
// The five markup characters become references; bytes that are not UTF-8
// and characters XML 1.0 cannot carry (control characters other than tab,
// line feed and carriage return; U+FFFE; U+FFFF) become U+FFFD. Carriage
// returns and line feeds become spaces, since labels are single lines.
func appendEscaped(dst []byte, s string) []byte {
	for i := 0; i < len(s); {
		c := s[i]
		if c < utf8.RuneSelf {
			switch {
			case c == '&':
				dst = append(dst, "&amp;"...)
			case c == '<':
				dst = append(dst, "&lt;"...)
			case c == '>':
				dst = append(dst, "&gt;"...)
			case c == '"':
				dst = append(dst, "&#34;"...)
			case c == '\'':
				dst = append(dst, "&#39;"...)
			case c == '\n' || c == '\r' || c == '\t':
				dst = append(dst, ' ')
			case c < 0x20 || c == 0x7f:
				dst = append(dst, "\uFFFD"...)
			default:
				dst = append(dst, c)
			}
			i++
			continue
		}
		r, size := utf8.DecodeRuneInString(s[i:])
		switch {
		case r == utf8.RuneError && size == 1, r == 0xFFFE, r == 0xFFFF,
			r >= 0x80 && r <= 0x9f:
			dst = append(dst, "\uFFFD"...)
		default:
			dst = append(dst, s[i:i+size]...)
		}
		i += size
	}
	return dst
}

// escape returns s escaped as by appendEscaped.
func escape(s string) string {
	return string(appendEscaped(nil, s))
}
