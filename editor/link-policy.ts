import Link from "@tiptap/extension-link";
import { isSafeHref } from "@/lib/document/safe-href";

/**
 * The editor's links: only http, https, mailto and in-app links are ever created, typed,
 * pasted or autolinked, and a link stores its `href` and nothing else. `rel` and `target`
 * are the app's, added when the link is drawn, so a saved link can neither be styled over
 * the page (`class`) nor choose how it opens. The server's document schema applies the same
 * rule (lib/document/document-schema.ts) to whatever arrives through the API.
 */
export const EntryLink = Link.extend({
  addAttributes() {
    return {
      href: {
        default: null,
        parseHTML: (element: HTMLElement) => element.getAttribute("href"),
      },
    };
  },
}).configure({
  openOnClick: false,
  autolink: true,
  linkOnPaste: true,
  defaultProtocol: "https",
  protocols: ["http", "https", "mailto"],
  HTMLAttributes: { rel: "noopener noreferrer nofollow", target: "_blank" },
  isAllowedUri: (url, ctx) => ctx.defaultValidate(url) && isSafeHref(url),
  shouldAutoLink: (url) => isSafeHref(url),
});
