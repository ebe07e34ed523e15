/**
 * Reads the ionic charge written at the end of a formula. Accepted notations:
 * `SO4^2-`, `SO4^{2-}`, `SO4^-2`, `SO4-2`, `SO4--`, `SO4 2-`, `Na+`, `Fe+3`, `Fe3+`.
 *
 * "Digits then a sign" is ambiguous: `Fe3+` is iron(III) but `NH4+` is ammonium. Such
 * endings give two readings, which the caller resolves (against the ion catalogue).
 *
 * One right-to-left scan of the ending (no backtracking regular expressions): the time is
 * linear in the length of the text.
 */
export interface ChargeReading {
  core: string;
  charge: number;
}

const isDigit = (ch: string) => ch >= "0" && ch <= "9";
const isSign = (ch: string) => ch === "+" || ch === "-";
const isSpace = (ch: string) => ch === " " || ch === "\t" || ch === "\n" || ch === "\r";
const signOf = (ch: string) => (ch === "+" ? 1 : -1);

/** `^2-`, `^{2-}`, `^-2`, `^ - `: the body after the caret, without braces and spaces. */
function caretReading(s: string): ChargeReading | null {
  let i = s.length - 1;
  while (i >= 0 && (isDigit(s[i]) || isSign(s[i]) || isSpace(s[i]) || s[i] === "{" || s[i] === "}"))
    i--;
  if (i < 0 || s[i] !== "^") return null;
  let body = "";
  for (let k = i + 1; k < s.length; k++)
    if (!isSpace(s[k]) && s[k] !== "{" && s[k] !== "}") body += s[k];
  const core = s.slice(0, i).trimEnd();
  if (body.length === 0) return null;
  const last = body[body.length - 1];
  if (isSign(last)) {
    const digits = body.slice(0, -1);
    for (const ch of digits) if (!isDigit(ch)) return null;
    return { core, charge: signOf(last) * (digits ? Number(digits) : 1) };
  }
  if (isSign(body[0])) {
    const digits = body.slice(1);
    if (digits.length === 0) return null;
    for (const ch of digits) if (!isDigit(ch)) return null;
    return { core, charge: signOf(body[0]) * Number(digits) };
  }
  return null;
}

/** Returns one reading, or two when the notation is ambiguous (preferred reading first). */
export function readCharge(text: string): ChargeReading[] {
  const s = text.trimEnd();
  const n = s.length;
  const caret = caretReading(s);
  if (caret) return [caret];
  if (n === 0) return [{ core: s, charge: 0 }];
  const last = s[n - 1];
  if (isSign(last)) {
    // `X 2-`: digits after a space.
    let d = n - 2;
    while (d >= 0 && isDigit(s[d])) d--;
    const digits = s.slice(d + 1, n - 1);
    if (digits.length > 0 && d >= 0 && isSpace(s[d])) {
      let c = d;
      while (c >= 0 && isSpace(s[c])) c--;
      if (c >= 0) return [{ core: s.slice(0, c + 1), charge: signOf(last) * Number(digits) }];
    }
    // `X--`, `X++`: a run of one sign.
    let r = n - 1;
    while (r >= 0 && isSign(s[r])) r--;
    const run = n - 1 - r;
    if (run >= 2) {
      let same = true;
      for (let k = r + 1; k < n; k++) if (s[k] !== last) same = false;
      if (same) return [{ core: s.slice(0, r + 1), charge: signOf(last) * run }];
      return [{ core: s.slice(0, n - 1), charge: signOf(last) }];
    }
    // `Fe3+`: a digit then the sign reads as a charge or as a count.
    if (n >= 2 && isDigit(s[n - 2])) {
      const core = s.slice(0, n - 2);
      return [
        { core, charge: signOf(last) * Number(s[n - 2]) },
        { core: s.slice(0, n - 1), charge: signOf(last) },
      ];
    }
    return [{ core: s.slice(0, n - 1), charge: signOf(last) }];
  }
  // `SO4-2`, `Fe+3`: a sign then digits at the end, after something that is not a sign or caret.
  if (isDigit(last)) {
    let d = n - 1;
    while (d >= 0 && isDigit(s[d])) d--;
    if (d >= 1 && isSign(s[d]) && !isSpace(s[d - 1]) && !isSign(s[d - 1]) && s[d - 1] !== "^")
      return [{ core: s.slice(0, d), charge: signOf(s[d]) * Number(s.slice(d + 1)) }];
  }
  return [{ core: s, charge: 0 }];
}

/** Canonical charge suffix: "+", "-", "^2+", "^3-" (the spelling `ModelIon.formula` uses). */
export function chargeSuffix(charge: number): string {
  if (charge === 0) return "";
  const sign = charge > 0 ? "+" : "-";
  return Math.abs(charge) === 1 ? sign : `^${Math.abs(charge)}${sign}`;
}
