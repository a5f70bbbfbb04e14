package runner

import (
	"context"
	"crypto/sha256"
	"encoding/hex"
	"errors"
	"fmt"
	"strconv"

	"quillcast/core/series"
	"quillcast/core/session"
	"quillcast/core/steps"
)

// Data are the files attached to a session, by the name the load step
// uses. A file may be given as bytes (read with the load step's options)
// or already read; Sets wins when a name is in both.
type Data struct {
	Files map[string][]byte
	Sets  map[string]*series.Dataset
}

// Runner runs sessions and remembers the state after each step, so that a
// re-run after an edit recomputes only from the first changed step. A
// Runner is not safe for use by several goroutines at once.
type Runner struct {
	cat   steps.Catalog
	cache map[string]cached
	// fault, when set, is called at the start of every step (tests inject
	// faults through it).
	fault func(s *steps.Step)
}

// cached is the outcome of one step kept for reuse.
type cached struct {
	after *state
	out   Output
	// next is the key the steps after this one chain from: the step's
	// own key, or, when the step only showed something (see
	// [state.shows]), a key saying only how many exhibits it numbered, so
	// that editing such a step does not run the steps after it again.
	next string
}

// New returns a Runner using the forecasting package's catalogue. Only
// in a build with the faulthook tag does it install a test fault (see
// faulthook_on.go).
func New() *Runner {
	return &Runner{cat: steps.DefaultCatalog(), cache: map[string]cached{}, fault: faultHook()}
}

// Run parses and runs the session document doc on the attached data. ctx
// cancels a long run; the steps not yet run then fail with a message
// saying the run was stopped. Data blocks embedded in the document are
// used for names not attached.
func (r *Runner) Run(ctx context.Context, doc *session.Document, data Data) *Result {
	return r.RunWith(ctx, doc, data, Options{})
}

// RunWith is [Runner.Run] with options: o.Progress hears how far the run
// has come (see [Options]).
func (r *Runner) RunWith(ctx context.Context, doc *session.Document, data Data, o Options) *Result {
	prog := steps.ParseWith(doc, r.cat)
	data = withEmbedded(data, doc)
	res := &Result{}
	st := (&state{}).clone()
	next := map[string]cached{}
	key := ""
	rep := reporter{send: o.Progress, steps: len(prog.Steps)}
	defer rep.end()
	for i, s := range prog.Steps {
		rep.step(i, s.N, s.Verb)
		k := stepKey(key, s, data)
		if c, ok := r.cache[k]; ok {
			out := relocate(c.out, s)
			res.add(out)
			res.Reused++
			next[k] = c
			st, key = c.after, c.next
			continue
		}
		after, out := r.runStep(ctx, st, s, data, rep, i)
		out.Key = contentKey(out)
		res.Computed++
		c := cached{after: after, out: out, next: k}
		if st.shows(after) {
			c.next = shownKey(key, after.exhibits)
		}
		if ctx.Err() == nil {
			// A step cut short by cancellation is not kept: the next
			// run does it properly.
			next[k] = c
		}
		res.add(out)
		st, key = after, c.next
	}
	r.cache = next
	res.final = st
	res.doc = doc
	return res
}

func (res *Result) add(out Output) {
	res.Outputs = append(res.Outputs, out)
	if out.Error != nil {
		res.Errors = append(res.Errors, out.Error)
	}
}

// stepKey chains the key of the steps before with this step's canonical
// text and, for a load, the fingerprint of the file it reads.
func stepKey(prev string, s *steps.Step, data Data) string {
	h := sha256.New()
	h.Write([]byte(prev))
	h.Write([]byte{0})
	if s.Err != nil {
		h.Write([]byte(s.Text))
	} else {
		h.Write([]byte(s.Canonical()))
	}
	if s.Verb == "load" {
		h.Write([]byte{0})
		h.Write([]byte(fingerprint(data, s.Subject)))
	}
	return hex.EncodeToString(h.Sum(nil))
}

// shownKey is the key after a step that only showed something: the key
// before it and the number of exhibits numbered so far.
func shownKey(prev string, exhibits int) string {
	h := sha256.New()
	h.Write([]byte(prev))
	h.Write([]byte{1})
	h.Write([]byte(strconv.Itoa(exhibits)))
	return hex.EncodeToString(h.Sum(nil))
}

func fingerprint(data Data, name string) string {
	if ds, ok := data.Sets[name]; ok && ds != nil {
		return "set:" + ds.Fingerprint
	}
	if b, ok := data.Files[name]; ok {
		return "file:" + series.Fingerprint(b)
	}
	return "missing"
}

func withEmbedded(data Data, doc *session.Document) Data {
	emb := doc.Embedded()
	if len(emb) == 0 {
		return data
	}
	files := map[string][]byte{}
	for k, v := range emb {
		files[k] = v
	}
	for k, v := range data.Files {
		files[k] = v
	}
	return Data{Files: files, Sets: data.Sets}
}

// relocate gives a reused output the position of the step it now belongs
// to: an edit above it may have moved its line.
func relocate(out Output, s *steps.Step) Output {
	out.Step, out.Line, out.Text = s.N, s.Line, s.Text
	if out.Error != nil {
		e := *out.Error
		e.Step, e.Line = s.N, s.Line
		out.Error = &e
	}
	return out
}

// runStep runs one step on a clone of st, recovering any fault.
// rep and index let a long step report its parts (index is the step's
// place among the steps, from 0).
func (r *Runner) runStep(ctx context.Context, st *state, s *steps.Step, data Data, rep reporter, index int) (after *state, out Output) {
	out = Output{Step: s.N, Line: s.Line, Text: s.Text, Verb: s.Verb, Status: Done, Blocks: []Block{}}
	work := st.clone()
	if s.Err != nil {
		return fail(st, s, out, s.Err)
	}
	if waits, ok := waitsOn(st, s); ok {
		return wait(st, s, out, waits)
	}
	if err := ctx.Err(); err != nil {
		return fail(st, s, out, runError(s, s.Column, "the run was stopped before this step; run the session again"))
	}
	defer func() {
		if p := recover(); p != nil {
			after, out = fail(st, s, Output{Step: s.N, Line: s.Line, Text: s.Text, Verb: s.Verb, Blocks: []Block{}},
				runError(s, s.Column, "the step stopped on an internal fault; the steps before it are unaffected. Please report this session"))
			out.Fault = fmt.Sprint(p)
		}
	}()
	if r.fault != nil {
		r.fault(s)
	}
	x := &exec{r: r, ctx: ctx, st: work, s: s, data: data, out: &out, rep: rep, index: index}
	if err := x.run(); err != nil {
		col := s.Column
		var at *placedError
		if errors.As(err, &at) {
			col = at.col
		}
		return fail(st, s, out, runError(s, col, err.Error()))
	}
	return work, out
}

func runError(s *steps.Step, col int, msg string) *steps.Error {
	return &steps.Error{Step: s.N, Line: s.Line, Column: col, Msg: msg, Cause: steps.ErrRun}
}

// fail records a failed step: its output shows only the error and the
// state marks what it would have made as broken.
func fail(st *state, s *steps.Step, out Output, err *steps.Error) (*state, Output) {
	out.Status, out.Error, out.Blocks = Failed, err, []Block{}
	return broken(st, s, s.N), out
}

func wait(st *state, s *steps.Step, out Output, on int) (*state, Output) {
	out.Status, out.WaitsOn = Waiting, on
	out.Blocks = []Block{{Kind: MessageBlock, Level: Warning,
		Text: fmt.Sprintf("Waits on step %d, which failed; fix that step and this one runs again.", on)}}
	return broken(st, s, on), out
}

// broken marks in a clone of st what step s would have made as broken by
// step root, so that steps needing it wait on root.
func broken(st *state, s *steps.Step, root int) *state {
	c := st.clone()
	switch s.Verb {
	case "load":
		c.data, c.split, c.forecasts, c.eval, c.pick = nil, nil, nil, nil, nil
		c.broken = map[string]int{"data": root}
	case "split":
		c.split = nil
		c.broken["split"] = root
	case "forecast", "combine":
		c.broken["label:"+steps.Label(s)] = root
	}
	return c
}

// waitsOn reports the failed step that s waits on, if any.
func waitsOn(st *state, s *steps.Step) (int, bool) {
	def, ok := steps.Lookup(s.Verb)
	if !ok {
		return 0, false
	}
	for _, need := range def.Needs {
		switch need {
		case "data":
			if st.data == nil && st.broken["data"] > 0 {
				return st.broken["data"], true
			}
		case "split":
			if st.split == nil && st.broken["split"] > 0 {
				return st.broken["split"], true
			}
		case "forecast":
			if len(st.forecasts) == 0 {
				if n := firstBrokenLabel(st); n > 0 {
					return n, true
				}
			}
		}
	}
	if s.Verb == "forecast" && st.split == nil && st.broken["split"] > 0 {
		if _, h := s.Option("horizon"); !h {
			return st.broken["split"], true
		}
	}
	for _, l := range referencedLabels(s) {
		if st.forecastNamed(l) == nil && st.broken["label:"+l] > 0 {
			return st.broken["label:"+l], true
		}
	}
	return 0, false
}

func firstBrokenLabel(st *state) int {
	first := 0
	for k, n := range st.broken {
		if len(k) > 6 && k[:6] == "label:" && (first == 0 || n < first) {
			first = n
		}
	}
	return first
}

// referencedLabels lists the forecast labels a step names.
func referencedLabels(s *steps.Step) []string {
	switch s.Verb {
	case "check":
		if s.Subject != "" {
			return []string{s.Subject}
		}
	case "combine", "backtest":
		if o, ok := s.Option("of"); ok {
			return o.Value.Words
		}
	case "pick":
		if o, ok := s.Option("among"); ok {
			return o.Value.Words
		}
	}
	return nil
}
