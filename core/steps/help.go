package steps

import (
	"strings"
)

// MethodHelp describes one forecasting method for the help page.
type MethodHelp struct {
	Name    string      `json:"name"`
	Title   string      `json:"title"`
	Summary string      `json:"summary"`
	Source  string      `json:"source"`
	Assumes string      `json:"assumes"`
	Options []OptionDef `json:"options"`
}

// HelpPage is the whole reference of the language: every verb and every
// forecasting method, built from the same definitions the parser uses.
type HelpPage struct {
	Verbs   []VerbDef    `json:"verbs"`
	Methods []MethodHelp `json:"methods"`
	Values  []string     `json:"values"` // how each kind of value is written
}

// Help returns the reference of the language for the page and, through
// [HelpPage.Markdown], for the memo's appendix.
func Help() HelpPage { return HelpWith(DefaultCatalog()) }

// HelpWith is [Help] with a catalogue of the caller's choice.
func HelpWith(cat Catalog) HelpPage {
	h := HelpPage{Verbs: Verbs()}
	for _, sp := range cat {
		h.Methods = append(h.Methods, MethodHelp{Name: sp.Name, Title: sp.Title, Summary: sp.Summary,
			Source: sp.Source, Assumes: sp.Assumes, Options: MethodOptions(sp, false)})
	}
	h.Values = []string{
		"number: 12, 0.3, -2",
		"word: one of the listed choices, such as mase",
		"name or text: hw, or \"Wickery & Co.\" in double quotes when it has spaces",
		"range: 2..24 or 0.1..0.9 (both ends included)",
		"list: 80,95 or hw,ma12 (commas, no spaces)",
		"period: 2024-03 (month), 2024-Q1 (quarter), 2024-W05 (week), 2024-03-15 (day), 2024 (year)",
		"a # starts a comment that runs to the end of the line",
	}
	return h
}

// Markdown writes the help page as CommonMark with GFM tables.
func (h HelpPage) Markdown() string {
	var b strings.Builder
	b.WriteString("## Steps\n\nOne step per line: a verb, an optional subject, then options written key=value.\n\n")
	for _, v := range h.Values {
		b.WriteString("- " + v + "\n")
	}
	for _, v := range h.Verbs {
		b.WriteString("\n### `" + v.Name)
		if v.Subject.What != "" {
			w := strings.ToUpper(strings.ReplaceAll(v.Subject.What, " ", "-"))
			if !v.Subject.Required {
				w = "[" + w + "]"
			}
			b.WriteString(" " + w)
		}
		b.WriteString("`\n\n" + v.Summary + "\n\nExample: `" + v.Example + "`\n")
		if v.Subject.Help != "" {
			b.WriteString("\nSubject: " + v.Subject.Help + choicesText(v.Subject.Choices) + ".\n")
		}
		optionTable(&b, v.Options)
		if v.Methods {
			b.WriteString("\nThe method's own parameters are options too (see Methods).\n")
		}
	}
	b.WriteString("\n## Methods\n")
	for _, m := range h.Methods {
		b.WriteString("\n### `" + m.Name + "`: " + m.Title + "\n\n" + m.Summary + "\n")
		if m.Assumes != "" {
			b.WriteString("\nAssumes: " + m.Assumes + "\n")
		}
		if m.Source != "" {
			b.WriteString("\nSource: " + m.Source + "\n")
		}
		optionTable(&b, m.Options)
	}
	return b.String()
}

func optionTable(b *strings.Builder, opts []OptionDef) {
	if len(opts) == 0 {
		return
	}
	b.WriteString("\n| option | value | default | what it does |\n| --- | --- | --- | --- |\n")
	for _, o := range opts {
		kind := o.Kind.String()
		if len(o.Choices) > 0 {
			kind = strings.Join(o.Choices, ", ")
		}
		def := o.Default
		switch {
		case o.Required:
			def = "required"
		case def == "":
			def = "—"
		}
		b.WriteString("| `" + o.Name + "=" + cell(o.Example) + "` | " + cell(kind) + " | " + cell(def) + " | " + cell(o.Help) + " |\n")
	}
}

// cell keeps text from breaking a table row.
func cell(s string) string {
	return strings.NewReplacer("|", `\|`, "\n", " ").Replace(s)
}
