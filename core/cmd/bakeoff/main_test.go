package main

import (
	"bytes"
	"context"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

const smallData = "series,category,period,value,role\n" +
	"A,MICRO,2020-Q1,10,fit\nA,MICRO,2020-Q2,12,fit\nA,MICRO,2020-Q3,14,fit\nA,MICRO,2020-Q4,16,test\n"

func TestRun(t *testing.T) {
	t.Parallel()
	dir := t.TempDir()
	data := filepath.Join(dir, "data.csv")
	if err := os.WriteFile(data, []byte(smallData), 0o644); err != nil {
		t.Fatal(err)
	}
	out := filepath.Join(dir, "new", "folder", "f.csv")
	var stdout, stderr bytes.Buffer
	err := run(context.Background(), []string{"-data", data, "-forecasts", out, "-methods", "naive, drift", "-season", "1"}, &stdout, &stderr)
	if err != nil {
		t.Fatalf("run: %v (%s)", err, stderr.String())
	}
	got, err := os.ReadFile(out)
	if err != nil {
		t.Fatal(err)
	}
	// Hand calculation: naive repeats the last value, 14; drift adds the
	// mean step of the fit part, (14-10)/2 = 2, to give 16.
	want := "series,method,horizon,period,forecast\nA,naive,1,2020-Q4,14\nA,drift,1,2020-Q4,16\n"
	if string(got) != want {
		t.Errorf("forecasts file:\n%s\nwant:\n%s", got, want)
	}
	for _, s := range []string{"method", "drift", "naive", "2 forecasts written to"} {
		if !strings.Contains(stdout.String(), s) {
			t.Errorf("output lacks %q:\n%s", s, stdout.String())
		}
	}
}

func TestRunErrors(t *testing.T) {
	t.Parallel()
	dir := t.TempDir()
	bad := filepath.Join(dir, "bad.csv")
	if err := os.WriteFile(bad, []byte("series,category,period,value,role\nA,M,1,x,fit\n"), 0o644); err != nil {
		t.Fatal(err)
	}
	tests := []struct {
		name string
		args []string
		want string
	}{
		{"no data flag", nil, "no data file given"},
		{"missing file", []string{"-data", filepath.Join(dir, "none.csv")}, "cannot open the data file"},
		{"bad value", []string{"-data", bad}, `line 2, column 4 (value): "x" is not a number`},
		{"bad lag", []string{"-data", bad, "-lag", "0"}, "-lag 0 is not a lag"},
		{"bad season", []string{"-data", bad, "-season", "-2"}, "-season -2"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			var stdout, stderr bytes.Buffer
			err := run(context.Background(), tt.args, &stdout, &stderr)
			if err == nil || !strings.Contains(err.Error(), tt.want) {
				t.Errorf("error = %v, want one containing %q", err, tt.want)
			}
		})
	}
}
