/** Public formula API: `parseFormula` resolves ambiguous charges against the ion catalogue. */
import { ionByAlias, isKnownIonKey } from "../species/ion-index";
import { compositionMolarMass } from "./molar-mass";
import { parseFormulaWith, type ParsedFormula } from "./parse";

export type { ParsedFormula } from "./parse";
export type { Composition } from "./composition";

const cache = new Map<string, ParsedFormula>();

/** Parses a formula or an ion alias ("TBA+", "ferricyanide"). Results are cached (frozen). */
export function parseFormula(text: string): ParsedFormula {
  const hit = cache.get(text);
  if (hit) return hit;
  const alias = typeof text === "string" ? ionByAlias(text) : undefined;
  const parsed = parseFormulaWith(alias ? alias.formula : text, { isKnownIonKey });
  Object.freeze(parsed.elements);
  Object.freeze(parsed.anhydrousElements);
  const result = Object.freeze({ ...parsed, input: text });
  if (cache.size > 5000) cache.clear();
  cache.set(text, result);
  return result;
}

/** Molar mass in g/mol (IUPAC 2021 abridged standard atomic weights), hydrate water included. */
export function molarMass(formula: string): number {
  return compositionMolarMass(parseFormula(formula).elements);
}
