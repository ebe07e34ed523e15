"use client";

import { BlockMath, InlineMath } from "react-katex";

/**
 * TeX rendered by KaTeX through react-katex. KaTeX's defaults keep `trust` off, so no TeX
 * command can emit links or HTML; a typo shows in red in place instead of breaking the block.
 */
export function Tex({
  tex,
  display = false,
  wrap = false,
  className,
}: {
  tex: string;
  display?: boolean;
  /** A block that breaks at its + and = signs when it is wider than its box. */
  wrap?: boolean;
  className?: string;
}) {
  const renderError = (error: Error) => (
    <span className="font-mono text-xs text-red-700" title={error.message}>
      {tex}
    </span>
  );
  if (wrap) {
    return (
      <div className={`leading-loose ${className ?? ""}`}>
        <InlineMath math={`\\displaystyle ${tex}`} renderError={renderError} />
      </div>
    );
  }
  if (display) {
    return (
      <div className={className}>
        <BlockMath math={tex} renderError={renderError} />
      </div>
    );
  }
  return (
    <span className={className}>
      <InlineMath math={tex} renderError={renderError} />
    </span>
  );
}
