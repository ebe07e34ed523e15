/**
 * The binary parameters of one cation–anion pair at a temperature, and the temperature range
 * they are stated for. In order of preference:
 *   1. a full published temperature function (data/temperature-functions.ts), within its range
 *      (rows marked `limitAwayFrom25` keep the 25 °C row's molality range at 25 ± 0.5 °C and
 *      limit the temperature terms to their own fit elsewhere, as derivatives are, with a message);
 *   2. the 25 °C set moved by first-order derivatives, P(T) = P(25 °C) + (∂P/∂T)(T − 298.15 K)
 *      (data/temperature-derivatives.ts), stated for 25 ± 15 °C: measured against Pitzer, Peiper
 *      & Busey (1984) NaCl, γ± stays within 2 % at 10–40 °C and errs by 5–20 % at 0 and 50–100 °C;
 *   3. the 25 °C set alone, stated for 25 ± 0.5 °C (common practice, no source).
 * Every form is continuous in T: outside its range the same function is extrapolated and the
 * result says so, so a sweep over temperature never jumps.
 */
import type { PitzerBinaryRow } from "../data/binary-row";
import type { PitzerBinaryTerms } from "../equations";
import { temperatureDerivatives, temperatureFunction } from "../parameter-tables";
import { saltIonicStrength } from "../stoichiometry";
import { evaluateForm } from "./forms";

const REFERENCE_TEMPERATURE_C = 25;
const DERIVATIVE_SPAN_K = 15;
const TWENTY_FIVE_ONLY_SPAN_K = 0.5;

export interface PairAtTemperature {
  terms: PitzerBinaryTerms;
  /** Ionic strength of the pure salt at the top of the fitted molality range. */
  maxI: number;
  /** Top of the fitted molality (mol/kg) of the set used. */
  maxMolality: number;
  /** Temperatures (°C) the set used is stated for. */
  rangeC: { min: number; max: number };
  source: string;
  /** Validity messages that hold whatever the composition (temperature outside the range). */
  temperatureMessages: string[];
  temperatureNote: string | null;
  /** Molality range of the temperature derivatives, when those are used. */
  derivativeMaxI: number | null;
}

function fmt(x: number): string {
  return Number(x.toPrecision(3)).toString();
}

export function pairAtTemperature(
  row: PitzerBinaryRow,
  charges: { cation: number; anion: number },
  temperatureC: number,
): PairAtTemperature {
  const T = temperatureC + 273.15;
  const fn = temperatureFunction(row.cation, row.anion);
  if (fn) {
    const Tr = 298.15;
    const nearTwentyFive =
      Math.abs(temperatureC - REFERENCE_TEMPERATURE_C) <= TWENTY_FIVE_ONLY_SPAN_K;
    const at = (c: readonly number[] | null, value25: number) =>
      !c
        ? fn.anchored
          ? value25
          : 0
        : fn.anchored
          ? value25 + evaluateForm(fn.form, c, T) - evaluateForm(fn.form, c, Tr)
          : evaluateForm(fn.form, c, T);
    const ownRange = fn.anchored && fn.limitAwayFrom25;
    const maxMolality = ownRange
      ? row.maxMolality
      : fn.anchored
        ? Math.min(fn.maxMolality, row.maxMolality)
        : fn.maxMolality;
    const temperatureLimit =
      ownRange && !nearTwentyFive && fn.maxMolality < row.maxMolality
        ? saltIonicStrength(charges.cation, charges.anion, fn.maxMolality)
        : null;
    const messages =
      temperatureC < fn.rangeC.min || temperatureC > fn.rangeC.max
        ? [
            `${fn.salt}: the Pitzer temperature function (${fn.source}) is stated for ${fn.rangeC.min}–${fn.rangeC.max} °C; ${fmt(temperatureC)} °C is an extrapolation.`,
          ]
        : [];
    return {
      terms: {
        beta0: at(fn.beta0, row.beta0),
        beta1: at(fn.beta1, row.beta1),
        beta2: at(fn.beta2, row.beta2),
        alpha1: fn.anchored ? row.alpha1 : fn.alpha1,
        alpha2: fn.anchored ? row.alpha2 : fn.alpha2,
        cPhi: at(fn.cPhi, row.cPhi),
      },
      maxI:
        ownRange && row.maxIonicStrengthMolal !== undefined
          ? row.maxIonicStrengthMolal
          : saltIonicStrength(charges.cation, charges.anion, maxMolality),
      maxMolality,
      rangeC: fn.rangeC,
      source: fn.anchored ? `${row.source}; T-dependence ${fn.source}` : fn.source,
      temperatureMessages: messages,
      temperatureNote: nearTwentyFive
        ? null
        : fn.anchored
          ? `${fn.salt}: 25 °C β and Cφ of ${row.source}, moved to ${fmt(temperatureC)} °C by the temperature function of ${fn.source}.`
          : `${fn.salt}: β and Cφ at ${fmt(temperatureC)} °C from the temperature function of ${fn.source}.`,
      derivativeMaxI: temperatureLimit,
    };
  }
  const dT = temperatureC - REFERENCE_TEMPERATURE_C;
  const maxI =
    row.maxIonicStrengthMolal ?? saltIonicStrength(charges.cation, charges.anion, row.maxMolality);
  const base = {
    maxI,
    maxMolality: row.maxMolality,
    source: row.source,
  };
  const d = temperatureDerivatives(row.cation, row.anion);
  if (d) {
    const range = {
      min: REFERENCE_TEMPERATURE_C - DERIVATIVE_SPAN_K,
      max: REFERENCE_TEMPERATURE_C + DERIVATIVE_SPAN_K,
    };
    return {
      ...base,
      terms: {
        ...row,
        beta0: row.beta0 + d.dBeta0 * dT,
        beta1: row.beta1 + d.dBeta1 * dT,
        beta2: row.beta2 + d.dBeta2 * dT,
        cPhi: row.cPhi + d.dCPhi * dT,
      },
      rangeC: range,
      temperatureMessages:
        Math.abs(dT) > DERIVATIVE_SPAN_K
          ? [
              `${row.salt}: the first-order temperature correction from 25 °C holds for about 10–40 °C; ${fmt(temperatureC)} °C is outside it.`,
            ]
          : [],
      temperatureNote:
        Math.abs(dT) <= TWENTY_FIVE_ONLY_SPAN_K
          ? null
          : `${row.salt}: β and Cφ moved from 25 °C with the ∂P/∂T of ${d.source}.`,
      derivativeMaxI:
        Math.abs(dT) <= TWENTY_FIVE_ONLY_SPAN_K
          ? null
          : saltIonicStrength(charges.cation, charges.anion, d.maxMolality),
    };
  }
  return {
    ...base,
    terms: { ...row },
    rangeC: {
      min: REFERENCE_TEMPERATURE_C - TWENTY_FIVE_ONLY_SPAN_K,
      max: REFERENCE_TEMPERATURE_C + TWENTY_FIVE_ONLY_SPAN_K,
    },
    temperatureMessages:
      Math.abs(dT) > TWENTY_FIVE_ONLY_SPAN_K
        ? [
            `Pitzer parameters for ${row.salt} exist at 25 °C only; the result at ${fmt(temperatureC)} °C uses them unchanged.`,
          ]
        : [],
    temperatureNote: null,
    derivativeMaxI: null,
  };
}
