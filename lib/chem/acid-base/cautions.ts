/**
 * Safety text for a buffer result (DESIGN.md "Safety"): the general caution on every result,
 * plus each reagent's special hazard. Hazard statements are common knowledge of the reagents'
 * GHS classifications, not a substitute for the safety data sheet.
 */
const GENERAL_CAUTIONS: readonly string[] = [
  "Computed pH is a model estimate: check it with a pH meter calibrated at the working temperature and adjust.",
  "Read the safety data sheet of every reagent and follow your institution's chemical hygiene plan and local rules.",
];

export function cautionsFor(hazards: readonly (string | undefined)[]): string[] {
  const seen = new Set<string>();
  for (const h of hazards) if (h) seen.add(h);
  return [...GENERAL_CAUTIONS, ...seen];
}
