const SUBSCRIPT = "₀₁₂₃₄₅₆₇₈₉";
const SUPERSCRIPT = "⁰¹²³⁴⁵⁶⁷⁸⁹";
const digits = (n: string, set: string) => [...n].map((d) => set[Number(d)]).join("");

/**
 * A formula as plain text the way chemists write it, for places that cannot hold markup (CSV
 * cells, sentences, titles): "SO4^2-" → "SO₄²⁻", "Na+" → "Na⁺", "CuSO4·5H2O" → "CuSO₄·5H₂O".
 * The same reading as lib/ui/chem-formula.tsx: counts after an element or a bracket are
 * subscripts, a leading count or one after "·" stays a coefficient, the charge is raised.
 */
export function formulaAsText(formula: string): string {
  const caret = /\^(\d*)([+-])$/.exec(formula);
  const bare = caret ? null : /[A-Za-z0-9)\]]([+-])$/.exec(formula);
  let body = formula;
  let charge = "";
  if (caret) {
    body = formula.slice(0, caret.index);
    charge = `${caret[1] === "1" ? "" : digits(caret[1], SUPERSCRIPT)}${caret[2] === "-" ? "⁻" : "⁺"}`;
  } else if (bare) {
    body = formula.slice(0, -1);
    charge = bare[1] === "-" ? "⁻" : "⁺";
  }
  const typeset = body.replace(/\d+/g, (count, index: number) =>
    index > 0 && /[A-Za-z)\]]/.test(body[index - 1]) ? digits(count, SUBSCRIPT) : count,
  );
  return typeset + charge;
}
