package runner

// memo records the memo's heading.
func (x *exec) memo() error {
	m := &x.st.meta
	set := []string{}
	for _, o := range x.s.Options {
		switch o.Key {
		case "title":
			m.Title = o.Value.Raw
		case "client":
			m.Client = o.Value.Raw
		case "by":
			m.By = o.Value.Raw
			set = append(set, "author")
			continue
		case "date":
			m.Date = o.Value.Raw
		}
		set = append(set, o.Key)
	}
	if len(set) == 0 {
		x.message(Info, "Nothing set: give title=, client=, by= or date= to head the memo.")
		return nil
	}
	x.message(Info, "The memo's %s set.", joinWords(set)+plural(len(set), " is", " are"))
	return nil
}

func plural(n int, one, many string) string {
	if n == 1 {
		return one
	}
	return many
}
