/**
 * Units of amount, read with mathjs so that any SI-prefixed spelling works (mmol/kg,
 * µmol/L, mg, mL, g/L …). Each unit is classified once by its dimension and cached.
 */
import { create, unitDependencies } from "mathjs";
import { ChemInputError } from "../errors";

const math = create({ unitDependencies });

type UnitKind = "molal" | "molar" | "mass" | "volume" | "mass-concentration" | "mass-fraction";

export interface UnitInfo {
  kind: UnitKind;
  /** Multiply an amount by this to get mol/kg, mol/L, g, L, g/L or a fraction (0–1). */
  factor: number;
  /** The unit as written by the user. */
  text: string;
}

const BASES: [UnitKind, string][] = [
  ["molal", "mol/kg"],
  ["molar", "mol/L"],
  ["mass", "g"],
  ["volume", "L"],
  ["mass-concentration", "g/L"],
];

const ALIASES: Record<string, string> = {
  M: "mol/L",
  mM: "mmol/L",
  uM: "umol/L",
  nM: "nmol/L",
  m: "mol/kg",
  mm: "mmol/kg",
  molal: "mol/kg",
  molar: "mol/L",
};

const FRACTIONS: Record<string, number> = {
  "mass fraction": 1,
  "w/w": 1,
  fraction: 1,
  "%": 0.01,
  "wt%": 0.01,
  "wt %": 0.01,
  "% w/w": 0.01,
  "%w/w": 0.01,
  "mass %": 0.01,
  "mass%": 0.01,
  "g/g": 1,
  "kg/kg": 1,
  "g/100g": 0.01,
  ppm: 1e-6,
};

const cache = new Map<string, UnitInfo | null>();
/** Longest unit text parsed ("mmol per kg of water" is 20); longer is refused. */
const MAX_UNIT_LENGTH = 40;

function normalize(text: string): string {
  let u = text
    .trim()
    .replace(/[µμ]/g, "u")
    .replace(/⁻¹/g, "-1")
    .replace(/⁻³/g, "-3")
    .replace(/³/g, "3")
    .replace(/\s*\/\s*/g, "/");
  // "mol kg-1", "mmol L-1", "mol dm-3": exponent notation of the same units
  u = u
    .replace(/^(\w*mol)\s*(kg|g|L|l)\s*\^?-1$/, "$1/$2")
    .replace(/^(\w*mol)\s*(dm|cm)\s*\^?-3$/, "$1/$2^3");
  u = u.replace(/(dm|cm|m)3\b/g, "$1^3").replace(/\bl\b/g, "L");
  return ALIASES[u] ?? u;
}

function classify(text: string): UnitInfo | null {
  const fraction = FRACTIONS[text.trim().toLowerCase()];
  if (fraction !== undefined) return { kind: "mass-fraction", factor: fraction, text };
  let unit;
  try {
    unit = math.unit(1, normalize(text));
  } catch {
    return null;
  }
  for (const [kind, base] of BASES) {
    const reference = math.unit(1, base);
    if (unit.equalBase(reference)) return { kind, factor: unit.toNumber(base), text };
  }
  return null;
}

export function readUnit(text: unknown, field: string): UnitInfo {
  if (typeof text !== "string" || text.trim() === "") {
    throw new ChemInputError("The unit is missing.", { field, code: "missing_unit" });
  }
  let info = cache.get(text);
  if (info === undefined) {
    // No unit is longer than a few characters; a long text is not parsed (and not cached).
    info = text.length > MAX_UNIT_LENGTH ? null : classify(text);
    if (text.length <= MAX_UNIT_LENGTH) {
      if (cache.size > 500) cache.clear();
      cache.set(text, info);
    }
  }
  if (!info) {
    throw new ChemInputError(
      `"${text}" is not a unit of amount Ionleaf understands. Use mol/kg, mmol/kg, mol/L (M), mmol/L (mM), µmol/L (µM), a mass (g, mg) with a mass of solvent or a final volume, g/L, or a mass fraction (wt%).`,
      { field, code: "bad_unit" },
    );
  }
  return info;
}
