package steps

import (
	"strings"
	"unicode/utf8"
)

// token is one whitespace-separated piece of a step line, with quoted text
// unquoted in val; col is the 1-based character column of its first
// character, eq the character offset of the first '=' outside quotes
// (-1 when none), and valCol the column just after that '='.
type token struct {
	raw    string
	key    string // text before the '=' (or the whole token when none)
	val    string // text after the '=', quotes removed
	col    int
	eq     int
	valCol int
	quoted bool
}

// lexError is a problem found while splitting a line, at a 1-based column.
type lexError struct {
	col int
	msg string
}

// lex splits a step line into tokens and its comment. Columns count
// characters from 1 at the start of the line.
func lex(line string) ([]token, string, *lexError) {
	var toks []token
	col := 1
	i := 0
	for i < len(line) {
		c := line[i]
		if c == ' ' || c == '\t' || c == '\r' {
			i++
			col++
			continue
		}
		if c == '#' {
			return toks, line[i+1:], nil
		}
		tok, n, cols, err := lexToken(line[i:], col)
		if err != nil {
			return toks, "", err
		}
		toks = append(toks, tok)
		i += n
		col += cols
	}
	return toks, "", nil
}

// lexToken reads one token from s, which starts at column col. It returns
// the token, the bytes and characters it took.
func lexToken(s string, col int) (token, int, int, *lexError) {
	t := token{col: col, eq: -1}
	var key, val strings.Builder
	cur := &key
	i, chars := 0, 0
	for i < len(s) {
		r, size := utf8.DecodeRuneInString(s[i:])
		if r == ' ' || r == '\t' || r == '\r' || r == '#' {
			break
		}
		if r == utf8.RuneError && size == 1 {
			return t, 0, 0, &lexError{col + chars, "the line holds bytes that are not text; retype the line"}
		}
		if r == '=' && t.eq < 0 {
			t.eq = chars
			t.valCol = col + chars + 1
			cur = &val
			i += size
			chars++
			continue
		}
		if r == '"' {
			start := col + chars
			i += size
			chars++
			closed := false
			for i < len(s) {
				q, qs := utf8.DecodeRuneInString(s[i:])
				if q == utf8.RuneError && qs == 1 {
					return t, 0, 0, &lexError{col + chars, "the line holds bytes that are not text; retype the line"}
				}
				i += qs
				chars++
				if q == '\\' && i < len(s) {
					e, es := utf8.DecodeRuneInString(s[i:])
					i += es
					chars++
					cur.WriteRune(e)
					continue
				}
				if q == '"' {
					closed = true
					break
				}
				cur.WriteRune(q)
			}
			if !closed {
				return t, 0, 0, &lexError{start, "the quoted text starting here has no closing `\"`; add one at its end"}
			}
			t.quoted = true
			continue
		}
		cur.WriteRune(r)
		i += size
		chars++
	}
	t.raw = s[:i]
	t.key = key.String()
	t.val = val.String()
	return t, i, chars, nil
}
