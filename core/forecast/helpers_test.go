package forecast

import (
	"math"
	"testing"

	"quillcast/core/internal/refdata"
)

// refCase is the common part of a reference case file (see the shared
// reference README, "Reading a case file from Go").
type refCase struct {
	ID   string `json:"id"`
	Data struct {
		Y []float64 `json:"y"`
	} `json:"data"`
	Tolerance struct {
		Abs float64 `json:"abs"`
		Rel float64 `json:"rel"`
	} `json:"tolerance"`
}

// readCase decodes reference/cases/<name>.json into v.
func readCase(t *testing.T, name string, v any) {
	t.Helper()
	refdata.ReadJSON(t, "reference/cases/"+name+".json", v)
}

// within reports whether got passes the reference rule |got-want| <= abs + rel*|want|.
func within(got, want, abs, rel float64) bool {
	return math.Abs(got-want) <= abs+rel*math.Abs(want)
}

// checkSlice compares got with want element by element; a nil want means
// "undefined" and got must be NaN there.
func checkSlice(t *testing.T, what string, got []float64, want []*float64, abs, rel float64) {
	t.Helper()
	if len(want) == 0 {
		t.Errorf("%s: no expected values (case file field missing?)", what)
	}
	if len(got) < len(want) {
		t.Errorf("%s: got %d values, want %d", what, len(got), len(want))
		return
	}
	bad := 0
	for i, w := range want {
		switch {
		case w == nil:
			if !math.IsNaN(got[i]) {
				t.Errorf("%s[%d] = %g, want undefined (NaN)", what, i, got[i])
				bad++
			}
		case !within(got[i], *w, abs, rel):
			t.Errorf("%s[%d] = %.12g, want %.12g", what, i, got[i], *w)
			bad++
		}
		if bad > 5 {
			t.Errorf("%s: further differences not shown", what)
			return
		}
	}
}

// checkFloats is checkSlice for expected values without undefined entries.
func checkFloats(t *testing.T, what string, got, want []float64, abs, rel float64) {
	t.Helper()
	w := make([]*float64, len(want))
	for i := range want {
		w[i] = &want[i]
	}
	checkSlice(t, what, got, w, abs, rel)
}

// mustFit fits m to y or stops the test.
func mustFit(t testing.TB, m Method, y []float64, season int) *Fit {
	t.Helper()
	f, err := m.Fit(y, season)
	if err != nil {
		t.Fatalf("%s: %v", m.Name(), err)
	}
	return f
}
