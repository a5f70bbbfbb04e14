package backtest

import (
	"strings"
	"testing"
)

func TestHoldoutSplit(t *testing.T) {
	t.Parallel()
	tests := []struct {
		name    string
		n       int
		h       Holdout
		want    Split
		wantErr string
	}{
		// Hand calculation: 100 periods, last 12 held out, training [0, 88).
		{name: "last 12 of 100", n: 100, h: Holdout{Last: 12}, want: Split{N: 100, TrainEnd: 88}},
		// Hand calculation: validation from position 40, training [0, 40).
		{name: "from position 40", n: 100, h: Holdout{Start: 40}, want: Split{N: 100, TrainEnd: 40}},
		// Hand calculation: 10 periods, at most 10-2 = 8 held out.
		{name: "last 8 of 10 is the limit", n: 10, h: Holdout{Last: 8}, want: Split{N: 10, TrainEnd: 2}},
		{name: "last 9 of 10 too long", n: 10, h: Holdout{Last: 9}, wantErr: "hold out at most 8"},
		{name: "two full seasons needed", n: 30, h: Holdout{Last: 12, MinTraining: 24}, wantErr: "hold out at most 6"},
		{name: "start past the end", n: 10, h: Holdout{Start: 10}, wantErr: "after the series ends"},
		{name: "start too early", n: 10, h: Holdout{Start: 1}, wantErr: "start validation at period 3 or later"},
		{name: "both given", n: 10, h: Holdout{Last: 2, Start: 5}, wantErr: "given twice"},
		{name: "none given", n: 10, h: Holdout{}, wantErr: "no validation period"},
		{name: "negative", n: 10, h: Holdout{Last: -3}, wantErr: "positive number"},
		{name: "series too short", n: 2, h: Holdout{Last: 1}, wantErr: "too few to hold any out"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			got, err := tt.h.Split(tt.n)
			if tt.wantErr != "" {
				if err == nil || !strings.Contains(err.Error(), tt.wantErr) {
					t.Fatalf("Split(%d) with %+v: error = %v, want one containing %q", tt.n, tt.h, err, tt.wantErr)
				}
				return
			}
			if err != nil {
				t.Fatalf("Split(%d) with %+v: %v", tt.n, tt.h, err)
			}
			if got != tt.want {
				t.Errorf("Split(%d) with %+v = %+v, want %+v", tt.n, tt.h, got, tt.want)
			}
		})
	}
}
