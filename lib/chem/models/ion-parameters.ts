/**
 * Per-ion parameters for the Debye–Hückel family, looked up by canonical ion formula
 * (the spelling `ModelIon.formula` carries) and cached: the models run on every keystroke.
 */
import { parseFormulaWith } from "../formula/parse";
import { isKnownIonKey } from "../species/ion-index";
import { BDOT_ION_SIZE_ANGSTROM } from "../data/ion-size-bdot";
import { KIELLAND_ION_SIZE_ANGSTROM } from "../data/ion-size-kielland";
import { TRUESDELL_JONES_PARAMETERS } from "../data/ion-size-truesdell-jones";

function byKey<T>(table: Readonly<Record<string, T>>): Map<string, T> {
  const map = new Map<string, T>();
  for (const [formula, value] of Object.entries(table))
    map.set(parseFormulaWith(formula, { isKnownIonKey }).key, value);
  return map;
}

const KIELLAND = byKey(KIELLAND_ION_SIZE_ANGSTROM);
const TRUESDELL_JONES = byKey(TRUESDELL_JONES_PARAMETERS);
const BDOT_SIZE = byKey(BDOT_ION_SIZE_ANGSTROM);

const keyCache = new Map<string, string | null>();

/** Composition key of an ion formula, or null when it does not parse. */
function ionKeyOf(formula: string): string | null {
  let key = keyCache.get(formula);
  if (key === undefined) {
    try {
      key = parseFormulaWith(formula, { isKnownIonKey }).key;
    } catch {
      key = null;
    }
    keyCache.set(formula, key);
  }
  return key;
}

export function kiellandIonSize(formula: string): number | undefined {
  const key = ionKeyOf(formula);
  return key ? KIELLAND.get(key) : undefined;
}

export function truesdellJonesParameters(
  formula: string,
): { aAngstrom: number; b: number } | undefined {
  const key = ionKeyOf(formula);
  return key ? TRUESDELL_JONES.get(key) : undefined;
}

export function bDotIonSize(formula: string): number | undefined {
  const key = ionKeyOf(formula);
  return key ? BDOT_SIZE.get(key) : undefined;
}

/**
 * Ion size used when no table has the ion: 4 Å for |z| = 1 and 5 Å otherwise, the middle of
 * Kielland's classes for simple inorganic ions (an assumption, said in the notes).
 */
export function assumedIonSize(charge: number): number {
  return Math.abs(charge) === 1 ? 4 : 5;
}
