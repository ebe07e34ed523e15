/**
 * What the solution's temperature fixes before any speciation: pKa of every step, pKw, the
 * Debye–Hückel A (part 1, from εr and ρ of water) and the density of water used to turn
 * molarity into molality.
 */
import { debyeHuckelConstants } from "../debye-huckel-constants";
import { ChemInputError } from "../errors";
import { waterDensityGPerMl } from "../solvents/water";
import { type ActivityConvention, CONVENTION_LIMIT_I, log10GammaFactory } from "./activity";
import {
  type AcidSystemData,
  type BufferSystemId,
  WATER_IONIZATION,
} from "./data/pka-goldberg-2002";
import { pKaAt } from "./thermo";

/** ΔrH°/ΔrCp° extrapolation is trusted over 0–60 °C (common practice for buffers, no source). */
const PKA_TEMPERATURE_RANGE_C = [0, 60] as const;

export interface Conditions {
  temperatureC: number;
  convention: ActivityConvention;
  pKw: number;
  aLog10: number;
  waterDensityGPerMl: number;
  pKaOf(system: AcidSystemData): number[];
  gammaAt(ionicStrengthMolal: number): (charge: number) => number;
  warnings: string[];
}

const CONVENTIONS: readonly ActivityConvention[] = ["davies", "bates-guggenheim", "ideal"];

export function conditionsAt(
  temperatureC: number | undefined,
  convention: ActivityConvention | undefined,
): Conditions {
  const t = temperatureC ?? 25;
  if (!Number.isFinite(t) || t < 0 || t > 100) {
    throw new ChemInputError("Temperature must be between 0 and 100 °C for aqueous buffers.", {
      field: "temperatureC",
      code: "out_of_range",
    });
  }
  const conv = convention ?? "davies";
  if (!CONVENTIONS.includes(conv)) {
    throw new ChemInputError(
      `Unknown activity convention "${conv}"; use davies, bates-guggenheim or ideal.`,
      {
        field: "activityConvention",
        code: "invalid_option",
      },
    );
  }
  const warnings: string[] = [];
  if (t < PKA_TEMPERATURE_RANGE_C[0] || t > PKA_TEMPERATURE_RANGE_C[1]) {
    warnings.push(
      `pKa values are extrapolated from 25 °C with ΔrH° and ΔrCp°; at ${t} °C expect a few hundredths of a pH unit of error.`,
    );
  }
  const aLog10 = debyeHuckelConstants(t, "water").aLog10;
  const cache = new Map<BufferSystemId, number[]>();
  return {
    temperatureC: t,
    convention: conv,
    pKw: pKaAt(WATER_IONIZATION, t),
    aLog10,
    waterDensityGPerMl: waterDensityGPerMl(t),
    pKaOf(system) {
      let v = cache.get(system.id);
      if (!v) cache.set(system.id, (v = system.steps.map((s) => pKaAt(s, t))));
      return v;
    },
    gammaAt: (I) => log10GammaFactory(conv, aLog10, I),
    warnings,
  };
}

export function ionicStrengthWarning(
  conditions: Conditions,
  ionicStrengthMolal: number,
): string | null {
  const limit = CONVENTION_LIMIT_I[conditions.convention];
  if (ionicStrengthMolal <= limit) return null;
  return `I = ${Number(ionicStrengthMolal.toPrecision(3))} mol/kg is beyond the range of the ${conditions.convention} activity convention (I ≤ ${limit} mol/kg): the pH is less certain.`;
}
