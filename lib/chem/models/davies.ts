/**
 * Davies equation (Davies 1962, Ion Association, Butterworths, p. 41):
 *   log10 γi = −A zi² ( √I / (1 + √I) − c I ),  c = 0.3 (Davies 1962) or 0.2 (Davies 1938)
 * Empirical, fitted to aqueous data. Range: I ≤ 0.5 mol/kg (common practice); against CRC
 * γ± the error is a few per cent at 0.1 mol/kg and grows to about 10 % at 0.5 (see tests).
 * Charge types: fitted to salts of ions up to |z| = 2 (common practice).
 */
import type { ActivityModel, ActivityModelInput } from "./types";
import { dhFamilyOutput, substitutedCore } from "./dh-common";

const RANGE = {
  maxChargeMagnitude: 2,
  label: "Davies",
  maxIonicStrengthMolal: 0.5,
  waterParameters: "the empirical linear coefficient",
};

function coefficient(input: ActivityModelInput): number {
  return input.options?.daviesCoefficient ?? 0.3;
}

export const daviesModel: ActivityModel = {
  id: "davies",
  label: RANGE.label,
  formulaTex: String.raw`\log_{10}\gamma_i = -A z_i^2 \left(\frac{\sqrt{I}}{1 + \sqrt{I}} - 0.3\,I\right)`,
  validityNote:
    "I ≤ 0.5 mol/kg (common practice; errors grow to about 10 % there); empirical, for water. Coefficient 0.3 (Davies 1962) or 0.2.",
  maxIonicStrengthMolal: RANGE.maxIonicStrengthMolal,
  compute(input: ActivityModelInput) {
    // −A z² (√I/(1+√I) − c I) is the common form with β = 1 and b = c A z².
    const cA = coefficient(input) * input.constants.aLog10;
    const b = input.ions.map((ion) => cA * ion.charge * ion.charge);
    return dhFamilyOutput(RANGE, input, new Array<number>(b.length).fill(1), b);
  },
  substitutedTex(input) {
    const { A, I, sqrtI } = substitutedCore(input);
    return String.raw`\log_{10}\gamma_i = -${A}\,z_i^2 \left(\frac{${sqrtI}}{1 + ${sqrtI}} - ${coefficient(input)} \times ${I}\right)`;
  },
};
