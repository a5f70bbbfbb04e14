package forecast

import (
	"fmt"
	"math"
	"slices"
	"strconv"
	"strings"
)

// checked wraps sp.New so that every setting is checked against sp.Params
// before the method is built.
func checked(sp Spec) func(Settings) (Method, error) {
	build := sp.New
	return func(s Settings) (Method, error) {
		if err := checkSettings(sp, s); err != nil {
			return nil, err
		}
		return build(s)
	}
}

// checkSettings reports the first setting (in alphabetical order of names)
// that sp does not accept.
func checkSettings(sp Spec, s Settings) error {
	names := make([]string, 0, len(s))
	for name := range s {
		names = append(names, name)
	}
	slices.Sort(names)
	for _, name := range names {
		p, ok := findParam(sp, name)
		if !ok {
			return settingError("%s has no parameter %q; it accepts %s", sp.Name, name, paramNames(sp))
		}
		if err := checkSetting(sp.Name, p, s[name]); err != nil {
			return err
		}
	}
	return nil
}

func checkSetting(method string, p ParamSpec, v Setting) error {
	switch p.Kind {
	case Number, Whole:
		x := v.Number
		if math.IsNaN(x) || math.IsInf(x, 0) {
			return settingError("%s for %s is not a number; write a value such as %s", p.Name, method, example(p))
		}
		if p.Kind == Whole && x != math.Trunc(x) {
			return settingError("%s=%s for %s is not a whole number; write a whole number such as %s", p.Name, fmtNum(x), method, example(p))
		}
		if x < p.Min || x > p.Max {
			return settingError("%s=%s for %s is out of range; write a value %s", p.Name, fmtNum(x), method, rangeText(p))
		}
	case Choice:
		if !slices.Contains(p.Choices, v.Word) {
			return settingError("%s=%q for %s is not accepted; write one of %s", p.Name, v.Word, method, strings.Join(p.Choices, ", "))
		}
	case List:
		if strings.TrimSpace(v.Word) == "" {
			return settingError("%s for %s is empty; write a comma-separated list", p.Name, method)
		}
	}
	return nil
}

func findParam(sp Spec, name string) (ParamSpec, bool) {
	for _, p := range sp.Params {
		if p.Name == name {
			return p, true
		}
	}
	return ParamSpec{}, false
}

func paramNames(sp Spec) string {
	if len(sp.Params) == 0 {
		return "no parameters"
	}
	names := make([]string, len(sp.Params))
	for i, p := range sp.Params {
		names[i] = p.Name
	}
	return strings.Join(names, ", ")
}

func rangeText(p ParamSpec) string {
	switch {
	case math.IsInf(p.Min, -1) && math.IsInf(p.Max, 1):
		return "that is a finite number"
	case math.IsInf(p.Max, 1):
		return "of at least " + fmtNum(p.Min)
	case math.IsInf(p.Min, -1):
		return "of at most " + fmtNum(p.Max)
	}
	return "from " + fmtNum(p.Min) + " to " + fmtNum(p.Max)
}

func example(p ParamSpec) string {
	switch {
	case p.Kind == Whole && !math.IsInf(p.Min, 0):
		return fmtNum(math.Max(p.Min, 12))
	case !math.IsInf(p.Min, 0) && !math.IsInf(p.Max, 0):
		return fmtNum((p.Min + p.Max) / 2)
	}
	return "1.5"
}

func fmtNum(x float64) string { return strconv.FormatFloat(x, 'g', -1, 64) }

func settingError(format string, args ...any) error {
	return &Error{Cause: ErrSetting, Msg: fmt.Sprintf(format, args...)}
}

// number returns the setting name as a number and whether it was given.
func (s Settings) number(name string) (float64, bool) {
	v, ok := s[name]
	return v.Number, ok
}

// optional returns a pointer to the setting name, or nil when it was not given.
func (s Settings) optional(name string) *float64 {
	v, ok := s[name]
	if !ok {
		return nil
	}
	x := v.Number
	return &x
}

// word returns the setting name as a word, or def when it was not given.
func (s Settings) word(name, def string) string {
	if v, ok := s[name]; ok {
		return v.Word
	}
	return def
}

// ParseNumbers reads a comma-separated list of numbers such as
// "-18, 5, 52, -39" (spaces allowed around each number). The error names
// the 1-based position of the first entry that is not a finite number.
func ParseNumbers(text string) ([]float64, error) {
	parts := strings.Split(text, ",")
	out := make([]float64, len(parts))
	for i, part := range parts {
		part = strings.TrimSpace(part)
		x, err := strconv.ParseFloat(part, 64)
		if err != nil || math.IsNaN(x) || math.IsInf(x, 0) {
			return nil, settingError("entry %d of the list, %q, is not a number; write numbers separated by commas such as 1.5,2,0.8", i+1, part)
		}
		out[i] = x
	}
	return out, nil
}

// whole returns the setting name as a whole number, 0 when not given.
func (s Settings) whole(name string) int {
	x, _ := s.number(name)
	return int(x)
}

// cycleParam is the shared parameter that overrides the season length.
func cycleParam() ParamSpec {
	return ParamSpec{
		Name: "cycle", Kind: Whole, Min: 2, Max: math.Inf(1),
		Help: "periods in one seasonal cycle, such as 12 for monthly data; by default the series' own",
	}
}
