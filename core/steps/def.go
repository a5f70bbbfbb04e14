package steps

import "math"

// OptionDef defines one key=value option of a verb.
type OptionDef struct {
	Name     string   `json:"name"`
	Kind     Kind     `json:"-"`
	KindName string   `json:"kind"`              // Kind in words, for the page
	Help     string   `json:"help"`              // one plain sentence
	Default  string   `json:"default,omitempty"` // shown in help; "" when there is none or it is estimated
	Example  string   `json:"example"`           // a value, as written after the '='
	Choices  []string `json:"choices,omitempty"` // accepted words (Word)
	Min      float64  `json:"-"`                 // smallest accepted number (Number, Whole, Range, Numbers)
	Max      float64  `json:"-"`                 // largest accepted number
	Whole    bool     `json:"-"`                 // the numbers of a Range or Numbers must be whole
	Required bool     `json:"required,omitempty"`
}

// SubjectDef says what may follow the verb before the options.
type SubjectDef struct {
	// What names the subject in help and errors ("method", "file name");
	// "" means the verb takes no subject.
	What     string   `json:"what,omitempty"`
	Required bool     `json:"required,omitempty"`
	Choices  []string `json:"choices,omitempty"` // accepted words; nil means any name
	Help     string   `json:"help,omitempty"`
}

// VerbDef defines one verb: everything the parser, the checking pass,
// completion and the help page know about it.
type VerbDef struct {
	Name    string      `json:"name"`
	Summary string      `json:"summary"` // one or two plain sentences
	Subject SubjectDef  `json:"subject"`
	Options []OptionDef `json:"options"`
	Example string      `json:"example"` // a whole step line
	// Needs lists what earlier steps must have made: "data" (a load),
	// "split" (a split), "forecast" (at least one forecast).
	Needs []string `json:"needs,omitempty"`
	// Methods is true when the subject is a forecasting method whose
	// parameters become options (forecast, sweep).
	Methods bool `json:"methods,omitempty"`
}

// Option returns the definition of the option named name.
func (v VerbDef) Option(name string) (OptionDef, bool) {
	for _, o := range v.Options {
		if o.Name == name {
			return o, true
		}
	}
	return OptionDef{}, false
}

func (v VerbDef) optionNames() []string {
	names := make([]string, len(v.Options))
	for i, o := range v.Options {
		names[i] = o.Name
	}
	return names
}

// opt builds an option; numbers are unbounded unless bounded later.
func opt(name string, k Kind, help, def, ex string) OptionDef {
	return OptionDef{Name: name, Kind: k, KindName: k.String(), Help: help, Default: def, Example: ex,
		Min: math.Inf(-1), Max: math.Inf(1)}
}

func (o OptionDef) between(lo, hi float64) OptionDef { o.Min, o.Max = lo, hi; return o }
func (o OptionDef) whole() OptionDef                 { o.Whole = true; return o }
func (o OptionDef) required() OptionDef              { o.Required = true; return o }
func (o OptionDef) choices(c ...string) OptionDef    { o.Choices = c; return o }
