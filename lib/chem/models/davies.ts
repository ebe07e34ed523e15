/**
 * Davies equation (Davies 1962, Ion Association, Butterworths, p. 41):
 *   log10 γi = −A zi² ( √I / (1 + √I) − c I ),  c = 0.3 (Davies 1962) or 0.2 (Davies 1938)
 * Empirical, fitted to aqueous data. Common practice quotes I ≤ 0.5 mol/kg, where the error
 * against CRC γ± reaches 10 % (1:1) to 60 % (2:1); Ionleaf states the range where it stays
 * within 2 % (dh-ranges.ts). Charge types: ions up to |z| = 2.
 */
import type { ActivityModel, ActivityModelInput, CommonFormCoefficients } from "./types";
import { dhFamilyOutput, substitutedCore } from "./dh-common";
import { DAVIES_RANGE } from "./dh-ranges";

const RANGE = {
  label: "Davies",
  range: DAVIES_RANGE,
  waterParameters: "the empirical linear coefficient",
};

function coefficient(input: ActivityModelInput): number {
  return input.options?.daviesCoefficient ?? 0.3;
}

/** −A z² (√I/(1+√I) − c I) is the common form with β = 1 and b = c A z². */
function daviesForm(input: ActivityModelInput): CommonFormCoefficients {
  const cA = coefficient(input) * input.constants.aLog10;
  const b = input.ions.map((ion) => cA * ion.charge * ion.charge);
  return { beta: new Array<number>(b.length).fill(1), b };
}

export const daviesModel: ActivityModel = {
  id: "davies",
  freeIon: true,
  label: RANGE.label,
  formulaTex: String.raw`\log_{10}\gamma_i = -A z_i^2 \left(\frac{\sqrt{I}}{1 + \sqrt{I}} - 0.3\,I\right)`,
  validityNote:
    "Water, 0–100 °C; I ≤ 0.05 mol/kg for 1:1, 0.03 for 2:1, 0.15 for 1:2 salts (with ion association), where it stays within 2 % of the CRC tables. Coefficient 0.3 (Davies 1962) or 0.2.",
  range: DAVIES_RANGE,
  commonForm: daviesForm,
  compute(input: ActivityModelInput) {
    const { beta, b } = daviesForm(input);
    return dhFamilyOutput(RANGE, input, beta, b);
  },
  substitutedTex(input) {
    const { A, I, sqrtI } = substitutedCore(input);
    return String.raw`\log_{10}\gamma_i = -${A}\,z_i^2 \left(\frac{${sqrtI}}{1 + ${sqrtI}} - ${coefficient(input)} \times ${I}\right)`;
  },
};
