package backtest

import (
	"reflect"
	"strings"
	"testing"
)

func TestFolds(t *testing.T) {
	t.Parallel()
	tests := []struct {
		name string
		n    int
		o    Origins
		want []Fold
	}{
		{
			// Hand calculation: origins at 4, 6, 8 (4 + k*2) while origin+2 <= 10;
			// origin 10 would need periods 10 and 11, past the end.
			name: "expanding initial 4 step 2 horizon 2",
			n:    10,
			o:    Origins{Initial: 4, Step: 2, Horizon: 2},
			want: []Fold{{0, 4, 4, 6}, {0, 6, 6, 8}, {0, 8, 8, 10}},
		},
		{
			// Hand calculation: same origins; training starts origin-4: 0, 2, 4.
			name: "sliding initial 4 step 2 horizon 2",
			n:    10,
			o:    Origins{Window: Sliding, Initial: 4, Step: 2, Horizon: 2},
			want: []Fold{{0, 4, 4, 6}, {2, 6, 6, 8}, {4, 8, 8, 10}},
		},
		{
			// Hand calculation: origins 3..6 with horizon 1 (origin+1 <= 7).
			name: "expanding defaults step 1 horizon 1",
			n:    7,
			o:    Origins{Initial: 3},
			want: []Fold{{0, 3, 3, 4}, {0, 4, 4, 5}, {0, 5, 5, 6}, {0, 6, 6, 7}},
		},
		{
			// Hand calculation: initial defaults to 12/2 = 6; origins 6..9 with
			// horizon 3 (origin+3 <= 12); a sliding window of 6.
			name: "sliding default initial half the series",
			n:    12,
			o:    Origins{Window: Sliding, Horizon: 3},
			want: []Fold{{0, 6, 6, 9}, {1, 7, 7, 10}, {2, 8, 8, 11}, {3, 9, 9, 12}},
		},
		{
			// Hand calculation: initial = 20-4-(3-1)*1 = 14; origins 14, 15, 16.
			name: "last 3 origins horizon 4",
			n:    20,
			o:    Origins{Last: 3, Horizon: 4},
			want: []Fold{{0, 14, 14, 18}, {0, 15, 15, 19}, {0, 16, 16, 20}},
		},
		{
			// Hand calculation: origins 2, 5, 8 keep the last two: 5 and 8.
			name: "last 2 of 3 with initial given",
			n:    9,
			o:    Origins{Initial: 2, Step: 3, Horizon: 1, Last: 2},
			want: []Fold{{0, 5, 5, 6}, {0, 8, 8, 9}},
		},
		{
			// Hand calculation: 5 + 3 = 8 = n, exactly one fold.
			name: "exactly one fold",
			n:    8,
			o:    Origins{Initial: 5, Horizon: 3},
			want: []Fold{{0, 5, 5, 8}},
		},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			got, err := Folds(tt.n, tt.o)
			if err != nil {
				t.Fatalf("Folds(%d, %+v): %v", tt.n, tt.o, err)
			}
			if !reflect.DeepEqual(got, tt.want) {
				t.Errorf("Folds(%d, %+v)\n got %v\nwant %v", tt.n, tt.o, got, tt.want)
			}
		})
	}
}

func TestFoldsErrors(t *testing.T) {
	t.Parallel()
	tests := []struct {
		name string
		n    int
		o    Origins
		want string
	}{
		{"horizon past the data", 10, Origins{Initial: 8, Horizon: 3}, "needs at least 11 periods"},
		{"negative step", 10, Origins{Step: -1}, "must not be negative"},
		{"first fold too small", 10, Origins{Initial: 1}, "give at least 2"},
		{"series too short", 2, Origins{Horizon: 1}, "the series has 2"},
		{"unknown window", 10, Origins{Window: 7}, "unknown window"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			_, err := Folds(tt.n, tt.o)
			if err == nil || !strings.Contains(err.Error(), tt.want) {
				t.Errorf("Folds(%d, %+v) error = %v, want one containing %q", tt.n, tt.o, err, tt.want)
			}
		})
	}
}
