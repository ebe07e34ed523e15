/**
 * Nernst equation with activities:
 *   E = E° − (RT ln10 / nF) log10( Π a_red^ν / Π a_ox^ν )
 * R, F: CODATA 2018. Activities are dimensionless (molal activity m γ / 1 mol kg⁻¹; gases:
 * partial pressure / 1 bar). H⁺ may come from `pH` (a_H = 10^−pH); OH⁻ from pH at 25 °C.
 */
import { FARADAY_C_PER_MOL, GAS_CONSTANT_J_PER_MOL_K, LN10, kelvin } from "../constants";
import { ChemInputError } from "../errors";
import { parseFormula } from "../formula";
import { AGCL_STANDARD_POTENTIAL_BY_TEMPERATURE, COUPLES, type CoupleData } from "./couples-data";
import { interpolate } from "../interpolate";

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
  if (couple.id === "AgCl/Ag" && temperatureC >= 0 && temperatureC <= 60) {
    return interpolate(AGCL_STANDARD_POTENTIAL_BY_TEMPERATURE, temperatureC);
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
      if (!Number.isFinite(input.pH))
        throw new ChemInputError("pH must be a number.", { field: "pH", code: "bad_ph" });
      if (species === "H+") return 10 ** -input.pH;
      if (Math.abs(temperatureC - 25) > 0.01)
        notes.push("a(OH⁻) from pH uses pKw = 14.00 (25 °C).");
      return 10 ** (input.pH - 14);
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
