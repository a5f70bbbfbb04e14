package steps

import (
	"strconv"
	"strings"
	"unicode/utf8"

	"quillcast/core/session"
)

// Program is the steps of a session as read and checked.
type Program struct {
	Steps  []*Step   // every step line, in order, those with errors included
	Errors ErrorList // every problem found, at most one per line, in order
}

// Parse reads and checks the steps of a session document against the
// forecasting package's catalogue. It never fails as a whole: each problem
// is recorded on its step (Step.Err) and in Program.Errors.
func Parse(doc *session.Document) *Program { return ParseWith(doc, DefaultCatalog()) }

// ParseText parses a session's text; see [Parse].
func ParseText(text string) *Program { return Parse(session.Parse(text)) }

// ParseWith is [Parse] with a catalogue of methods of the caller's choice.
func ParseWith(doc *session.Document, cat Catalog) *Program {
	p := &Program{}
	lg := newLang(cat)
	for _, l := range doc.StepLines() {
		if isBlank(l.Text) {
			continue
		}
		s := parseLine(l.Text, lg)
		s.N = len(p.Steps) + 1
		s.Line = l.Line
		if s.Err != nil {
			s.Err.Step, s.Err.Line = s.N, l.Line
		}
		p.Steps = append(p.Steps, s)
	}
	checkOrder(p.Steps, lg)
	for _, s := range p.Steps {
		if s.Err != nil {
			p.Errors = append(p.Errors, s.Err)
		}
	}
	return p
}

// Files returns the data files the session's load steps name, in order of
// first use, without repeats: what must be attached before it runs.
func (p *Program) Files() []string {
	var out []string
	for _, s := range p.Steps {
		if s.Verb == "load" && s.Subject != "" && !contains(out, s.Subject) {
			out = append(out, s.Subject)
		}
	}
	return out
}

// isBlank reports whether a line holds no step: only spaces or a comment.
func isBlank(line string) bool {
	t := strings.TrimLeft(line, " \t\r")
	return t == "" || t[0] == '#' || strings.TrimSpace(t) == ""
}

func errAt(col int, cause error, msg string) *Error {
	return &Error{Column: col, Cause: cause, Msg: msg}
}

// parseLine reads one step line; problems land in the step's Err with the
// column set and Step and Line left for the caller.
func parseLine(line string, lg *lang) *Step {
	cat := lg.cat
	s := &Step{Text: line}
	toks, comment, lerr := lex(line)
	s.Comment = comment
	if lerr != nil {
		s.Err = errAt(lerr.col, ErrSyntax, lerr.msg)
		return s
	}
	if len(toks) == 0 {
		s.Err = errAt(1, ErrSyntax, "the line holds no step; write a verb such as load or forecast")
		return s
	}
	verb := toks[0]
	s.Verb, s.Column = verb.raw, verb.col
	if verb.eq >= 0 || verb.quoted {
		s.Err = errAt(verb.col, ErrSyntax, "a step starts with a verb, but found "+quote(verb.raw)+"; begin the line with a verb such as "+strings.Join(lg.names[:4], ", "))
		return s
	}
	def, ok := lg.verbs[verb.raw]
	if !ok {
		hint := didYouMean(strings.ToLower(verb.raw), lg.names)
		if hint == "" {
			hint = verbList()
		}
		s.Err = errAt(verb.col, ErrVerb, "unknown verb "+quote(verb.raw)+hint)
		return s
	}
	rest := toks[1:]
	if len(rest) > 0 && rest[0].eq < 0 {
		subj := rest[0]
		rest = rest[1:]
		s.Subject, s.SubjCol = unquoted(subj), subj.col
		if s.Subject == "" {
			s.Err = errAt(subj.col, ErrSubject, "the quoted "+nonEmpty(def.Subject.What, "subject")+" is empty; write it between the quotes")
			return s
		}
		if msg := checkSubject(def, s.Subject, cat); msg != "" {
			s.Err = errAt(subj.col, ErrSubject, msg)
			return s
		}
	} else if def.Subject.Required {
		s.Err = errAt(endCol(line, toks[0]), ErrSubject, quote(def.Name)+" needs a "+def.Subject.What+" after it; write for example "+quote(def.Example))
		return s
	}
	options := StepOptions(def, s.Subject, cat)
	for _, t := range rest {
		if t.eq < 0 {
			s.Err = errAt(t.col, ErrSyntax, "expected an option written key=value, but found "+quote(t.raw)+"; the subject comes right after the verb, and each option needs an `=`")
			return s
		}
		o, known := findOption(options, t.key)
		if !known {
			s.Err = errAt(t.col, ErrOption, unknownOption(t.key, def, s.Subject, options))
			return s
		}
		if prev, dup := s.Option(t.key); dup {
			s.Err = errAt(t.col, ErrOption, "option "+quote(t.key)+" is given twice (first at column "+itoa(prev.Column)+"); keep one")
			return s
		}
		v, msg, at := readValue(o, t.val)
		if msg != "" {
			s.Err = errAt(t.valCol+at, ErrValue, msg)
			return s
		}
		s.Options = append(s.Options, Option{Key: t.key, Value: v, Column: t.col, ValueCol: t.valCol})
	}
	for _, o := range options {
		if _, given := s.Option(o.Name); o.Required && !given {
			s.Err = errAt(endCol(line, toks[len(toks)-1]), ErrOption, quote(def.Name)+" needs "+quote(o.Name+"=")+"; add for example "+quote(o.Name+"="+o.Example))
			return s
		}
	}
	if msg, col := checkStep(s, def); msg != "" {
		s.Err = errAt(col, ErrOption, msg)
	}
	return s
}

// lang is the language's definitions, built once per parse.
type lang struct {
	cat   Catalog
	verbs map[string]VerbDef
	names []string
}

func newLang(cat Catalog) *lang {
	lg := &lang{cat: cat, verbs: map[string]VerbDef{}}
	for _, v := range Verbs() {
		lg.verbs[v.Name] = v
		lg.names = append(lg.names, v.Name)
	}
	return lg
}

// StepOptions returns every option a step of verb def with the given
// subject accepts: the verb's own and, for forecast and sweep, the method's.
func StepOptions(def VerbDef, subject string, cat Catalog) []OptionDef {
	out := append([]OptionDef(nil), def.Options...)
	if def.Methods {
		if sp, ok := cat.Lookup(subject); ok {
			out = append(out, MethodOptions(sp, def.Name == "sweep")...)
		}
	}
	return out
}

func findOption(options []OptionDef, name string) (OptionDef, bool) {
	for _, o := range options {
		if o.Name == name {
			return o, true
		}
	}
	return OptionDef{}, false
}

func unknownOption(key string, def VerbDef, subject string, options []OptionDef) string {
	names := make([]string, len(options))
	for i, o := range options {
		names[i] = o.Name
	}
	who := quote(def.Name)
	if def.Methods && subject != "" {
		who = quote(def.Name + " " + subject)
	}
	msg := "unknown option " + quote(key) + " for " + who
	if dym := didYouMean(key, names); dym != "" {
		return msg + dym
	}
	if len(names) == 0 {
		return msg + "; it takes no options"
	}
	return msg + "; it accepts " + strings.Join(names, ", ")
}

func checkSubject(def VerbDef, subj string, cat Catalog) string {
	switch {
	case def.Subject.What == "":
		return quote(def.Name) + " takes no subject, but found " + quote(subj) + "; options are written key=value, such as " + quote(def.Example)
	case def.Methods:
		if _, ok := cat.Lookup(subj); !ok {
			return "unknown method " + quote(subj) + didYouMean(subj, cat.names()) + "; the methods are " + strings.Join(cat.names(), ", ")
		}
	case def.Subject.Choices != nil && !contains(def.Subject.Choices, subj):
		return quote(subj) + " is not a " + def.Subject.What + " of " + quote(def.Name) + didYouMean(subj, def.Subject.Choices) + choicesText(def.Subject.Choices)
	}
	return ""
}

// checkStep applies the rules that tie a step's options together.
func checkStep(s *Step, def VerbDef) (string, int) {
	switch def.Name {
	case "split":
		last, hasLast := s.Option("last")
		from, hasFrom := s.Option("from")
		switch {
		case hasLast && hasFrom:
			return "give either `last=` or `from=`, not both", from.Column
		case !hasLast && !hasFrom:
			return "`split` needs `last=` (periods to hold out) or `from=` (the first held-out period); add for example `last=12`", utf8.RuneCountInString(s.Text) + 1
		}
		_ = last
	case "sweep":
		ranges := 0
		for _, o := range s.Options {
			if o.Value.Hi > o.Value.Lo {
				ranges++
				if ranges > 1 {
					return "a sweep varies one parameter at a time, but " + quote(o.Key) + " is a second range; give it a single value", o.Column
				}
			}
		}
		if ranges == 0 {
			return "say which parameter to sweep and over what range, such as " + quote(sweepExample(s.Subject)), utf8.RuneCountInString(s.Text) + 1
		}
	}
	return "", 0
}

func sweepExample(method string) string {
	if method == "moving-average" {
		return "width=2..24"
	}
	return "alpha=0.05..0.95"
}

func unquoted(t token) string {
	if t.quoted {
		return t.key
	}
	return t.raw
}

// endCol is the column just after token t.
func endCol(line string, t token) int { return t.col + utf8.RuneCountInString(t.raw) }

func verbList() string { return "; the verbs are " + strings.Join(verbNames(), ", ") }

func itoa(n int) string { return strconv.Itoa(n) }

func nonEmpty(s, def string) string {
	if s == "" {
		return def
	}
	return s
}
