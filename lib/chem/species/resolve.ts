/**
 * Turns what a chemist typed for a component into a species: its ions per formula unit,
 * its molar mass as weighed (hydrate included), water of crystallisation, hazards, notes.
 */
import { ChemInputError } from "../errors";
import { parseFormula, type ParsedFormula } from "../formula";
import { compositionMolarMass } from "../formula/molar-mass";
import { saltByAlias, saltByKey } from "./catalogue";
import type { IonCount } from "./dissociation";
import { inferDissociation } from "./infer";
import { ionByAlias, ionByKey } from "./ion-index";
import type { SpeciesKind } from "./salts";

/** Cached and shared between calls: treat as read-only (the types say so). */
export interface ResolvedSpecies {
  /** Canonical formula as weighed ("CuSO4·5H2O"). */
  formula: string;
  /** Formula of the dissolved electrolyte ("CuSO4"). */
  saltFormula: string;
  name?: string;
  kind: SpeciesKind;
  readonly ions: readonly Readonly<IonCount>[];
  /** g/mol of the weighed form, hydrate water included. */
  molarMassGPerMol: number;
  /** g/mol without water of crystallisation. */
  anhydrousMolarMassGPerMol: number;
  hydrateWater: number;
  readonly hazards: readonly string[];
  readonly notes: readonly string[];
  readonly warnings: readonly string[];
}

const cache = new Map<string, ResolvedSpecies>();

/** Spellings of the same thermodynamic species: H3O+ is H+ with its water of hydration. */
const SAME_SPECIES: Record<string, string> = {
  "H3O+": "H+",
  hydronium: "H+",
  "hydronium ion": "H+",
};

function fromParsed(parsed: ParsedFormula, field: string): ResolvedSpecies {
  const base = {
    formula: parsed.formula,
    saltFormula: parsed.anhydrousFormula,
    molarMassGPerMol: compositionMolarMass(parsed.elements),
    anhydrousMolarMassGPerMol: compositionMolarMass(parsed.anhydrousElements),
    hydrateWater: parsed.hydrateWater,
    hazards: [] as string[],
    notes: [] as string[],
    warnings: [] as string[],
  };
  if (parsed.charge !== 0) {
    const known = ionByKey(parsed.anhydrousKey);
    const ion: IonCount = {
      formula: parsed.anhydrousFormula,
      charge: parsed.charge,
      count: 1,
      key: parsed.anhydrousKey,
    };
    if (!known)
      base.warnings.push(
        `${parsed.anhydrousFormula} is not in the ion catalogue; it is taken as an ion of charge ${parsed.charge > 0 ? "+" : ""}${parsed.charge}.`,
      );
    return {
      ...base,
      name: known?.name,
      kind: "ion",
      ions: [ion],
      hazards: [...(known?.hazards ?? [])],
    };
  }
  const salt = saltByKey(parsed.anhydrousKey);
  if (salt) {
    return {
      ...base,
      saltFormula: salt.formula,
      name: salt.name,
      kind: salt.kind,
      ions: salt.ions,
      hazards: [...salt.hazards],
      notes: salt.note ? [salt.note] : [],
    };
  }
  const inferred = inferDissociation(parsed.anhydrousElements);
  if (inferred) {
    const text = inferred.map((i) => `${i.count > 1 ? i.count + " " : ""}${i.formula}`).join(" + ");
    base.warnings.push(
      `${parsed.anhydrousFormula} is not in the catalogue; its dissociation was inferred from ionic charges as ${text}.`,
    );
    return { ...base, kind: "salt", ions: inferred };
  }
  throw new ChemInputError(
    `"${parsed.input}" is not in the species catalogue and its ions cannot be inferred from their charges. Enter its ions separately (for example "Na+" and "Cl-"), or write "${parsed.formula}(aq)" for a dissolved non-electrolyte.`,
    { field, code: "unknown_species" },
  );
}

/** "C6H12O6(aq)": a neutral molecule the user declares as a non-electrolyte. */
function nonElectrolyte(text: string, field: string): ResolvedSpecies | null {
  const trimmed = text.trim();
  if (!trimmed.endsWith("(aq)")) return null;
  const body = trimmed.slice(0, -4).trimEnd();
  if (!body) return null;
  const parsed = parseFormula(body);
  if (parsed.charge !== 0) return null;
  const salt = saltByKey(parsed.anhydrousKey);
  if (salt && salt.ions.length > 0) {
    throw new ChemInputError(`${salt.formula} is an electrolyte; enter it without "(aq)".`, {
      field,
      code: "bad_formula",
    });
  }
  return {
    formula: parsed.formula,
    saltFormula: parsed.anhydrousFormula,
    name: salt?.name,
    kind: "molecule",
    ions: [],
    molarMassGPerMol: compositionMolarMass(parsed.elements),
    anhydrousMolarMassGPerMol: compositionMolarMass(parsed.anhydrousElements),
    hydrateWater: parsed.hydrateWater,
    hazards: [...(salt?.hazards ?? [])],
    notes: [],
    warnings: [
      `${parsed.formula} is taken as a dissolved non-electrolyte (no ions, activity coefficient 1).`,
    ],
  };
}

function looksLikeName(text: string): boolean {
  return /^[a-z][a-z\s,()'-]*$/.test(text.trim()) && /[a-z]{3}/.test(text);
}

export function resolveSpecies(text: string, field = "formula"): ResolvedSpecies {
  const hit = cache.get(text);
  if (hit) return hit;
  let resolved: ResolvedSpecies;
  const alias = typeof text === "string" ? saltByAlias(text) : undefined;
  const same = typeof text === "string" ? SAME_SPECIES[text.trim()] : undefined;
  if (!alias && !same && typeof text === "string" && !ionByAlias(text) && looksLikeName(text)) {
    throw new ChemInputError(
      `"${text}" is not a name in the species catalogue; type its formula or its ions (for example "Na+").`,
      { field, code: "unknown_species" },
    );
  }
  try {
    resolved =
      nonElectrolyte(text, field) ??
      fromParsed(parseFormula(same ?? (alias ? alias.formula : text)), field);
  } catch (error) {
    if (error instanceof ChemInputError && error.field !== field) {
      throw new ChemInputError(error.message, { field, code: error.code });
    }
    throw error;
  }
  const hazards = [...resolved.hazards];
  for (const ion of resolved.ions) {
    for (const h of ionByKey(ion.key)?.hazards ?? []) if (!hazards.includes(h)) hazards.push(h);
  }
  resolved = { ...resolved, hazards };
  if (cache.size > 2000) cache.clear();
  cache.set(text, resolved);
  return resolved;
}
