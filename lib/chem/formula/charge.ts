/**
 * Reads the ionic charge written at the end of a formula. Accepted notations:
 * `SO4^2-`, `SO4^{2-}`, `SO4^-2`, `SO4-2`, `SO4--`, `SO4 2-`, `Na+`, `Fe+3`, `Fe3+`.
 *
 * "Digits then a sign" is ambiguous: `Fe3+` is iron(III) but `NH4+` is ammonium. Such
 * endings give two readings, which the caller resolves (against the ion catalogue).
 */
export interface ChargeReading {
  core: string;
  charge: number;
}

function signOf(ch: string): number {
  return ch === "+" ? 1 : -1;
}

/** Returns one reading, or two when the notation is ambiguous (preferred reading first). */
export function readCharge(text: string): ChargeReading[] {
  const s = text.trimEnd();
  let m = /^(.*?)\s*\^\{?\s*(\d*)\s*([+-])\s*\}?$/.exec(s);
  if (m) return [{ core: m[1], charge: signOf(m[3]) * (m[2] ? Number(m[2]) : 1) }]; // ^2-
  m = /^(.*?)\s*\^\{?\s*([+-])\s*(\d+)\s*\}?$/.exec(s);
  if (m) return [{ core: m[1], charge: signOf(m[2]) * Number(m[3]) }]; // ^-2
  m = /^(.*\S)\s+(\d+)([+-])$/.exec(s);
  if (m) return [{ core: m[1], charge: signOf(m[3]) * Number(m[2]) }];
  m = /^(.*?)([+-]{2,})$/.exec(s);
  if (m && new Set(m[2]).size === 1) return [{ core: m[1], charge: signOf(m[2][0]) * m[2].length }];
  m = /^(.*[^\s+^-])([+-])(\d+)$/.exec(s);
  if (m) return [{ core: m[1], charge: signOf(m[2]) * Number(m[3]) }];
  m = /^(.*?)(\d)([+-])$/.exec(s);
  if (m) {
    const asCharge = { core: m[1], charge: signOf(m[3]) * Number(m[2]) };
    const asCount = { core: m[1] + m[2], charge: signOf(m[3]) };
    return [asCharge, asCount];
  }
  m = /^(.*?)([+-])$/.exec(s);
  if (m) return [{ core: m[1], charge: signOf(m[2]) }];
  return [{ core: s, charge: 0 }];
}

/** Canonical charge suffix: "+", "-", "^2+", "^3-" (the spelling `ModelIon.formula` uses). */
export function chargeSuffix(charge: number): string {
  if (charge === 0) return "";
  const sign = charge > 0 ? "+" : "-";
  return Math.abs(charge) === 1 ? sign : `^${Math.abs(charge)}${sign}`;
}
