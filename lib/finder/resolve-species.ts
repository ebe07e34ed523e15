import "server-only";
import type { Executor } from "@/db/client";
import { findLabSpeciesByTerms } from "@/db/queries/lab-species";
import { parseFormula, resolveSpecies } from "@/lib/chem";
import { AppError } from "@/lib/errors";

/**
 * The species a finder query names, as the formulas stored with each solution: a lab's own
 * species by formula or name first, then the catalogue (formula, name or alias; a hydrate
 * searches as its dissolved salt, "CuSO4·5H2O" as CuSO4), then any well-formed formula as
 * written. An unknown name is a 422 on the
 * `species` field that says which one.
 */
export async function resolveSpeciesTerms(
  db: Executor,
  labId: string,
  terms: string[],
): Promise<string[]> {
  if (!terms.length) return [];
  const own = await findLabSpeciesByTerms(db, labId, terms);
  const unknown: string[] = [];
  const formulas = terms.map((term) => {
    const lab = own.find((s) => s.formula === term || s.name.toLowerCase() === term.toLowerCase());
    if (lab) return lab.formula;
    try {
      return resolveSpecies(term).saltFormula;
    } catch {
      // Not an electrolyte the catalogue knows, but a well-formed formula (C6H12O6) may
      // still have been typed into a block: search it as written.
    }
    try {
      parseFormula(term);
      return term;
    } catch {
      unknown.push(term);
      return "";
    }
  });
  if (unknown.length) {
    throw new AppError("invalid_input", "Some fields need attention.", {
      fieldErrors: {
        species: [
          `${unknown.map((t) => `"${t}"`).join(", ")} ${unknown.length === 1 ? "is" : "are"} not a species of the catalogue or of the lab; type a formula (NaCl, SO4^2-) or choose from the list.`,
        ],
      },
    });
  }
  return [...new Set(formulas)];
}
