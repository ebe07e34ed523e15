/**
 * One spelling per ion for table look-ups: the formula core plus the canonical charge suffix
 * ("Na+", "Mg^2+", "SO4^2-"), whatever suffix the caller used, so that "SO4-2" and "SO4^2-"
 * meet the same table row.
 */
export function ionKey(formula: string, charge: number): string {
  const core = formula
    .trim()
    .replace(/(\s*\^\{?\s*\d*\s*[+-]+\s*\d*\s*\}?|[+-]+\d*)$/, "")
    .trim();
  if (charge === 0) return core;
  const sign = charge > 0 ? "+" : "-";
  return Math.abs(charge) === 1 ? core + sign : `${core}^${Math.abs(charge)}${sign}`;
}

/** Key of an unordered pair of ions, optionally with a third (common) ion. */
export function pairKey(ionA: string, ionB: string, common = ""): string {
  return (ionA < ionB ? `${ionA}|${ionB}` : `${ionB}|${ionA}`) + (common ? `|${common}` : "");
}
