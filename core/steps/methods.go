package steps

import (
	"quillcast/core/forecast"
)

// Catalog is the set of forecasting methods the language knows: the
// forecasting package's catalogue, or a test's own.
type Catalog []forecast.Spec

// DefaultCatalog returns the forecasting package's catalogue.
func DefaultCatalog() Catalog { return Catalog(forecast.Catalog()) }

// Lookup returns the method named name.
func (c Catalog) Lookup(name string) (forecast.Spec, bool) {
	for _, sp := range c {
		if sp.Name == name {
			return sp, true
		}
	}
	return forecast.Spec{}, false
}

func (c Catalog) names() []string {
	out := make([]string, len(c))
	for i, sp := range c {
		out[i] = sp.Name
	}
	return out
}

// MethodOptions returns the options a method adds to `forecast METHOD`, or
// to `sweep METHOD` when sweep is true (numeric parameters then also take
// a range of values to try).
func MethodOptions(sp forecast.Spec, sweep bool) []OptionDef {
	out := make([]OptionDef, 0, len(sp.Params))
	for _, p := range sp.Params {
		var o OptionDef
		switch p.Kind {
		case forecast.Number:
			o = opt(p.Name, Number, p.Help, p.Default, numberExample(p)).between(p.Min, p.Max)
			if sweep {
				o.Kind, o.KindName, o.Example = Range, Range.String(), "0.1..0.9"
			}
		case forecast.Whole:
			o = opt(p.Name, Whole, p.Help, p.Default, numberExample(p)).between(p.Min, p.Max)
			if sweep {
				o.Kind, o.KindName, o.Whole, o.Example = Range, Range.String(), true, "2..24"
			}
		case forecast.Choice:
			ex := ""
			if len(p.Choices) > 0 {
				ex = p.Choices[0]
			}
			o = opt(p.Name, Word, p.Help, p.Default, ex).choices(p.Choices...)
		default:
			o = opt(p.Name, Text, p.Help, p.Default, "1,2,3")
		}
		out = append(out, o)
	}
	return out
}

func numberExample(p forecast.ParamSpec) string {
	if p.Default != "" {
		return p.Default
	}
	switch {
	case p.Kind == forecast.Whole && p.Min <= 12 && p.Max >= 12:
		return "12"
	case p.Min >= 0 && p.Max <= 1:
		return "0.3"
	case p.Min > -1e12 && p.Max < 1e12:
		return trimNum((p.Min + p.Max) / 2)
	}
	return "1"
}

// Settings turns a forecast or sweep step's method options into the
// forecasting package's settings. Options that belong to the verb itself
// (horizon, as, ...) and range values are left out.
func Settings(sp forecast.Spec, s *Step) forecast.Settings {
	out := forecast.Settings{}
	for _, p := range sp.Params {
		o, ok := s.Option(p.Name)
		if !ok {
			continue
		}
		switch p.Kind {
		case forecast.Number, forecast.Whole:
			if o.Value.Lo != o.Value.Hi {
				continue
			}
			x := o.Value.Num
			if o.Value.Lo != 0 || o.Value.Hi != 0 {
				x = o.Value.Lo
			}
			out[p.Name] = forecast.Setting{Number: x}
		default:
			out[p.Name] = forecast.Setting{Word: o.Value.Raw}
		}
	}
	return out
}
