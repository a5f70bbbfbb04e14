package memo

import (
	"bytes"
	"encoding/csv"
	"slices"
	"testing"
)

func TestGuardCell(t *testing.T) {
	// Which leading characters a spreadsheet runs as a formula: common
	// practice (the usual advice on CSV injection names =, +, -, @, tab
	// and carriage return).
	tests := []struct{ in, want string }{
		{"=1+1", "'=1+1"},
		{`=HYPERLINK("http://x","y")`, `'=HYPERLINK("http://x","y")`},
		{"+cmd|' /C calc'!A0", "'+cmd|' /C calc'!A0"},
		{"-2+3", "'-2+3"},
		{"@SUM(A1)", "'@SUM(A1)"},
		{"\t=1", "'\t=1"},
		{"\r=1", "'\r=1"},
		{"＝1+1", "'＝1+1"},
		{"-12.5", "-12.5"},
		{"+3", "+3"},
		{"-1e-4", "-1e-4"},
		{".5", ".5"},
		{"-", "'-"},
		{"- 12", "'- 12"},
		{"2024-03", "2024-03"},
		{"hw", "hw"},
		{"", ""},
		{" =1", " =1"},
	}
	for _, tc := range tests {
		t.Run(tc.in, func(t *testing.T) {
			if got := GuardCell(tc.in); got != tc.want {
				t.Errorf("GuardCell(%q) = %q, want %q", tc.in, got, tc.want)
			}
		})
	}
}

func TestWriteCSV(t *testing.T) {
	s := Sheet{
		Header: ForecastHeader(),
		Rows: [][]string{
			{"2025-01", "hw", "1740.2", "1660.0", "1820.4", "1618.1", "1862.3"},
			{"2025-02", "=cmd()", "-12.5", "", "a,b", `say "hi"`, "line\nbreak"},
		},
	}
	var buf bytes.Buffer
	if err := WriteCSV(&buf, s); err != nil {
		t.Fatal(err)
	}
	want := "period,method,forecast,lo80,hi80,lo95,hi95\n" +
		"2025-01,hw,1740.2,1660.0,1820.4,1618.1,1862.3\n" +
		"2025-02,'=cmd(),-12.5,,\"a,b\",\"say \"\"hi\"\"\",\"line\nbreak\"\n"
	if buf.String() != want {
		t.Errorf("got\n%s\nwant\n%s", buf.String(), want)
	}
	// Reading it back gives the guarded cells.
	rows, err := csv.NewReader(&buf).ReadAll()
	if err != nil {
		t.Fatal(err)
	}
	if !slices.Equal(rows[2], []string{"2025-02", "'=cmd()", "-12.5", "", "a,b", `say "hi"`, "line\nbreak"}) {
		t.Errorf("read back %q", rows[2])
	}
}

func TestSafeURL(t *testing.T) {
	tests := []struct {
		url  string
		want bool
	}{
		{"https://example.com", true},
		{"HTTP://EXAMPLE.COM", true},
		{"mailto:a@example.com", true},
		{"report.pdf", true},
		{"#summary", true},
		{"/path/with:colon", true},
		{"?q=a:b", true},
		{"javascript:alert(1)", false},
		{" JavaScript:alert(1)", false},
		{"java\nscript:alert(1)", false},
		{"data:text/html;base64,PHNjcmlwdD4=", false},
		{"data:image/png;base64,iVBOR", false},
		{"vbscript:x", false},
		{"file:///etc/passwd", false},
		{"ftp://example.com", false},
	}
	for _, tc := range tests {
		t.Run(tc.url, func(t *testing.T) {
			if got := safeURL(tc.url); got != tc.want {
				t.Errorf("safeURL(%q) = %v, want %v", tc.url, got, tc.want)
			}
		})
	}
}
