// Attaching data: files from the picker or a drop, and cells pasted from a
// spreadsheet. The engine reads the bytes and answers with what it
// understood; this module only shows that answer.

import { call, EngineError } from "./engine.js";
import { el, svgFragment, figureTable } from "./dom.js";

/** addSteps is set by the page: it appends step lines to the session. */
let addSteps = () => {};

/** onAddSteps sets the function that appends step lines to the session. */
export function onAddSteps(fn) {
  addSteps = fn;
}

function useButton(label, lines) {
  return el("button", {
    type: "button",
    onclick: () => {
      addSteps(lines);
      document.getElementById("preview-dialog").close();
    },
  }, label, " ", el("code", {}, lines.join(" · ")));
}

function status(text, problem = false) {
  const s = document.getElementById("status");
  s.textContent = text;
  s.classList.toggle("problem", problem);
}

/** attachFiles hands each file to the engine and shows the first preview. */
export async function attachFiles(files, after) {
  for (const f of files) {
    status(`Reading ${f.name}…`);
    const bytes = new Uint8Array(await f.arrayBuffer());
    await attachBytes(bytes, f.name);
  }
  if (files.length > 0) await after();
}

/** attachPaste attaches pasted cells as a tab-separated file. */
export async function attachPaste(text, after) {
  const stamp = new Date().toISOString().slice(0, 19).replace(/[-:T]/g, "");
  await attachBytes(new TextEncoder().encode(text), `pasted-${stamp}.tsv`);
  await after();
}

async function attachBytes(bytes, name) {
  try {
    const preview = await call("attach", bytes, name);
    status(`Attached ${name}. Load it with a step such as: load ${name}`);
    render(preview);
  } catch (err) {
    render(null, name, err);
    status(`Attached ${name}, but it could not be read as it is; see the preview.`, true);
  }
}

/** showPreview re-reads a stored dataset and shows what was understood. */
export async function showPreview(name) {
  try {
    render(await call("preview", name));
  } catch (err) {
    render(null, name, err);
  }
}

function render(p, name, err) {
  const body = document.getElementById("preview-body");
  const nodes = [];
  if (err) {
    const f = err instanceof EngineError ? err.failure : { message: String(err) };
    nodes.push(el("p", {}, `${name}: the engine could not read this file with its default settings.`));
    const list = f.problems && f.problems.length > 0 ? f.problems : [f];
    nodes.push(el("ul", { class: "problems" }, ...list.map((x) => el("li", {}, x.message))));
    nodes.push(el("p", { class: "hint" }, "The file is kept; a load step with the right options may still read it."));
  } else {
    nodes.push(el("p", {}, `${p.name}: ${p.rows} rows, ${p.series.length} series, ${p.frequency} periods`, p.dateColumn ? ` from the column "${p.dateColumn}".` : "."));
    if (p.decisions.length > 0) {
      nodes.push(el("h3", {}, "Decisions taken while reading"), el("ul", {}, ...p.decisions.map((d) => el("li", {}, d))));
    }
    if (p.problems.length > 0) {
      nodes.push(el("h3", {}, "Problems to know about"),
        el("ul", { class: "problems" }, ...p.problems.map((x) => el("li", {}, x.text))));
    }
    if (p.notStored) nodes.push(el("p", { class: "msg warning" }, p.notStored));
    if (p.bakeoff && p.bakeoff.length > 0) {
      nodes.push(el("p", {}, useButton("Compare methods on every series:", p.bakeoff)));
    }
    for (const s of p.series.slice(0, 6)) {
      nodes.push(el("h3", {}, `${s.name}: ${s.count} values, ${s.first} to ${s.last}`),
        el("p", {}, useButton("Add to the session:", [s.step])), svgFragment(s.chart),
        figureTable([p.dateColumn || "period", s.name], s.head, "First rows"));
    }
    if (p.series.length > 6) nodes.push(el("p", { class: "hint" }, `…and ${p.series.length - 6} more series.`));
  }
  body.replaceChildren(...nodes);
  const dlg = document.getElementById("preview-dialog");
  if (!dlg.open) dlg.showModal();
}
