package browsertest

import (
	"context"
	"encoding/json"
	"fmt"
	"os"
	"path/filepath"
	"testing"
	"time"

	"github.com/chromedp/chromedp"
)

// benchScript runs the bench engine in Web Workers: each worker
// instantiates the module compiled once by the page, and answers calls to
// globalThis.quillcastBench (the bench tag's functions) or
// globalThis.quillcast (the engine's own API) with the answer's text, the
// time the call took inside the worker and the size of its wasm memory.
const benchScript = `
const workerCode = ` + "`" + `
importScripts(ORIGIN + '/wasm_exec.js');
let inst;
self.onmessage = async (e) => {
  const m = e.data;
  if (m.type === 'start') {
    const ready = new Promise((r) => self.addEventListener('quillcast-ready', r, { once: true }));
    const go = new Go();
    inst = await WebAssembly.instantiate(m.module, go.importObject);
    go.run(inst);
    await ready;
    self.postMessage({ id: m.id, text: '{"ok":true}', ms: 0, mem: inst.exports.mem.buffer.byteLength });
    return;
  }
  const t0 = performance.now();
  let text;
  try { text = await self[m.api][m.name](...m.args); }
  catch (err) { text = JSON.stringify({ ok: false, error: { message: String(err) } }); }
  self.postMessage({ id: m.id, text, ms: performance.now() - t0, mem: inst.exports.mem.buffer.byteLength });
};` + "`" + `;
let nextId = 1, compiled = null;
function send(w, msg) {
  const id = nextId++;
  return new Promise((resolve) => { w.pending.set(id, resolve); w.postMessage({ ...msg, id }); });
}
async function newWorker() {
  compiled = compiled || WebAssembly.compileStreaming(fetch('/bench.wasm'));
  const src = workerCode.replace('ORIGIN', JSON.stringify(location.origin));
  const w = new Worker(URL.createObjectURL(new Blob([src], { type: 'text/javascript' })));
  w.pending = new Map();
  w.onmessage = (e) => { const p = w.pending.get(e.data.id); w.pending.delete(e.data.id); p(e.data); };
  await send(w, { type: 'start', module: await compiled });
  return w;
}
async function call(w, api, name, ...args) {
  const r = await send(w, { type: 'call', api, name, args });
  const env = JSON.parse(r.text);
  if (!env.ok) throw new Error(name + ': ' + (env.error && env.error.message));
  return { value: env.value, ms: r.ms, mem: r.mem };
}
async function bytes(path) { return new Uint8Array(await (await fetch(path)).arrayBuffer()); }
async function workers(n) { return Promise.all([...Array(n)].map(() => newWorker())); }
function chunk(i, n, from, to) {
  const k = to - from + 1;
  return [from + Math.floor(i * k / n), from + Math.floor((i + 1) * k / n) - 1];
}
async function benchSweep(n, reps, inp, fn) {
  const walk = await bytes('/walk.f64');
  const ws = await workers(n);
  await Promise.all(ws.map((w) => call(w, 'quillcastBench', 'load', walk)));
  const out = { cold: 0, warm: [] };
  for (let r = 0; r <= reps; r++) {
    const t0 = performance.now();
    await Promise.all(ws.map((w, i) => call(w, 'quillcastBench', fn, ...chunk(i, n, inp.from, inp.to), inp.train)));
    const s = (performance.now() - t0) / 1e3;
    if (r === 0) out.cold = s; else out.warm.push(s);
  }
  ws.forEach((w) => w.terminate());
  return JSON.stringify(out);
}
async function benchSweeps(n, reps, inp) {
  const walk = await bytes('/walk.f64');
  const pools = { one: await workers(1), many: await workers(n) };
  const out = { one: { cold: 0, warm: [] }, many: { cold: 0, warm: [] } };
  for (const ws of Object.values(pools)) await Promise.all(ws.map((w) => call(w, 'quillcastBench', 'load', walk)));
  for (let r = 0; r <= reps; r++) {
    for (const [key, ws] of Object.entries(pools)) {
      const t0 = performance.now();
      await Promise.all(ws.map((w, i) => call(w, 'quillcastBench', 'sweep', ...chunk(i, ws.length, inp.from, inp.to), inp.train)));
      const s = (performance.now() - t0) / 1e3;
      if (r === 0) out[key].cold = s; else out[key].warm.push(s);
    }
  }
  Object.values(pools).flat().forEach((w) => w.terminate());
  return JSON.stringify(out);
}
async function benchHW(reps, batch, season) {
  const y = await bytes('/hw.f64');
  const [w] = await workers(1);
  const out = { seconds: [] };
  for (let r = 0; r <= reps; r++) {
    const v = (await call(w, 'quillcastBench', 'holtWinters', y, season, batch)).value;
    if (r === 0) out.cold = v.seconds; else out.seconds.push(v.seconds);
    out.sse = v.sse; out.evals = v.evals;
  }
  w.terminate();
  return JSON.stringify(out);
}
async function benchBakeoff(n, reps) {
  const file = await bytes('/competition.csv');
  const ws = await workers(n);
  const out = [];
  for (let r = 0; r < reps; r++) {
    const t0 = performance.now();
    await Promise.all(ws.map((w, i) => call(w, 'quillcastBench', 'bakeoff', file, i, n)));
    out.push((performance.now() - t0) / 1e3);
  }
  ws.forEach((w) => w.terminate());
  return JSON.stringify(out);
}
async function benchMemory(steps) {
  const file = await bytes('/rows.csv');
  const [w] = await workers(1);
  const out = { start: 0, attach: 0, run: 0, attachMs: 0, runMs: 0, problem: '' };
  out.start = (await call(w, 'quillcast', 'storage')).mem;
  try {
    const a = await call(w, 'quillcast', 'attach', file, 'rows.csv');
    out.attach = a.mem; out.attachMs = a.ms;
    const parts = [{ kind: 'steps', lines: steps.map((text, i) => ({ text, line: i + 1 })) }];
    const r = await call(w, 'quillcast', 'run', JSON.stringify(parts));
    out.run = r.mem; out.runMs = r.ms;
    const errs = r.value.result.errors || [];
    if (errs.length > 0) out.problem = errs[0].message;
  } catch (err) {
    out.problem = String(err.message || err);
    out.run = Math.max(out.attach, out.start);
  }
  w.terminate();
  return JSON.stringify(out);
}
`

// evalLong evaluates a JavaScript expression returning JSON text and
// decodes it into v, allowing limit for slow work.
func evalLong(p *page, expr string, limit time.Duration, v any) {
	p.t.Helper()
	ctx, cancel := context.WithTimeout(p.ctx, limit)
	defer cancel()
	s, err := chromedp.Run(ctx, chromedp.Evaluate[string](expr, chromedp.EvalAwaitPromise))
	if err != nil {
		p.fail("evaluating "+expr, err)
	}
	if err := json.Unmarshal([]byte(s), v); err != nil {
		p.fail("reading the answer of "+expr, err)
	}
}

// benchInputs is the part of inputs.json the page rows need.
type benchInputs struct {
	Points      int    `json:"points"`
	Train       int    `json:"train"`
	From        int    `json:"from"`
	To          int    `json:"to"`
	Season      int    `json:"season"`
	Competition string `json:"competition"`
}

// computeRows measures the sweep, the plain loop, the Holt-Winters fit,
// the bake-off and the memory of the 1,000,000-row case in workers.
func computeRows(t *testing.T, dir string, figs *benchFigures) {
	t.Helper()
	var in benchInputs
	raw, err := os.ReadFile(filepath.Join(dir, "inputs.json"))
	if err == nil {
		err = json.Unmarshal(raw, &in)
	}
	if err != nil {
		t.Fatal(err)
	}
	p := startBrowser(t, benchServer(t, dir, in.Competition))
	p.run("opening the bench page", 30*time.Second, chromedp.Navigate(p.base.String()), chromedp.WaitReady(chromedp.CSS("title")))
	n := max(eval[int](p, `navigator.hardwareConcurrency || 1`), 1)
	figs.Workers = n
	inp := fmt.Sprintf(`{from: %d, to: %d, train: %d}`, in.From, in.To, in.Train)

	type runs struct {
		Cold float64   `json:"cold"`
		Warm []float64 `json:"warm"`
	}
	var sweeps struct{ One, Many runs }
	evalLong(p, fmt.Sprintf(`benchSweeps(%d, 7, %s)`, n, inp), 10*time.Minute, &sweeps)
	figs.Rows["sweep-1"] = benchSample{Values: sweeps.One.Warm, Unit: "s",
		Note: fmt.Sprintf("one worker, widths 1..200, wall time seen by the page, runs alternating with the %d-worker ones, after one run that warms up the browser's optimising compiler (that first run took %.2f s)", n, sweeps.One.Cold)}
	figs.Rows["sweep-n"] = benchSample{Values: sweeps.Many.Warm, Unit: "s",
		Note: fmt.Sprintf("widths split evenly across %d workers, after a warm-up run (%.2f s)", n, sweeps.Many.Cold)}
	var sweep runs
	if os.Getenv("QUILLCAST_BENCH_PLAIN") != "0" {
		sweep.Warm = nil
		evalLong(p, fmt.Sprintf(`benchSweep(1, 0, %s, 'plain')`, inp), 10*time.Minute, &sweep)
		figs.Rows["plain"] = benchSample{Values: []float64{sweep.Cold}, Unit: "s", Note: "plain O(n·w) loop, one worker, one run (it is slow)"}
	}

	var hw struct {
		Seconds []float64 `json:"seconds"`
		Cold    float64   `json:"cold"`
		SSE     float64   `json:"sse"`
		Evals   int       `json:"evals"`
	}
	evalLong(p, fmt.Sprintf(`benchHW(7, 20, %d)`, in.Season), 5*time.Minute, &hw)
	figs.HWSSE = hw.SSE
	figs.Rows["hw"] = benchSample{Values: hw.Seconds, Unit: "s", Note: fmt.Sprintf("mean of 20 fits per run, timed inside the worker, after a first batch at %.2f ms per fit; %d SSE evaluations per fit", hw.Cold*1e3, hw.Evals)}

	var secs []float64
	evalLong(p, fmt.Sprintf(`benchBakeoff(%d, 2)`, n), 10*time.Minute, &secs)
	figs.Rows["bakeoff"] = benchSample{Values: secs, Unit: "s", Note: fmt.Sprintf("series dealt round-robin to %d workers, wall time seen by the page; the page's own bake-off step shares its series among up to four workers the same way", n)}

	var mem struct {
		Start, Attach, Run float64
		AttachMs, RunMs    float64
		Problem            string
	}
	steps := `["load rows.csv value=value", "split last=12", "sweep moving-average width=1..200 by=rmse"]`
	evalLong(p, fmt.Sprintf(`benchMemory(%s)`, steps), 5*time.Minute, &mem)
	note := fmt.Sprintf("wasm memory (it only grows, so this is the peak): %.0f MB at start, %.0f MB after attaching the %d-row file (%.2f s), %.0f MB after running %s (%.2f s)",
		mem.Start/1e6, mem.Attach/1e6, in.Points, mem.AttachMs/1e3, mem.Run/1e6, steps, mem.RunMs/1e3)
	if mem.Problem != "" {
		note += "; the engine answered: " + mem.Problem
	}
	figs.Rows["memory"] = benchSample{Values: []float64{mem.Run}, Unit: "B", Note: note}
}
