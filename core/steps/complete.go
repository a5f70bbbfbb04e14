package steps

import (
	"strings"
	"unicode/utf8"
)

// Suggestion is one completion offered at the cursor.
type Suggestion struct {
	Text   string `json:"text"`   // what replaces the word under the cursor
	Label  string `json:"label"`  // what the list shows
	Detail string `json:"detail"` // one line of help
	From   int    `json:"from"`   // 1-based column of the first character replaced
	To     int    `json:"to"`     // 1-based column just past the last character replaced
}

// Complete returns what may be written at column col (1-based, in
// characters; len+1 is the end) of a step line: verbs at the start, then
// the verb's subjects, then its options and their values, filtered by what
// is typed so far. It uses the forecasting package's catalogue.
func Complete(line string, col int) []Suggestion {
	return CompleteWith(line, col, DefaultCatalog())
}

// CompleteWith is [Complete] with a catalogue of the caller's choice.
func CompleteWith(line string, col int, cat Catalog) []Suggestion {
	runes := []rune(line)
	if col < 1 {
		col = 1
	}
	if col > len(runes)+1 {
		col = len(runes) + 1
	}
	// The word under the cursor runs from the last space before it.
	start := col - 1
	for start > 0 && runes[start-1] != ' ' && runes[start-1] != '\t' {
		start--
	}
	before := string(runes[:start])
	if strings.ContainsRune(before, '#') {
		return nil
	}
	word := string(runes[start : col-1])
	end := col - 1
	for end < len(runes) && runes[end] != ' ' && runes[end] != '\t' {
		end++
	}
	from, to := start+1, end+1
	fields := strings.Fields(before)
	if len(fields) == 0 {
		var out []Suggestion
		for _, v := range Verbs() {
			if strings.HasPrefix(v.Name, word) {
				out = append(out, Suggestion{Text: v.Name, Label: v.Name, Detail: v.Summary, From: from, To: to})
			}
		}
		return out
	}
	def, ok := Lookup(fields[0])
	if !ok {
		return nil
	}
	subject := ""
	if len(fields) > 1 && !strings.Contains(fields[1], "=") {
		subject = fields[1]
	}
	var out []Suggestion
	if key, val, isOpt := strings.Cut(word, "="); isOpt {
		o, known := findOption(StepOptions(def, subject, cat), key)
		if !known {
			return nil
		}
		vfrom := from + utf8.RuneCountInString(key) + 1
		for _, c := range valueChoices(o) {
			if strings.HasPrefix(c, val) {
				out = append(out, Suggestion{Text: c, Label: c, Detail: o.Help, From: vfrom, To: to})
			}
		}
		return out
	}
	if len(fields) == 1 && def.Subject.What != "" {
		for _, c := range subjectChoices(def, cat) {
			if strings.HasPrefix(c.Label, word) {
				c.From, c.To = from, to
				out = append(out, c)
			}
		}
	}
	used := map[string]bool{}
	for _, f := range fields[1:] {
		if k, _, ok := strings.Cut(f, "="); ok {
			used[k] = true
		}
	}
	for _, o := range StepOptions(def, subject, cat) {
		if used[o.Name] || !strings.HasPrefix(o.Name, word) {
			continue
		}
		out = append(out, Suggestion{Text: o.Name + "=", Label: o.Name + "=" + o.Example, Detail: o.Help, From: from, To: to})
	}
	return out
}

func subjectChoices(def VerbDef, cat Catalog) []Suggestion {
	var out []Suggestion
	switch {
	case def.Methods:
		for _, sp := range cat {
			out = append(out, Suggestion{Text: sp.Name, Label: sp.Name, Detail: sp.Title + ": " + sp.Summary})
		}
	default:
		for _, c := range def.Subject.Choices {
			out = append(out, Suggestion{Text: c, Label: c, Detail: def.Subject.Help})
		}
	}
	return out
}

func valueChoices(o OptionDef) []string {
	if len(o.Choices) > 0 {
		return o.Choices
	}
	if o.Example != "" {
		return []string{o.Example}
	}
	return nil
}
