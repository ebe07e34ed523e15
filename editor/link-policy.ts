import { isSafeHref } from "@/lib/document/safe-href";

/**
 * Link options for the editor: only http, https, mailto and in-app links are ever created,
 * typed, pasted or autolinked. The server's document schema applies the same rule.
 */
export const linkOptions = {
  openOnClick: false,
  autolink: true,
  linkOnPaste: true,
  defaultProtocol: "https",
  protocols: ["http", "https", "mailto"],
  HTMLAttributes: { rel: "noopener noreferrer nofollow", target: "_blank" },
  isAllowedUri: (url: string, ctx: { defaultValidate: (url: string) => boolean }) =>
    ctx.defaultValidate(url) && isSafeHref(url),
  shouldAutoLink: (url: string) => isSafeHref(url),
};
