/**
 * Güntelberg equation (Güntelberg 1926, Z. Phys. Chem. 123, 199):
 *   log10 γi = −A zi² √I / (1 + √I)
 * The extended equation with B å = 1 (kg/mol)^½ (å ≈ 3 Å in water at 25 °C), used for
 * mixtures where no single ion size fits. Ions up to |z| = 2; ranges in dh-ranges.ts.
 */
import type { ActivityModel, ActivityModelInput, CommonFormCoefficients } from "./types";
import { dhFamilyOutput, substitutedCore } from "./dh-common";
import { GUNTELBERG_RANGE } from "./dh-ranges";

const RANGE = {
  label: "Güntelberg",
  range: GUNTELBERG_RANGE,
  waterParameters: "the product B·å = 1",
};

/** β = 1 (B å = 1), b = 0. */
function guntelbergForm(input: ActivityModelInput): CommonFormCoefficients {
  const n = input.ions.length;
  return { beta: new Array<number>(n).fill(1), b: new Array<number>(n).fill(0) };
}

export const guntelbergModel: ActivityModel = {
  id: "guntelberg",
  freeIon: true,
  label: RANGE.label,
  formulaTex: String.raw`\log_{10}\gamma_i = -\frac{A z_i^2 \sqrt{I}}{1 + \sqrt{I}}`,
  validityNote:
    "Water, 0–100 °C; I ≤ 0.02 mol/kg for 1:1, 0.01 for 2:1 and 1:2 salts (within 2 % of the CRC tables); B·å = 1 is a water value.",
  range: GUNTELBERG_RANGE,
  commonForm: guntelbergForm,
  compute(input: ActivityModelInput) {
    const { beta, b } = guntelbergForm(input);
    return dhFamilyOutput(RANGE, input, beta, b);
  },
  substitutedTex(input) {
    const { A, sqrtI } = substitutedCore(input);
    return String.raw`\log_{10}\gamma_i = -\frac{${A}\,z_i^2 \times ${sqrtI}}{1 + ${sqrtI}}`;
  },
};
