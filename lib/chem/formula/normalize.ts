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
  // "." separates a hydrate ("CuSO4.5H2O") when spaces, digits, spaces and then an element or a
  // bracket follow; the parser does not accept decimal subscripts. Each look-ahead stops at the
  // next dot, so the scan stays linear in the length.
  let result = "";
  for (let i = 0; i < out.length; i++) {
    if (out[i] !== ".") {
      result += out[i];
      continue;
    }
    let j = i + 1;
    while (j < out.length && (out[j] === " " || out[j] === "\t")) j++;
    while (j < out.length && out[j] >= "0" && out[j] <= "9") j++;
    while (j < out.length && (out[j] === " " || out[j] === "\t")) j++;
    const next = out[j];
    result +=
      next !== undefined && ((next >= "A" && next <= "Z") || next === "(" || next === "[")
        ? HYDRATE_DOT
        : ".";
  }
  return result;
}
