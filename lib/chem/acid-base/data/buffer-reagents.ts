/**
 * The forms a buffer is weighed from: what one formula unit puts into solution. `level` is the
 * number of protons removed from the system's fully protonated species (phosphate: H3PO4 = 0,
 * NaH2PO4 = 1, Na2HPO4 = 2). Hydrate water is part of the formula (molar masses from part 1's
 * parser, IUPAC 2021 atomic weights). Stoichiometry is common practice, no source.
 */
import type { BufferSystemId } from "./pka-goldberg-2002";

interface ReagentContribution {
  system: BufferSystemId;
  level: number;
  /** Buffer units per formula unit (borax gives 4 boron: 2 B(OH)3 + 2 B(OH)4−). */
  count: number;
}

interface CounterIon {
  formula: string;
  charge: number;
  count: number;
}

export interface BufferReagent {
  formula: string;
  name: string;
  contributes: readonly ReagentContribution[];
  counterIons: readonly CounterIon[];
  /** Extra hazard notes beyond the general caution (GHS classification, common knowledge). */
  hazard?: string;
}

const na = (count: number): CounterIon => ({ formula: "Na+", charge: 1, count });
const k = (count: number): CounterIon => ({ formula: "K+", charge: 1, count });
const cl: CounterIon = { formula: "Cl-", charge: -1, count: 1 };
const one = (system: BufferSystemId, level: number, count = 1): ReagentContribution[] => [
  { system, level, count },
];

export const BUFFER_REAGENTS: readonly BufferReagent[] = [
  {
    formula: "H3PO4",
    name: "phosphoric acid (as 100 %)",
    contributes: one("phosphate", 0),
    counterIons: [],
    hazard: "Phosphoric acid is corrosive (concentrated, 85 %): gloves and goggles.",
  },
  {
    formula: "NaH2PO4",
    name: "sodium dihydrogen phosphate, anhydrous",
    contributes: one("phosphate", 1),
    counterIons: [na(1)],
  },
  {
    formula: "NaH2PO4·H2O",
    name: "sodium dihydrogen phosphate monohydrate",
    contributes: one("phosphate", 1),
    counterIons: [na(1)],
  },
  {
    formula: "NaH2PO4·2H2O",
    name: "sodium dihydrogen phosphate dihydrate",
    contributes: one("phosphate", 1),
    counterIons: [na(1)],
  },
  {
    formula: "Na2HPO4",
    name: "disodium hydrogen phosphate, anhydrous",
    contributes: one("phosphate", 2),
    counterIons: [na(2)],
  },
  {
    formula: "Na2HPO4·2H2O",
    name: "disodium hydrogen phosphate dihydrate",
    contributes: one("phosphate", 2),
    counterIons: [na(2)],
  },
  {
    formula: "Na2HPO4·7H2O",
    name: "disodium hydrogen phosphate heptahydrate",
    contributes: one("phosphate", 2),
    counterIons: [na(2)],
  },
  {
    formula: "Na2HPO4·12H2O",
    name: "disodium hydrogen phosphate dodecahydrate",
    contributes: one("phosphate", 2),
    counterIons: [na(2)],
  },
  {
    formula: "Na3PO4·12H2O",
    name: "trisodium phosphate dodecahydrate",
    contributes: one("phosphate", 3),
    counterIons: [na(3)],
    hazard: "Trisodium phosphate solutions are strongly alkaline (pH > 12): eye protection.",
  },
  {
    formula: "KH2PO4",
    name: "potassium dihydrogen phosphate",
    contributes: one("phosphate", 1),
    counterIons: [k(1)],
  },
  {
    formula: "K2HPO4",
    name: "dipotassium hydrogen phosphate, anhydrous",
    contributes: one("phosphate", 2),
    counterIons: [k(2)],
  },
  {
    formula: "K2HPO4·3H2O",
    name: "dipotassium hydrogen phosphate trihydrate",
    contributes: one("phosphate", 2),
    counterIons: [k(2)],
  },
  {
    formula: "CH3COOH",
    name: "acetic acid, glacial",
    contributes: one("acetate", 0),
    counterIons: [],
    hazard:
      "Glacial acetic acid is corrosive and flammable (flash point 39 °C): fume hood, gloves, goggles.",
  },
  {
    formula: "CH3COONa",
    name: "sodium acetate, anhydrous",
    contributes: one("acetate", 1),
    counterIons: [na(1)],
  },
  {
    formula: "CH3COONa·3H2O",
    name: "sodium acetate trihydrate",
    contributes: one("acetate", 1),
    counterIons: [na(1)],
  },
  {
    formula: "CH3COOK",
    name: "potassium acetate",
    contributes: one("acetate", 1),
    counterIons: [k(1)],
  },
  {
    formula: "C6H8O7",
    name: "citric acid, anhydrous",
    contributes: one("citrate", 0),
    counterIons: [],
    hazard: "Citric acid causes serious eye irritation.",
  },
  {
    formula: "C6H8O7·H2O",
    name: "citric acid monohydrate",
    contributes: one("citrate", 0),
    counterIons: [],
    hazard: "Citric acid causes serious eye irritation.",
  },
  {
    formula: "NaH2C6H5O7",
    name: "sodium dihydrogen citrate",
    contributes: one("citrate", 1),
    counterIons: [na(1)],
  },
  {
    formula: "Na3C6H5O7·2H2O",
    name: "trisodium citrate dihydrate",
    contributes: one("citrate", 3),
    counterIons: [na(3)],
  },
  {
    formula: "NaHCO3",
    name: "sodium hydrogen carbonate",
    contributes: one("carbonate", 1),
    counterIons: [na(1)],
  },
  {
    formula: "Na2CO3",
    name: "sodium carbonate, anhydrous",
    contributes: one("carbonate", 2),
    counterIons: [na(2)],
    hazard: "Sodium carbonate causes serious eye irritation.",
  },
  {
    formula: "Na2CO3·10H2O",
    name: "sodium carbonate decahydrate",
    contributes: one("carbonate", 2),
    counterIons: [na(2)],
    hazard: "Sodium carbonate causes serious eye irritation.",
  },
  {
    formula: "KHCO3",
    name: "potassium hydrogen carbonate",
    contributes: one("carbonate", 1),
    counterIons: [k(1)],
  },
  {
    formula: "K2CO3",
    name: "potassium carbonate",
    contributes: one("carbonate", 2),
    counterIons: [k(2)],
    hazard: "Potassium carbonate causes serious eye irritation.",
  },
  {
    formula: "H3BO3",
    name: "boric acid",
    contributes: one("borate", 0),
    counterIons: [],
    hazard: "Boric acid is classified as toxic to reproduction (EU CLP Repr. 1B).",
  },
  {
    formula: "Na2B4O7·10H2O",
    name: "sodium tetraborate decahydrate (borax)",
    contributes: [
      { system: "borate", level: 0, count: 2 },
      { system: "borate", level: 1, count: 2 },
    ],
    counterIons: [na(2)],
    hazard: "Borax is classified as toxic to reproduction (EU CLP Repr. 1B).",
  },
  {
    formula: "C4H11NO3·HCl",
    name: "Tris hydrochloride",
    contributes: one("tris", 0),
    counterIons: [cl],
  },
  {
    formula: "C4H11NO3",
    name: "Tris base",
    contributes: one("tris", 1),
    counterIons: [],
    hazard: "Tris base irritates skin and eyes.",
  },
  { formula: "C8H18N2O4S", name: "HEPES free acid", contributes: one("hepes", 0), counterIons: [] },
  {
    formula: "C8H17N2NaO4S",
    name: "HEPES sodium salt",
    contributes: one("hepes", 1),
    counterIons: [na(1)],
  },
  {
    formula: "C6H13NO4S·H2O",
    name: "MES monohydrate (free acid)",
    contributes: one("mes", 0),
    counterIons: [],
  },
  {
    formula: "C6H12NNaO4S",
    name: "MES sodium salt",
    contributes: one("mes", 1),
    counterIons: [na(1)],
  },
  { formula: "C7H15NO4S", name: "MOPS free acid", contributes: one("mops", 0), counterIons: [] },
  {
    formula: "C7H14NNaO4S",
    name: "MOPS sodium salt",
    contributes: one("mops", 1),
    counterIons: [na(1)],
  },
];

/** Strong acids and bases used as stock solutions, and inert salts for ionic strength. */
export interface StrongElectrolyte {
  formula: string;
  name: string;
  ions: readonly CounterIon[];
  role: "acid" | "base" | "salt";
  hazard?: string;
}

export const STRONG_ELECTROLYTES: readonly StrongElectrolyte[] = [
  {
    formula: "HCl",
    name: "hydrochloric acid",
    ions: [{ formula: "H+", charge: 1, count: 1 }, cl],
    role: "acid",
    hazard:
      "Hydrochloric acid is corrosive to skin, eyes and airways; concentrated HCl (above about 6 mol/L) fumes: dispense it in a fume hood with gloves and goggles, and add acid to water, never water to acid.",
  },
  {
    formula: "NaOH",
    name: "sodium hydroxide",
    ions: [na(1), { formula: "OH-", charge: -1, count: 1 }],
    role: "base",
    hazard:
      "Sodium hydroxide is corrosive and especially dangerous to the eyes; dissolving the solid releases much heat: goggles and gloves.",
  },
  {
    formula: "KOH",
    name: "potassium hydroxide",
    ions: [k(1), { formula: "OH-", charge: -1, count: 1 }],
    role: "base",
    hazard:
      "Potassium hydroxide is corrosive and especially dangerous to the eyes; dissolving the solid releases much heat: goggles and gloves.",
  },
  { formula: "NaCl", name: "sodium chloride", ions: [na(1), cl], role: "salt" },
  { formula: "KCl", name: "potassium chloride", ions: [k(1), cl], role: "salt" },
];
