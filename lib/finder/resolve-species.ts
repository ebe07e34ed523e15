import "server-only";
import type { Executor } from "@/db/client";
import { findLabSpeciesByTerms } from "@/db/queries/lab-species";
import { parseFormula, resolveSpecies } from "@/lib/chem";
import { AppError } from "@/lib/errors";

/** The catalogue's formula for a term (a hydrate as its salt), or null when it does not know it. */
function fromCatalogue(term: string): string | null {
  try {
    return resolveSpecies(term).saltFormula;
  } catch {
    return null;
  }
}

/** A well-formed formula the catalogue does not know (C6H12O6) is searched as written. */
function asWrittenFormula(term: string): string | null {
  try {
    parseFormula(term);
    return term;
  } catch {
    return null;
  }
}

/**
 * The species a finder query names, as the formulas stored with each solution: the
 * catalogue's (formula, name or alias; a hydrate searches as its dissolved salt, "CuSO4·5H2O"
 * as CuSO4), then, for the terms it does not know, the lab's own species by formula or name
 * (one query, only when needed), then any well-formed formula as written. An unknown name is
 * a 422 on the `species` field that says which one.
 */
export async function resolveSpeciesTerms(
  db: Executor,
  labId: string,
  terms: string[],
): Promise<string[]> {
  const known = new Map(terms.map((t) => [t, fromCatalogue(t)]));
  const rest = terms.filter((t) => known.get(t) === null);
  const own = rest.length ? await findLabSpeciesByTerms(db, labId, rest) : [];
  const unknown: string[] = [];
  const formulas = terms.map((term) => {
    const lab = own.find((s) => s.formula === term || s.name.toLowerCase() === term.toLowerCase());
    const formula = known.get(term) ?? lab?.formula ?? asWrittenFormula(term);
    if (formula === null) unknown.push(term);
    return formula ?? "";
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
