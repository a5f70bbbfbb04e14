// The memo draft in the centre of the page: prose notes and step lines in
// document order, each step followed by its output as numbered exhibits.
// The notebook edits text only; running, numbering and formatting are the
// engine's work.

import { el, svgFragment, engineTable, engineMarkup } from "./dom.js";

/** Notebook renders session parts and turns edits into change events. */
export class Notebook {
  constructor(root, { onChange, complete }) {
    this.root = root;
    this.onChange = onChange; // called with new parts after every edit
    this.complete = complete; // async (line, column) => suggestions
    this.parts = [];
    this.outputs = new Map(); // document line -> output
    // Outputs as drawn, by the engine's output key: an output whose key
    // comes back from a later run is shown again from here (its blocks are
    // not sent again) and its exhibits are not rebuilt.
    this.drawn = new Map(); // key -> {out, box}
    this.rows = new Map(); // notes and step rows as drawn, by what they show
    this.blocks = new Map(); // steps block elements by part index
    this.undo = [];
    this.redo = [];
    root.addEventListener("keydown", (e) => this.onKey(e));
  }

  /** heldKeys lists the keys of the outputs drawn, for the engine's run. */
  heldKeys() {
    return [...this.drawn.keys()];
  }

  /**
   * filled returns the outputs of a run with each output the engine marked
   * kept (sent without its blocks) completed from the one drawn before, or
   * null when one of them is no longer held.
   */
  filled(outputs) {
    const full = [];
    for (const o of outputs || []) {
      if (!o.kept) { full.push(o); continue; }
      const d = this.drawn.get(o.key);
      if (!d) return null;
      full.push({ ...o, blocks: d.out.blocks, kept: false });
    }
    return full;
  }

  /**
   * show replaces the parts and outputs and redraws, keeping the focus.
   * Outputs must be complete (see filled). Drawn outputs whose keys are
   * gone are forgotten.
   */
  show(parts, outputs) {
    const focus = this.focusedPlace();
    this.parts = parts;
    this.outputs = new Map((outputs || []).map((o) => [o.line, o]));
    const keys = new Set((outputs || []).map((o) => o.key));
    for (const k of this.drawn.keys()) if (!keys.has(k)) this.drawn.delete(k);
    this.render();
    if (focus) this.focusPlace(focus.part, focus.line, focus.editing);
  }

  /** change records an undo point and hands the new parts on. */
  change(parts, focus) {
    this.undo.push(JSON.stringify(this.parts));
    if (this.undo.length > 200) this.undo.shift();
    this.redo = [];
    this.parts = parts;
    this.render();
    if (focus) this.focusPlace(focus.part, focus.line, focus.editing);
    this.onChange(parts);
  }

  undoLast() {
    if (this.undo.length === 0) return;
    this.redo.push(JSON.stringify(this.parts));
    this.parts = JSON.parse(this.undo.pop());
    this.render();
    this.onChange(this.parts);
  }

  redoLast() {
    if (this.redo.length === 0) return;
    this.undo.push(JSON.stringify(this.parts));
    this.parts = JSON.parse(this.redo.pop());
    this.render();
    this.onChange(this.parts);
  }

  clone() {
    return JSON.parse(JSON.stringify(this.parts));
  }

  /**
   * render brings the page up to the parts and outputs. A note or step row
   * drawn earlier from the same text and output is kept in place untouched
   * (its charts are neither parsed nor laid out again); only rows that
   * differ are built and swapped in.
   */
  render() {
    const rows = new Map();
    const blocks = new Map();
    const nodes = [];
    const reuse = (sig, make) => {
      const n = this.rows.get(sig) || make();
      rows.set(sig, n);
      return n;
    };
    this.parts.forEach((p, i) => {
      if (p.kind === "prose") nodes.push(reuse(JSON.stringify(["prose", i, p.text, p.html]), () => this.prose(p, i)));
      else if (p.kind === "steps") nodes.push(this.stepsBlock(p, i, reuse, blocks));
      else if (p.kind === "data") {
        nodes.push(reuse(JSON.stringify(["data", i, p.name]), () => el("p", { class: "embedded" }, `Embedded data: ${p.name}`)));
      }
    });
    this.rows = rows;
    this.blocks = blocks;
    reconcile(this.root, nodes);
  }

  /** forget drops the drawn row or note holding node, which an editor is replacing. */
  forget(node) {
    for (const [sig, n] of this.rows) if (n === node || n.contains(node)) this.rows.delete(sig);
  }

  prose(p, i) {
    const view = el("div", { class: "prose", tabindex: "0", "data-part": i, "aria-label": "Note; press Enter to edit" });
    if (p.html !== undefined) {
      // Rendered by the engine (goldmark, raw HTML left out).
      view.append(engineMarkup(p.html));
    } else {
      // Just edited: shown as typed until the engine renders it.
      view.append(el("p", { class: "pending" }, p.text));
    }
    view.addEventListener("click", () => this.editProse(i));
    return view;
  }

  editProse(i) {
    const view = this.root.querySelector(`.prose[data-part="${i}"]`);
    if (!view) return;
    const area = el("textarea", { class: "prose-edit", "data-part": i, "aria-label": "Note text (markdown); Escape to finish", rows: 6 });
    area.value = this.parts[i].text;
    const finish = () => {
      if (!area.isConnected) return;
      if (area.value !== this.parts[i].text) {
        const parts = this.clone();
        parts[i].text = area.value;
        delete parts[i].html;
        this.change(parts, { part: i, line: -1 });
      } else {
        this.render();
        this.focusPlace(i, -1, false);
      }
    };
    area.addEventListener("keydown", (e) => {
      if (e.key === "Escape") { e.preventDefault(); e.stopPropagation(); finish(); }
    });
    area.addEventListener("blur", finish);
    this.forget(view);
    view.replaceWith(area);
    area.focus();
  }

  stepsBlock(p, i, reuse, blocks) {
    const block = this.blocks.get(i) || el("div", { class: "steps", "data-part": i });
    blocks.set(i, block);
    reconcile(block, (p.lines || []).map((line, j) => {
      const out = this.outputs.get(line.line);
      const sig = JSON.stringify(["step", i, j, line.text, out ? [out.key, out.step, out.status, out.verb, out.error, out.waitsOn, out.key ? "" : out.blocks] : null]);
      return reuse(sig, () => this.stepRow(line, i, j));
    }));
    return block;
  }

  stepRow(line, i, j) {
    const out = this.outputs.get(line.line);
    const row = el("div", { class: "step", "data-part": i, "data-line": j });
    const code = el("code", {
      class: "line" + (out && out.status !== "done" ? " " + out.status : ""),
      tabindex: "0",
      "data-part": i,
      "data-line": j,
      "aria-label": `Step line: ${line.text || "empty"}. Press Enter to edit.`,
    });
    code.append(...this.lineMarkup(line.text, out));
    code.addEventListener("click", () => this.editStep(i, j));
    row.append(el("span", { class: "gutter", "aria-hidden": "true" }, out ? String(out.step) : ""), code);
    if (out) row.append(this.outputOf(out));
    return row;
  }

  /** lineMarkup marks the verb the engine found and any error column. */
  lineMarkup(text, out) {
    if (!text) return [el("span", { class: "empty" }, "(empty step)")];
    const chars = Array.from(text);
    const col = out && out.error && out.error.column > 0 ? out.error.column : 0;
    const verbLen = out && out.verb && text.trimStart().startsWith(out.verb) ? Array.from(out.verb).length : 0;
    const lead = chars.length - Array.from(text.trimStart()).length;
    const nodes = [];
    let i = 0;
    if (verbLen > 0) {
      if (lead > 0) nodes.push(chars.slice(0, lead).join(""));
      nodes.push(el("span", { class: "verb" }, chars.slice(lead, lead + verbLen).join("")));
      i = lead + verbLen;
    }
    if (col > 0 && col - 1 >= i && col - 1 <= chars.length) {
      nodes.push(chars.slice(i, col - 1).join(""));
      let end = col - 1;
      while (end < chars.length && chars[end] !== " ") end++;
      nodes.push(el("mark", { class: "error-at", title: out.error.message }, chars.slice(col - 1, Math.max(end, col)).join("") || " "));
      nodes.push(chars.slice(Math.max(end, col)).join(""));
    } else {
      nodes.push(chars.slice(i).join(""));
    }
    return nodes;
  }

  /** outputOf returns the output's box: the one drawn before for its key, or a new one. */
  outputOf(out) {
    const d = out.key ? this.drawn.get(out.key) : null;
    if (d) return d.box;
    const box = this.drawOutput(out);
    if (out.key) this.drawn.set(out.key, { out, box });
    return box;
  }

  drawOutput(out) {
    const box = el("div", { class: "output" });
    if (out.status === "failed" && out.error) {
      // Steps are what the page shows, so the place is told by step and
      // column; the document line matters in the saved text only.
      const where = out.error.column ? `Step ${out.step}, column ${out.error.column}: ` : `Step ${out.step}: `;
      box.append(el("p", { class: "msg error", role: "note" }, where + out.error.message));
    }
    // A waiting step's reason arrives as a message block from the engine.
    for (const b of out.blocks || []) {
      if (b.kind === "message") {
        box.append(el("p", { class: `msg ${b.level || "info"}` }, b.text));
        continue;
      }
      const fig = el("figure", { class: "exhibit", id: `exhibit-${b.exhibit}` },
        el("h3", {}, el("span", { class: "num" }, `Exhibit ${b.exhibit}`), ` — ${b.title}`));
      if (b.kind === "chart") fig.append(svgFragment(b.svg));
      if (b.kind === "table" && b.table) fig.append(engineTable(b.table));
      if (b.text) fig.append(el("figcaption", {}, b.text));
      box.append(fig);
    }
    return box;
  }

  editStep(i, j) {
    const code = this.root.querySelector(`code.line[data-part="${i}"][data-line="${j}"]`);
    if (!code) return;
    const wrap = el("div", { class: "edit" });
    const input = el("input", {
      class: "line-edit", "data-part": i, "data-line": j, spellcheck: "false", autocomplete: "off",
      "aria-label": "Step line; Enter runs it, Escape cancels, Tab completes",
    });
    input.value = this.parts[i].lines[j].text;
    const list = el("ul", { class: "suggest", role: "listbox", "aria-label": "Completions" });
    wrap.append(input, list);
    let done = false;
    const apply = (then) => {
      if (done) return;
      done = true;
      const parts = this.clone();
      const changed = parts[i].lines[j].text !== input.value;
      parts[i].lines[j].text = input.value;
      if (then) then(parts);
      else if (changed) this.change(parts, { part: i, line: j });
      else { this.render(); this.focusPlace(i, j, false); }
    };
    const suggest = async () => {
      const col = Array.from(input.value.slice(0, input.selectionStart)).length + 1;
      const asked = input.value;
      const items = (await this.complete(asked, col)) || [];
      if (input.value !== asked || !input.isConnected) return;
      list.replaceChildren(...items.slice(0, 8).map((s, k) => el("li", { role: "option", "aria-selected": k === 0 ? "true" : "false" },
        el("code", {}, s.label), " ", el("span", { class: "detail" }, s.detail))));
      list.items = items;
    };
    input.addEventListener("input", suggest);
    input.addEventListener("keydown", (e) => {
      e.stopPropagation();
      if (e.key === "Escape") { done = true; this.render(); this.focusPlace(i, j, false); e.preventDefault(); return; }
      if (e.key === "Enter" && (e.ctrlKey || e.metaKey || e.shiftKey)) {
        e.preventDefault();
        apply((parts) => { parts[i].lines.splice(j + 1, 0, { text: "", line: 0 }); this.change(parts, { part: i, line: j + 1, editing: true }); });
        return;
      }
      if (e.key === "Enter") { e.preventDefault(); apply(); return; }
      if (e.key === "Tab" && !e.shiftKey) {
        // Complete from suggestions for exactly what is typed now.
        e.preventDefault();
        const asked = input.value;
        const col = Array.from(asked.slice(0, input.selectionStart)).length + 1;
        this.complete(asked, col).then((items) => {
          if (!items || items.length === 0 || input.value !== asked) return;
          const s = items[0];
          const chars = Array.from(asked);
          const head = chars.slice(0, s.from - 1).join("") + s.text;
          input.value = head + chars.slice(s.to - 1).join("");
          input.setSelectionRange(head.length, head.length);
          suggest();
        });
        return;
      }
      if (e.key === "ArrowUp" || e.key === "ArrowDown") {
        e.preventDefault();
        const to = this.neighbour(i, j, e.key === "ArrowUp" ? -1 : 1);
        apply((parts) => {
          if (parts[i].lines[j].text !== this.parts[i].lines[j].text) this.change(parts, to ? { ...to, editing: true } : null);
          else { this.render(); if (to) this.focusPlace(to.part, to.line, true); }
        });
      }
    });
    input.addEventListener("blur", () => setTimeout(() => { if (!done && !wrap.contains(document.activeElement)) apply(); }, 0));
    this.forget(code);
    code.replaceWith(wrap);
    input.focus();
    suggest();
  }

  /** neighbour returns the step line dir steps away across blocks. */
  neighbour(i, j, dir) {
    const places = [];
    this.parts.forEach((p, pi) => { if (p.kind === "steps") p.lines.forEach((_, li) => places.push({ part: pi, line: li })); });
    const k = places.findIndex((x) => x.part === i && x.line === j);
    return places[k + dir] || null;
  }

  focusedPlace() {
    const a = document.activeElement;
    if (!a || !this.root.contains(a) || a.dataset.part === undefined) return null;
    return { part: Number(a.dataset.part), line: a.dataset.line === undefined ? -1 : Number(a.dataset.line), editing: a.tagName === "INPUT" };
  }

  focusPlace(i, j, editing) {
    if (j < 0) {
      const n = this.root.querySelector(`.prose[data-part="${i}"]`);
      if (n) n.focus();
      return;
    }
    if (editing) { this.editStep(i, j); return; }
    const n = this.root.querySelector(`code.line[data-part="${i}"][data-line="${j}"]`);
    if (n) n.focus();
  }

  /** addStep appends an empty step line (to the last steps block) and edits it. */
  addStep() {
    const parts = this.clone();
    let i = parts.map((p) => p.kind).lastIndexOf("steps");
    if (i < 0) { parts.push({ kind: "steps", lines: [] }); i = parts.length - 1; }
    parts[i].lines.push({ text: "", line: 0 });
    this.undo.push(JSON.stringify(this.parts));
    this.parts = parts;
    this.render();
    this.editStep(i, parts[i].lines.length - 1);
  }

  /** appendSteps adds a block of step lines at the end and runs it. */
  appendSteps(lines) {
    const parts = this.clone();
    parts.push({ kind: "steps", lines: lines.map((text) => ({ text, line: 0 })) });
    this.change(parts, null);
  }

  addNote() {
    const parts = this.clone();
    parts.push({ kind: "prose", text: "A note for the memo." });
    this.change(parts, null);
    this.editProse(parts.length - 1);
  }

  onKey(e) {
    const t = e.target;
    if (t.tagName === "INPUT" || t.tagName === "TEXTAREA") return;
    if (t.classList.contains("prose") && e.key === "Enter") { e.preventDefault(); this.editProse(Number(t.dataset.part)); return; }
    if (!t.classList.contains("line")) return;
    const i = Number(t.dataset.part), j = Number(t.dataset.line);
    if (e.key === "Enter" && (e.ctrlKey || e.metaKey)) {
      e.preventDefault();
      const parts = this.clone();
      parts[i].lines.splice(j + 1, 0, { text: "", line: 0 });
      this.undo.push(JSON.stringify(this.parts));
      this.parts = parts;
      this.render();
      this.editStep(i, j + 1);
    } else if (e.key === "Enter") {
      e.preventDefault();
      this.editStep(i, j);
    } else if ((e.key === "ArrowUp" || e.key === "ArrowDown") && e.altKey) {
      e.preventDefault();
      const k = j + (e.key === "ArrowUp" ? -1 : 1);
      if (k < 0 || k >= this.parts[i].lines.length) return;
      const parts = this.clone();
      [parts[i].lines[j], parts[i].lines[k]] = [parts[i].lines[k], parts[i].lines[j]];
      this.change(parts, { part: i, line: k });
    } else if (e.key === "ArrowUp" || e.key === "ArrowDown") {
      e.preventDefault();
      const to = this.neighbour(i, j, e.key === "ArrowUp" ? -1 : 1);
      if (to) this.focusPlace(to.part, to.line, false);
    } else if (e.key === "Delete") {
      e.preventDefault();
      const parts = this.clone();
      parts[i].lines.splice(j, 1);
      const to = parts[i].lines.length > 0 ? { part: i, line: Math.min(j, parts[i].lines.length - 1) } : null;
      this.change(parts, to);
    }
  }
}

/**
 * reconcile makes nodes the element children of parent, in order, moving
 * only what must move: children not among nodes are removed first, so the
 * kept ones stay where they are and new ones are inserted between them.
 */
function reconcile(parent, nodes) {
  const keep = new Set(nodes);
  for (const c of [...parent.children]) if (!keep.has(c)) c.remove();
  nodes.forEach((n, k) => {
    const at = parent.children[k];
    if (at !== n) parent.insertBefore(n, at || null);
  });
}
