/**
 * Extended Debye–Hückel equation with Kielland's (1937) ion sizes:
 *   log10 γi = −A zi² √I / (1 + B åi √I)
 * Ion sizes å: Kielland (1937) J. Am. Chem. Soc. 59, 1675 (data/ion-size-kielland.ts).
 * Range: I ≤ 0.1 mol/kg and |z| ≤ 4, the range of Kielland's table. The sizes are for water.
 */
import type { ActivityModel, ActivityModelInput } from "./types";
import { dhFamilyOutput, substitutedCore } from "./dh-common";
import { assumedIonSize, kiellandIonSize } from "./ion-parameters";

const RANGE = {
  maxChargeMagnitude: 4,
  label: "Extended Debye–Hückel (Kielland ion sizes)",
  maxIonicStrengthMolal: 0.1,
  waterParameters: "Kielland's ion sizes",
};

export const dhExtendedModel: ActivityModel = {
  id: "dh-extended",
  label: RANGE.label,
  formulaTex: String.raw`\log_{10}\gamma_i = -\frac{A z_i^2 \sqrt{I}}{1 + B \mathring{a}_i \sqrt{I}}`,
  validityNote: "I ≤ 0.1 mol/kg, the range of Kielland's (1937) table; ion sizes for water.",
  maxIonicStrengthMolal: RANGE.maxIonicStrengthMolal,
  compute(input: ActivityModelInput) {
    const B = input.constants.bPerAngstrom;
    const notes: string[] = [];
    const beta = input.ions.map((ion) => {
      let a = kiellandIonSize(ion.formula);
      if (a === undefined) {
        a = assumedIonSize(ion.charge);
        notes.push(`No Kielland ion size for ${ion.formula}; å = ${a} Å assumed.`);
      }
      return B * a;
    });
    return dhFamilyOutput(RANGE, input, beta, new Array<number>(beta.length).fill(0), { notes });
  },
  substitutedTex(input) {
    const { A, B, sqrtI } = substitutedCore(input);
    return String.raw`\log_{10}\gamma_i = -\frac{${A}\,z_i^2 \times ${sqrtI}}{1 + ${B}\,\mathring{a}_i \times ${sqrtI}}`;
  },
};
