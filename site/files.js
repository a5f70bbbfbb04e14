// Links and files the page hands to the user: share links that carry the
// steps (never the data) in the URL fragment, and downloads made from
// Blobs, so nothing is sent anywhere.

import { el } from "./dom.js";

/** sharedSteps returns the steps carried by a share link, or null. */
export function sharedSteps() {
  const m = /^#steps=(.*)$/s.exec(location.hash);
  if (!m) return null;
  try {
    return decodeURIComponent(m[1]);
  } catch {
    return null;
  }
}

/**
 * shareLink returns a link to this page carrying the step lines of the
 * session's parts. Notes and data stay out: a link may travel by mail.
 */
export function shareLink(parts) {
  const steps = parts.filter((p) => p.kind === "steps").map((p) => (p.lines || []).map((l) => l.text).join("\n")).join("\n");
  return `${location.href.split("#")[0]}#steps=${encodeURIComponent(steps)}`;
}

/** download offers body (text or a Blob) as a file named name. */
export function download(name, type, body) {
  const url = URL.createObjectURL(body instanceof Blob ? body : new Blob([body], { type }));
  const a = el("a", { href: url, download: name });
  document.body.append(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}

/** fileName makes a file name from a session title. */
export function fileName(title, ext) {
  return (title || "session").replace(/[^\p{L}\p{N} _-]+/gu, "").trim().replace(/\s+/g, "-").toLowerCase() + ext;
}
