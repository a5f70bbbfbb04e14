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
	return complete(line, col, cat, nil)
}

// Labels returns the forecast labels that a step written before step n
// (1-based; len(p.Steps)+1 for a new last line) can name: those made since
// the last load and split before it.
func (p *Program) Labels(n int) []string {
	sc := scope{labels: map[string]int{}}
	for _, s := range p.Steps {
		if s.N >= n {
			break
		}
		sc.add(s)
	}
	return sc.order
}

// CompleteAt is [Complete] for a line standing at step n of the program:
// it also offers the forecast labels made by the steps before it, after
// check, of= and among=.
func (p *Program) CompleteAt(n int, line string, col int) []Suggestion {
	return complete(line, col, DefaultCatalog(), p.Labels(n))
}

func complete(line string, col int, cat Catalog, labels []string) []Suggestion {
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
		choices := valueChoices(o)
		if o.Kind == Names && labels != nil && o.Name != "methods" {
			choices = labelChoices(val, labels)
			last := lastItem(val)
			vfrom += utf8.RuneCountInString(val) - utf8.RuneCountInString(last)
			val = last
		}
		for _, c := range choices {
			if strings.HasPrefix(c, val) {
				out = append(out, Suggestion{Text: c, Label: c, Detail: o.Help, From: vfrom, To: to})
			}
		}
		return out
	}
	if len(fields) == 1 && def.Name == "check" {
		for _, l := range labels {
			if strings.HasPrefix(l, word) {
				out = append(out, Suggestion{Text: l, Label: l, Detail: "a forecast made earlier", From: from, To: to})
			}
		}
	}
	if len(fields) == 1 && def.Subject.What != "" && def.Name != "check" {
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

// labelChoices offers the labels not yet in the comma list typed so far.
func labelChoices(typed string, labels []string) []string {
	done := strings.Split(typed, ",")
	done = done[:len(done)-1]
	var out []string
	for _, l := range labels {
		if !contains(done, l) {
			out = append(out, l)
		}
	}
	return out
}

// lastItem is the part of a comma list after its last comma.
func lastItem(s string) string {
	if i := strings.LastIndexByte(s, ','); i >= 0 {
		return s[i+1:]
	}
	return s
}
