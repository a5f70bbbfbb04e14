package main

import (
	"encoding/json"
	"fmt"
	"math"
	"os"
	"path/filepath"
	"runtime"
	"strings"

	"quillcast/core/backtest"
	"quillcast/core/cmd/benchtable/workload"
)

// pageFigures is what the page measurements write to page.json.
type pageFigures struct {
	Load    string            `json:"load"`    // load average during the page runs
	Workers int               `json:"workers"` // Web Workers used for the parallel rows
	HWSSE   float64           `json:"hwSSE"`   // SSE of the page's Holt-Winters fit
	Rows    map[string]sample `json:"rows"`
}

// readPage reads page.json; a missing file gives empty figures and a note.
func readPage(dir string) (pageFigures, string) {
	var p pageFigures
	b, err := os.ReadFile(filepath.Join(dir, pageFile))
	if err != nil {
		return p, "page figures missing (" + err.Error() + "); run the page measurements with QUILLCAST_BENCH=1"
	}
	if err := json.Unmarshal(b, &p); err != nil {
		return p, "page.json unreadable: " + err.Error()
	}
	return p, ""
}

// measure runs the native and reference measurements and joins them with
// the page's into the table's rows.
func measure(c config) ([]row, string, error) {
	startLoad := loadAverage()
	in, err := readInputs(c.out)
	if err != nil {
		return nil, "", err
	}
	page, pageNote := readPage(c.out)
	if pageNote != "" {
		fmt.Fprintln(os.Stderr, "benchtable:", pageNote)
	}
	pr := func(key string) sample { return page.Rows[key] }
	var rows []row
	step := func(what string) { fmt.Fprintln(os.Stderr, "benchtable:", what) }

	// 1. Payload.
	step("payload")
	payload, err := payloadRows(c)
	if err != nil {
		return nil, "", err
	}
	rows = append(rows, payload...)

	// 2. Time to ready.
	first, repeat := pr("ready-first"), pr("ready-repeat")
	rows = append(rows,
		row{Item: "2", What: "time to ready, first visit (empty profile, build/dist)", Ours: first,
			Target: "≤ 0.6 s", Met: verdict(first.ok(), first.median() <= 0.6), Note: first.Note},
		row{Item: "2", What: "time to ready, repeat visit (same profile)", Ours: repeat, Other: first, Versus: "first visit",
			Ratio: ratioText(faster(repeat, first)), Target: "≤ 0.15 s", Met: verdict(repeat.ok(), repeat.median() <= 0.15), Note: repeat.Note})

	// 3. Re-run latency.
	step("re-run after an edit")
	native, err := nativeRerun(c.session, c.demo, 3*c.reps)
	if err != nil {
		return nil, "", err
	}
	for _, k := range []struct{ key, what string }{
		{"rerun-last", "re-run after editing the demo's last step, in the page"},
		{"rerun-first", "re-run after editing the demo's first analysis step, in the page"},
	} {
		s := pr(k.key)
		r := row{Item: "3", What: k.what, Ours: s, Target: "≤ 50 ms", Met: verdict(s.ok(), s.median() <= 0.05), Note: s.Note}
		if k.key == "rerun-last" {
			r.Other, r.Versus = native, "the engine natively, same edit"
			if s.ok() && native.ok() {
				r.Ratio = fmt.Sprintf("page %.1f× native", s.median()/native.median())
			}
		}
		rows = append(rows, r)
	}

	// 4. Window sweep.
	step("window sweep")
	raw, err := os.ReadFile(filepath.Join(c.out, walkFile))
	if err != nil {
		return nil, "", err
	}
	y, err := workload.ParseFloats(raw)
	if err != nil {
		return nil, "", err
	}
	widths := backtest.Range{From: in.From, To: in.To}
	sweepNative, sw, err := nativeSweep(y, in.Train, widths, c.reps)
	if err != nil {
		return nil, "", err
	}
	var np numpyRun
	if err := python(c.python, filepath.Join(c.scripts, "sweep_numpy.py"), &np, filepath.Join(c.out, walkFile), in.Train, in.From, in.To, c.reps); err != nil {
		return nil, "", err
	}
	numpy := secondsOf(np.Seconds)
	agree := sweepAgreement(sw, np)
	step("plain O(n·w) loop")
	plain, err := nativePlain(y, in.Train, widths, c.plainRep)
	if err != nil {
		return nil, "", err
	}
	sweepOne, sweepN, plainPage := pr("sweep-1"), pr("sweep-n"), pr("plain")
	numpyVs := "numpy " + np.Version + " cumulative sums, natively"
	for _, k := range []struct {
		what string
		s    sample
	}{
		{"width sweep 1..200 over 1,000,000 points, page, 1 worker", sweepOne},
		{fmt.Sprintf("width sweep, page, %d workers", page.Workers), sweepN},
	} {
		txt, r := faster(k.s, numpy)
		rows = append(rows, row{Item: "4", What: k.what, Ours: k.s, Other: numpy, Versus: numpyVs, Ratio: txt,
			Target: "≤ 0.5 s and ≥ 1.8× numpy", Met: verdict(k.s.ok(), k.s.median() <= 0.5 && r >= 1.8), Note: k.s.Note})
	}
	best := sweepOne
	if sweepN.ok() && (!best.ok() || sweepN.median() < best.median()) {
		best = sweepN
	}
	txt, r := faster(best, plainPage)
	rows = append(rows, row{Item: "4", What: "width sweep, page (faster of the two) vs the plain O(n·w) loop in the page", Ours: best, Other: plainPage,
		Versus: "plain loop in Go, page", Ratio: txt, Target: "≥ 50×", Met: verdict(best.ok() && plainPage.ok(), r >= 50), Note: plainPage.Note})
	txt, _ = faster(sweepNative, numpy)
	rows = append(rows, row{Item: "4", What: "width sweep, native Go", Ours: sweepNative, Other: numpy, Versus: numpyVs, Ratio: txt,
		Note: fmt.Sprintf("%s; plain O(n·w) Go loop natively: %s (%s)", agree, plain, ratioText(faster(sweepNative, plain)))})

	// 5. Holt-Winters.
	step("Holt-Winters")
	hwRaw, err := os.ReadFile(filepath.Join(c.out, hwFile))
	if err != nil {
		return nil, "", err
	}
	hy, err := workload.ParseFloats(hwRaw)
	if err != nil {
		return nil, "", err
	}
	hw, err := nativeHoltWinters(hy, in.Season, c.reps, 50, true)
	if err != nil {
		return nil, "", err
	}
	hwHeur, err := nativeHoltWinters(hy, in.Season, c.reps, 50, false)
	if err != nil {
		return nil, "", err
	}
	var sm statsRun
	if err := python(c.python, filepath.Join(c.scripts, "hw_statsmodels.py"), &sm, filepath.Join(c.out, hwFile), in.Season, c.reps); err != nil {
		return nil, "", err
	}
	smTime := secondsOf(sm.Seconds)
	smVs := "statsmodels " + sm.Version + " ExponentialSmoothing().fit(), natively"
	hwPage := pr("hw")
	sseNote := func(ours float64) string {
		return fmt.Sprintf("SSE ours %.2f vs statsmodels %.2f (%+.2f%%)", ours, sm.SSE, 100*(ours/sm.SSE-1))
	}
	sseOK := func(ours float64) bool { return ours <= sm.SSE*(1+1e-6) }
	txt, r = faster(hwPage, smTime)
	rows = append(rows, row{Item: "5", What: "Holt-Winters additive fit, 144 months, page", Ours: hwPage, Other: smTime, Versus: smVs, Ratio: txt,
		Target: "≤ 5 ms, ≥ 10×, SSE ≤ library's", Met: verdict(hwPage.ok(), hwPage.median() <= 0.005 && r >= 10 && sseOK(page.HWSSE)),
		Note: joinNotes(sseNote(page.HWSSE), hwPage.Note)})
	txt, _ = faster(hw.Time, smTime)
	rows = append(rows, row{Item: "5", What: "Holt-Winters additive fit, native Go", Ours: hw.Time, Other: smTime, Versus: smVs, Ratio: txt,
		Note: fmt.Sprintf("data: %s; constants and initial states estimated, %d SSE evaluations per fit; %s; with the heuristic start instead: %s per fit, SSE %.2f",
			in.HWSource, hw.Evals, sseNote(hw.SSE), hwHeur.Time, hwHeur.SSE)})

	// 6. Bake-off.
	step("bake-off")
	bo, nSeries, err := nativeBakeoff(c.competition, c.slowReps)
	if err != nil {
		return nil, "", err
	}
	boPage := pr("bakeoff")
	txt = ""
	if boPage.ok() && bo.ok() {
		txt = fmt.Sprintf("page %.1f× native", boPage.median()/bo.median())
	}
	rows = append(rows, row{Item: "6", What: fmt.Sprintf("bake-off, %d quarterly series, every method, page, %d workers", nSeries, page.Workers), Ours: boPage,
		Other: bo, Versus: "natively across goroutines (one per core)", Ratio: txt, Target: "≤ 10 s", Met: verdict(boPage.ok(), boPage.median() <= 10), Note: boPage.Note})

	// 7. Memory.
	mem := pr("memory")
	rows = append(rows, row{Item: "7", What: "peak wasm memory, 1,000,000-row file loaded and swept, page", Ours: mem,
		Target: "≤ 300 MB", Met: verdict(mem.ok(), mem.median() <= 300e6), Note: mem.Note})
	if pageNote != "" {
		rows[len(rows)-1].Note = joinNotes(rows[len(rows)-1].Note, pageNote)
	}
	context := fmt.Sprintf("Measured on %d cores; load average %s when the native runs began, %s when they ended (page runs: %s). Figures from a shared machine are noisy: compare the ratios of one run.", runtime.NumCPU(), startLoad, loadAverage(), page.Load)
	return rows, context, nil
}

// sweepAgreement compares our sweep's errors with numpy's, width by width.
func sweepAgreement(sw *backtest.WidthSweep, np numpyRun) string {
	if sw == nil || len(np.RMSE) != len(sw.Rows) || len(np.MAE) != len(sw.Rows) {
		return "numpy's results could not be compared (different widths)"
	}
	worst := 0.0
	for i, r := range sw.Rows {
		worst = math.Max(worst, math.Abs(r.Own.RMSE-np.RMSE[i])/np.RMSE[i])
		worst = math.Max(worst, math.Abs(r.Own.MAE-np.MAE[i])/np.MAE[i])
	}
	return fmt.Sprintf("MAE and RMSE agree with numpy's for all %d widths within a relative %.1e", len(sw.Rows), worst)
}

func ratioText(s string, _ float64) string { return s }

func joinNotes(a, b string) string {
	switch {
	case a == "":
		return b
	case b == "":
		return a
	}
	return a + "; " + b
}

// loadAverage returns the one-minute load average of the machine, or "not
// known" where /proc/loadavg is missing.
func loadAverage() string {
	b, err := os.ReadFile("/proc/loadavg")
	if err != nil {
		return "not known"
	}
	f := strings.Fields(string(b))
	if len(f) == 0 {
		return "not known"
	}
	return f[0]
}
