/** Warnings and notes of a solution: from its species, the amounts, the solvent and the model. */
import type { ResolvedSpecies } from "../species/resolve";
import type { SolventState } from "../solvents/properties";

export function solutionWarnings(
  species: readonly ResolvedSpecies[],
  state: SolventState,
  amountWarnings: readonly string[],
  modelNotes: readonly string[],
): { warnings: string[]; notes: string[] } {
  const warnings: string[] = [];
  const notes: string[] = [];
  for (const s of species) {
    for (const w of s.warnings) warnings.push(w);
    for (const n of s.notes) if (!notes.includes(n)) notes.push(n);
  }
  for (const n of modelNotes) if (!notes.includes(n)) notes.push(n);
  warnings.push(...amountWarnings, ...state.notes);
  if (state.solvent.id !== "water") {
    const hydrates = species.filter((s) => s.hydrateWater > 0).map((s) => s.formula);
    if (hydrates.length)
      warnings.push(
        `The water of crystallisation of ${hydrates.join(", ")} is counted as solvent mass, but it is water in ${state.solvent.name}: the solvent is no longer pure.`,
      );
  }
  return { warnings, notes };
}
