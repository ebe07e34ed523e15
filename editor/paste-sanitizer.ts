import { Extension } from "@tiptap/core";
import { isSafeHref } from "@/lib/document/safe-href";

/**
 * Pasted HTML is cleaned before ProseMirror parses it. The editor schema already drops
 * nodes and attributes it does not know; this is the second line, so no script, event
 * handler, style or foreign URL scheme survives even a future schema mistake.
 *
 * Pasting happens only in a browser, so this uses the browser's own inert parser
 * (DOMParser runs no script and loads nothing) and an allowlist walk, instead of
 * sanitize-html, which would add about 68 kB gzip to every page with an editor.
 */

/** Elements whose content is dropped with them. */
const DROP_WITH_CONTENT = new Set([
  "script",
  "style",
  "template",
  "iframe",
  "object",
  "embed",
  "noscript",
  "textarea",
  "select",
  "option",
  "svg",
  "math",
  "head",
  "title",
  "meta",
  "link",
  "base",
  "form",
  "button",
  "video",
  "audio",
  "canvas",
  "img",
  "picture",
  "source",
]);

/** Allowed elements and their allowed attributes; others are unwrapped (their text kept). */
const ALLOWED: Record<string, readonly string[]> = {
  p: [],
  br: [],
  h1: [],
  h2: [],
  h3: [],
  h4: [],
  h5: [],
  h6: [],
  strong: [],
  b: [],
  em: [],
  i: [],
  u: [],
  s: [],
  del: [],
  code: ["class"],
  pre: [],
  blockquote: [],
  hr: [],
  thead: [],
  tbody: [],
  tr: [],
  table: [],
  th: ["colspan", "rowspan"],
  td: ["colspan", "rowspan"],
  ol: ["start"],
  a: ["href", "title"],
  // tiptap's own clipboard markup: task items and math keep their data attributes.
  ul: ["data-type"],
  li: ["data-type", "data-checked"],
  label: [],
  input: ["type", "checked"],
  span: ["data-type", "data-latex"],
  // Live blocks travel as one JSON attribute, validated by the block's zod schema on parse.
  div: ["data-type", "data-latex", "data-block"],
};
/** ProseMirror's own clipboard marker: lets a copy within Ionleaf keep its structure. */
const ALLOWED_EVERYWHERE = ["data-pm-slice"];

export function sanitizePastedHtml(html: string): string {
  const doc = new DOMParser().parseFromString(html, "text/html");
  cleanChildren(doc.body);
  return doc.body.innerHTML;
}

function cleanChildren(parent: Element) {
  for (const child of Array.from(parent.childNodes)) {
    if (child.nodeType === Node.TEXT_NODE) continue;
    if (child.nodeType !== Node.ELEMENT_NODE) {
      child.remove(); // comments, processing instructions
      continue;
    }
    const element = child as Element;
    const tag = element.tagName.toLowerCase();
    if (DROP_WITH_CONTENT.has(tag)) {
      element.remove();
      continue;
    }
    cleanChildren(element);
    const allowed = ALLOWED[tag];
    if (!allowed) {
      element.replaceWith(...Array.from(element.childNodes));
      continue;
    }
    for (const attribute of Array.from(element.attributes)) {
      const name = attribute.name.toLowerCase();
      if (!allowed.includes(name) && !ALLOWED_EVERYWHERE.includes(name))
        element.removeAttribute(attribute.name);
    }
    if (tag === "a" && !isSafeHref(element.getAttribute("href") ?? ""))
      element.removeAttribute("href");
    if (tag === "input" && element.getAttribute("type") !== "checkbox") element.remove();
  }
}

export const PasteSanitizer = Extension.create({
  name: "pasteSanitizer",
  transformPastedHTML(html) {
    return sanitizePastedHtml(html);
  },
});
