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
 * startWorker starts the engine in a worker and installs the proxy. module
 * is the compiled engine or a Promise of it: the worker is made (and reads
 * its code) while the engine still compiles, and is sent the module, which
 * the browser shares with it rather than copying or compiling it again.
 */
async function startWorker(module) {
  const w = await makeWorker();
  const info = await new Promise((resolve, reject) => {
    w.onerror = (e) => reject(new Error(e.message || "the worker could not start"));
    w.onmessage = (e) => {
      const m = e.data;
      if (m.type === "ready") resolve(m);
      else if (m.type === "failed") reject(new Error(m.message));
    };
    Promise.resolve(module).then((m) => w.postMessage({ type: "start", module: m })).catch(reject);
  });
  w.onerror = null;
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
