/**
 * Turns the ways chemists type formulas into one plain ASCII spelling before parsing:
 * Unicode subscripts (SO₄), superscript charges (SO₄²⁻, Na⁺), the minus sign (−) and
 * en dash, and the several dots used for hydrates (·, •, ∙, ⋅, *, .).
 */
const SUBSCRIPTS = "₀₁₂₃₄₅₆₇₈₉";
const SUPERSCRIPTS = "⁰¹²³⁴⁵⁶⁷⁸⁹";

export const HYDRATE_DOT = "·";

export function normalizeFormulaText(text: string): string {
  let out = "";
  let superscript = "";
  const flushSuperscript = () => {
    if (superscript) out += "^" + superscript;
    superscript = "";
  };
  for (const ch of text.trim()) {
    const sub = SUBSCRIPTS.indexOf(ch);
    const sup = SUPERSCRIPTS.indexOf(ch);
    if (sub >= 0) {
      flushSuperscript();
      out += String(sub);
    } else if (sup >= 0) superscript += String(sup);
    else if (ch === "⁺") superscript += "+";
    else if (ch === "⁻") superscript += "-";
    else {
      flushSuperscript();
      if (ch === "−" || ch === "–") out += "-";
      else if (ch === "•" || ch === "∙" || ch === "⋅" || ch === "*") out += HYDRATE_DOT;
      else out += ch;
    }
  }
  flushSuperscript();
  // "." separates a hydrate ("CuSO4.5H2O"); the parser does not accept decimal subscripts.
  return out.replace(/\.(?=\s*\d*\s*[A-Z([])/g, HYDRATE_DOT);
}
