/** Pieces shared by the Debye–Hückel family of models. */
import { rangeViolations, type ModelRange } from "./range";
import type { ActivityModelInput, ActivityModelOutput, ModelIon } from "./types";

/** Number formatted for a KaTeX formula (4 significant figures, no exponent noise). */
const texCache = new Map<number, string>();

export function texNumber(value: number): string {
  const hit = texCache.get(value);
  if (hit !== undefined) return hit;
  const text = formatTexNumber(value);
  if (texCache.size > 500) texCache.clear();
  texCache.set(value, text);
  return text;
}

function formatTexNumber(value: number): string {
  if (value === 0) return "0";
  const abs = Math.abs(value);
  if (abs >= 1e-3 && abs < 1e4) return String(Number(value.toPrecision(4)));
  const [mantissa, exponent] = value.toExponential(3).split("e");
  return `${Number(mantissa)}\\times10^{${Number(exponent)}}`;
}

function waterOnlyNote(label: string, what: string, solvent: string): string[] {
  return solvent === "water"
    ? []
    : [`${label}: ${what} were fitted for water; for ${solvent} they are an extrapolation.`];
}

/** Largest cation charge × largest anion charge magnitude among the ions present. */
export function chargeProductMagnitude(ions: readonly ModelIon[]): number {
  let zPlus = 0;
  let zMinus = 0;
  for (const ion of ions) {
    if (ion.molality <= 0) continue;
    if (ion.charge > zPlus) zPlus = ion.charge;
    if (-ion.charge > zMinus) zMinus = -ion.charge;
  }
  return Math.max(zPlus, 1) * Math.max(zMinus, 1);
}

export function substitutedCore(input: ActivityModelInput): {
  A: string;
  B: string;
  I: string;
  sqrtI: string;
} {
  return {
    A: texNumber(input.constants.aLog10),
    B: texNumber(input.constants.bPerAngstrom),
    I: texNumber(input.ionicStrengthMolal),
    sqrtI: texNumber(Math.sqrt(input.ionicStrengthMolal)),
  };
}

// Gauss–Legendre nodes and weights on [0, 1] (8 points, standard tables), for the dilution integral.
export const GL_NODES = [
  0.0198550717512319, 0.1016667612931866, 0.2372337950418355, 0.4082826787521751,
  0.5917173212478249, 0.7627662049581645, 0.8983332387068134, 0.9801449282487681,
];
export const GL_WEIGHTS = [
  0.0506142681451881, 0.1111905172266872, 0.1568533229389436, 0.181341891689181, 0.181341891689181,
  0.1568533229389436, 0.1111905172266872, 0.0506142681451881,
];

/**
 * Every Debye–Hückel-family model is one form with per-ion coefficients:
 *   log10 γi = −A zi² √I / (1 + βi √I) + bi I
 * (limiting law: β = 0, b = 0; extended: β = B å; Güntelberg: β = 1; Davies: β = 1,
 * b = c A z²; Truesdell–Jones: β = B å, b fitted). Returns ln γ of each ion and the osmotic
 * coefficient over the ions from the Gibbs–Duhem relation along the dilution path
 * (m_i → t m_i): Σm (φ − 1) = Σ m_i [ln γ_i(I) − ∫₀¹ ln γ_i(t I) dt], the integral by
 * Gauss–Legendre in u = √t (ln γ goes as √t at infinite dilution).
 */
/** ln γ of the common form at ionic strength x (no closure: this runs in the hot loop). */
function lnGammaExtendedForm(az2: number, beta: number, b: number, x: number): number {
  const sqrtX = Math.sqrt(x);
  return LN10_LOCAL * ((-az2 * sqrtX) / (1 + beta * sqrtX) + b * x);
}

const LN10_LOCAL = Math.LN10;

/** ln γ of every ion from the common form's coefficients at ionic strength I, into `out`. */
export function commonFormLnGamma(
  aLog10: number,
  ions: readonly ModelIon[],
  form: { beta: ArrayLike<number>; b: ArrayLike<number> },
  I: number,
  out: number[],
): number[] {
  for (let i = 0; i < ions.length; i++) {
    const z = ions[i].charge;
    out[i] = lnGammaExtendedForm(aLog10 * z * z, form.beta[i], form.b[i], I);
  }
  return out;
}

function evaluateExtendedForm(
  input: ActivityModelInput,
  beta: ArrayLike<number>,
  b: ArrayLike<number>,
): { lnGamma: number[]; osmoticCoefficient: number } {
  const { ions, ionicStrengthMolal: I } = input;
  const A = input.constants.aLog10;
  const lnGamma = new Array<number>(ions.length);
  let sumM = 0;
  let sumEnd = 0;
  let sumIntegral = 0;
  for (let i = 0; i < ions.length; i++) {
    const z = ions[i].charge;
    const az2 = A * z * z;
    const end = lnGammaExtendedForm(az2, beta[i], b[i], I);
    lnGamma[i] = end;
    let integral = 0;
    for (let k = 0; k < GL_NODES.length; k++) {
      const u = GL_NODES[k];
      integral += GL_WEIGHTS[k] * 2 * u * lnGammaExtendedForm(az2, beta[i], b[i], I * u * u);
    }
    const m = ions[i].molality;
    sumM += m;
    sumEnd += m * end;
    sumIntegral += m * integral;
  }
  return { lnGamma, osmoticCoefficient: sumM > 0 ? 1 + (sumEnd - sumIntegral) / sumM : 1 };
}

/**
 * The output every Debye–Hückel-family model returns: the common form evaluated, the range
 * check (temperature, ionic strength, charge type; models/range.ts) and the note for
 * non-water solvents, whose parameters were fitted for water.
 */
export function dhFamilyOutput(
  model: { label: string; range: ModelRange; waterParameters?: string },
  input: ActivityModelInput,
  beta: ArrayLike<number>,
  b: ArrayLike<number>,
  extra: { validityMessages?: string[]; notes?: string[] } = {},
): ActivityModelOutput {
  const { lnGamma, osmoticCoefficient } = evaluateExtendedForm(input, beta, b);
  const validityMessages = extra.validityMessages
    ? [...extra.validityMessages]
    : rangeViolations(
        model.label,
        model.range,
        input.ions.filter((i) => !i.pair),
        input.rangeIonicStrengthMolal ?? input.ionicStrengthMolal,
        input.temperatureC,
      );
  // Parameters fitted for water are outside their domain in another solvent: a validity matter.
  if (model.waterParameters)
    validityMessages.push(...waterOnlyNote(model.label, model.waterParameters, input.solvent));
  const notes = [...(extra.notes ?? [])];
  return { lnGamma, osmoticCoefficient, validityMessages, notes };
}
