package backtest

import "fmt"

// Window says how the training part moves as the origin rolls forward.
type Window int

const (
	// Expanding keeps the first period in every fold: the training part
	// grows by Step periods from one fold to the next. It is the zero value.
	Expanding Window = iota
	// Sliding keeps the training part at Initial periods: it moves forward
	// by Step periods from one fold to the next (a fixed window).
	Sliding
)

// String names the window as written in steps and tables.
func (w Window) String() string {
	if w == Sliding {
		return "sliding"
	}
	return "expanding"
}

// Origins are the settings of a rolling-origin evaluation. The zero value
// of each field means its default.
type Origins struct {
	Window  Window // Expanding (default) or Sliding
	Initial int    // training periods of the first fold; 0 means half the series, at least 2
	Step    int    // periods the origin moves between folds; 0 means 1
	Horizon int    // periods forecast from each origin; 0 means 1
	// Last keeps only the last Last folds ("backtest origins=8"); 0 keeps
	// every fold the other settings allow. When Last is set and Initial is 0,
	// the first fold starts as early as Last folds need.
	Last int
}

// Fold is one forecast origin. Training is [TrainStart, TrainEnd) and test
// is [TestStart, TestEnd), 0-based half-open periods; TestStart equals
// TrainEnd (the forecast origin) and the test part always holds the full
// horizon.
type Fold struct {
	TrainStart, TrainEnd int
	TestStart, TestEnd   int
}

// Folds lists the folds of a rolling-origin evaluation on a series of n
// periods, oldest origin first.
//
// The k-th fold (k = 0, 1, ...) has its origin at Initial + k*Step and is
// kept while the origin plus Horizon does not pass n, so every fold is
// scored on the full horizon. With an expanding window training starts at
// period 0; with a sliding window it starts Initial periods before the
// origin. Folds returns an error in plain words when the settings are out
// of range or leave no fold.
func Folds(n int, o Origins) ([]Fold, error) {
	o, err := o.resolve(n)
	if err != nil {
		return nil, err
	}
	var folds []Fold
	for origin := o.Initial; origin+o.Horizon <= n; origin += o.Step {
		start := 0
		if o.Window == Sliding {
			start = origin - o.Initial
		}
		folds = append(folds, Fold{TrainStart: start, TrainEnd: origin, TestStart: origin, TestEnd: origin + o.Horizon})
	}
	if o.Last > 0 && len(folds) > o.Last {
		folds = folds[len(folds)-o.Last:]
	}
	return folds, nil
}

// resolve fills the defaults of o for a series of n periods and checks it.
func (o Origins) resolve(n int) (Origins, error) {
	if o.Step < 0 || o.Horizon < 0 || o.Initial < 0 || o.Last < 0 {
		return o, fmt.Errorf("rolling-origin settings must not be negative (initial %d, step %d, horizon %d, origins %d)", o.Initial, o.Step, o.Horizon, o.Last)
	}
	if o.Window != Expanding && o.Window != Sliding {
		return o, fmt.Errorf("unknown window kind %d; use an expanding or a sliding window", int(o.Window))
	}
	if o.Step == 0 {
		o.Step = 1
	}
	if o.Horizon == 0 {
		o.Horizon = 1
	}
	if o.Initial == 0 {
		switch {
		case o.Last > 0:
			o.Initial = max(n-o.Horizon-(o.Last-1)*o.Step, MinTraining)
		default:
			o.Initial = max(n/2, MinTraining)
		}
	}
	if o.Initial < MinTraining {
		return o, fmt.Errorf("the first fold has %d training periods; give at least %d", o.Initial, MinTraining)
	}
	if need := o.Initial + o.Horizon; need > n {
		return o, fmt.Errorf("rolling origin needs at least %d periods (%d to train the first fold and %d to test it), but the series has %d; shorten the first training window or the horizon", need, o.Initial, o.Horizon, n)
	}
	return o, nil
}
