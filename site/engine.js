// Starting the WebAssembly engine and calling it. The engine registers
// globalThis.quillcast and signals "quillcast-ready"; every call answers
// with JSON text {"ok":true,"value":...} or {"ok":false,"error":{...}}.

/** EngineError carries the engine's error data: message, line, column. */
export class EngineError extends Error {
  constructor(failure) {
    super(failure.message);
    this.name = "EngineError";
    this.failure = failure;
  }
}

/** Knowing the engine API generation this page was written for. */
const engineVersion = "1";

/**
 * start loads quillcast.wasm (fetched as a Response or a Promise of one)
 * and resolves once the engine has signalled that it is ready.
 */
export async function start(wasmResponse) {
  const ready = new Promise((resolve) => {
    if (globalThis.quillcast && globalThis.quillcast.ready) {
      resolve();
    } else {
      globalThis.addEventListener("quillcast-ready", () => resolve(), { once: true });
    }
  });
  const go = new globalThis.Go();
  const { instance } = await WebAssembly.instantiateStreaming(wasmResponse, go.importObject);
  go.run(instance).then(() => {
    document.dispatchEvent(new CustomEvent("quillcast-stopped"));
  });
  await ready;
  if (globalThis.quillcast.version !== engineVersion) {
    throw new Error(`this page needs engine version ${engineVersion}, but version ${globalThis.quillcast.version} was loaded; reload the page`);
  }
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
