package series

import (
	"bytes"
	"errors"
	"math"
	"os"
	"path/filepath"
	"testing"
)

// FuzzRead checks that Read never panics, that every error and problem
// points inside the input (lines from 1 to the number of lines, columns
// from 1 to the number of columns), and that every series it returns is
// consistent: written out with canonical period labels and read again, it
// gives the same periods and values. The seed corpus is the table of shapes and the bad-input
// catalogue, so plain `go test` runs it.
func FuzzRead(f *testing.F) {
	for _, tt := range readTests {
		f.Add([]byte(tt.in))
	}
	files, _ := filepath.Glob(filepath.Join("testdata", "bad", "*.csv"))
	for _, file := range files {
		if b, err := os.ReadFile(file); err == nil {
			f.Add(b)
		}
	}
	f.Fuzz(func(t *testing.T, data []byte) {
		lines := 1 + countBreaks(data)
		ds, err := Read(data, "fuzz.csv", ReadOptions{MaxBytes: 1 << 16})
		if err != nil {
			var list ErrorList
			if !errors.As(err, &list) || len(list) == 0 {
				t.Fatalf("error %v is not a non-empty ErrorList", err)
			}
			for _, e := range list {
				if e.Line < 0 || e.Line > lines {
					t.Errorf("error %q: line %d outside 0..%d", e, e.Line, lines)
				}
				if e.Column < 0 || e.Column > bytes.Count(data, []byte{','})+bytes.Count(data, []byte{';'})+bytes.Count(data, []byte{'\t'})+bytes.Count(data, []byte{'|'})+1 {
					t.Errorf("error %q: column %d outside the input", e, e.Column)
				}
				if e.Msg == "" || e.Err == nil {
					t.Errorf("error without message or cause: %#v", e)
				}
			}
			return
		}
		for _, p := range ds.Problems {
			if p.Line < 0 || p.Line > lines || p.Column < 0 || p.Column > len(ds.Columns) {
				t.Errorf("problem %q: line %d, column %d outside the input (%d lines, %d columns)", p, p.Line, p.Column, lines, len(ds.Columns))
			}
		}
		if len(ds.Series) == 0 {
			t.Fatal("Read succeeded without a series")
		}
		roundTrip(t, ds.Series[0])
		for i, s := range ds.Series {
			if s.Len() == 0 || s.Start.Freq != ds.Frequency {
				t.Fatalf("series %q: %d values, frequency %s in a %s dataset", s.Name, s.Len(), s.Start.Freq, ds.Frequency)
			}
			// Only an unresolved duplicate period leaves an end missing.
			if ds.Ready(i) && (math.IsNaN(s.Values[0]) || math.IsNaN(s.Values[s.Len()-1])) {
				t.Errorf("series %q is ready but starts or ends with a missing value", s.Name)
			}
			if i, ok := s.IndexOf(s.End()); !ok || i != s.Len()-1 {
				t.Errorf("series %q: End %s at %d, %v", s.Name, s.End(), i, ok)
			}
		}
	})
}

// roundTrip writes s as a two-column file with canonical labels, reads it
// back and compares, ignoring missing values at either end (Read trims
// them).
func roundTrip(t *testing.T, s *Series) {
	t.Helper()
	lo, hi := 0, s.Len()-1
	for lo <= hi && math.IsNaN(s.Values[lo]) {
		lo++
	}
	for hi >= lo && math.IsNaN(s.Values[hi]) {
		hi--
	}
	if lo > hi {
		return
	}
	var b bytes.Buffer
	b.WriteString("period,value\n")
	for i := lo; i <= hi; i++ {
		b.Write(s.PeriodAt(i).AppendText(nil))
		b.WriteByte(',')
		if math.IsNaN(s.Values[i]) {
			b.WriteString("NA")
		} else {
			b.WriteString(formatValue(s.Values[i]))
		}
		b.WriteByte('\n')
	}
	back, err := Read(b.Bytes(), "round.csv", ReadOptions{DecimalMark: '.', Frequency: s.Frequency()})
	if err != nil {
		t.Fatalf("series %q written as\n%s\ndoes not read back: %v", s.Name, b.Bytes(), err)
	}
	got := back.Series[0]
	if got.Start != s.PeriodAt(lo) || got.Len() != hi-lo+1 {
		t.Fatalf("series %q: wrote %d values from %s, read %d from %s", s.Name, hi-lo+1, s.PeriodAt(lo), got.Len(), got.Start)
	}
	for i, v := range got.Values {
		w := s.Values[lo+i]
		if math.IsNaN(v) != math.IsNaN(w) || !math.IsNaN(w) && v != w {
			t.Fatalf("series %q at %s: wrote %v, read %v", s.Name, got.PeriodAt(i), w, v)
		}
	}
}
