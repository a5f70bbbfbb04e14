// Where the page's own files come from: fetched from beside the scripts
// when the page is served, or read from the page itself in the single-file
// build, where a data block (not a script) carries them base64-encoded and
// the engine gzip-compressed. Either way nothing comes from anywhere else.

const base = new URL(".", import.meta.url);

/** embedded returns the single-file build's files, or null when served. */
function embedded() {
  const node = document.getElementById("quillcast-files");
  return node ? JSON.parse(node.textContent) : null;
}

function decode(b64) {
  const raw = atob(b64);
  const bytes = new Uint8Array(raw.length);
  for (let i = 0; i < raw.length; i++) bytes[i] = raw.charCodeAt(i);
  return bytes;
}

/** isBundle reports whether the page is the single-file build. */
export function isBundle() {
  return document.getElementById("quillcast-files") !== null;
}

/** assetBytes returns one of the page's own files, or null when absent. */
export async function assetBytes(name) {
  const files = embedded();
  if (files) return name in files ? decode(files[name]) : null;
  const res = await fetch(new URL(name, base));
  return res.ok ? new Uint8Array(await res.arrayBuffer()) : null;
}

/** assetText returns one of the page's own text files, or "" when absent. */
export async function assetText(name) {
  const b = await assetBytes(name);
  return b ? new TextDecoder().decode(b) : "";
}

/** engineResponse returns the engine as a Response for WebAssembly. */
export async function engineResponse() {
  const files = embedded();
  if (!files) return fetch(new URL("quillcast.wasm", base));
  const gz = new Blob([decode(files["quillcast.wasm.gz"])]);
  return new Response(gz.stream().pipeThrough(new DecompressionStream("gzip")), {
    headers: { "Content-Type": "application/wasm" },
  });
}
