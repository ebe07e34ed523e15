import {
  ACTIVITY_MODELS,
  listCouples,
  listRedoxProbes,
  listReferenceElectrodes,
  listSolvents,
  resolveSpecies,
  searchSpecies,
} from "@/lib/chem";
import type { SelectOption } from "./ui/select-field";

/**
 * The editor's one door to lib/chem's catalogues: species type-ahead, solvents, models,
 * couples, reference electrodes and hazard notes. If lib/chem renames a helper, only this
 * file changes. Lists are built once: the catalogues are static data.
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

const once = <T>(build: () => T) => {
  let value: T | undefined;
  return () => (value ??= build());
};

export const solventOptions = once((): SelectOption[] =>
  listSolvents().map((solvent) => ({
    value: solvent.id,
    label: solvent.id === solvent.name ? solvent.name : `${solvent.name} (${solvent.formula})`,
  })),
);

/** The models lib/chem offers, "auto" first, with their published names. */
export const modelOptions = once((): SelectOption[] =>
  ACTIVITY_MODELS.map((model) => ({ value: model.id, label: model.label })),
);

export function modelLabel(id: string): string {
  return ACTIVITY_MODELS.find((model) => model.id === id)?.label ?? id;
}

const signedVolts = (value: number) => `${value < 0 ? "−" : "+"}${Math.abs(value).toFixed(3)} V`;

export const coupleOptions = once((): SelectOption[] =>
  listCouples().map((couple) => ({
    value: couple.id,
    label: `${couple.reaction}   E° = ${signedVolts(couple.standardPotentialV)}`,
  })),
);

const SUB = "₀₁₂₃₄₅₆₇₈₉";
const SUP = "⁰¹²³⁴⁵⁶⁷⁸⁹";

/** "Fe(CN)6^4-" → "Fe(CN)₆⁴⁻" for places that take plain text only (select options). */
function formulaText(formula: string): string {
  const [body, charge] = formula.split("^");
  const sub = body.replace(/(?<=[A-Za-z)\]])\d+/g, (d) => [...d].map((c) => SUB[+c]).join(""));
  if (!charge) return sub.replace(/[+-]$/, (sign) => (sign === "+" ? "⁺" : "⁻"));
  const sign = charge.endsWith("-") ? "⁻" : "⁺";
  return sub + [...charge.slice(0, -1)].map((c) => SUP[+c]).join("") + sign;
}

export interface RedoxProbeOption extends SelectOption {
  /** The forms with a known diffusion coefficient, as options ("reduced", "oxidized"). */
  forms: SelectOption[];
}

/** lib/chem's redox probes, each with the forms it can be present in (those with a known D). */
export const redoxProbeOptions = once((): RedoxProbeOption[] =>
  listRedoxProbes().map((probe) => ({
    value: probe.id,
    label: `${probe.name} — ${probe.medium}`,
    forms: [
      probe.diffusionReducedCm2PerS25C !== null
        ? { value: "reduced", label: `reduced form, ${formulaText(probe.reduced)}` }
        : null,
      probe.diffusionOxidizedCm2PerS25C !== null
        ? { value: "oxidized", label: `oxidized form, ${formulaText(probe.oxidized)}` }
        : null,
    ].filter((form): form is SelectOption => form !== null),
  })),
);

const referenceNames = once(
  () =>
    new Map(listReferenceElectrodes().map((electrode) => [electrode.id as string, electrode.name])),
);

export function referenceElectrodeLabel(id: string): string {
  return referenceNames().get(id) ?? id;
}

/**
 * Hazard notes for a block: the engine's own list when it computed the solution, otherwise
 * (input refused) those of each typed species the catalogue knows and of its ions, so a
 * warning never disappears while a number is being corrected.
 */
export function hazardNotesFor(
  formulas: readonly string[],
  result?: { hazards?: readonly string[] },
): string[] {
  if (result?.hazards) return [...result.hazards];
  const notes = new Set<string>();
  for (const formula of formulas) {
    const species = tryResolve(formula);
    if (!species) continue;
    species.hazards.forEach((note) => notes.add(note));
    for (const ion of species.ions)
      tryResolve(ion.formula)?.hazards.forEach((note) => notes.add(note));
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
