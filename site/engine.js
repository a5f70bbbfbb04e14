// Starting the WebAssembly engine and calling it. The engine runs in a Web
// Worker when the browser allows one (so long runs can show progress and be
// stopped); otherwise it runs on the page itself, and the page says so.
// Either way globalThis.quillcast holds the engine's functions, each
// answering (at once or through a Promise) with JSON text
// {"ok":true,"value":...} or {"ok":false,"error":{...}}.

import { isBundle, assetText } from "./assets.js";

/** EngineError carries the engine's error data: message, line, column. */
export class EngineError extends Error {
  constructor(failure) {
    super(failure.message);
    this.name = "EngineError";
    this.failure = failure;
  }
}

/** The engine API generation this page was written for. */
const engineVersion = "1";

/** How long a call runs before the page shows the progress bar. */
const busyAfterMs = 250;

const engine = {
  mode: "",        // "worker" or "page"
  worker: null,
  module: null,    // the compiled engine, kept to restart a stopped worker
  pending: new Map(), // call id -> {resolve, reject, name}
  nextId: 1,
  busyTimer: 0,
  onBusy: () => {},
  restarting: null, // a Promise while a stopped worker is replaced
  source: null,     // the worker's code as a Blob
};

/** onBusy registers fn(busy) to show and hide the progress bar. */
export function onBusy(fn) {
  engine.onBusy = fn;
}

/** mode returns "worker" or "page": where the engine runs. */
export function mode() {
  return engine.mode;
}

function waitReady() {
  return new Promise((resolve) => {
    if (globalThis.quillcast && globalThis.quillcast.ready) resolve();
    else globalThis.addEventListener("quillcast-ready", () => resolve(), { once: true });
  });
}

/** startInPage runs the compiled engine on the page's own thread. */
async function startInPage(module) {
  const ready = waitReady();
  const go = new globalThis.Go();
  const instance = await WebAssembly.instantiate(module, go.importObject);
  go.run(instance).then(() => document.dispatchEvent(new CustomEvent("quillcast-stopped")));
  await ready;
  engine.mode = "page";
}

/**
 * workerSource reads the worker's code once, at start: Go's wasm_exec.js
 * followed by worker.js. Workers are made from it as Blobs, so replacing a
 * stopped worker fetches nothing.
 */
async function workerSource() {
  if (!engine.source) {
    const [runtime, code] = await Promise.all([
      isBundle() ? document.querySelector("script:not([src]):not([type])").textContent : assetText("wasm_exec.js"),
      assetText("worker.js"),
    ]);
    if (!runtime || !code) throw new Error("the worker's code is missing");
    engine.source = new Blob([runtime, "\n", code], { type: "text/javascript" });
  }
  return engine.source;
}

/** makeWorker creates a worker from its code. */
async function makeWorker() {
  const url = URL.createObjectURL(await workerSource());
  try {
    return new Worker(url);
  } finally {
    setTimeout(() => URL.revokeObjectURL(url), 10000);
  }
}

/**
 * launch starts the engine in a new worker and resolves with the worker and
 * its ready message. module is the compiled engine or a Promise of it: the
 * worker is made (and reads its code) while the engine still compiles, and
 * is sent the module, which the browser shares with it rather than copying
 * or compiling it again. offer goes with the start message.
 */
async function launch(module, offer) {
  const w = await makeWorker();
  try {
    const info = await new Promise((resolve, reject) => {
      w.onerror = (e) => reject(new Error(e.message || "the worker could not start"));
      w.onmessage = (e) => {
        const m = e.data;
        if (m.type === "ready") resolve(m);
        else if (m.type === "failed") reject(new Error(m.message));
      };
      Promise.resolve(module).then((m) => w.postMessage({ type: "start", module: m, ...offer })).catch(reject);
    });
    w.onerror = null;
    return { w, info };
  } catch (err) {
    w.terminate();
    throw err;
  }
}

/** startWorker starts the engine in a worker and installs the proxy. */
async function startWorker(module) {
  const { w, info } = await launch(module, poolOffer());
  w.onmessage = (e) => received(e.data);
  engine.worker = w;
  engine.mode = "worker";
  const api = { ready: true, version: info.version };
  for (const name of info.names) api[name] = (...args) => request(name, args);
  globalThis.quillcast = api;
}

function received(m) {
  if (m.type === "reply") {
    const p = engine.pending.get(m.id);
    if (!p) return;
    engine.pending.delete(m.id);
    p.resolve(m.text);
    busyCheck();
  } else if (m.type === "part") {
    pool.queue.push({ id: m.id, text: m.text });
    pump();
  } else if (m.type === "progress") {
    globalThis.dispatchEvent(new CustomEvent("quillcast-progress", { detail: m.detail }));
  } else if (m.type === "storage-closed") {
    globalThis.dispatchEvent(new CustomEvent("quillcast-storage-closed"));
  } else if (m.type === "stopped") {
    document.dispatchEvent(new CustomEvent("quillcast-stopped"));
  }
}

async function request(name, args) {
  if (engine.restarting) await engine.restarting;
  return post(name, args);
}

/** post sends a call to the worker and returns the Promise of its answer. */
function post(name, args) {
  const id = engine.nextId++;
  return new Promise((resolve, reject) => {
    engine.pending.set(id, { resolve, reject, name });
    engine.worker.postMessage({ type: "call", id, name, args });
    busyCheck();
  });
}

/*
 * Further workers for a bake-off. The engine worker hands the page each
 * part of a bake-off as text; the page gives it to an idle further worker
 * (started on first need, up to the number offered) and hands the answer
 * back as it came. The engine splits the work and merges the answers, so
 * the page only moves text. A part no further worker can take fails, and
 * the engine forecasts it itself.
 */

/** The most further workers a bake-off uses. */
const maxPoolWorkers = 4;

const pool = {
  size: 0,     // how many may run
  list: [],    // {worker, ready, part}: part is the one it works on
  queue: [],   // parts waiting: {id, text}
  failure: "", // why a further worker could not start
};

/** poolOffer is what the engine worker is told about further workers. */
function poolOffer() {
  const cores = navigator.hardwareConcurrency || 1;
  pool.size = cores < 2 ? 0 : Math.min(cores, maxPoolWorkers);
  return { poolSize: pool.size, why: pool.size ? "" : "the browser reports a single processor core" };
}

/** pump gives waiting parts to idle further workers, starting more if allowed. */
function pump() {
  while (pool.queue.length > 0) {
    const idle = pool.list.find((h) => h.ready && !h.part);
    if (idle) {
      idle.part = pool.queue.shift();
      idle.worker.postMessage({ type: "call", id: idle.part.id, name: "bakeoffPart", args: [idle.part.text] });
    } else if (pool.failure && pool.list.length === 0) {
      for (const part of pool.queue.splice(0)) {
        engine.worker.postMessage({ type: "part-failed", id: part.id, message: pool.failure });
      }
    } else if (!pool.failure && pool.list.length < pool.size &&
               pool.list.filter((h) => !h.ready).length < pool.queue.length) {
      startPoolWorker();
    } else {
      return;
    }
  }
}

/** startPoolWorker starts one further worker. */
function startPoolWorker() {
  const h = { worker: null, ready: false, part: null };
  pool.list.push(h);
  launch(engine.module, {}).then(({ w }) => {
    if (!pool.list.includes(h)) {
      w.terminate(); // stopped while it started
      return;
    }
    h.worker = w;
    h.ready = true;
    w.onmessage = (e) => poolWorkerSaid(h, e.data);
    w.onerror = (e) => {
      if (!pool.list.includes(h)) return;
      w.terminate();
      dropPoolWorker(h, `a further worker failed (${e.message || "no reason given"})`);
    };
    pump();
  }, (err) => {
    dropPoolWorker(h, `a further worker could not start (${err.message})`);
  });
}

/** poolWorkerSaid hands a further worker's answer back to the engine worker. */
function poolWorkerSaid(h, m) {
  if (!pool.list.includes(h)) return;
  if (m.type === "reply" && h.part && m.id === h.part.id) {
    engine.worker.postMessage({ type: "part-reply", id: h.part.id, text: m.text });
    h.part = null;
    pump();
  } else if (m.type === "stopped") {
    h.worker.terminate();
    dropPoolWorker(h, "a further worker stopped");
  }
}

/** dropPoolWorker forgets a further worker that failed, failing its part. */
function dropPoolWorker(h, why) {
  pool.list = pool.list.filter((x) => x !== h);
  pool.failure = why;
  if (h.part) engine.worker.postMessage({ type: "part-failed", id: h.part.id, message: why });
  pump();
}

/** stopPool ends every further worker and forgets the waiting parts. */
function stopPool() {
  for (const h of pool.list) {
    if (h.worker) h.worker.terminate();
  }
  pool.list = [];
  pool.queue = [];
  pool.failure = "";
}

/** busyCheck shows the progress bar while a call has run for a while. */
function busyCheck() {
  clearTimeout(engine.busyTimer);
  if (engine.pending.size === 0) {
    engine.onBusy(false);
    return;
  }
  engine.busyTimer = setTimeout(() => engine.onBusy(engine.pending.size > 0), busyAfterMs);
}

/**
 * compile compiles the engine from a Response (or a Promise of one) once.
 * A response served as application/wasm compiles while it streams in, which
 * also lets the browser reuse the code it compiled on an earlier visit to
 * the same (content-hashed) address; any other is read whole first.
 */
async function compile(response) {
  const res = await response;
  if (!res.ok) throw new Error(`the engine could not be loaded (${res.status} ${res.statusText})`);
  const type = res.headers.get("Content-Type") || "";
  if (WebAssembly.compileStreaming && type.split(";")[0].trim() === "application/wasm") {
    return WebAssembly.compileStreaming(res);
  }
  return WebAssembly.compile(await res.arrayBuffer());
}

/**
 * start compiles the engine (from a Response or a Promise of one) and
 * resolves once it is ready: in a worker where possible, on the page
 * otherwise.
 */
export async function start(response) {
  const module = compile(response);
  engine.module = module;
  try {
    await startWorker(module);
  } catch (err) {
    // A failed compile is not the worker's fault: say what went wrong.
    await module;
    console.warn(`quillcast: the engine runs on the page itself, because no worker could start (${err.message})`);
    globalThis.quillcastPool = { size: 0, why: `no worker could start (${err.message})` };
    await startInPage(await module);
  }
  if (globalThis.quillcast.version !== engineVersion) {
    throw new Error(`this page needs engine version ${engineVersion}, but version ${globalThis.quillcast.version} was loaded; reload the page`);
  }
}

/**
 * stop ends a long run by ending the worker, then starts a fresh one that
 * reloads the stored datasets. Calls in flight fail with an EngineError of
 * code "stopped"; later calls wait for the fresh engine. Stored sessions and
 * datasets are untouched.
 */
export async function stop() {
  if (engine.mode !== "worker") return false;
  engine.worker.terminate();
  stopPool();
  for (const p of engine.pending.values()) {
    p.reject(new EngineError({ message: "the run was stopped", code: "stopped" }));
  }
  engine.pending.clear();
  busyCheck();
  // The fresh engine reloads the stored datasets before any other call.
  engine.restarting = startWorker(engine.module).then(() => post("storage", []));
  try {
    await engine.restarting;
  } finally {
    engine.restarting = null;
  }
  return true;
}

/** call runs an engine function and returns its value or throws EngineError. */
export async function call(name, ...args) {
  const fn = globalThis.quillcast && globalThis.quillcast[name];
  if (typeof fn !== "function") {
    throw new EngineError({ message: `the engine has no function "${name}"; reload the page` });
  }
  const env = JSON.parse(await fn(...args));
  if (!env.ok) {
    throw new EngineError(env.error);
  }
  return env.value;
}
