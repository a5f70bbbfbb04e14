package bakeoff

import (
	"context"
	"os"
	"strings"
	"testing"

	"quillcast/core/internal/refdata"
)

// readShared reads a competition file from the shared check folder.
func readShared(tb testing.TB, rel string) []Series {
	tb.Helper()
	f, err := os.Open(refdata.Path(tb, rel))
	if err != nil {
		tb.Fatal(err)
	}
	defer f.Close()
	data, err := Read(f)
	if err != nil {
		tb.Fatal(err)
	}
	return data
}

// TestCompetitionOther runs the bake-off on the 174 "other" series of the
// M3 competition (competition/m3-other.csv, horizon 8, no season) and
// checks the automatic choice against the best published single method:
// theta, mean sMAPE 4.41 (competition/README.md, recomputed there from the
// submitted forecasts; Makridakis and Hibon 2000, International Journal of
// Forecasting 16(4), 451-476).
func TestCompetitionOther(t *testing.T) {
	t.Parallel()
	data := readShared(t, "competition/m3-other.csv")
	if len(data) != 174 {
		t.Fatalf("read %d series, want 174 (competition/README.md)", len(data))
	}
	res, err := Run(context.Background(), data, Options{Methods: []string{"naive2", "ses", "holt", "damped", "theta", "auto"}})
	if err != nil {
		t.Fatal(err)
	}
	var table strings.Builder
	if err := res.WriteTable(&table); err != nil {
		t.Fatal(err)
	}
	t.Logf("M3 other, 174 series, horizon 8:\n%s", table.String())
	for _, s := range res.Scores {
		if s.Method != "auto" {
			continue
		}
		// Published theta sMAPE 4.41 (competition/README.md).
		if !s.SMAPE.Defined || s.SMAPE.Value >= 4.41 || s.Series != 174 {
			t.Errorf("auto: sMAPE %v over %d series, want below 4.41 over 174 (theta, competition/README.md)", s.SMAPE, s.Series)
		}
	}
}

// BenchmarkBakeoffQuarterly runs every method and auto on the 756
// quarterly M3 series (competition/m3-quarterly.csv, season 4), end to end
// from the parsed file to the scores. It is skipped without the shared
// check folder.
func BenchmarkBakeoffQuarterly(b *testing.B) {
	if refdata.Root() == "" {
		b.Skip("the shared check folder is not beside the checkout")
	}
	data := readShared(b, "competition/m3-quarterly.csv")
	b.Run("series=756", func(b *testing.B) {
		b.ReportAllocs()
		for b.Loop() {
			if _, err := Run(context.Background(), data, Options{}); err != nil {
				b.Fatal(err)
			}
		}
	})
}
