/**
 * Nernst equation with activities:
 *   E = E° − (RT ln10 / nF) log10( Π a_red^ν / Π a_ox^ν )
 * R, F: CODATA 2018. Activities are dimensionless (molal activity m γ / 1 mol kg⁻¹; gases:
 * partial pressure / 1 bar). H⁺ may come from `pH` (a_H = 10^−pH); OH⁻ from pH with Kw at the
 * temperature (a_OH = Kw(T) / a_H; water-ionization.ts). E° of H2O/H2,OH⁻ follows from that of
 * H⁺/H2 (0 by convention at every T) and Kw: E° = −(RT ln10/2F)·2·pKw(T).
 */
import { FARADAY_C_PER_MOL, GAS_CONSTANT_J_PER_MOL_K, LN10, kelvin } from "../constants";
import { ChemInputError } from "../errors";
import { parseFormula } from "../formula";
import { AGCL_BATES_BOWER_1954, COUPLES, type CoupleData } from "./couples-data";
import { pKwAt, WATER_IONIZATION_SOURCE } from "./water-ionization";

export interface NernstInput {
  couple: string;
  activities?: Record<string, number>;
  temperatureC?: number;
  pH?: number;
}

export interface NernstResult {
  potentialV: number;
  standardPotentialV: number;
  slopeVPerDecade: number;
  n: number;
  log10Q: number;
  reaction: string;
  formalPotentials: { medium: string; potentialV: number }[];
  notes: string[];
}

/** RT ln10 / nF in volts per decade. */
export function nernstSlopeV(temperatureC: number, n = 1): number {
  if (!(temperatureC > -273.15 && temperatureC <= 1000))
    throw new ChemInputError(
      "The temperature must be a number above absolute zero and at most 1000 °C.",
      {
        field: "temperatureC",
        code: "bad_temperature",
      },
    );
  if (!(Number.isInteger(n) && n > 0 && n <= 20))
    throw new ChemInputError("The number of electrons n must be a whole number from 1 to 20.", {
      field: "n",
      code: "bad_electrons",
    });
  return (GAS_CONSTANT_J_PER_MOL_K * kelvin(temperatureC) * LN10) / (n * FARADAY_C_PER_MOL);
}

const BY_ID = new Map(COUPLES.map((couple) => [couple.id.toLowerCase(), couple]));

function findCouple(id: string): CoupleData {
  const couple = BY_ID.get(
    String(id ?? "")
      .trim()
      .toLowerCase(),
  );
  if (!couple) {
    throw new ChemInputError(
      `Unknown couple "${id}". Known couples include ${COUPLES.slice(0, 6)
        .map((c) => c.id)
        .join(", ")} …`,
      { field: "couple", code: "unknown_couple" },
    );
  }
  return couple;
}

export function listCouples(): {
  id: string;
  reaction: string;
  n: number;
  standardPotentialV: number;
  formalPotentials: { medium: string; potentialV: number }[];
}[] {
  return COUPLES.map((c) => ({
    id: c.id,
    reaction: c.reaction,
    n: c.n,
    standardPotentialV: c.standardPotentialV,
    formalPotentials: [...(c.formalPotentials ?? [])],
  }));
}

function standardPotential(couple: CoupleData, temperatureC: number, notes: string[]): number {
  if (couple.id === "AgCl/Ag") {
    const { coefficients: a, rangeC } = AGCL_BATES_BOWER_1954;
    const t = temperatureC;
    if (t < rangeC.min || t > rangeC.max)
      notes.push(
        `E° of AgCl/Ag: the Bates & Bower (1954) equation is stated for ${rangeC.min}–${rangeC.max} °C; ${t} °C is an extrapolation.`,
      );
    return a[0] + t * (a[1] + t * (a[2] + t * a[3]));
  }
  if (couple.id === "H2O/H2,OH-") {
    // E°(T) = E°(25 °C) − [slope(T)·pKw(T) − slope(25 °C)·pKw(25 °C)]: the tabulated value at
    // 25 °C, moved with Kw(T) (E° of H⁺/H2 is 0 at every temperature by convention).
    if (Math.abs(temperatureC - 25) > 0.01)
      notes.push(
        `E° of H2O/H2,OH⁻ moved from 25 °C with pKw = ${pKwAt(temperatureC).toFixed(3)} at ${temperatureC} °C (${WATER_IONIZATION_SOURCE}).`,
      );
    return (
      couple.standardPotentialV -
      (nernstSlopeV(temperatureC, 1) * pKwAt(temperatureC) - nernstSlopeV(25, 1) * pKwAt(25))
    );
  }
  if (Math.abs(temperatureC - 25) > 0.01)
    notes.push(
      `E° of ${couple.id} is known here at 25 °C only; only the Nernst slope follows the temperature.`,
    );
  return couple.standardPotentialV;
}

function activityLookup(
  input: NernstInput,
  temperatureC: number,
  notes: string[],
): (species: string) => number {
  const byKey = new Map<string, number>();
  for (const [formula, value] of Object.entries(input.activities ?? {})) {
    let key: string;
    try {
      key = parseFormula(formula).anhydrousKey;
    } catch {
      throw new ChemInputError(`"${formula}" in the activities is not a formula.`, {
        field: `activities.${formula}`,
        code: "bad_formula",
      });
    }
    if (typeof value !== "number" || !Number.isFinite(value) || value <= 0) {
      throw new ChemInputError(
        `The activity of ${formula} must be a positive number (got ${String(value)}).`,
        { field: `activities.${formula}`, code: "bad_activity" },
      );
    }
    byKey.set(key, value);
  }
  return (species) => {
    const parsed = parseFormula(species);
    const given = byKey.get(parsed.anhydrousKey);
    if (given !== undefined) return given;
    if (input.pH !== undefined && (species === "H+" || species === "OH-")) {
      if (!(input.pH >= -2 && input.pH <= 16))
        throw new ChemInputError("pH must be a number from −2 to 16.", {
          field: "pH",
          code: "bad_ph",
        });
      if (species === "H+") return 10 ** -input.pH;
      const pKw = pKwAt(temperatureC);
      notes.push(
        `a(OH⁻) from pH with pKw = ${pKw.toFixed(3)} at ${temperatureC} °C (${WATER_IONIZATION_SOURCE}${temperatureC < 0 || temperatureC > 100 ? ", extrapolated beyond 0–100 °C" : ""}).`,
      );
      return 10 ** (input.pH - pKw);
    }
    if (parsed.charge === 0 && /^(H2|O2|Cl2)$/.test(parsed.anhydrousFormula)) {
      notes.push(`${parsed.anhydrousFormula} taken at 1 bar.`);
      return 1;
    }
    throw new ChemInputError(
      `The Nernst equation for this couple needs the activity of ${species}.`,
      { field: `activities.${species}`, code: "missing_activity" },
    );
  };
}

export function nernstPotentialDetailed(input: NernstInput): NernstResult {
  const couple = findCouple(input.couple);
  const temperatureC = input.temperatureC ?? 25;
  if (!Number.isFinite(temperatureC) || temperatureC < -40 || temperatureC > 300) {
    throw new ChemInputError(
      `Temperature ${temperatureC} °C is outside the range this calculation accepts (−40 to 300 °C).`,
      { field: "temperatureC", code: "temperature_out_of_range" },
    );
  }
  const notes: string[] = couple.note ? [couple.note] : [];
  const activity = activityLookup(input, temperatureC, notes);
  let log10Q = 0;
  for (const [species, nu] of Object.entries(couple.reduced))
    log10Q += nu * Math.log10(activity(species));
  for (const [species, nu] of Object.entries(couple.oxidized))
    log10Q -= nu * Math.log10(activity(species));
  const standardPotentialV = standardPotential(couple, temperatureC, notes);
  const slopeVPerDecade = nernstSlopeV(temperatureC, couple.n);
  return {
    potentialV: standardPotentialV - slopeVPerDecade * log10Q,
    standardPotentialV,
    slopeVPerDecade,
    n: couple.n,
    log10Q,
    reaction: couple.reaction,
    formalPotentials: [...(couple.formalPotentials ?? [])],
    notes,
  };
}

/** Equilibrium potential in V vs SHE. */
export function nernstPotential(input: NernstInput): number {
  return nernstPotentialDetailed(input).potentialV;
}
