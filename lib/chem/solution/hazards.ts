/**
 * Hazards of the solution as a whole: each species' own hazards plus the combinations
 * that labs are warned about (common practice, no single source).
 */
import type { ResolvedSpecies } from "../species/resolve";

const FLUORINATED = ["F-", "PF6-", "BF4-", "AsF6-"];

const cache = new Map<string, string[]>();

/** Memoised by the species and solvent: the same solution block asks on every keystroke. */
export function solutionHazards(species: readonly ResolvedSpecies[], solventId: string): string[] {
  let key = solventId;
  for (const s of species) key += "|" + s.formula;
  let hazards = cache.get(key);
  if (!hazards) {
    hazards = computeHazards(species, solventId);
    if (cache.size > 500) cache.clear();
    cache.set(key, hazards);
  }
  return [...hazards];
}

function computeHazards(species: readonly ResolvedSpecies[], solventId: string): string[] {
  const hazards = new Set<string>();
  const ions = new Set<string>();
  for (const s of species) {
    for (const h of s.hazards) hazards.add(h);
    for (const ion of s.ions) ions.add(ion.formula);
  }
  const acidic = ions.has("H+") || species.some((s) => s.kind === "acid");
  if (acidic && (ions.has("Fe(CN)6^3-") || ions.has("Fe(CN)6^4-"))) {
    hazards.add(
      "Hexacyanoferrate with acid: hot or concentrated acid releases HCN gas; work in a fume hood.",
    );
  }
  if (acidic && ions.has("CN-")) hazards.add("Cyanide with acid releases HCN gas: do not mix.");
  if (acidic && FLUORINATED.some((f) => ions.has(f))) {
    hazards.add("Fluoride or fluorinated anion with acid can form HF: use HF precautions.");
  }
  if (ions.has("ClO4-") && solventId !== "water") {
    hazards.add(
      "Perchlorate in an organic solvent: never evaporate to dryness; dry perchlorate–organic residues can explode.",
    );
  }
  return [...hazards];
}
