/**
 * Truesdell–Jones equation (Truesdell & Jones 1974, J. Res. U.S. Geol. Surv. 2, 233):
 *   log10 γi = −A zi² √I / (1 + B åi √I) + bi I
 * with the ion-specific å and b of WATEQ4F (Ball & Nordstrom 1991). For ions WATEQ4F does
 * not fit, the b-dot form of Helgeson (1969) is used: the EQ3/6 ion size and Ḃ(T).
 * Ranges (dh-ranges.ts): with every ion fitted, I ≤ 2 mol/kg near 25 °C and 0.3 elsewhere;
 * with b-dot ions, 0.1 (measured against CRC γ± and Pitzer, Peiper & Busey 1984 NaCl).
 */
import { bDot } from "../data/ion-size-bdot";
import type { ActivityModel, ActivityModelInput, CommonFormCoefficients } from "./types";
import { dhFamilyOutput, substitutedCore, texNumber } from "./dh-common";
import { TRUESDELL_JONES_BDOT_RANGE, TRUESDELL_JONES_FITTED_RANGE } from "./dh-ranges";
import {
  assumedIonSize,
  bDotIonSize,
  kiellandIonSize,
  truesdellJonesParameters,
} from "./ion-parameters";

const LABEL = "Truesdell–Jones (b-dot)";

interface TruesdellJonesIonParameters {
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

interface TruesdellJonesForm extends CommonFormCoefficients {
  bDotIons: string[];
  assumed: string[];
  /** True when every ion of the solution (not the pairs) has a WATEQ4F-fitted b. */
  allFitted: boolean;
  bDotHere: number;
}

/** β = B å, b fitted (WATEQ4F) or Ḃ(T) (b-dot ions). */
function truesdellJonesForm(input: ActivityModelInput): TruesdellJonesForm {
  const B = input.constants.bPerAngstrom;
  const bDotIons: string[] = [];
  const assumed: string[] = [];
  let allFitted = true;
  const n = input.ions.length;
  const beta = new Array<number>(n);
  const b = new Array<number>(n);
  const bDotHere = bDot(input.temperatureC);
  for (let i = 0; i < n; i++) {
    const ion = input.ions[i];
    const p = truesdellJonesIonStatic(ion.formula, ion.charge);
    // Ion pairs of the speciation take the b-dot form and an assumed size (its note says so);
    // they do not decide the range either: the solution's own ions do.
    if (p.source !== "WATEQ4F" && !ion.pair) {
      bDotIons.push(ion.formula);
      if (ion.charge !== 0 && ion.molality > 0) allFitted = false;
    }
    if (p.source === "assumed" && !ion.pair) assumed.push(`${ion.formula} (å = ${p.aAngstrom} Å)`);
    beta[i] = B * p.aAngstrom;
    b[i] = p.source === "WATEQ4F" ? p.b : bDotHere;
  }
  return { beta, b, bDotIons, assumed, allFitted, bDotHere };
}

export const truesdellJonesModel: ActivityModel = {
  id: "truesdell-jones",
  freeIon: true,
  label: LABEL,
  formulaTex: String.raw`\log_{10}\gamma_i = -\frac{A z_i^2 \sqrt{I}}{1 + B \mathring{a}_i \sqrt{I}} + b_i I`,
  validityNote:
    "Water. Every ion with a WATEQ4F-fitted b: I ≤ 2 mol/kg at 20–30 °C (1:2 salts 0.3), I ≤ 0.3 at 0–100 °C; an ion in b-dot form (Helgeson 1969): I ≤ 0.1 (within 2 % of the CRC and PPB84 tables).",
  range: TRUESDELL_JONES_FITTED_RANGE,
  commonForm: truesdellJonesForm,
  compute(input: ActivityModelInput) {
    const { beta, b, bDotIons, assumed, allFitted, bDotHere } = truesdellJonesForm(input);
    const notes: string[] = [];
    if (bDotIons.length)
      notes.push(
        `No fitted Truesdell–Jones b for ${bDotIons.join(", ")}: b-dot form used (Ḃ = ${texNumber(bDotHere)} kg/mol).`,
      );
    if (assumed.length) notes.push(`No tabulated ion size for ${assumed.join(", ")}: assumed.`);
    const range = allFitted ? TRUESDELL_JONES_FITTED_RANGE : TRUESDELL_JONES_BDOT_RANGE;
    return dhFamilyOutput(
      {
        label: allFitted ? LABEL : `${LABEL} with b-dot ions`,
        range,
        waterParameters: "the å and b parameters",
      },
      input,
      beta,
      b,
      { notes },
    );
  },
  substitutedTex(input) {
    const { A, B, I, sqrtI } = substitutedCore(input);
    return String.raw`\log_{10}\gamma_i = -\frac{${A}\,z_i^2 \times ${sqrtI}}{1 + ${B}\,\mathring{a}_i \times ${sqrtI}} + b_i \times ${I}`;
  },
};
