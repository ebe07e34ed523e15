/** The built-in species catalogue: salts, acids and bases (salts.ts) plus ions (ions.ts). */
import { addComposition, compositionKey, type Composition } from "../formula/composition";
import { parseFormulaWith } from "../formula/parse";
import { parseDissociation, type IonCount } from "./dissociation";
import { allIons, isKnownIonKey } from "./ion-index";
import { COMPOUND_HAZARDS, SALTS, type SaltData, type SpeciesKind } from "./salts";

export interface CatalogueSalt extends SaltData {
  kind: SpeciesKind;
  ions: IonCount[];
  key: string;
  hazards: string[];
}

function kindOf(salt: SaltData, ions: IonCount[]): SpeciesKind {
  if (salt.weak)
    return salt.name.endsWith("acid") ? "acid" : salt.formula === "NH3" ? "base" : "molecule";
  if (ions.some((i) => i.formula === "H+")) return "acid";
  if (ions.some((i) => i.formula === "OH-")) return "base";
  return "salt";
}

const BY_KEY = new Map<string, CatalogueSalt>();
const BY_ALIAS = new Map<string, CatalogueSalt>();
export const CATALOGUE_SALTS: CatalogueSalt[] = [];

for (const salt of SALTS) {
  const parsed = parseFormulaWith(salt.formula, { isKnownIonKey });
  const ions = parseDissociation(salt.dissociation);
  const entry: CatalogueSalt = {
    ...salt,
    ions,
    key: parsed.anhydrousKey,
    kind: kindOf(salt, ions),
    hazards: COMPOUND_HAZARDS[salt.formula] ? [COMPOUND_HAZARDS[salt.formula]] : [],
  };
  CATALOGUE_SALTS.push(entry);
  BY_KEY.set(entry.key, entry);
  for (const alias of [salt.name, ...(salt.aliases ?? [])])
    BY_ALIAS.set(alias.toLowerCase(), entry);
}

export function saltByKey(key: string): CatalogueSalt | undefined {
  return BY_KEY.get(key);
}

export function saltByAlias(text: string): CatalogueSalt | undefined {
  return BY_ALIAS.get(text.trim().toLowerCase());
}

/** Sum of the ions' compositions and charges: equals the salt's for a consistent entry. */
export function dissociationBalance(ions: IonCount[]): { key: string; charge: number } {
  const total: Composition = {};
  let charge = 0;
  for (const ion of ions) {
    addComposition(total, parseFormulaWith(ion.formula, { isKnownIonKey }).elements, ion.count);
    charge += ion.charge * ion.count;
  }
  return { key: compositionKey(total, 0), charge };
}

interface SpeciesSummary {
  formula: string;
  name: string;
  kind: SpeciesKind;
  aliases: string[];
}

const SUMMARIES: SpeciesSummary[] = [
  ...CATALOGUE_SALTS.map((s) => ({
    formula: s.formula,
    name: s.name,
    kind: s.kind,
    aliases: s.aliases ?? [],
  })),
  ...allIons().map((i) => ({
    formula: parseFormulaWith(i.formula).formula,
    name: i.name,
    kind: "ion" as const,
    aliases: i.aliases ?? [],
  })),
];

/**
 * Type-ahead search over formulas, names and aliases. Exact and prefix matches of the
 * formula rank first, then prefix matches of the name or an alias, then substrings.
 */
export function searchSpecies(
  query: string,
  limit = 20,
): { formula: string; name: string; kind: SpeciesKind }[] {
  const q = String(query ?? "")
    .trim()
    .toLowerCase();
  if (!q) return [];
  const scored: [number, number, SpeciesSummary][] = [];
  SUMMARIES.forEach((s, index) => {
    const f = s.formula.toLowerCase();
    const words = [s.name.toLowerCase(), ...s.aliases.map((a) => a.toLowerCase())];
    let score = -1;
    if (f === q || words.includes(q)) score = 0;
    else if (f.startsWith(q)) score = 1;
    else if (
      words.some((w) => w.startsWith(q) || w.split(/[\s(),-]+/).some((part) => part.startsWith(q)))
    )
      score = 2;
    else if (f.includes(q) || words.some((w) => w.includes(q))) score = 3;
    if (score >= 0) scored.push([score, index, s]);
  });
  scored.sort((a, b) => a[0] - b[0] || a[2].formula.length - b[2].formula.length || a[1] - b[1]);
  return scored
    .slice(0, limit)
    .map(([, , s]) => ({ formula: s.formula, name: s.name, kind: s.kind }));
}
