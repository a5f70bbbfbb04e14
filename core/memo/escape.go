package memo

import (
	"strings"
	"unicode/utf8"
)

// This file keeps text from turning into Markdown markup it did not mean.

// inlineSpecial are the characters that can start or end inline markup in
// CommonMark with GFM tables and strikethrough; each is backslash-escaped.
const inlineSpecial = "\\`*_[]<>|&~!#"

// escapeInline returns s as Markdown inline text that reads back as s: the
// characters that could open markup are backslash-escaped, line breaks,
// tabs, vertical tabs and form feeds become spaces, NUL and broken UTF-8
// become U+FFFD, and the result is trimmed of spaces.
func escapeInline(s string) string {
	var b strings.Builder
	b.Grow(len(s) + 8)
	for i := 0; i < len(s); {
		c := s[i]
		if c < utf8.RuneSelf {
			switch {
			case strings.IndexByte(inlineSpecial, c) >= 0:
				b.WriteByte('\\')
				b.WriteByte(c)
			case c == '\n' || c == '\r' || c == '\t' || c == '\v' || c == '\f':
				b.WriteByte(' ')
			case c == 0:
				b.WriteString("\uFFFD")
			default:
				b.WriteByte(c)
			}
			i++
			continue
		}
		r, size := utf8.DecodeRuneInString(s[i:])
		if r == utf8.RuneError && size == 1 {
			b.WriteString("\uFFFD")
		} else {
			b.WriteString(s[i : i+size])
		}
		i += size
	}
	return strings.Trim(b.String(), " ")
}

// escapeCell returns s escaped for a cell of a GFM table; see escapeInline.
// An empty result is fine: the cell shows empty.
func escapeCell(s string) string {
	return escapeInline(s)
}

// guardProse returns the user's Markdown ready to sit between other blocks
// of the memo without swallowing them: a line that would open a raw HTML
// block gets a backslash before its "<" (raw HTML is left out of the memo
// anyway), a code fence left open is closed, and NUL becomes U+FFFD.
func guardProse(text string) string {
	text = strings.ReplaceAll(strings.ToValidUTF8(text, "\uFFFD"), "\x00", "\uFFFD")
	text = strings.ReplaceAll(strings.ReplaceAll(text, "\r\n", "\n"), "\r", "\n")
	lines := strings.Split(strings.Trim(text, "\n"), "\n")
	fence := ""
	for i, line := range lines {
		trimmed := strings.TrimLeft(line, " ")
		indent := len(line) - len(trimmed)
		if fence != "" {
			if indent < 4 && strings.HasPrefix(trimmed, fence) && strings.Trim(trimmed, fence[:1]+" \t") == "" {
				fence = ""
			}
			continue
		}
		if indent >= 4 {
			continue
		}
		if f := fenceOpener(trimmed); f != "" {
			fence = f
			continue
		}
		if strings.HasPrefix(trimmed, "<") {
			lines[i] = line[:indent] + "\\" + trimmed
		}
	}
	out := strings.Join(lines, "\n")
	if fence != "" {
		out += "\n" + fence
	}
	return out
}

// fenceOpener returns the run of three or more backticks or tildes that
// opens a code fence at the start of line, or "".
func fenceOpener(line string) string {
	if len(line) < 3 || (line[0] != '`' && line[0] != '~') {
		return ""
	}
	n := 0
	for n < len(line) && line[n] == line[0] {
		n++
	}
	if n < 3 || (line[0] == '`' && strings.Contains(line[n:], "`")) {
		return ""
	}
	return line[:n]
}

// codeFence returns a backtick fence longer than any run of backticks in
// text, at least three long.
func codeFence(text string) string {
	longest, run := 0, 0
	for i := 0; i < len(text); i++ {
		if text[i] == '`' {
			run++
			longest = max(longest, run)
		} else {
			run = 0
		}
	}
	return strings.Repeat("`", max(3, longest+1))
}

// oneLine joins the lines of a list item with spaces.
func oneLine(s string) string {
	s = strings.ReplaceAll(s, "\r\n", " ")
	return strings.NewReplacer("\n", " ", "\r", " ").Replace(s)
}
