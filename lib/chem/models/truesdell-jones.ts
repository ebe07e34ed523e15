/**
 * Truesdell–Jones equation (Truesdell & Jones 1974, J. Res. U.S. Geol. Surv. 2, 233):
 *   log10 γi = −A zi² √I / (1 + B åi √I) + bi I
 * with the ion-specific å and b of WATEQ4F (Ball & Nordstrom 1991). For ions WATEQ4F does
 * not fit, the b-dot form of Helgeson (1969) is used: the EQ3/6 ion size and Ḃ(T).
 * Range: I ≤ 2 mol/kg when every ion has a fitted b (chloride-dominated waters), about
 * 0.5 mol/kg otherwise (checked against CRC γ± of HCl, LiCl, NaOH in the tests); water.
 */
import { bDot } from "../data/ion-size-bdot";
import type { ActivityModel, ActivityModelInput } from "./types";
import { dhFamilyOutput, ionicStrengthMessage, substitutedCore, texNumber } from "./dh-common";
import {
  assumedIonSize,
  bDotIonSize,
  kiellandIonSize,
  truesdellJonesParameters,
} from "./ion-parameters";

const LABEL = "Truesdell–Jones (b-dot)";
const MAX_I = 2;
/** Above this, b-dot ions (no fitted b) are outside Helgeson's well-tested range. */
const BDOT_MAX_I = 0.5;

export interface TruesdellJonesIonParameters {
  aAngstrom: number;
  b: number;
  source: "WATEQ4F" | "b-dot" | "assumed";
}

const ionCache = new Map<string, TruesdellJonesIonParameters>();

/** Ion size and source, cached by formula; `b` is NaN for b-dot ions (it depends on T). */
function truesdellJonesIonStatic(formula: string, charge: number): TruesdellJonesIonParameters {
  let cached = ionCache.get(formula);
  if (!cached) {
    // WATEQ4F's b = 0 means "no b fitted": those ions take the b-dot form like untabulated ones.
    const fitted = truesdellJonesParameters(formula);
    if (fitted && fitted.b !== 0) cached = { ...fitted, source: "WATEQ4F" };
    else {
      const size = bDotIonSize(formula) ?? kiellandIonSize(formula);
      cached = {
        aAngstrom: size ?? assumedIonSize(charge),
        b: Number.NaN,
        source: size === undefined ? "assumed" : "b-dot",
      };
    }
    ionCache.set(formula, cached);
  }
  return cached;
}

export function truesdellJonesIon(
  formula: string,
  charge: number,
  temperatureC: number,
): TruesdellJonesIonParameters {
  const p = truesdellJonesIonStatic(formula, charge);
  return p.source === "WATEQ4F" ? p : { ...p, b: bDot(temperatureC) };
}

export const truesdellJonesModel: ActivityModel = {
  id: "truesdell-jones",
  label: LABEL,
  formulaTex: String.raw`\log_{10}\gamma_i = -\frac{A z_i^2 \sqrt{I}}{1 + B \mathring{a}_i \sqrt{I}} + b_i I`,
  validityNote:
    "I ≤ 2 mol/kg with WATEQ4F-fitted ions (Truesdell & Jones 1974); b-dot ions (Helgeson 1969) to about 0.5 mol/kg; water.",
  maxIonicStrengthMolal: MAX_I,
  compute(input: ActivityModelInput) {
    const I = input.ionicStrengthMolal;
    const B = input.constants.bPerAngstrom;
    const bDotIons: string[] = [];
    const assumed: string[] = [];
    const n = input.ions.length;
    const beta = new Array<number>(n);
    const b = new Array<number>(n);
    const bDotHere = bDot(input.temperatureC);
    for (let i = 0; i < n; i++) {
      const ion = input.ions[i];
      const p = truesdellJonesIonStatic(ion.formula, ion.charge);
      if (p.source !== "WATEQ4F") bDotIons.push(ion.formula);
      if (p.source === "assumed") assumed.push(`${ion.formula} (å = ${p.aAngstrom} Å)`);
      beta[i] = B * p.aAngstrom;
      b[i] = p.source === "WATEQ4F" ? p.b : bDotHere;
    }
    const notes: string[] = [];
    if (bDotIons.length)
      notes.push(
        `No fitted Truesdell–Jones b for ${bDotIons.join(", ")}: b-dot form used (Ḃ = ${texNumber(bDotHere)} kg/mol).`,
      );
    if (assumed.length) notes.push(`No tabulated ion size for ${assumed.join(", ")}: assumed.`);
    const validityMessages = ionicStrengthMessage(LABEL, MAX_I, input);
    if (bDotIons.length && I > BDOT_MAX_I && validityMessages.length === 0) {
      validityMessages.push(
        `Ions without fitted b (${bDotIons.join(", ")}) use the b-dot form, tested to about I = ${BDOT_MAX_I} mol/kg.`,
      );
    }
    return dhFamilyOutput(
      { label: LABEL, maxIonicStrengthMolal: MAX_I, waterParameters: "the å and b parameters" },
      input,
      beta,
      b,
      { validityMessages, notes },
    );
  },
  substitutedTex(input) {
    const { A, B, I, sqrtI } = substitutedCore(input);
    return String.raw`\log_{10}\gamma_i = -\frac{${A}\,z_i^2 \times ${sqrtI}}{1 + ${B}\,\mathring{a}_i \times ${sqrtI}} + b_i \times ${I}`;
  },
};
