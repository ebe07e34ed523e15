"use client";

import { useEffect } from "react";

/** How long to wait for a lazily rendered block to appear before giving up. */
const WAIT_MS = 8_000;

/**
 * `#block-<id>` in the URL (a link from the solution finder) scrolls that block into view
 * and marks it `data-highlighted="true"` (the block's ring). Blocks render after the editor
 * and their panels load lazily, so the element is looked for until it appears; a later
 * change of the hash highlights the new block.
 */
export function useBlockHighlight(ready: boolean): void {
  useEffect(() => {
    if (!ready) return;
    let timer: ReturnType<typeof setInterval> | undefined;
    const highlight = () => {
      clearInterval(timer);
      const id = decodeURIComponent(window.location.hash.slice(1));
      if (!id.startsWith("block-")) return;
      const started = Date.now();
      timer = setInterval(() => {
        const element = document.getElementById(id);
        if (!element && Date.now() - started < WAIT_MS) return;
        clearInterval(timer);
        if (!element) return;
        for (const other of document.querySelectorAll('[data-highlighted="true"]'))
          other.removeAttribute("data-highlighted");
        element.setAttribute("data-highlighted", "true");
        element.scrollIntoView({ block: "start" });
      }, 100);
    };
    highlight();
    window.addEventListener("hashchange", highlight);
    return () => {
      clearInterval(timer);
      window.removeEventListener("hashchange", highlight);
    };
  }, [ready]);
}
