package bakeoff

import (
	"bytes"
	"encoding/csv"
	"fmt"
	"reflect"
	"strconv"
	"strings"
	"testing"
)

var readTests = []struct {
	name    string
	input   string
	want    []Series
	wantErr string
}{
	{
		name: "two series",
		input: "series,category,period,value,role\n" +
			"A,MICRO,1,10,fit\nA,MICRO,2,11.5,fit\nA,MICRO,3,12,test\n" +
			"B,MACRO,2024-Q1,-3,fit\nB,MACRO,2024-Q2,4,test\nB,MACRO,2024-Q3,5,test\n",
		want: []Series{
			{Name: "A", Category: "MICRO", FitPeriods: []string{"1", "2"}, Fit: []float64{10, 11.5}, TestPeriods: []string{"3"}, Test: []float64{12}},
			{Name: "B", Category: "MACRO", FitPeriods: []string{"2024-Q1"}, Fit: []float64{-3}, TestPeriods: []string{"2024-Q2", "2024-Q3"}, Test: []float64{4, 5}},
		},
	},
	{
		name:  "columns in another order with an extra one",
		input: "role,value,note,period,series,category\nfit,1,x,1,S,C\ntest,2,y,2,S,C\n",
		want:  []Series{{Name: "S", Category: "C", FitPeriods: []string{"1"}, Fit: []float64{1}, TestPeriods: []string{"2"}, Test: []float64{2}}},
	},
	{name: "empty file", input: "", wantErr: "the file is empty"},
	{name: "header only", input: "series,category,period,value,role\n", wantErr: "no rows"},
	{name: "missing column", input: "series,category,period,value\nA,B,1,2\n", wantErr: `line 1: the header has no column "role"`},
	{name: "value not a number", input: "series,category,period,value,role\nA,M,1,ten,fit\n", wantErr: `line 2, column 4 (value): "ten" is not a number`},
	{name: "infinite value", input: "series,category,period,value,role\nA,M,1,Inf,fit\n", wantErr: "line 2, column 4"},
	{name: "unknown role", input: "series,category,period,value,role\nA,M,1,2,train\n", wantErr: `line 2, column 5 (role): "train" is not a role`},
	{name: "fit after test", input: "series,category,period,value,role\nA,M,1,2,fit\nA,M,2,2,test\nA,M,3,2,fit\n", wantErr: "line 4, column 5 (role): series A has a fit row after its test rows"},
	{name: "no test rows", input: "series,category,period,value,role\nA,M,1,2,fit\n", wantErr: "series A has no test rows"},
	{name: "no fit rows", input: "series,category,period,value,role\nA,M,1,2,test\n", wantErr: "series A has no fit rows"},
	{name: "short row", input: "series,category,period,value,role\nA,M,1\n", wantErr: "line 2: the row has 3 fields"},
	{name: "empty series name", input: "series,category,period,value,role\n,M,1,2,fit\n", wantErr: "line 2, column 1 (series)"},
	{name: "bad quote", input: "series,category,period,value,role\nA,\"M,1,2,fit\n", wantErr: "check the quotes"},
}

func TestRead(t *testing.T) {
	t.Parallel()
	for _, tt := range readTests {
		t.Run(tt.name, func(t *testing.T) {
			got, err := Read(strings.NewReader(tt.input))
			if tt.wantErr != "" {
				if err == nil || !strings.Contains(err.Error(), tt.wantErr) {
					t.Fatalf("Read(%q) error = %v, want one containing %q", tt.input, err, tt.wantErr)
				}
				return
			}
			if err != nil {
				t.Fatalf("Read(%q): %v", tt.input, err)
			}
			if !reflect.DeepEqual(got, tt.want) {
				t.Errorf("Read(%q)\n got %+v\nwant %+v", tt.input, got, tt.want)
			}
		})
	}
}

// FuzzRead checks that Read never panics, that error positions lie inside
// the input, and that what it reads writes back and reads again the same.
func FuzzRead(f *testing.F) {
	for _, tt := range readTests {
		f.Add(tt.input)
	}
	f.Fuzz(func(t *testing.T, input string) {
		got, err := Read(strings.NewReader(input))
		if err != nil {
			var line int
			if _, scanErr := fmt.Sscanf(err.Error(), "line %d", &line); scanErr == nil {
				if lines := strings.Count(input, "\n") + 1; line < 1 || line > lines {
					t.Fatalf("error on line %d of a %d-line input: %v", line, lines, err)
				}
			}
			return
		}
		var b bytes.Buffer
		w := csv.NewWriter(&b)
		w.Write([]string{"series", "category", "period", "value", "role"})
		for _, s := range got {
			write := func(periods []string, values []float64, role string) {
				for i, v := range values {
					w.Write([]string{s.Name, s.Category, periods[i], strconv.FormatFloat(v, 'g', -1, 64), role})
				}
			}
			write(s.FitPeriods, s.Fit, "fit")
			write(s.TestPeriods, s.Test, "test")
		}
		w.Flush()
		again, err := Read(&b)
		if err != nil {
			t.Fatalf("reading back: %v\n%s", err, b.String())
		}
		if !reflect.DeepEqual(got, again) {
			t.Fatalf("read back differs:\n got %+v\nwant %+v", again, got)
		}
	})
}
