package runner

import "fmt"

// Options are the settings of [Runner.RunWith]. The zero value runs
// without reporting progress.
type Options struct {
	// Progress, when set, is called as the run advances: when each step
	// starts (reused steps included), as the parts of a long step finish
	// (the forecasts of a backtest, the series of a bake-off), and once
	// when the run is over, with Done equal to Steps. Calls come one at a
	// time from the goroutine running the session, in order; the function
	// should return quickly.
	Progress func(Progress)
}

// Progress is how far a run has come.
type Progress struct {
	Done  int    // steps finished, from 0 to Steps
	Steps int    // steps in the session
	Step  int    // number of the step running (counted from 1 in the session); 0 when the run is over
	Verb  string // verb of the step running; "" when the run is over
	// Part of Parts is how much of the running step is done, for steps
	// that report it; 0 of 0 otherwise.
	Part, Parts int
}

// Fraction returns the share of the run done, from 0 to 1: finished steps
// plus the finished share of the running one, over all steps. A session
// without steps is done.
func (p Progress) Fraction() float64 {
	if p.Steps <= 0 {
		return 1
	}
	f := float64(p.Done)
	if p.Parts > 0 {
		f += float64(min(p.Part, p.Parts)) / float64(p.Parts)
	}
	return min(f/float64(p.Steps), 1)
}

// String describes p for a progress bar's label: "Step 5 of 17 (backtest),
// part 2 of 3", or "17 of 17 steps done" at the end.
func (p Progress) String() string {
	if p.Verb == "" {
		return fmt.Sprintf("%d of %d steps done", p.Done, p.Steps)
	}
	s := fmt.Sprintf("Step %d of %d (%s)", p.Done+1, p.Steps, p.Verb)
	if p.Parts > 0 {
		s += fmt.Sprintf(", part %d of %d", p.Part, p.Parts)
	}
	return s
}

// reporter sends progress for one run; its zero value reports nothing.
type reporter struct {
	send  func(Progress)
	steps int
}

// step reports that the step at index i (0-based among the steps) starts.
func (r reporter) step(i int, n int, verb string) {
	if r.send != nil {
		r.send(Progress{Done: i, Steps: r.steps, Step: n, Verb: verb})
	}
}

// part reports that part of parts of the step at index i are done.
func (r reporter) part(i, n int, verb string, part, parts int) {
	if r.send != nil {
		r.send(Progress{Done: i, Steps: r.steps, Step: n, Verb: verb, Part: part, Parts: parts})
	}
}

// end reports that the run is over.
func (r reporter) end() {
	if r.send != nil {
		r.send(Progress{Done: r.steps, Steps: r.steps})
	}
}

// progress reports, from inside a long step, that part of parts are done.
func (x *exec) progress(part, parts int) {
	x.rep.part(x.index, x.s.N, x.s.Verb, part, parts)
}
