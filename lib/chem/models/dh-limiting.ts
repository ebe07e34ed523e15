/**
 * Debye–Hückel limiting law (Debye & Hückel 1923, Phys. Z. 24, 185):
 *   log10 γi = −A zi² √I
 * Holds only in the dilute limit: for 1:1 electrolytes up to √I ≈ 0.1, and to lower √I the
 * higher the charges (common practice, no single source); this engine takes
 * √I ≤ 0.1 / |z+ z−| with the largest charges present. A is computed from the solvent's
 * εr and ρ, so the law applies to any solvent.
 */
import type { ModelRange } from "./range";
import type { ActivityModel, ActivityModelInput } from "./types";
import { chargeProductMagnitude, dhFamilyOutput, substitutedCore, texNumber } from "./dh-common";

const DH_LIMITING_SQRT_I_MAX_1_1 = 0.1;

export function limitingLawSqrtIMax(chargeProduct: number): number {
  return DH_LIMITING_SQRT_I_MAX_1_1 / chargeProduct;
}

/**
 * The √I rule as range rows (any solvent and any temperature the solvent data cover: the law
 * needs only εr and ρ). The rule itself is checked in `compute`.
 */
const DH_LIMITING_RANGE: ModelRange = {
  temperatureC: { min: -100, max: 300 },
  limits: [1, 2, 3, 4].flatMap((zCation) =>
    [1, 2, 3, 4].map((zAnion) => ({
      zCation,
      zAnion,
      maxIonicStrengthMolal: limitingLawSqrtIMax(zCation * zAnion) ** 2,
    })),
  ),
  basis: "√I ≤ 0.1/|z₊z₋|, common practice",
};

export const dhLimitingModel: ActivityModel = {
  id: "dh-limiting",
  freeIon: true,
  label: "Debye–Hückel limiting law",
  formulaTex: String.raw`\log_{10}\gamma_i = -A z_i^2 \sqrt{I}`,
  validityNote:
    "Dilute solutions only: √I ≤ 0.1 for 1:1 electrolytes, √I ≤ 0.1/|z₊z₋| for higher charges (common practice).",
  range: DH_LIMITING_RANGE,
  commonForm: (input) => {
    const zeros = new Array<number>(input.ions.length).fill(0);
    return { beta: zeros, b: zeros };
  },
  compute(input: ActivityModelInput) {
    const sqrtI = Math.sqrt(input.rangeIonicStrengthMolal ?? input.ionicStrengthMolal);
    const product = chargeProductMagnitude(input.ions.filter((i) => !i.pair));
    const limit = limitingLawSqrtIMax(product);
    const validityMessages =
      sqrtI > limit
        ? [
            `The Debye–Hückel limiting law holds for ${product === 1 ? "1:1 electrolytes" : `charge product |z₊z₋| = ${product}`} only up to √I ≈ ${texNumber(limit)} (here √I = ${texNumber(sqrtI)}); use the extended equation, Davies or Truesdell–Jones.`,
          ]
        : [];
    const zeros = new Array<number>(input.ions.length).fill(0);
    // The range check is the √I rule above, not a fixed ionic strength.
    return dhFamilyOutput(
      { label: "Debye–Hückel limiting law", range: DH_LIMITING_RANGE },
      input,
      zeros,
      zeros,
      { validityMessages },
    );
  },
  substitutedTex(input) {
    const { A, sqrtI } = substitutedCore(input);
    return String.raw`\log_{10}\gamma_i = -${A}\,z_i^2 \times ${sqrtI}`;
  },
};
