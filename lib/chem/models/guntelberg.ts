/**
 * Güntelberg equation (Güntelberg 1926, Z. Phys. Chem. 123, 199):
 *   log10 γi = −A zi² √I / (1 + √I)
 * The extended equation with B å = 1 (kg/mol)^½ (å ≈ 3 Å in water at 25 °C), used for
 * mixtures where no single ion size fits. Range: I ≤ 0.1 mol/kg, ions up to |z| = 2
 * (one size for all ions suits small low-charge ions; common practice).
 */
import type { ActivityModel, ActivityModelInput } from "./types";
import { dhFamilyOutput, substitutedCore } from "./dh-common";

const RANGE = {
  maxChargeMagnitude: 2,
  label: "Güntelberg",
  maxIonicStrengthMolal: 0.1,
  waterParameters: "the product B·å = 1",
};

export const guntelbergModel: ActivityModel = {
  id: "guntelberg",
  label: RANGE.label,
  formulaTex: String.raw`\log_{10}\gamma_i = -\frac{A z_i^2 \sqrt{I}}{1 + \sqrt{I}}`,
  validityNote: "I ≤ 0.1 mol/kg (Güntelberg 1926); B·å = 1 is a water value.",
  maxIonicStrengthMolal: RANGE.maxIonicStrengthMolal,
  compute(input: ActivityModelInput) {
    const n = input.ions.length;
    return dhFamilyOutput(RANGE, input, new Array<number>(n).fill(1), new Array<number>(n).fill(0));
  },
  substitutedTex(input) {
    const { A, sqrtI } = substitutedCore(input);
    return String.raw`\log_{10}\gamma_i = -\frac{${A}\,z_i^2 \times ${sqrtI}}{1 + ${sqrtI}}`;
  },
};
