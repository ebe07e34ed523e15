/** Reads a dissociation string ("2 Na+ + SO4^2-") into ion formulas and counts. */
import { parseFormulaWith } from "../formula/parse";
import { isKnownIonKey } from "./ion-index";

export interface IonCount {
  /** Canonical ion formula. */
  formula: string;
  charge: number;
  /** Ions per formula unit of the salt. */
  count: number;
  key: string;
}

export function parseDissociation(text: string): IonCount[] {
  if (text.trim() === "") return [];
  return text.split(/\s\+\s/).map((term) => {
    const m = /^\s*(\d+)?\s*(\S+)\s*$/.exec(term);
    if (!m) throw new Error(`Bad dissociation term "${term}" in "${text}"`);
    const parsed = parseFormulaWith(m[2], { isKnownIonKey });
    return {
      formula: parsed.formula,
      charge: parsed.charge,
      count: m[1] ? Number(m[1]) : 1,
      key: parsed.key,
    };
  });
}
