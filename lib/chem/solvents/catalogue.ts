/**
 * Solvents for electrochemistry. Water is temperature-dependent (solvents/water.ts); the
 * non-aqueous solvents carry εr and density at 25 °C only.
 *
 * Non-aqueous values: Izutsu, Electrochemistry in Nonaqueous Solutions, 2nd ed. (2009),
 * Table 1.1 (εr and density at 25 °C), and Riddick, Bunger & Sakano, Organic Solvents,
 * 4th ed. (1986) for melting and boiling points. Values recalled (from memory), to about
 * the third significant figure.
 */
import { ChemInputError } from "../errors";
import { WATER_TEMPERATURE_RANGE_C, waterDensityGPerMl, waterRelativePermittivity } from "./water";

export interface SolventData {
  id: string;
  name: string;
  formula: string;
  /** Liquid range at 1 atm (melting to boiling point), °C. */
  liquidRangeC: { min: number; max: number };
  /** εr at 25 °C. */
  relativePermittivity25C: number;
  /** Density at 25 °C, g/mL. */
  densityGPerMl25C: number;
  /** True when εr and ρ follow the temperature (water only). */
  temperatureDependent: boolean;
  source: string;
  aliases: string[];
}

const IZUTSU =
  "Izutsu (2009) Electrochemistry in Nonaqueous Solutions, 2nd ed., Table 1.1 (from memory)";

// [id, name, formula, mp °C, bp °C, εr 25 °C, ρ 25 °C g/mL, aliases]
const NON_AQUEOUS: [string, string, string, number, number, number, number, string[]][] = [
  ["acetonitrile", "acetonitrile", "CH3CN", -43.8, 81.6, 35.94, 0.7766, ["MeCN", "ACN", "AN"]],
  ["dmso", "dimethyl sulfoxide", "(CH3)2SO", 18.5, 189, 46.45, 1.0955, ["DMSO"]],
  ["dmf", "N,N-dimethylformamide", "HCON(CH3)2", -60.4, 153, 36.71, 0.9439, ["DMF"]],
  ["propylene-carbonate", "propylene carbonate", "C4H6O3", -48.8, 242, 64.92, 1.1995, ["PC"]],
  ["methanol", "methanol", "CH3OH", -97.7, 64.7, 32.66, 0.7866, ["MeOH"]],
  ["ethanol", "ethanol", "C2H5OH", -114.1, 78.3, 24.55, 0.7849, ["EtOH"]],
  [
    "dichloromethane",
    "dichloromethane",
    "CH2Cl2",
    -96.7,
    39.6,
    8.93,
    1.3168,
    ["DCM", "methylene chloride"],
  ],
  ["acetone", "acetone", "(CH3)2CO", -94.7, 56.1, 20.56, 0.7845, ["propanone"]],
  ["thf", "tetrahydrofuran", "C4H8O", -108.4, 66, 7.58, 0.8833, ["THF"]],
  ["nitromethane", "nitromethane", "CH3NO2", -28.5, 101.2, 35.87, 1.1313, ["MeNO2"]],
  ["gamma-butyrolactone", "γ-butyrolactone", "C4H6O2", -43.5, 204, 39.0, 1.1254, ["GBL"]],
  ["dme", "1,2-dimethoxyethane", "CH3OCH2CH2OCH3", -69, 84.5, 7.2, 0.8637, ["DME", "glyme"]],
];

const WATER: SolventData = {
  id: "water",
  name: "water",
  formula: "H2O",
  liquidRangeC: { ...WATER_TEMPERATURE_RANGE_C },
  relativePermittivity25C: waterRelativePermittivity(25),
  densityGPerMl25C: waterDensityGPerMl(25),
  temperatureDependent: true,
  source:
    "εr: Malmberg & Maryott (1956) J. Res. NBS 56, 1–8; ρ: Kell (1975) J. Chem. Eng. Data 20, 97–105",
  aliases: ["H2O", "aqueous"],
};

const SOLVENTS: readonly SolventData[] = [
  WATER,
  ...NON_AQUEOUS.map(([id, name, formula, min, max, eps, rho, aliases]) => ({
    id,
    name,
    formula,
    liquidRangeC: { min, max },
    relativePermittivity25C: eps,
    densityGPerMl25C: rho,
    temperatureDependent: false,
    source: IZUTSU,
    aliases,
  })),
];

const BY_NAME = new Map<string, SolventData>();
for (const s of SOLVENTS)
  for (const n of [s.id, s.name, s.formula, ...s.aliases]) BY_NAME.set(n.toLowerCase(), s);

function findSolvent(idOrName: string): SolventData | undefined {
  return BY_NAME.get(String(idOrName).trim().toLowerCase());
}

export function getSolvent(idOrName: string): SolventData {
  const solvent = findSolvent(idOrName);
  if (!solvent) {
    throw new ChemInputError(
      `Unknown solvent "${idOrName}". Known solvents: ${SOLVENTS.map((s) => s.name).join(", ")}.`,
      { field: "solvent", code: "unknown_solvent" },
    );
  }
  return solvent;
}

export function listSolvents(): {
  id: string;
  name: string;
  formula: string;
  relativePermittivity25C: number;
  densityGPerMl25C: number;
  liquidRangeC: { min: number; max: number };
  source: string;
}[] {
  return SOLVENTS.map(
    ({ id, name, formula, relativePermittivity25C, densityGPerMl25C, liquidRangeC, source }) => ({
      id,
      name,
      formula,
      relativePermittivity25C,
      densityGPerMl25C,
      liquidRangeC: { ...liquidRangeC },
      source,
    }),
  );
}
