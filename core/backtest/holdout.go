package backtest

import "fmt"

// MinTraining is the fewest training periods a partition may leave when the
// caller states no other minimum: one value to start from and one to learn
// a change from.
const MinTraining = 2

// Split is one partition of a series of N periods: training is [0, TrainEnd)
// and validation is [TrainEnd, N).
type Split struct {
	N        int // periods in the whole series
	TrainEnd int // first period of the validation part; also the training length
}

// Validation is the number of periods held out.
func (s Split) Validation() int { return s.N - s.TrainEnd }

// Holdout says how to hold out the validation period. Set exactly one of
// Last and Start.
type Holdout struct {
	// Last holds out the last Last periods ("split last=12").
	Last int
	// Start holds out the periods from 0-based position Start to the end
	// ("split from=2024-01" once the caller turned the period into a position).
	Start int
	// MinTraining is the fewest training periods to leave; 0 means
	// [MinTraining]. Methods with a season need more (two full seasons for
	// Holt-Winters) and their callers should say so here.
	MinTraining int
}

// Split partitions a series of n periods. It returns an error in plain
// words when the validation period is empty, longer than the data allows,
// or leaves fewer training periods than MinTraining.
func (h Holdout) Split(n int) (Split, error) {
	minTrain := h.MinTraining
	if minTrain <= 0 {
		minTrain = MinTraining
	}
	switch {
	case h.Last != 0 && h.Start != 0:
		return Split{}, fmt.Errorf("the validation period is given twice (last %d and from position %d); give only one", h.Last, h.Start+1)
	case h.Last == 0 && h.Start == 0:
		return Split{}, fmt.Errorf("no validation period given; hold out the last periods (for example last 12) or give the first validation period")
	case h.Last < 0:
		return Split{}, fmt.Errorf("a validation period of %d periods is not possible; give a positive number of periods", h.Last)
	case h.Start < 0:
		return Split{}, fmt.Errorf("the validation period cannot start before the first period of the series")
	}
	limit := n - minTrain
	if limit < 1 {
		return Split{}, fmt.Errorf("the series has %d periods, too few to hold any out: training needs at least %d periods and validation at least 1", n, minTrain)
	}
	trainEnd := h.Start
	if h.Last != 0 {
		if h.Last > limit {
			return Split{}, fmt.Errorf("cannot hold out the last %d periods of a %d-period series: training needs at least %d periods, so hold out at most %d", h.Last, n, minTrain, limit)
		}
		trainEnd = n - h.Last
	}
	if trainEnd >= n {
		return Split{}, fmt.Errorf("the validation period starts at period %d, after the series ends at period %d; start it at period %d or earlier", trainEnd+1, n, n)
	}
	if trainEnd < minTrain {
		return Split{}, fmt.Errorf("a validation period starting at period %d leaves %d training periods; training needs at least %d, so start validation at period %d or later", trainEnd+1, trainEnd, minTrain, minTrain+1)
	}
	return Split{N: n, TrainEnd: trainEnd}, nil
}
