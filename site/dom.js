// Small helpers that build page elements. Text always goes in as text
// (never as HTML); only SVG and HTML produced by the engine, which escapes
// everything that came from a user's file, is parsed as markup.

/** el creates an element with attributes and children (strings or nodes). */
export function el(tag, attrs = {}, ...children) {
  const node = document.createElement(tag);
  for (const [k, v] of Object.entries(attrs)) {
    if (v === false || v === null || v === undefined) continue;
    if (k.startsWith("on") && typeof v === "function") {
      node.addEventListener(k.slice(2), v);
    } else {
      node.setAttribute(k, v === true ? "" : String(v));
    }
  }
  for (const c of children) {
    if (c === null || c === undefined || c === false) continue;
    node.append(c instanceof Node ? c : document.createTextNode(String(c)));
  }
  return node;
}

/** engineMarkup parses markup written by the engine into a fragment. */
export function engineMarkup(markup) {
  const t = document.createElement("template");
  t.innerHTML = markup;
  return t.content;
}

/** svgFragment wraps an engine chart for placing in the document. */
export function svgFragment(svg) {
  return el("div", { class: "chart" }, engineMarkup(svg));
}

/**
 * figureTable builds a table from header texts and rows of cell texts, all
 * already formatted by the engine. Columns after the first are figures,
 * aligned right.
 */
export function figureTable(header, rows, caption) {
  const table = el("table", { class: "figures" });
  if (caption) table.append(el("caption", {}, caption));
  table.append(el("thead", {}, el("tr", {},
    ...header.map((h, i) => el("th", { scope: "col", class: i > 0 ? "num" : null }, h)))));
  table.append(el("tbody", {}, ...rows.map((r) => el("tr", {},
    ...r.map((c, i) => (i === 0 ? el("th", { scope: "row" }, c) : el("td", { class: "num" }, c)))))));
  return table;
}

/**
 * engineTable builds a table the engine sent: headers, rows, alignment. It
 * comes inside a box that scrolls sideways when the table is wider than
 * the document, so labels need not break at their hyphens.
 */
export function engineTable(t) {
  const right = t.right || [];
  const table = el("table", { class: "figures" });
  table.append(el("thead", {}, el("tr", {},
    ...t.headers.map((h, i) => el("th", { scope: "col", class: right[i] ? "num" : null }, h)))));
  table.append(el("tbody", {}, ...t.rows.map((r) => el("tr", {},
    ...r.map((c, i) => el("td", { class: right[i] ? "num" : null }, c))))));
  return el("div", { class: "table-box" }, table);
}
