// Command benchtable measures Quillcast's speed and size and prints one
// table: for each figure our median (with the range over repeated runs),
// the comparison measured in the same run, their ratio and the target.
//
//	benchtable -prepare -out build/bench   # write the shared inputs
//	(the page measurements in site/browsertest write build/bench/page.json)
//	benchtable -out build/bench            # native and reference runs, the table
//
// `make bench` runs the three steps in order. The rows are: the engine's
// payload; time to ready in the page; re-run latency after an edit; the
// moving-average width sweep over 1,000,000 points against numpy
// cumulative sums and a plain O(n·w) loop; the additive Holt-Winters fit
// against statsmodels' default fit at equal or lower SSE; the bake-off of
// the 756 quarterly competition series; and peak wasm memory. Figures
// from the page come from page.json; a row whose page part was not
// measured says so.
package main

import (
	"flag"
	"fmt"
	"os"
)

// config holds the command's flags.
type config struct {
	out, site, bundle, dist  string
	session, demo            string
	competition, hwData      string
	python, scripts          string
	points                   int
	reps, slowReps, plainRep int
	prepareOnly              bool
}

func main() {
	var c config
	flag.StringVar(&c.out, "out", "build/bench", "folder for the prepared inputs, page.json and table.md")
	flag.StringVar(&c.site, "site", "build/site", "the built site (make build)")
	flag.StringVar(&c.dist, "dist", "build/dist", "the folder for a static host (make dist)")
	flag.StringVar(&c.bundle, "bundle", "build/quillcast.html", "the single-file build (make bundle)")
	flag.StringVar(&c.session, "session", "testdata/sessions/demo.md", "the demo session")
	flag.StringVar(&c.demo, "demo", "testdata/demo", "the demo data folder")
	flag.StringVar(&c.competition, "competition", "../shared/competition/m3-quarterly.csv", "the quarterly competition file")
	flag.StringVar(&c.hwData, "hw", "../shared/reference/data/elec_equip_monthly.csv", "monthly data whose first 144 values the Holt-Winters row fits")
	flag.StringVar(&c.python, "python", "/usr/bin/python3", "the Python with numpy and statsmodels")
	flag.StringVar(&c.scripts, "scripts", "testdata/bench", "folder of the numpy and statsmodels scripts")
	flag.IntVar(&c.points, "points", 1_000_000, "points of the sweep and memory rows")
	flag.IntVar(&c.reps, "reps", 7, "runs of the quick figures")
	flag.IntVar(&c.slowReps, "slow-reps", 3, "runs of the slow figures (bake-off)")
	flag.IntVar(&c.plainRep, "plain-reps", 1, "runs of the plain O(n·w) loop")
	flag.BoolVar(&c.prepareOnly, "prepare", false, "only write the shared inputs into -out")
	flag.Parse()
	if c.prepareOnly {
		if _, err := prepare(c.out, c); err != nil {
			fmt.Fprintln(os.Stderr, "benchtable:", err)
			os.Exit(1)
		}
		return
	}
	rows, context, err := measure(c)
	if err != nil {
		fmt.Fprintln(os.Stderr, "benchtable:", err)
		os.Exit(1)
	}
	f, err := os.Create(c.out + "/table.md")
	if err == nil {
		err = writeTable(f, rows)
		if err == nil {
			_, err = fmt.Fprintf(f, "\n%s\n", context)
		}
		if cerr := f.Close(); err == nil {
			err = cerr
		}
	}
	if err != nil {
		fmt.Fprintln(os.Stderr, "benchtable:", err)
		os.Exit(1)
	}
	if err := writeTable(os.Stdout, rows); err != nil {
		os.Exit(1)
	}
	fmt.Printf("\n%s\n", context)
}
