package backtest

import (
	"errors"
	"reflect"
	"strings"
	"testing"

	"quillcast/core/accuracy"
	"quillcast/core/forecast"
)

func TestAutoSpec(t *testing.T) {
	t.Parallel()
	sp := AutoSpec()
	tests := []struct {
		name    string
		st      forecast.Settings
		want    Auto
		wantErr string
	}{
		{name: "defaults", st: nil, want: Auto{}},
		{
			name: "every setting",
			st: forecast.Settings{
				"of": {Word: "ses, damped"}, "combine": {Number: 2}, "origins": {Number: 12},
				"horizon": {Number: 4}, "by": {Word: "smape"},
			},
			want: Auto{Candidates: []string{"ses", "damped"}, Combine: 2, Origins: 12, Horizon: 4, By: accuracy.SMAPE},
		},
		{name: "unknown parameter", st: forecast.Settings{"alpha": {Number: 0.3}}, wantErr: `auto has no parameter "alpha"`},
		{name: "combine not whole", st: forecast.Settings{"combine": {Number: 2.5}}, wantErr: "combine=2.5"},
		{name: "origins zero", st: forecast.Settings{"origins": {Number: 0}}, wantErr: "from 1 to 500"},
		{name: "unknown measure", st: forecast.Settings{"by": {Word: "hunch"}}, wantErr: `by="hunch"`},
		{name: "unknown candidate", st: forecast.Settings{"of": {Word: "ses,oracle"}}, wantErr: `"oracle" is not a method`},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			m, err := sp.New(tt.st)
			if tt.wantErr != "" {
				if err == nil || !strings.Contains(err.Error(), tt.wantErr) || !errors.Is(err, forecast.ErrSetting) {
					t.Fatalf("error = %v, want one containing %q with cause ErrSetting", err, tt.wantErr)
				}
				return
			}
			if err != nil {
				t.Fatal(err)
			}
			if !reflect.DeepEqual(m, tt.want) {
				t.Errorf("got %+v, want %+v", m, tt.want)
			}
		})
	}
	if sp.Name != "auto" || (Auto{}).Name() != sp.Name {
		t.Errorf("spec name %q, want auto", sp.Name)
	}
}
