package bakeoff

import (
	"bytes"
	"context"
	"errors"
	"reflect"
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

// handSeries are two short series whose scores are worked by hand below.
func handSeries() []Series {
	return []Series{
		{Name: "A", FitPeriods: []string{"1", "2", "3"}, Fit: []float64{10, 12, 14}, TestPeriods: []string{"4", "5"}, Test: []float64{16, 12}},
		{Name: "B", FitPeriods: []string{"1", "2", "3", "4"}, Fit: []float64{5, 5, 7, 5}, TestPeriods: []string{"5"}, Test: []float64{10}},
	}
}

func TestRunHandMade(t *testing.T) {
	t.Parallel()
	res, err := Run(context.Background(), handSeries(), Options{Methods: []string{"naive", "mean"}})
	if err != nil {
		t.Fatal(err)
	}
	// Hand calculation, naive: A forecasts 14, 14 against 16, 12: sMAPE
	// 200*2/30 and 200*2/26, absolute errors 2 and 2 over A's scale
	// (2+2)/2 = 2; B forecasts 5 against 10: sMAPE 200*5/15, error 5 over
	// B's scale (0+2+2)/3 = 4/3. Means over the three periods.
	// Mean: A forecasts 12: sMAPE 200*4/28 and 0, errors 4 and 0; B
	// forecasts 5.5: sMAPE 200*4.5/15.5, error 4.5.
	want := map[string][2]float64{
		"naive": {(200*2.0/30 + 200*2.0/26 + 200*5.0/15) / 3, (1 + 1 + 5/(4.0/3)) / 3},
		"mean":  {(200*4.0/28 + 0 + 200*4.5/15.5) / 3, (2 + 0 + 4.5/(4.0/3)) / 3},
	}
	if len(res.Scores) != 2 {
		t.Fatalf("got %d scores, want 2", len(res.Scores))
	}
	for _, s := range res.Scores {
		w := want[s.Method]
		if s.Series != 2 || s.Points != 3 || !scalar.EqualWithinAbsOrRel(s.SMAPE.Value, w[0], 1e-12, 1e-12) || !scalar.EqualWithinAbsOrRel(s.MASE.Value, w[1], 1e-12, 1e-12) {
			t.Errorf("%s: series %d points %d sMAPE %v MASE %v, want 2, 3, %v, %v (hand calculation)", s.Method, s.Series, s.Points, s.SMAPE.Value, s.MASE.Value, w[0], w[1])
		}
	}
	// Hand calculation: mean 86.63/3 = 28.9 beats naive 95.38/3 = 31.8.
	if res.Scores[0].Method != "mean" {
		t.Errorf("first row %s, want mean (lower sMAPE)", res.Scores[0].Method)
	}
	var b bytes.Buffer
	if err := res.WriteForecasts(&b); err != nil {
		t.Fatal(err)
	}
	wantCSV := "series,method,horizon,period,forecast\n" +
		"A,naive,1,4,14\nA,naive,2,5,14\nA,mean,1,4,12\nA,mean,2,5,12\n" +
		"B,naive,1,5,5\nB,mean,1,5,5.5\n"
	if b.String() != wantCSV {
		t.Errorf("forecasts file:\n%s\nwant:\n%s", b.String(), wantCSV)
	}
}

func TestRunSkipsAndSeason(t *testing.T) {
	t.Parallel()
	data := handSeries()
	res, err := Run(context.Background(), data, Options{Methods: []string{"seasonal-naive", "naive"}})
	if err != nil {
		t.Fatal(err)
	}
	if len(res.Skips) != 2 || res.Skips[0].Method != "seasonal-naive" || !strings.Contains(res.Skips[0].Reason, "season") {
		t.Errorf("skips %+v, want seasonal-naive skipped on both series for want of a season", res.Skips)
	}
	var b bytes.Buffer
	if err := res.WriteTable(&b); err != nil {
		t.Fatal(err)
	}
	if !strings.Contains(b.String(), "seasonal-naive skipped 2 of 2 series") {
		t.Errorf("table does not explain the skip:\n%s", b.String())
	}
	// Season detection from period labels (series.ParsePeriod shapes).
	tests := []struct {
		label string
		o     Options
		want  int
	}{
		{"1984-Q1", Options{}, 4},
		{"2024-03", Options{}, 12},
		{"17", Options{}, 1},
		{"1984-Q1", Options{Season: 1}, 1},
		{"not a period", Options{}, 1},
	}
	for _, tt := range tests {
		if got := tt.o.seasonOf(Series{FitPeriods: []string{tt.label}}); got != tt.want {
			t.Errorf("season of %q with %+v = %d, want %d", tt.label, tt.o, got, tt.want)
		}
	}
}

func TestRunDeterministic(t *testing.T) {
	t.Parallel()
	var data []Series
	for i := range 30 {
		s := handSeries()[i%2]
		s.Name = string(rune('a'+i%26)) + s.Name + strings.Repeat("x", i/26)
		data = append(data, s)
	}
	o := Options{Methods: []string{"naive", "drift", "ses"}}
	one, err := Run(context.Background(), data, Options{Methods: o.Methods, Workers: 1})
	if err != nil {
		t.Fatal(err)
	}
	var calls int
	four, err := Run(context.Background(), data, Options{Methods: o.Methods, Workers: 4, Progress: func(done, total int) { calls++ }})
	if err != nil {
		t.Fatal(err)
	}
	if !reflect.DeepEqual(one, four) {
		t.Error("results differ between 1 and 4 workers")
	}
	if calls != len(data) {
		t.Errorf("progress called %d times, want %d", calls, len(data))
	}
}

func TestRunErrors(t *testing.T) {
	t.Parallel()
	if _, err := Run(context.Background(), handSeries(), Options{Methods: []string{"tea-leaves"}}); err == nil || !strings.Contains(err.Error(), `"tea-leaves" is not a method`) {
		t.Errorf("unknown method: error %v", err)
	}
	ctx, cancel := context.WithCancel(context.Background())
	cancel()
	if _, err := Run(ctx, handSeries(), Options{Methods: []string{"naive"}}); !errors.Is(err, context.Canceled) {
		t.Errorf("cancelled: error %v, want one wrapping context.Canceled", err)
	}
}

func TestRunConstantSeries(t *testing.T) {
	t.Parallel()
	data := append(handSeries(), Series{Name: "C", FitPeriods: []string{"1", "2", "3"}, Fit: []float64{4, 4, 4}, TestPeriods: []string{"4"}, Test: []float64{5}})
	res, err := Run(context.Background(), data, Options{Methods: []string{"naive"}})
	if err != nil {
		t.Fatal(err)
	}
	s := res.Scores[0]
	// Hand calculation: MASE over A and B only, as in TestRunHandMade; C's
	// fit part is constant, so its MASE has no scale.
	if s.MASEOut != 1 || !scalar.EqualWithinAbsOrRel(s.MASE.Value, (1+1+5/(4.0/3))/3, 1e-12, 1e-12) {
		t.Errorf("MASE %v leaving out %d series, want %v leaving out 1", s.MASE.Value, s.MASEOut, (1+1+5/(4.0/3))/3)
	}
	var b bytes.Buffer
	if err := res.WriteTable(&b); err != nil {
		t.Fatal(err)
	}
	if !strings.Contains(b.String(), "the mean MASE leaves out 1 series where it is undefined, for example series C") {
		t.Errorf("table does not explain the missing MASE:\n%s", b.String())
	}
}
