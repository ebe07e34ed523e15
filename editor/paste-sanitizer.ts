import { Extension } from "@tiptap/core";
import DOMPurify from "dompurify";
import { isSafeHref } from "@/lib/document/safe-href";

/**
 * Pasted HTML is cleaned before ProseMirror parses it. The editor schema already drops
 * nodes and attributes it does not know; this is the second line, so no script, event
 * handler, style or foreign URL scheme survives even a future schema mistake.
 *
 * DOMPurify (well kept, parses with the browser's inert parser) does the walk; the lists
 * below narrow it to what an entry can hold, per element, which is stricter than its
 * defaults: no images, forms, media, SVG or MathML at all, and no attribute an element
 * does not need.
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
  a: ["href"], // a link keeps only where it goes (lib/document/document-schema.ts)
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
  const purifier = DOMPurify(window);
  purifier.addHook("afterSanitizeAttributes", (node) => {
    const tag = node.nodeName.toLowerCase();
    const allowed = ALLOWED[tag] ?? [];
    for (const attribute of Array.from(node.attributes)) {
      const name = attribute.name.toLowerCase();
      if (!allowed.includes(name) && !ALLOWED_EVERYWHERE.includes(name))
        node.removeAttribute(attribute.name);
    }
    if (tag === "a" && !isSafeHref(node.getAttribute("href") ?? "")) node.removeAttribute("href");
    if (tag === "input" && node.getAttribute("type") !== "checkbox") node.remove();
  });
  return purifier.sanitize(html, {
    ALLOWED_TAGS: Object.keys(ALLOWED),
    ALLOWED_ATTR: [...new Set([...Object.values(ALLOWED).flat(), ...ALLOWED_EVERYWHERE])],
    ALLOW_DATA_ATTR: false,
    KEEP_CONTENT: true, // unknown elements are unwrapped, their text kept
    FORBID_CONTENTS: [...DROP_WITH_CONTENT],
  });
}

export const PasteSanitizer = Extension.create({
  name: "pasteSanitizer",
  transformPastedHTML(html) {
    return sanitizePastedHtml(html);
  },
});
