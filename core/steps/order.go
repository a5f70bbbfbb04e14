package steps

import (
	"slices"
	"unicode/utf8"
)

// scope is what the steps so far have made, for the ordering pass.
type scope struct {
	data   int            // step number of the last load, 0 when none
	split  int            // step number of the last split since that load
	labels map[string]int // forecast labels since that load, with their step
	order  []string       // labels in the order made
}

// Label returns the label a forecast or combine step gives its result:
// its as= option, else the method's name (forecast) or "combination".
func Label(s *Step) string {
	if o, ok := s.Option("as"); ok {
		return o.Value.Raw
	}
	if s.Verb == "combine" {
		return "combination"
	}
	return s.Subject
}

// checkOrder reports steps that need something no earlier step made:
// data before anything else, a split before scoring, a forecast label
// before it is named. Steps with an error already keep it.
func checkOrder(steps []*Step, lg *lang) {
	sc := scope{labels: map[string]int{}}
	for _, s := range steps {
		def, ok := lg.verbs[s.Verb]
		if !ok {
			continue
		}
		if s.Err == nil {
			if msg, col := sc.missing(s, def); msg != "" {
				s.Err = &Error{Step: s.N, Line: s.Line, Column: col, Cause: ErrOrder, Msg: msg}
			}
		}
		sc.add(s)
	}
}

func (sc *scope) add(s *Step) {
	switch s.Verb {
	case "load":
		*sc = scope{data: s.N, labels: map[string]int{}}
	case "split":
		// Forecasts fitted before a split belong to the old partition.
		sc.split = s.N
		sc.labels, sc.order = map[string]int{}, nil
	case "forecast", "combine":
		l := Label(s)
		if _, dup := sc.labels[l]; !dup {
			sc.order = append(sc.order, l)
		}
		sc.labels[l] = s.N
	}
}

func (sc *scope) missing(s *Step, def VerbDef) (string, int) {
	for _, need := range def.Needs {
		switch {
		case need == "data" && sc.data == 0:
			return quote(s.Verb) + " needs data first; add a `load` step before it, such as `load orders.csv value=units`", s.Column
		case need == "split" && sc.split == 0:
			return quote(s.Verb) + " needs a `split` first, to say which periods are held out; add one before it, such as `split last=12`", s.Column
		case need == "forecast" && len(sc.labels) == 0:
			return quote(s.Verb) + " needs a `forecast` first; add one before it, such as `forecast seasonal-naive`", s.Column
		}
	}
	switch s.Verb {
	case "forecast":
		if _, h := s.Option("horizon"); !h && sc.split == 0 && sc.data != 0 {
			return "`forecast` needs a `split` first, or say `horizon=` to forecast past the end of the data only", utf8.RuneCountInString(s.Text) + 1
		}
		if prev, dup := sc.labels[Label(s)]; dup {
			col := s.SubjCol
			if o, ok := s.Option("as"); ok {
				col = o.ValueCol
			}
			return "the label " + quote(Label(s)) + " is already used by step " + itoa(prev) + "; give this forecast another with `as=`", col
		}
	case "combine":
		if prev, dup := sc.labels[Label(s)]; dup {
			col := utf8.RuneCountInString(s.Text) + 1
			if o, ok := s.Option("as"); ok {
				col = o.ValueCol
			}
			return "the label " + quote(Label(s)) + " is already used by step " + itoa(prev) + "; give this combination another with `as=`", col
		}
		return sc.unknownLabels(s, "of")
	case "backtest":
		return sc.unknownLabels(s, "of")
	case "pick":
		return sc.unknownLabels(s, "among")
	case "check":
		if s.Subject != "" {
			if _, ok := sc.labels[s.Subject]; !ok {
				return "no forecast is labelled " + quote(s.Subject) + " yet" + didYouMean(s.Subject, sc.order) + sc.known(), s.SubjCol
			}
		}
	}
	return "", 0
}

// unknownLabels checks the labels listed in option key.
func (sc *scope) unknownLabels(s *Step, key string) (string, int) {
	o, ok := s.Option(key)
	if !ok {
		return "", 0
	}
	col := o.ValueCol
	for _, w := range o.Value.Words {
		if _, ok := sc.labels[w]; !ok {
			return "no forecast is labelled " + quote(w) + " yet" + didYouMean(w, sc.order) + sc.known(), col
		}
		col += utf8.RuneCountInString(w) + 1
	}
	return "", 0
}

func (sc *scope) known() string {
	if len(sc.order) == 0 {
		return ""
	}
	labels := slices.Clone(sc.order)
	out := "; the forecasts so far are "
	for i, l := range labels {
		if i > 0 {
			out += ", "
		}
		out += l
	}
	return out
}
