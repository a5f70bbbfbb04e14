// Quillcast page: starts the engine, opens the last session (or the demo on
// a first visit), runs it and keeps it saved in the browser. No figure is
// computed or formatted here: every table, chart and message arrives
// finished from the engine.

import { start, call, stop, mode, onBusy, EngineError } from "./engine.js";
import { el } from "./dom.js";
import { Notebook } from "./notebook.js";
import { showHelp } from "./help.js";
import { attachFiles, attachPaste, showPreview, onAddSteps } from "./data.js";
import { memoText, previewMemo, memoBlob } from "./memo.js";
import { assetBytes, assetText, engineResponse } from "./assets.js";
import { sharedSteps, shareLink, download, fileName } from "./files.js";

const $ = (id) => document.getElementById(id);
const root = document.documentElement;

/** state of the open session. */
const session = { id: "", title: "", text: "", version: 0, parts: [] };
/** stored is the title and text of the session as last saved or opened. */
const stored = { title: null, text: null };
let saveTimer = 0;
let runSeq = 0;

function setStatus(text, problem = false) {
  $("status").textContent = text;
  $("status").classList.toggle("problem", problem);
}

function banner(text, ...actions) {
  const b = $("banner");
  if (!text) { b.hidden = true; b.replaceChildren(); return; }
  b.replaceChildren(el("span", {}, text), ...actions);
  b.hidden = false;
}

function explain(err) {
  return err instanceof EngineError ? err.message : `${err.message || err}`;
}

const notebook = new Notebook($("parts"), {
  onChange: (parts) => runAndSave(parts),
  complete: async (line, col) => {
    try {
      return (await call("complete", line, col)) || [];
    } catch {
      return [];
    }
  },
});

/** run sends the parts to the engine and shows the outputs. */
async function run(parts) {
  const seq = ++runSeq;
  setStatus("Running the steps…");
  showProgress(null);
  const text = JSON.stringify(parts);
  // Outputs the notebook still shows come back without their exhibits.
  let res = await call("run", text, JSON.stringify(notebook.heldKeys()));
  if (seq !== runSeq) return null; // a newer edit is on its way
  let outputs = notebook.filled(res.result.outputs);
  if (!outputs) {
    // An output marked kept is no longer drawn: ask for all of them (every
    // step's result is reused, so this costs no computing).
    res = await call("run", text);
    if (seq !== runSeq) return null;
    outputs = res.result.outputs;
  }
  session.text = res.text;
  session.parts = res.parts;
  notebook.show(res.parts, outputs);
  const n = res.result.errors ? res.result.errors.length : 0;
  setStatus(n === 0 ? "All steps ran. Everything stays on this computer." : `${n} step${n === 1 ? " has a problem" : "s have problems"}; see the marked lines.`, n > 0);
  return res;
}

/**
 * showProgress sets the progress bar from the engine's report {fraction,
 * text}; null makes it indeterminate until the first report of a run.
 */
function showProgress(detail) {
  const bar = $("progress");
  if (!detail) {
    bar.removeAttribute("value");
    $("progress-text").textContent = "";
    return;
  }
  bar.value = detail.fraction;
  $("progress-text").textContent = detail.text;
}

async function runAndSave(parts) {
  try {
    const res = await run(parts);
    if (res) scheduleSave();
  } catch (err) {
    if (err instanceof EngineError && err.failure.code === "stopped") {
      // Keep the edit: save the text even though its outputs were not made.
      session.parts = parts;
      setStatus("Stopped. Your steps are kept; edit a step or press Run all steps to run them again.", true);
      return;
    }
    setStatus(`Could not run the steps: ${explain(err)}`, true);
  }
}

/** stopRun ends a long run; a fresh engine comes up with the stored data. */
async function stopRun() {
  await stop();
}

/** scheduleSave saves the session within a second of the last edit. */
function scheduleSave() {
  clearTimeout(saveTimer);
  if (session.id && session.text === stored.text && session.title === stored.title) {
    // Nothing changed since the stored version (a re-run, say): writing
    // it again would only raise the version another tab compares with.
    root.dataset.saved = String(session.version);
    return;
  }
  root.dataset.saved = "pending";
  saveTimer = setTimeout(save, 400);
}

async function save() {
  try {
    const { title, text } = session;
    const saved = await call("saveSession", JSON.stringify({
      id: session.id, title, text, datasets: [], version: session.version,
    }));
    session.id = saved.id;
    session.version = saved.version;
    Object.assign(stored, { title, text });
    root.dataset.saved = String(saved.version);
    await listSessions();
  } catch (err) {
    root.dataset.saved = "failed";
    if (err instanceof EngineError && err.failure.code === "conflict") {
      banner(`Not saved: ${err.message}.`,
        el("button", { type: "button", onclick: () => { banner(""); openSession(session.id); } }, "Load the other tab's version"),
        el("button", { type: "button", onclick: async () => {
          banner(""); session.id = ""; session.version = 0; session.title += " (copy)"; $("doc-title").value = session.title; await save();
        } }, "Keep mine as a copy"));
      return;
    }
    if (err instanceof EngineError && err.failure.code === "quota") {
      banner(`Not saved: ${err.message}.`,
        el("button", { type: "button", onclick: () => { banner(""); $("export-session").click(); } }, "Save the session as a file"));
      return;
    }
    setStatus(`Not saved: ${explain(err)}. Use "Save session file" to keep your work.`, true);
  }
}

async function listSessions() {
  const list = await call("sessions");
  $("sessions").replaceChildren(...list.map((s) => el("li", { class: s.id === session.id ? "current" : null },
    el("button", { type: "button", class: "link", "aria-current": s.id === session.id ? "true" : null, onclick: () => openSession(s.id) }, s.title || "Untitled session"))));
  return list;
}

async function listDatasets() {
  const list = await call("datasets");
  $("datasets").replaceChildren(...list.map((d) => el("li", { class: "with-action" },
    el("button", { type: "button", class: "link", title: "Show what was read", onclick: () => showPreview(d.name) }, d.name),
    el("button", {
      type: "button", class: "remove", "aria-label": `Remove ${d.name} from this browser`, title: "Remove from this browser",
      onclick: async () => {
        if (!confirm(`Remove ${d.name} from this browser? Sessions that load it will ask for it again.`)) return;
        await call("removeDataset", d.name);
        await listDatasets();
      },
    }, "×"))));
}

async function openSession(id) {
  const s = await call("openSession", id);
  Object.assign(session, { id: s.id, title: s.title, text: s.text, version: s.version });
  Object.assign(stored, { title: s.title, text: s.text });
  $("doc-title").value = s.title;
  const parts = await call("parts", s.text);
  notebook.undo = []; notebook.redo = [];
  await run(parts);
  await listSessions();
}

async function newSession(title, text) {
  Object.assign(session, { id: "", title, text, version: 0 });
  $("doc-title").value = title;
  notebook.undo = []; notebook.redo = [];
  await run(await call("parts", text));
  await save();
}

/** loadDemo reads the demo session and its files, before the engine is ready. */
async function loadDemo() {
  const [list, text] = await Promise.all([assetText("demo/files.txt"), assetText("demo/demo.md")]);
  const names = list.split("\n").map((s) => s.trim()).filter(Boolean);
  const files = await Promise.all(names.map(async (name) => ({ name, bytes: await assetBytes("demo/" + name) })));
  return { text, files: files.filter((f) => f.bytes) };
}

/** openShared starts a new session from the steps a link carried. */
async function openShared(steps) {
  await newSession("Shared steps", "```quill\n" + steps + "\n```\n");
  setStatus("Opened steps from a link. It carried no data: attach the files the load steps name.");
}

function wire() {
  onAddSteps((lines) => notebook.appendSteps(lines));
  $("doc-title").addEventListener("change", () => { session.title = $("doc-title").value; scheduleSave(); });
  $("add-step").addEventListener("click", () => notebook.addStep());
  $("run-all").addEventListener("click", () => runAndSave(notebook.parts));
  $("stop").addEventListener("click", () => stopRun().catch((e) => setStatus(explain(e), true)));
  onBusy((busy) => { $("busy").hidden = !busy; });
  $("add-note").addEventListener("click", () => notebook.addNote());
  $("new-session").addEventListener("click", () => newSession("Untitled session", "```quill\n```\n").catch((e) => setStatus(explain(e), true)));
  $("copy-session").addEventListener("click", async () => {
    if (!session.id) return;
    const s = await call("duplicateSession", session.id, `${session.title} (copy)`);
    await openSession(s.id);
  });
  $("delete-session").addEventListener("click", async () => {
    if (!session.id || !confirm(`Delete the session "${session.title}"? Its datasets stay.`)) return;
    await call("deleteSession", session.id);
    const list = await listSessions();
    if (list.length > 0) await openSession(list[0].id);
    else await newSession("Untitled session", "```quill\n```\n");
  });
  $("file-input").addEventListener("change", async (e) => {
    await attachFiles([...e.target.files], afterAttach);
    e.target.value = "";
  });
  $("import-input").addEventListener("change", async (e) => {
    const f = e.target.files[0];
    e.target.value = "";
    if (f) await newSession(f.name.replace(/\.(md|txt)$/i, ""), await f.text());
  });
  $("export-session").addEventListener("click", async () => {
    try {
      const text = await call("exportSession", JSON.stringify(session.parts), $("export-with-data").checked);
      download(fileName(session.title, ".md"), "text/markdown", text);
      setStatus($("export-with-data").checked ? "Session saved with its data inside: treat the file as confidential." : "Session saved without data: it carries steps and notes only.");
    } catch (e) {
      setStatus(`Not saved: ${explain(e)}`, true);
    }
  });
  $("memo-preview").addEventListener("click", () => previewMemo($("memo-body"), $("memo-dialog")).catch((e) => setStatus(`No memo: ${explain(e)}`, true)));
  for (const b of document.querySelectorAll("[data-memo]")) {
    b.addEventListener("click", async () => {
      try {
        const { blob, ext } = await memoBlob(b.dataset.memo);
        download(fileName(session.title, ext), blob.type, blob);
        setStatus(`Memo written as ${ext}. Check it before it goes to the client.`);
      } catch (e) {
        setStatus(`No memo: ${explain(e)}`, true);
      }
    });
  }
  $("memo-copy").addEventListener("click", async () => {
    try {
      await navigator.clipboard.writeText(await memoText("md"));
      setStatus("The memo is on the clipboard as markdown.");
    } catch (e) {
      setStatus(`Could not copy the memo: ${explain(e)}`, true);
    }
  });
  $("share").addEventListener("click", async () => {
    const link = shareLink(session.parts);
    const box = $("share-link");
    box.value = link;
    box.hidden = false;
    box.select();
    try { await navigator.clipboard.writeText(link); setStatus("Link copied. It carries the steps only, never the data."); } catch { setStatus("Copy the selected link. It carries the steps only, never the data."); }
  });
  $("forget").addEventListener("click", () => $("forget-dialog").showModal());
  $("forget-dialog").addEventListener("close", async () => {
    if ($("forget-dialog").returnValue !== "forget") return;
    await call("forgetAll");
    await listDatasets();
    await newSession("Untitled session", "```quill\n```\n");
    setStatus("Every session and dataset was removed from this browser.");
  });
  $("help-toggle").addEventListener("click", () => toggleHelp());
  document.addEventListener("keydown", (e) => {
    if (e.key === "F2") { e.preventDefault(); toggleHelp(); }
    const t = e.target;
    if (t.tagName === "INPUT" || t.tagName === "TEXTAREA") return;
    if ((e.ctrlKey || e.metaKey) && e.key.toLowerCase() === "z") { e.preventDefault(); if (e.shiftKey) notebook.redoLast(); else notebook.undoLast(); }
    if ((e.ctrlKey || e.metaKey) && e.key.toLowerCase() === "y") { e.preventDefault(); notebook.redoLast(); }
  });
  document.addEventListener("dragover", (e) => { e.preventDefault(); root.classList.add("dropping"); });
  document.addEventListener("dragleave", () => root.classList.remove("dropping"));
  document.addEventListener("drop", async (e) => {
    e.preventDefault();
    root.classList.remove("dropping");
    await attachFiles([...e.dataTransfer.files], afterAttach);
  });
  document.addEventListener("paste", async (e) => {
    const t = e.target;
    if (t.tagName === "INPUT" || t.tagName === "TEXTAREA") return;
    const text = e.clipboardData.getData("text/plain");
    if (text) { e.preventDefault(); await attachPaste(text, afterAttach); }
  });
  window.addEventListener("hashchange", () => {
    const shared = sharedSteps();
    if (shared === null || root.dataset.state !== "ready") return;
    history.replaceState(null, "", location.pathname);
    openShared(shared).catch((e) => setStatus(explain(e), true));
  });
  globalThis.addEventListener("quillcast-progress", (e) => showProgress(e.detail));
  window.addEventListener("quillcast-storage-closed", () => banner("Quillcast was updated in another tab. Reload this page to keep saving."));
}

async function afterAttach() {
  await listDatasets();
  await run(notebook.parts);
}

function toggleHelp() {
  const panel = $("help-panel");
  panel.hidden = !panel.hidden;
  $("help-toggle").setAttribute("aria-expanded", String(!panel.hidden));
  if (!panel.hidden) { showHelp(panel); panel.focus(); }
}

async function main() {
  wire();
  try {
    await start(engineResponse());
    root.dataset.engine = mode();
    const store = await call("storage");
    $("storage-note").textContent = store.kind === "IndexedDB"
      ? "Sessions and datasets are kept in this browser's storage on this computer."
      : store.note;
    if (navigator.storage && navigator.storage.persist) {
      navigator.storage.persist().then((granted) => {
        $("storage-note").textContent += granted ? " The browser agreed to keep them." : " The browser may clear them when space runs low; save session files for safekeeping.";
      });
    }
    const shared = sharedSteps();
    const known = await listSessions();
    await listDatasets();
    if (shared !== null) {
      history.replaceState(null, "", location.pathname);
      await openShared(shared);
    } else if (known.length > 0) {
      await openSession(known[0].id);
    } else {
      // The demo's files are read only when the demo opens, after the
      // engine is ready: a repeat visit never needs them.
      const demo = await loadDemo();
      for (const f of demo.files) await call("attach", f.bytes, f.name);
      await listDatasets();
      await newSession("Demo: Wickery candle orders", demo.text || "```quill\n```\n");
    }
    if (mode() === "page") {
      setStatus("The engine runs on the page itself here (no worker could start): a long run pauses the page until it ends.");
    }
    root.dataset.state = "ready";
  } catch (err) {
    const where = err instanceof EngineError && err.failure.line ? ` (line ${err.failure.line})` : "";
    setStatus(`Could not start: ${explain(err)}${where}`, true);
    root.dataset.state = "failed";
  }
}

document.addEventListener("quillcast-stopped", () => {
  setStatus("The engine stopped unexpectedly; reload the page. Your saved work is kept.", true);
});

main();
