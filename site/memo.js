// The memo: written by the engine from the last run, previewed in the page
// and downloaded as markdown, standalone HTML or a zip with the charts and
// the forecasts.

import { call } from "./engine.js";
import { engineMarkup } from "./dom.js";

/** memoText returns the memo as "md" or "html" text. */
export async function memoText(format) {
  return (await call("memo", format)).text;
}

/** memoBlob returns the memo as a downloadable Blob and its extension. */
export async function memoBlob(format) {
  const m = await call("memo", format);
  switch (format) {
    case "md":
      return { blob: new Blob([m.text], { type: "text/markdown" }), ext: ".md" };
    case "html":
      return { blob: new Blob([m.text], { type: "text/html" }), ext: ".html" };
    default: {
      const raw = atob(m.bytes);
      const bytes = new Uint8Array(raw.length);
      for (let i = 0; i < raw.length; i++) bytes[i] = raw.charCodeAt(i);
      return { blob: new Blob([bytes], { type: "application/zip" }), ext: ".zip" };
    }
  }
}

/**
 * previewMemo shows the memo's body in the page. The engine writes a
 * standalone HTML page; only its main element is placed in the page (the
 * page's own style sheet lays it out), so the memo's own style sheet, which
 * this page's policy would refuse, is left out.
 */
export async function previewMemo(body, dialog) {
  const html = await memoText("html");
  const from = html.indexOf("<main");
  const to = html.lastIndexOf("</main>");
  body.replaceChildren(engineMarkup(from >= 0 && to > from ? html.slice(from, to + 7) : ""));
  if (!dialog.open) dialog.showModal();
}
