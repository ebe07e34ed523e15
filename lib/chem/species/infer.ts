/**
 * For a neutral formula that is not in the catalogue, finds a cation and an anion whose
 * compositions and charges add up to it: "RbBr" → Rb+ + Br-, "EuCl3" → Eu^3+ + 3 Cl-.
 * Anions come from the ion catalogue (plus the halides and sulfide as monatomic ions);
 * the cation is a catalogue cation other than H+ (strong acids are all in the catalogue) or
 * a single metal whose charge (1–4) balances.
 */
import { compositionKey, type Composition } from "../formula/composition";
import { chargeSuffix } from "../formula/charge";
import { parseFormulaWith } from "../formula/parse";
import type { IonCount } from "./dissociation";
import { allIons, ionByKey } from "./ion-index";

interface Candidate {
  formula: string;
  charge: number;
  elements: Composition;
}

const ANIONS: Candidate[] = allIons()
  .filter((i) => i.charge < 0)
  .map((i) => ({
    formula: parseFormulaWith(i.formula).formula,
    charge: i.charge,
    elements: parseFormulaWith(i.formula).elements,
  }));

const NON_METALS = new Set([
  "H",
  "B",
  "C",
  "N",
  "O",
  "F",
  "P",
  "S",
  "Cl",
  "Se",
  "Br",
  "I",
  "He",
  "Ne",
  "Ar",
  "Kr",
  "Xe",
  "Rn",
  "Si",
  "As",
  "Te",
]);

function subtract(a: Composition, b: Composition, times: number): Composition | null {
  const out: Composition = { ...a };
  for (const [el, c] of Object.entries(b)) {
    const left = (out[el] ?? 0) - c * times;
    if (left < 0) return null;
    if (left === 0) delete out[el];
    else out[el] = left;
  }
  return out;
}

function ion(formula: string, charge: number, count: number): IonCount {
  const parsed = parseFormulaWith(formula);
  return { formula: parsed.formula, charge, count, key: parsed.key };
}

export function inferDissociation(elements: Composition): IonCount[] | null {
  for (const anion of ANIONS) {
    const maxTimes = Math.min(
      ...Object.entries(anion.elements).map(([el, c]) => Math.floor((elements[el] ?? 0) / c)),
    );
    for (let q = 1; q <= maxTimes; q++) {
      const rest = subtract(elements, anion.elements, q);
      if (!rest || Object.keys(rest).length === 0) continue;
      const negative = q * -anion.charge;
      const symbols = Object.keys(rest);
      if (symbols.length === 1 && !NON_METALS.has(symbols[0])) {
        const p = rest[symbols[0]];
        const charge = negative / p;
        if (Number.isInteger(charge) && charge >= 1 && charge <= 4) {
          return [
            ion(symbols[0] + chargeSuffix(charge), charge, p),
            ion(anion.formula, anion.charge, q),
          ];
        }
      }
      for (let p = 1; p <= negative; p++) {
        if (negative % p !== 0) continue;
        const unit: Composition = {};
        let whole = true;
        for (const [el, c] of Object.entries(rest)) {
          if (c % p !== 0) whole = false;
          unit[el] = c / p;
        }
        if (!whole) continue;
        const known = ionByKey(compositionKey(unit, negative / p));
        // An acid not in the catalogue is most likely weak (or the formula is organic):
        // do not guess that it gives up all its protons.
        if (known && known.formula !== "H+")
          return [ion(known.formula, known.charge, p), ion(anion.formula, anion.charge, q)];
      }
    }
  }
  return null;
}
