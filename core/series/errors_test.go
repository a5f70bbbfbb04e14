package series

import (
	"errors"
	"fmt"
	"strings"
	"testing"
)

func TestErrorList(t *testing.T) {
	t.Parallel()
	// 30 lines with two bad cells each: one error per line, at most 20 in all.
	var b strings.Builder
	b.WriteString("month,a,b\n")
	for i := range 120 {
		cell := fmt.Sprint(i)
		if i%4 == 0 {
			cell = "x"
		}
		fmt.Fprintf(&b, "%s,%s,%s\n", NewMonth(2020, 1+i), cell, cell)
	}
	_, err := Read([]byte(b.String()), "many.csv", ReadOptions{})
	var list ErrorList
	if !errors.As(err, &list) {
		t.Fatalf("error %v is not an ErrorList", err)
	}
	if len(list) != maxErrors {
		t.Errorf("%d errors, want %d", len(list), maxErrors)
	}
	seen := map[int]bool{}
	for i, e := range list {
		if seen[e.Line] {
			t.Errorf("line %d reported twice", e.Line)
		}
		seen[e.Line] = true
		if i > 0 && e.Line < list[i-1].Line {
			t.Errorf("errors out of line order: %d after %d", e.Line, list[i-1].Line)
		}
	}
	if !errors.Is(err, ErrNotNumber) {
		t.Error("errors.Is(err, ErrNotNumber) is false")
	}
	var pe *ParseError
	if !errors.As(err, &pe) || pe.Line != 2 || pe.Column != 2 || pe.Name != "a" || pe.Cell != "x" {
		t.Errorf("first error %#v, want line 2, column 2 \"a\", cell \"x\"", pe)
	}
	if want := fmt.Sprintf("(and %d more problems)", maxErrors-1); !strings.HasSuffix(err.Error(), want) {
		t.Errorf("message %q does not end with %q", err, want)
	}
}

func TestParseErrorMessage(t *testing.T) {
	t.Parallel()
	tests := []struct {
		name string
		err  ParseError
		want string
	}{
		{"line and named column", ParseError{Line: 14, Column: 2, Name: "units", Msg: `"12,5O" is not a number`}, `line 14, column "units": "12,5O" is not a number`},
		{"line and numbered column", ParseError{Line: 3, Column: 4, Msg: "m"}, "line 3, column 4: m"},
		{"line only", ParseError{Line: 7, Msg: "m"}, "line 7: m"},
		{"column only", ParseError{Column: 1, Name: "month", Msg: "m"}, `column "month": m`},
		{"whole file", ParseError{Msg: "m"}, "m"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			if got := tt.err.Error(); got != tt.want {
				t.Errorf("got %q, want %q", got, tt.want)
			}
		})
	}
}

func TestFingerprint(t *testing.T) {
	t.Parallel()
	// SHA-256 of the empty input starts e3b0c44298fc1c14 (FIPS 180-4 test
	// vector, common practice).
	if got := Fingerprint(nil); got != "e3b0c44298fc1c14" {
		t.Errorf("Fingerprint(nil) = %s", got)
	}
	if Fingerprint([]byte("a")) == Fingerprint([]byte("b")) {
		t.Error("different bytes share a fingerprint")
	}
}
