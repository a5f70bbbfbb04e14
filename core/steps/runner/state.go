package runner

import (
	"maps"
	"slices"

	"quillcast/core/backtest"
	"quillcast/core/forecast"
	"quillcast/core/series"
)

// Meta is the memo's heading, set by the memo step.
type Meta struct {
	Title, Client, By, Date string
}

// loaded is the series a load step picked.
type loaded struct {
	step    int
	file    string
	set     *series.Dataset
	series  *series.Series
	y       []float64 // values, gaps refused or filled
	season  int       // season length, 0 or 1 when none
	periods []string  // label of each period
	options string    // the read options in words, for the memo
}

// partition is the split in force.
type partition struct {
	step     int
	trainEnd int // training is y[:trainEnd], validation y[trainEnd:]
}

// fcast is one forecast made by a forecast or combine step.
type fcast struct {
	step     int
	label    string
	method   string          // catalogue name, or "combination"
	title    string          // display name of the method
	assumes  string          // what the method assumes, in plain words
	text     string          // the step's canonical text, for the memo appendix
	model    forecast.Method // what a backtest refits; nil when it cannot be refitted
	fit      *forecast.Fit   // fit on the training period (nil for combinations)
	fitted   []float64       // one-step fitted values on training, NaN where none
	valid    []float64       // forecasts of the validation period from the end of training
	future   []float64       // forecasts past the end of the data, from a refit on all data
	bands    []band          // intervals around future, by level
	horizon  int
	params   []forecast.Param
	refitted []forecast.Param // parameters of the refit on all data
	notes    []string
	findings []string // plain-words assumption findings shown under the step
}

// band is one prediction interval around a forecast.
type band struct {
	level     float64 // percent, such as 80
	lo, hi    []float64
	empirical bool // from backtest errors rather than a formula
}

// scored is one row of an evaluation: a forecast's accuracy.
type scored struct {
	label, method string
	benchmark     bool
	train, valid  map[string]float64 // by measure name; missing when undefined
	reasons       map[string]string  // why a validation measure is undefined
}

// evaluation is what the last evaluate step found.
type evaluation struct {
	step int
	by   string
	rows []scored
	best string // label of the best forecast by validation measure
}

// choice is the recommendation of a pick step.
type choice struct {
	step  int
	label string
	by    string
	value float64
	why   string
}

// state is everything the steps so far have made. A step never changes
// the state it is given: it works on a clone, so states kept in the cache
// stay as they were.
type state struct {
	meta      Meta
	data      *loaded
	split     *partition
	forecasts []*fcast
	eval      *evaluation
	pick      *choice
	backtests map[string]*backtest.Backtest // by forecast label
	cautions  []string                      // assumption findings for the memo
	exhibits  int                           // exhibits numbered so far
	broken    map[string]int                // what a failed step would have made, and that step
}

func (s *state) clone() *state {
	c := *s
	c.forecasts = slices.Clone(s.forecasts)
	c.cautions = slices.Clone(s.cautions)
	c.backtests = maps.Clone(s.backtests)
	c.broken = maps.Clone(s.broken)
	if c.backtests == nil {
		c.backtests = map[string]*backtest.Backtest{}
	}
	if c.broken == nil {
		c.broken = map[string]int{}
	}
	return &c
}

// forecastNamed returns the forecast labelled label, or nil.
func (s *state) forecastNamed(label string) *fcast {
	for _, f := range s.forecasts {
		if f.label == label {
			return f
		}
	}
	return nil
}

// shows reports whether after differs from s only in the exhibits it
// numbered: the step between them only showed something (a smoothed
// line, a chart of the series) and left every result a later step reads
// as it was. Steps replace what they change rather than writing into
// values they share with s (see [state]), so comparing pointers suffices.
func (s *state) shows(after *state) bool {
	return s.meta == after.meta && s.data == after.data && s.split == after.split &&
		s.eval == after.eval && s.pick == after.pick &&
		slices.Equal(s.forecasts, after.forecasts) && slices.Equal(s.cautions, after.cautions) &&
		maps.Equal(s.backtests, after.backtests) && maps.Equal(s.broken, after.broken)
}
