// The engine's worker: runs the WebAssembly engine off the page's main
// thread so that long runs (sweeps, backtests, bake-offs) leave the page
// responsive, and so that a run can be stopped by ending the worker.
//
// Messages in:  {type: "start", module: WebAssembly.Module, poolSize?, why?}
//               {type: "call", id, name, args}
//               {type: "part-reply", id, text}, {type: "part-failed", id, message}
// Messages out: {type: "ready", version, names}, {type: "reply", id, text},
//               {type: "failed", message}, {type: "stopped"},
//               {type: "storage-closed"}, {type: "progress", detail},
//               {type: "part", id, text}
//
// The engine worker is told how many further workers the page may start
// for a bake-off (poolSize, and why when none); the engine hands each part
// of a bake-off to the page as a "part" message, and the page answers it
// with the text a further worker's bakeoffPart returned. Further workers
// run this same code, started without a pool size.
//
// The page starts it from a Blob holding wasm_exec.js followed by this
// text, so Go is already defined and no file is fetched; loaded on its own,
// it fetches wasm_exec.js from beside itself.

/* global Go, importScripts */
if (typeof Go === "undefined") {
  importScripts("wasm_exec.js");
}

async function startEngine(module) {
  const ready = new Promise((resolve) => self.addEventListener("quillcast-ready", resolve, { once: true }));
  const go = new Go();
  // The page compiled the engine once and sent the module: instantiating
  // it here does not compile it a second time.
  const instance = await WebAssembly.instantiate(module, go.importObject);
  go.run(instance).then(() => self.postMessage({ type: "stopped" }));
  await ready;
  const api = self.quillcast;
  const names = Object.keys(api).filter((k) => typeof api[k] === "function");
  self.postMessage({ type: "ready", version: api.version, names });
}

// The parts of a bake-off waiting for the page's answer, by id.
const parts = { next: 1, waiting: new Map() };

/** offerPool lets the engine find the page's further workers (see wasm/pool.go). */
function offerPool(size, why) {
  self.quillcastPool = {
    size,
    why,
    run(text) {
      const id = parts.next++;
      return new Promise((resolve, reject) => {
        parts.waiting.set(id, { resolve, reject });
        self.postMessage({ type: "part", id, text });
      });
    },
  };
}

/** partAnswered settles the part the page answered. */
function partAnswered(m) {
  const p = parts.waiting.get(m.id);
  if (!p) return;
  parts.waiting.delete(m.id);
  if (m.type === "part-reply") p.resolve(m.text);
  else p.reject(new Error(m.message));
}

async function answer(m) {
  let text;
  try {
    text = await self.quillcast[m.name](...m.args);
  } catch (err) {
    text = JSON.stringify({ ok: false, error: { message: `the engine could not answer (${err && err.message ? err.message : err})` } });
  }
  self.postMessage({ type: "reply", id: m.id, text });
}

self.addEventListener("quillcast-storage-closed", () => self.postMessage({ type: "storage-closed" }));
// A run's progress, {fraction, text}, as the engine reports it.
self.addEventListener("quillcast-progress", (e) => self.postMessage({ type: "progress", detail: e.detail }));

self.onmessage = (e) => {
  const m = e.data;
  if (m.type === "start") {
    if (typeof m.poolSize === "number") offerPool(m.poolSize, m.why || "");
    startEngine(m.module).catch((err) => self.postMessage({ type: "failed", message: String(err && err.message ? err.message : err) }));
  } else if (m.type === "call") {
    answer(m);
  } else if (m.type === "part-reply" || m.type === "part-failed") {
    partAnswered(m);
  }
};
