import { listSolvents, resolveSpecies, searchSpecies } from "@/lib/chem";
import type { SelectOption } from "./ui/select-field";

/**
 * The editor's one door to lib/chem's catalogues: species type-ahead, solvents, model
 * names and hazard notes. If lib/chem renames a helper, only this file changes.
 */

export interface SpeciesOption {
  formula: string;
  name: string;
  kind?: string;
}

export function searchSpeciesOptions(query: string, limit = 8): SpeciesOption[] {
  if (query.trim() === "") return [];
  return searchSpecies(query, limit).map(({ formula, name, kind }) => ({ formula, name, kind }));
}

let solventCache: SelectOption[] | null = null;
export function solventOptions(): SelectOption[] {
  solventCache ??= listSolvents().map((solvent) => ({ value: solvent.id, label: `${solvent.name} (${solvent.formula})` }));
  return solventCache;
}

// Published methods keep their usual names (DESIGN.md, "Vocabulary").
const MODEL_LABELS: Record<string, string> = {
  auto: "Auto",
  "dh-limiting": "Debye–Hückel limiting law",
  "dh-extended": "Extended Debye–Hückel",
  guntelberg: "Güntelberg",
  davies: "Davies",
  "truesdell-jones": "Truesdell–Jones",
  pitzer: "Pitzer",
  sit: "SIT (Brønsted–Guggenheim–Scatchard)",
};

export function modelLabel(id: string): string {
  return MODEL_LABELS[id] ?? id;
}

/**
 * Hazard notes for the species typed in a block: the compound's own notes plus those of its
 * ions (a perchlorate salt carries the perchlorate note). Species the catalogue does not know
 * contribute nothing here; the engine reports them as unknown in place.
 */
export function hazardNotesFor(formulas: readonly string[], result?: { hazards?: readonly string[] }): string[] {
  const notes = new Set<string>(result?.hazards ?? []);
  for (const formula of formulas) {
    const species = tryResolve(formula);
    if (!species) continue;
    species.hazards.forEach((note) => notes.add(note));
    for (const ion of species.ions) tryResolve(ion.formula)?.hazards.forEach((note) => notes.add(note));
  }
  return [...notes];
}

function tryResolve(formula: string) {
  try {
    return resolveSpecies(formula);
  } catch {
    return undefined;
  }
}

/** Charges of a salt's cation and anion (first of each), for the mean-coefficient formula. */
export function saltCharges(formula: string): { zPlus: number; zMinus: number } | null {
  const species = tryResolve(formula);
  const cation = species?.ions.find((ion) => ion.charge > 0);
  const anion = species?.ions.find((ion) => ion.charge < 0);
  return cation && anion ? { zPlus: cation.charge, zMinus: anion.charge } : null;
}

const REFERENCE_LABELS: Record<string, string> = {
  SHE: "SHE",
  SCE: "SCE (sat. KCl)",
  "Ag/AgCl-satKCl": "Ag/AgCl (sat. KCl)",
  "Ag/AgCl-3.5MKCl": "Ag/AgCl (3.5 M KCl)",
  "Ag/AgCl-3MKCl": "Ag/AgCl (3 M KCl)",
  "Hg/HgO-1MNaOH": "Hg/HgO (1 M NaOH)",
  "Hg/Hg2SO4-satK2SO4": "Hg/Hg₂SO₄ (sat. K₂SO₄)",
  RHE: "RHE",
};

export function referenceElectrodeLabel(id: string): string {
  return REFERENCE_LABELS[id] ?? id;
}

/** Redox couples of lib/chem's catalogue, for the cell block's select. */
export function coupleOptions(): SelectOption[] {
  return [];
}
