"use client";

import katex from "katex";
import { useMemo } from "react";

/**
 * TeX rendered with KaTeX. `trust: false` and `throwOnError: false`: a typo shows in red in
 * place instead of breaking the block, and no TeX command can emit links or HTML.
 */
export function Tex({
  tex,
  display = false,
  className,
}: {
  tex: string;
  display?: boolean;
  className?: string;
}) {
  const html = useMemo(
    () =>
      katex.renderToString(tex, {
        displayMode: display,
        throwOnError: false,
        trust: false,
        strict: "ignore",
        output: "htmlAndMathml",
      }),
    [tex, display],
  );
  const Tag = display ? "div" : "span";
  return <Tag className={className} dangerouslySetInnerHTML={{ __html: html }} />;
}
