package main

import (
	"fmt"
	"regexp"
	"strings"
)

// importLine matches the one form of import the page's modules use:
//
//	import { a, b } from "./name.js";
var importLine = regexp.MustCompile(`^import \{[^}]*\} from "\./([a-z0-9_-]+\.js)";$`)

// exportPrefix matches a declaration exported at the start of a line.
var exportPrefix = regexp.MustCompile(`^export (async function|function|class|const|let) `)

// topName matches a top-level declaration and captures its name.
var topName = regexp.MustCompile(`^(?:export )?(?:async function|function|class|const|let) ([A-Za-z_$][A-Za-z0-9_$]*)`)

// joinModules joins the page's ES modules into one module script, each
// module after those it imports, with the import lines removed and the
// export keywords dropped. It refuses imports of any other form and two
// modules declaring the same top-level name, so a joined page never differs
// silently from the served one.
func joinModules(files siteFiles, entry string) (string, error) {
	var order []string
	state := map[string]int{} // 1 visiting, 2 done
	var visit func(name string) error
	visit = func(name string) error {
		switch state[name] {
		case 1:
			return fmt.Errorf("the modules import each other in a circle through %s", name)
		case 2:
			return nil
		}
		src, ok := files[name]
		if !ok {
			return fmt.Errorf("a module imports %s, which the built site lacks", name)
		}
		state[name] = 1
		for i, line := range strings.Split(string(src), "\n") {
			if !strings.HasPrefix(line, "import ") {
				continue
			}
			m := importLine.FindStringSubmatch(line)
			if m == nil {
				return fmt.Errorf("%s line %d: the single-file build understands only `import { … } from \"./x.js\";`", name, i+1)
			}
			if err := visit(m[1]); err != nil {
				return err
			}
		}
		state[name] = 2
		order = append(order, name)
		return nil
	}
	if err := visit(entry); err != nil {
		return "", err
	}
	var b strings.Builder
	declared := map[string]string{}
	for _, name := range order {
		fmt.Fprintf(&b, "// --- %s\n", name)
		for _, line := range strings.Split(string(files[name]), "\n") {
			if importLine.MatchString(line) {
				continue
			}
			if m := topName.FindStringSubmatch(line); m != nil {
				if other, dup := declared[m[1]]; dup {
					return "", fmt.Errorf("%s and %s both declare %q at the top level; rename one", other, name, m[1])
				}
				declared[m[1]] = name
			}
			b.WriteString(exportPrefix.ReplaceAllString(line, "$1 "))
			b.WriteByte('\n')
		}
	}
	return b.String(), nil
}
