import { ChemInputError } from "../errors";
import { readCharge, chargeSuffix, type ChargeReading } from "./charge";
import { addComposition, compositionKey, parseComposition, type Composition } from "./composition";
import { HYDRATE_DOT, normalizeFormulaText } from "./normalize";

export interface ParsedFormula {
  /** What was typed. */
  input: string;
  /** Canonical spelling: "CuSO4·5H2O", "SO4^2-", "Fe(CN)6^3-", "Na+". */
  formula: string;
  /** Canonical spelling without the water of crystallisation ("CuSO4"). */
  anhydrousFormula: string;
  /** Element counts of one formula unit, including any water of crystallisation. */
  elements: Composition;
  /** Element counts without the water of crystallisation. */
  anhydrousElements: Composition;
  charge: number;
  /** Moles of H2O of crystallisation per mole of formula unit (5 for CuSO4·5H2O). */
  hydrateWater: number;
  /** Composition key (Hill order + charge), equal for equal species written differently. */
  key: string;
  anhydrousKey: string;
}

export interface ParseOptions {
  /** Resolves "Fe3+" (iron(III)) against "NH4+" (ammonium): is this key a known ion? */
  isKnownIonKey?: (key: string) => boolean;
}

/** Longest formula accepted: the longest catalogue entry is 22 characters; beyond this is no formula. */
const MAX_FORMULA_LENGTH = 200;
/** Largest ionic charge accepted (±12 covers the polyoxometalates). */
const MAX_ION_CHARGE = 12;

function fail(message: string): never {
  throw new ChemInputError(message, { field: "formula", code: "bad_formula" });
}

/** Drops one pair of brackets around a whole charged complex: "[Fe(CN)6]" → "Fe(CN)6". */
function unwrap(core: string): string {
  const t = core.trim();
  if (t.length < 2 || t[0] !== "[" || t[t.length - 1] !== "]") return t;
  const inner = t.slice(1, -1);
  let depth = 0;
  for (const ch of inner) {
    if (ch === "[") depth++;
    if (ch === "]" && --depth < 0) return t;
  }
  return inner;
}

function chooseReading(
  readings: ChargeReading[],
  options: ParseOptions,
  whole: string,
): ChargeReading {
  if (readings.length === 1) return readings[0];
  const parsed = readings.map((r) => {
    try {
      return { r, key: compositionKey(parseComposition(unwrap(r.core), whole), r.charge) };
    } catch {
      return null;
    }
  });
  const valid = parsed.filter((p): p is { r: ChargeReading; key: string } => p !== null);
  if (valid.length === 0) return readings[0];
  const known = valid.find((p) => options.isKnownIonKey?.(p.key));
  if (known) return known.r;
  // Not in the catalogue: a lone element ("Ce4+") or a bracketed complex ("[Co(NH3)6]3+")
  // carries its charge after the digit; otherwise the digit is a subscript ("XO4-").
  const [asCharge, asCount] = readings;
  const core = asCharge.core.trim();
  if (/^[A-Z][a-z]?$/.test(core) || /[\])]$/.test(core)) return asCharge;
  return valid.some((p) => p.r === asCount) ? asCount : asCharge;
}

/**
 * Parses a formula: element symbols, (), [] and {} with multipliers, hydrates
 * ("CuSO4·5H2O", "CuSO4.5H2O", "CuSO4*5H2O") and ionic charges in the usual notations.
 */
export function parseFormulaWith(text: string, options: ParseOptions = {}): ParsedFormula {
  if (typeof text !== "string" || text.trim() === "") fail("The formula is empty.");
  if (text.length > MAX_FORMULA_LENGTH)
    fail(
      `A formula of ${text.length} characters is longer than ${MAX_FORMULA_LENGTH}: check what was pasted.`,
    );
  const input = text;
  const normalized = normalizeFormulaText(text);
  const [main, ...adducts] = normalized.split(HYDRATE_DOT);
  if (main.trim() === "") fail(`"${input}" has nothing before the hydrate dot.`);

  const reading = chooseReading(readCharge(main), options, input);
  if (Math.abs(reading.charge) > MAX_ION_CHARGE)
    fail(`A charge of ${reading.charge} in "${input}" is beyond ±${MAX_ION_CHARGE}.`);
  const core = unwrap(reading.core);
  const anhydrousElements = parseComposition(core, input);
  const elements = addComposition({}, anhydrousElements);
  let hydrateWater = 0;
  const adductTexts: string[] = [];
  for (const part of adducts) {
    const trimmed = part.trim();
    let k = 0;
    while (k < trimmed.length && trimmed[k] >= "0" && trimmed[k] <= "9") k++;
    if (k > 4) fail(`A hydrate coefficient in "${input}" is larger than 9999.`);
    const times = k > 0 ? Number(trimmed.slice(0, k)) : 1;
    const body = trimmed.slice(k).trim();
    if (!body) fail(`Nothing follows the hydrate dot in "${input}".`);
    if (times === 0) fail(`A coefficient of 0 in "${input}" makes no sense.`);
    const adduct = parseComposition(body, input);
    addComposition(elements, adduct, times);
    if (compositionKey(adduct, 0) === "H2O|0") hydrateWater += times;
    adductTexts.push((times === 1 ? "" : String(times)) + body);
  }
  const anhydrousFormula = core.replace(/\s+/g, "") + chargeSuffix(reading.charge);
  const formula = [core.replace(/\s+/g, "") + chargeSuffix(reading.charge), ...adductTexts].join(
    HYDRATE_DOT,
  );
  return {
    input,
    formula,
    anhydrousFormula,
    elements,
    anhydrousElements,
    charge: reading.charge,
    hydrateWater,
    key: compositionKey(elements, reading.charge),
    anhydrousKey: compositionKey(anhydrousElements, reading.charge),
  };
}
