const SUBSCRIPT = "₀₁₂₃₄₅₆₇₈₉";
const SUPERSCRIPT = "⁰¹²³⁴⁵⁶⁷⁸⁹";
const digits = (n: string, set: string) => [...n].map((d) => set[Number(d)]).join("");

/**
 * A formula's body and its charge, read as lib/chem spells them: "^" before a multiple charge
 * ("SO4^2-", "Fe^3+"); a single charge is a bare sign ("Na+", "NO3-"), so the digit before it is
 * still a count. `count` is "" for a charge of one; `sign` is null for a neutral formula.
 * Shared by every place that typesets formulas (text, the block's markup, the printed record).
 */
export function splitCharge(formula: string): {
  body: string;
  count: string;
  sign: "+" | "-" | null;
} {
  const caret = /\^(\d*)([+-])$/.exec(formula);
  if (caret) {
    return {
      body: formula.slice(0, caret.index),
      count: caret[1] === "1" ? "" : caret[1],
      sign: caret[2] as "+" | "-",
    };
  }
  const bare = /[A-Za-z0-9)\]]([+-])$/.exec(formula);
  if (bare) return { body: formula.slice(0, -1), count: "", sign: bare[1] as "+" | "-" };
  return { body: formula, count: "", sign: null };
}

/**
 * A formula as plain text the way chemists write it, for places that cannot hold markup (CSV
 * cells, sentences, titles): "SO4^2-" → "SO₄²⁻", "Na+" → "Na⁺", "CuSO4·5H2O" → "CuSO₄·5H₂O".
 * The same reading as lib/ui/chem-formula.tsx: counts after an element or a bracket are
 * subscripts, a leading count or one after "·" stays a coefficient, the charge is raised.
 */
export function formulaAsText(formula: string): string {
  const { body, count, sign } = splitCharge(formula);
  const charge = sign ? `${digits(count, SUPERSCRIPT)}${sign === "-" ? "⁻" : "⁺"}` : "";
  const typeset = body.replace(/\d+/g, (n, index: number) =>
    index > 0 && /[A-Za-z)\]]/.test(body[index - 1]) ? digits(n, SUBSCRIPT) : n,
  );
  return typeset + charge;
}
