import { Fragment, type ReactNode } from "react";
import { splitCharge } from "@/lib/document/formula-text";

/**
 * A formula as chemists write it: "Fe(CN)6^3-" → Fe(CN)₆³⁻, "CuSO4·5H2O" → CuSO₄·5H₂O.
 * Counts after an element or a bracket become subscripts; a trailing charge, with or without
 * "^", becomes a superscript. The plain text stays available to screen readers and copy.
 */
export function ChemFormula({ formula, className }: { formula: string; className?: string }) {
  return (
    <span className={className}>
      <span aria-hidden>{renderFormula(formula)}</span>
      <span className="sr-only">{formula}</span>
    </span>
  );
}

function renderFormula(formula: string): ReactNode[] {
  const { body, count, sign } = splitCharge(formula);
  const charge = sign ? `${count}${sign === "-" ? "−" : "+"}` : "";
  const parts: ReactNode[] = [];
  const pattern = /(\d+)/g;
  let last = 0;
  for (const match of body.matchAll(pattern)) {
    const index = match.index ?? 0;
    const before = body[index - 1];
    parts.push(body.slice(last, index));
    // A count after "·" or at the start is a coefficient (5H2O), not a subscript.
    if (before && /[A-Za-z)\]]/.test(before)) parts.push(<sub key={index}>{match[1]}</sub>);
    else parts.push(match[1]);
    last = index + match[1].length;
  }
  parts.push(body.slice(last));
  if (charge) parts.push(<sup key="charge">{charge}</sup>);
  return parts.map((part, i) =>
    typeof part === "string" ? <Fragment key={`t${i}`}>{part}</Fragment> : part,
  );
}
