/**
 * Whether the Pitzer model is fully parameterised for a composition, for the "auto" model
 * choice: every cation–anion pair present has binary parameters, the ionic strength is inside
 * every pair's fitted range, and the temperature is 25 °C or covered by published derivatives.
 */
import type { ModelIon } from "../types";
import { assemblePitzerSystem } from "./assemble";

export interface PitzerCoverage {
  covered: boolean;
  /** Every cation–anion pair present has parameters (whatever the range). */
  parameters: boolean;
  /** Why not, in a chemist's words (empty when covered). */
  reasons: string[];
}

export function pitzerCoverage(
  ions: readonly ModelIon[],
  temperatureC: number,
  ionicStrengthMolal: number,
): PitzerCoverage {
  const charged = ions.filter((i) => i.charge !== 0 && i.molality > 0);
  if (!charged.some((i) => i.charge > 0) || !charged.some((i) => i.charge < 0)) {
    return {
      covered: false,
      parameters: false,
      reasons: ["Pitzer needs at least one cation and one anion."],
    };
  }
  const assembly = assemblePitzerSystem(ions, temperatureC, ionicStrengthMolal);
  const reasons = [...assembly.validityMessages];
  if (assembly.missingPairs.length > 0)
    reasons.unshift(`no Pitzer parameters for ${assembly.missingPairs.join(", ")}`);
  return {
    covered: reasons.length === 0,
    parameters: assembly.missingPairs.length === 0,
    reasons,
  };
}
