/** The solution's ions, merged over its components in order of first appearance. */
import type { ComponentAmount } from "../amounts/solve";
import type { ResolvedSpecies } from "../species/resolve";
import type { IonAmount } from "./screening";

export interface SolutionIon extends IonAmount {
  key: string;
}

export function solutionIons(
  species: readonly ResolvedSpecies[],
  amounts: readonly ComponentAmount[],
  litresPerKgSolvent: number,
): { ions: SolutionIon[]; neutralMolality: number } {
  const byFormula = new Map<string, SolutionIon>();
  let neutralMolality = 0;
  species.forEach((s, i) => {
    const m = amounts[i].molality;
    if (s.ions.length === 0) neutralMolality += m;
    for (const ion of s.ions) {
      let entry = byFormula.get(ion.formula);
      if (!entry) {
        entry = {
          formula: ion.formula,
          charge: ion.charge,
          molality: 0,
          molarity: 0,
          key: ion.key,
        };
        byFormula.set(ion.formula, entry);
      }
      entry.molality += m * ion.count;
      entry.molarity = entry.molality / litresPerKgSolvent;
    }
  });
  return { ions: [...byFormula.values()], neutralMolality };
}
