"use client";

import { BlockMath, InlineMath } from "react-katex";

/**
 * TeX rendered by KaTeX through react-katex. KaTeX's defaults keep `trust` off, so no TeX
 * command can emit links or HTML; a typo shows in red in place instead of breaking the block.
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
  const renderError = (error: Error) => (
    <span className="font-mono text-xs text-red-700" title={error.message}>
      {tex}
    </span>
  );
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
