/**
 * Extended Debye–Hückel equation with Kielland's (1937) ion sizes:
 *   log10 γi = −A zi² √I / (1 + B åi √I)
 * Ion sizes å: Kielland (1937) J. Am. Chem. Soc. 59, 1675 (data/ion-size-kielland.ts).
 * Kielland's table goes to I = 0.1 mol/kg and |z| ≤ 4; Ionleaf's stated ranges (dh-ranges.ts)
 * are where γ± stays within 2 % of the CRC tables. The sizes are for water.
 */
import type { ActivityModel, ActivityModelInput, CommonFormCoefficients } from "./types";
import { dhFamilyOutput, substitutedCore } from "./dh-common";
import { DH_EXTENDED_RANGE } from "./dh-ranges";
import { assumedIonSize, kiellandIonSize } from "./ion-parameters";

const RANGE = {
  label: "Extended Debye–Hückel (Kielland ion sizes)",
  range: DH_EXTENDED_RANGE,
  waterParameters: "Kielland's ion sizes",
};

/** β = B å with Kielland's å (an assumed å, named in `assumed`, where he gives none); b = 0. */
function dhExtendedForm(input: ActivityModelInput): CommonFormCoefficients & { assumed: string[] } {
  const B = input.constants.bPerAngstrom;
  const assumed: string[] = [];
  const beta = input.ions.map((ion) => {
    let a = kiellandIonSize(ion.formula);
    if (a === undefined) {
      a = assumedIonSize(ion.charge);
      // Ion pairs of the speciation take the assumed size; its note says so once.
      if (!ion.pair) assumed.push(`No Kielland ion size for ${ion.formula}; å = ${a} Å assumed.`);
    }
    return B * a;
  });
  return { beta, b: new Array<number>(beta.length).fill(0), assumed };
}

export const dhExtendedModel: ActivityModel = {
  id: "dh-extended",
  freeIon: true,
  label: RANGE.label,
  formulaTex: String.raw`\log_{10}\gamma_i = -\frac{A z_i^2 \sqrt{I}}{1 + B \mathring{a}_i \sqrt{I}}`,
  validityNote:
    "Water, 0–100 °C; I ≤ 0.05 mol/kg for 1:1, 0.15 for 2:1, 0.015 for 1:2 salts (within 2 % of the CRC tables; Kielland's table itself goes to 0.1).",
  range: DH_EXTENDED_RANGE,
  commonForm: dhExtendedForm,
  compute(input: ActivityModelInput) {
    const { beta, b, assumed } = dhExtendedForm(input);
    return dhFamilyOutput(RANGE, input, beta, b, { notes: assumed });
  },
  substitutedTex(input) {
    const { A, B, sqrtI } = substitutedCore(input);
    return String.raw`\log_{10}\gamma_i = -\frac{${A}\,z_i^2 \times ${sqrtI}}{1 + ${B}\,\mathring{a}_i \times ${sqrtI}}`;
  },
};
