import { Extension } from "@tiptap/core";
import sanitizeHtml from "sanitize-html";

/**
 * Pasted HTML is cleaned before ProseMirror parses it. The editor schema already drops
 * nodes and attributes it does not know; this is the second line, so no script, event
 * handler, style or foreign URL scheme survives even a future schema mistake.
 */
const ALLOWED_TAGS = [
  "p", "br", "h1", "h2", "h3", "h4", "h5", "h6", "strong", "b", "em", "i", "u", "s", "del", "code", "pre",
  "blockquote", "ul", "ol", "li", "a", "table", "thead", "tbody", "tr", "th", "td", "hr", "span", "div",
  "label", "input",
];

export function sanitizePastedHtml(html: string): string {
  return sanitizeHtml(html, {
    allowedTags: ALLOWED_TAGS,
    allowedAttributes: {
      // ProseMirror's own clipboard marker: lets a copy within Ionleaf keep its structure.
      "*": ["data-pm-slice"],
      a: ["href", "title"],
      th: ["colspan", "rowspan"],
      td: ["colspan", "rowspan"],
      ol: ["start"],
      code: ["class"],
      // tiptap's own clipboard markup: task items and math keep their data attributes.
      li: ["data-type", "data-checked"],
      ul: ["data-type"],
      span: ["data-type", "data-latex"],
      // Live blocks travel as one JSON attribute, validated by the block's zod schema on parse.
      div: ["data-type", "data-latex", "data-block"],
      input: ["type", "checked"],
    },
    allowedSchemes: ["http", "https", "mailto"],
    allowedSchemesAppliedToAttributes: ["href"],
    allowProtocolRelative: false,
    disallowedTagsMode: "discard",
    nonTextTags: ["script", "style", "textarea", "option", "noscript", "template", "iframe", "object"],
  });
}

export const PasteSanitizer = Extension.create({
  name: "pasteSanitizer",
  transformPastedHTML(html) {
    return sanitizePastedHtml(html);
  },
});
