/**
 * Limiting ionic conductivity λ° of an ion in water, at 25 °C from the CRC table
 * (ionic-conductivity-data.ts). At other temperatures every ion is scaled like KCl: by the
 * ratio κ(t)/κ(25 °C) of the NIST 0.01 mol/kg KCl standard, 0–50 °C, and beyond 50 °C by
 * Walden's rule λ°η = constant (Robinson & Stokes, Electrolyte Solutions, 2nd ed. 1959,
 * ch. 6) with the viscosity of water. Walden's rule alone was 3–4 % off at ±10 K for KCl;
 * the KCl law reads K⁺ and Na⁺ within 2 % of Lange's Handbook Table 8.32 at 18 °C
 * (tests/unit/chem/ionic-conductivity.test.ts). H⁺ and OH⁻ (proton hopping) follow another
 * law: the result says so away from 25 °C.
 *
 * Diffusion coefficient of the ion at infinite dilution (Nernst–Einstein):
 *   D = RT λ° / (|z| F²)   with λ° per unit charge (CRC table's header equation).
 */
import { FARADAY_C_PER_MOL, GAS_CONSTANT_J_PER_MOL_K, kelvin } from "../constants";
import { ChemInputError } from "../errors";
import { parseFormula } from "../formula";
import { assertLiquidWaterTemperature, waterViscosityMPaS } from "../solvents/water-viscosity";
import { interpolate } from "../interpolate";
import {
  IONIC_CONDUCTIVITY_SOURCE,
  KCL_0_01_MOLAL_CONDUCTIVITY_US_PER_CM,
  LIMITING_IONIC_CONDUCTIVITY_25C,
} from "./ionic-conductivity-data";

/** λ°(t)/λ°(25 °C), the same for every ion: the KCl standard's ratio, Walden's rule beyond 50 °C. */
export function conductivityTemperatureRatio(temperatureC: number): number {
  const at25 = interpolate(KCL_0_01_MOLAL_CONDUCTIVITY_US_PER_CM, 25);
  if (temperatureC <= 50)
    return interpolate(KCL_0_01_MOLAL_CONDUCTIVITY_US_PER_CM, temperatureC) / at25;
  const at50 = interpolate(KCL_0_01_MOLAL_CONDUCTIVITY_US_PER_CM, 50) / at25;
  return (at50 * waterViscosityMPaS(50)) / waterViscosityMPaS(temperatureC);
}

export interface LimitingConductivity {
  ion: string;
  charge: number;
  /** λ° per unit charge, S cm² mol⁻¹ (the handbook's unit). */
  lambdaSCm2PerMolPerCharge: number;
  /** Infinite-dilution diffusion coefficient from Nernst–Einstein, cm²/s. */
  diffusionCoefficientCm2PerS: number;
  source: string;
  notes: string[];
}

const BY_KEY = new Map(
  LIMITING_IONIC_CONDUCTIVITY_25C.map((r) => [parseFormula(r.ion).anhydrousKey, r] as const),
);

export function ionCharge(
  formula: string,
  field = "ion",
): { key: string; charge: number; formula: string } {
  let parsed;
  try {
    parsed = parseFormula(formula);
  } catch {
    throw new ChemInputError(`"${formula}" is not a formula.`, { field, code: "bad_formula" });
  }
  if (parsed.charge === 0)
    throw new ChemInputError(`${formula} has no charge: only ions conduct.`, {
      field,
      code: "not_an_ion",
    });
  return { key: parsed.anhydrousKey, charge: parsed.charge, formula: parsed.formula };
}

export function limitingIonicConductivity(ion: string, temperatureC = 25): LimitingConductivity {
  assertLiquidWaterTemperature(temperatureC);
  const { key, charge, formula } = ionCharge(ion);
  const row = BY_KEY.get(key);
  if (!row)
    throw new ChemInputError(
      `No limiting ionic conductivity for ${formula} in the CRC table used here.`,
      {
        field: "ion",
        code: "unknown_ion_conductivity",
      },
    );
  const notes: string[] = [];
  if (row.recalled)
    notes.push(
      `λ° of ${formula} is recalled from the handbook's organic-ion part, not confirmed in a public copy.`,
    );
  let lambda = row.lambdaSCm2PerMolPerCharge;
  if (Math.abs(temperatureC - 25) > 1e-9) {
    lambda *= conductivityTemperatureRatio(temperatureC);
    notes.push(
      temperatureC <= 50
        ? `λ° at ${temperatureC} °C scaled like KCl (NIST standard, 0–50 °C): about 2 % uncertain for most ions.`
        : `λ° at ${temperatureC} °C from Walden's rule above 50 °C: several per cent uncertain.`,
    );
    if (key === "H+" || key === "OH-" || formula === "H+" || formula === "OH-")
      notes.push(
        `${formula} conducts by proton hopping, which follows another temperature law: λ° away from 25 °C may be off by 10 % or more.`,
      );
  }
  const lambdaSI = lambda * 1e-4; // S m² mol⁻¹
  const d =
    (GAS_CONSTANT_J_PER_MOL_K * kelvin(temperatureC) * lambdaSI) /
    (Math.abs(charge) * FARADAY_C_PER_MOL ** 2);
  return {
    ion: formula,
    charge,
    lambdaSCm2PerMolPerCharge: lambda,
    diffusionCoefficientCm2PerS: d * 1e4,
    source: IONIC_CONDUCTIVITY_SOURCE,
    notes,
  };
}

export function listIonicConductivities(): { ion: string; lambdaSCm2PerMolPerCharge: number }[] {
  return LIMITING_IONIC_CONDUCTIVITY_25C.map((r) => ({
    ion: r.ion,
    lambdaSCm2PerMolPerCharge: r.lambdaSCm2PerMolPerCharge,
  }));
}
