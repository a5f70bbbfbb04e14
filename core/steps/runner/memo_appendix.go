package runner

import (
	"fmt"
	"strings"

	"quillcast/core/format"
	"quillcast/core/memo"
	"quillcast/core/session"
	"quillcast/core/steps"
)

// notesSection gathers the prose of the session, the analyst's own words,
// leaving out the first level-one heading (it is the memo's title).
func (res *Result) notesSection() memo.Section {
	s := memo.Section{Kind: memo.Notes}
	if res.doc == nil {
		return s
	}
	dropped := false
	for _, p := range res.doc.Parts {
		if p.Kind != session.Prose {
			continue
		}
		text := p.Raw
		if !dropped {
			var kept []string
			for _, l := range strings.Split(text, "\n") {
				if !dropped && strings.HasPrefix(strings.TrimSpace(l), "# ") {
					dropped = true
					continue
				}
				kept = append(kept, l)
			}
			text = strings.Join(kept, "\n")
		}
		if strings.TrimSpace(text) != "" {
			s.Blocks = append(s.Blocks, memo.Paragraph{Text: demoteHeadings(strings.TrimSpace(text))})
		}
	}
	if len(s.Blocks) == 0 {
		s.Blocks = append(s.Blocks, para("The analyst added no notes."))
	}
	return s
}

func (res *Result) appendixSection(version string) memo.Section {
	s := memo.Section{Kind: memo.Appendix}
	steps := ""
	if res.doc != nil {
		steps = res.doc.Steps()
	}
	s.Blocks = append(s.Blocks, para("The steps below reproduce every figure of this memo when run on the same data file (check its fingerprint)."),
		memo.Steps{Info: session.StepsInfo, Text: steps})
	st := res.final
	if st != nil {
		var items []string
		for _, f := range st.forecasts {
			item := fmt.Sprintf("%s: %s", f.label, f.title)
			var ps []string
			for _, p := range f.params {
				how := "given"
				if p.Estimated {
					how = "estimated"
				}
				ps = append(ps, fmt.Sprintf("%s %s (%s)", p.Name, value(p.Value), how))
			}
			if len(ps) > 0 {
				item += "; " + strings.Join(ps, ", ")
			}
			items = append(items, item)
		}
		if len(items) > 0 {
			s.Blocks = append(s.Blocks, para("Settings of each forecast, as fitted on the training period:"), memo.List{Items: items})
		}
	}
	if ref := verbReference(res.doc); len(ref) > 0 {
		s.Blocks = append(s.Blocks, para("What each verb of these steps does:"), memo.List{Items: ref})
	}
	if version != "" {
		s.Blocks = append(s.Blocks, para("Program version: %s.", version))
	}
	return s
}

// ForecastSheet returns every forecast past the end of the data as rows for
// forecasts.csv: period, method label, forecast and the 80% and 95% bounds
// (empty where there is none), numbers in plain form.
func (res *Result) ForecastSheet() memo.Sheet {
	sh := memo.Sheet{Header: memo.ForecastHeader()}
	st := res.final
	if st == nil || st.data == nil {
		return sh
	}
	for _, f := range st.forecasts {
		labels := futureLabelsOf(st, len(f.future))
		for i, v := range f.future {
			row := []string{labels[i], f.label, format.Plain(v, 4)}
			for _, l := range []float64{80, 95} {
				if b := bandAt(f, l); b != nil {
					row = append(row, format.Plain(b.lo[i], 4), format.Plain(b.hi[i], 4))
				} else {
					row = append(row, "", "")
				}
			}
			sh.Rows = append(sh.Rows, row)
		}
	}
	return sh
}

// demoteHeadings moves the ATX headings of the analyst's prose two levels
// down (## becomes ####), so that they sit under the memo's own section
// headings; lines inside fenced code are left alone.
func demoteHeadings(text string) string {
	lines := strings.Split(text, "\n")
	fence := ""
	for i, l := range lines {
		t := strings.TrimLeft(l, " ")
		if len(l)-len(t) > 3 {
			continue
		}
		if fence != "" {
			if strings.HasPrefix(t, fence) {
				fence = ""
			}
			continue
		}
		if strings.HasPrefix(t, "```") || strings.HasPrefix(t, "~~~") {
			fence = t[:3]
			continue
		}
		n := 0
		for n < len(t) && t[n] == '#' {
			n++
		}
		if n >= 1 && n <= 6 && (n == len(t) || t[n] == ' ' || t[n] == '\t') {
			lines[i] = strings.Repeat("#", min(n+2, 6)) + t[n:]
		}
	}
	return strings.Join(lines, "\n")
}

// verbReference lists the verbs the session uses, in order of first use,
// each with its summary from the language's own definitions.
func verbReference(doc *session.Document) []string {
	if doc == nil {
		return nil
	}
	seen := map[string]bool{}
	var out []string
	for _, s := range steps.Parse(doc).Steps {
		def, ok := steps.Lookup(s.Verb)
		if !ok || seen[def.Name] {
			continue
		}
		seen[def.Name] = true
		out = append(out, "`"+def.Name+"`: "+def.Summary)
	}
	return out
}
