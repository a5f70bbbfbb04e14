// Quillcast page: starts the engine, attaches the demo data and shows what
// the engine returns. No number is computed or formatted here: every figure
// and chart arrives finished from the engine.

import { start, call, EngineError } from "./engine.js";
import { el, svgFragment, figureTable } from "./dom.js";

const statusLine = document.getElementById("status");

function setStatus(text, problem = false) {
  statusLine.textContent = text;
  statusLine.classList.toggle("problem", problem);
}

/** fetchBytes fetches one of our own files as bytes. */
async function fetchBytes(path) {
  const res = await fetch(path);
  if (!res.ok) {
    throw new Error(`could not load ${path} (${res.status})`);
  }
  return new Uint8Array(await res.arrayBuffer());
}

/** loadDemo fetches the list of demo files and their contents. */
async function loadDemo() {
  const res = await fetch("demo/files.txt");
  if (!res.ok) {
    throw new Error(`could not load the demo list (${res.status})`);
  }
  const names = (await res.text()).split("\n").map((s) => s.trim()).filter(Boolean);
  return Promise.all(names.map(async (name) => ({ name, bytes: await fetchBytes("demo/" + name) })));
}

/** showDataset adds a dataset to the rail and its exhibits to the memo. */
function showDataset(preview, counter) {
  const list = document.getElementById("datasets");
  list.append(el("li", {}, preview.name,
    el("span", { class: "meta" }, `${preview.frequency}, ${preview.series.length} series`)));
  const exhibits = document.getElementById("exhibits");
  for (const s of preview.series) {
    const n1 = ++counter.n;
    exhibits.append(el("figure", { class: "exhibit", id: `exhibit-${n1}` },
      el("h3", {}, el("span", { class: "num" }, `Exhibit ${n1}`), ` — ${s.name}, ${s.first} to ${s.last}`),
      svgFragment(s.chart)));
    const n2 = ++counter.n;
    exhibits.append(el("figure", { class: "exhibit", id: `exhibit-${n2}` },
      el("h3", {}, el("span", { class: "num" }, `Exhibit ${n2}`), ` — first rows of ${s.name}`),
      figureTable([preview.dateColumn || "period", s.name], s.head,
        `${s.count} values in ${preview.name}`)));
  }
  if (preview.problems.length > 0) {
    exhibits.append(el("ul", { class: "problems" },
      ...preview.problems.map((p) => el("li", {}, p.text))));
  }
}

async function main() {
  const root = document.documentElement;
  try {
    const [, demo] = await Promise.all([start(fetch("quillcast.wasm")), loadDemo()]);
    setStatus("Reading the demo data…");
    const counter = { n: 0 };
    for (const file of demo) {
      showDataset(await call("attach", file.bytes, file.name), counter);
    }
    setStatus("Ready. Everything runs on this computer.");
    root.dataset.state = "ready";
  } catch (err) {
    const where = err instanceof EngineError && err.failure.line ? ` (line ${err.failure.line})` : "";
    setStatus(`Could not start: ${err.message}${where}`, true);
    root.dataset.state = "failed";
  }
}

document.addEventListener("quillcast-stopped", () => {
  setStatus("The engine stopped unexpectedly; reload the page. Your saved work is kept.", true);
});

main();
