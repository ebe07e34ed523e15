/**
 * The interface every activity model implements, so that `computeSolution` can dispatch
 * to the Debye–Hückel family (part 1) and to Pitzer and SIT (part 2) the same way.
 */

import type { ModelRange } from "./range";

export type ActivityModelId =
  "dh-limiting" | "dh-extended" | "guntelberg" | "davies" | "truesdell-jones" | "pitzer" | "sit";

/** An ion as the models see it: molal concentration on the molality scale (mol/kg solvent). */
export interface ModelIon {
  /** Canonical ion formula, e.g. "Na+", "SO4^2-". */
  formula: string;
  charge: number;
  molality: number;
  /** True for an ion pair formed by the speciation (not one of the solution's own ions). */
  pair?: boolean;
}

/** Solvent-dependent Debye–Hückel constants at the solution's temperature (molal scale). */
export interface DebyeHuckelConstants {
  temperatureK: number;
  /** A in log10 γ = −A z² √I (kg^½ mol^−½). */
  aLog10: number;
  /** B in 1/(1 + B å √I), per ångström (kg^½ mol^−½ Å^−1). */
  bPerAngstrom: number;
  /** Pitzer's Debye–Hückel osmotic coefficient parameter Aφ = A ln10 / 3. */
  aPhi: number;
}

/** Model switches a user may set (added by part 1; models ignore what they do not use). */
export interface ActivityModelOptions {
  /** Coefficient of the linear term in the Davies equation: 0.3 (Davies 1962) or 0.2 (earlier form). */
  daviesCoefficient?: 0.2 | 0.3;
  /** Set by computeSolution when ion pairs are speciated: the model need not warn about them. */
  ionPairsSpeciated?: boolean;
}

export interface ActivityModelInput {
  ions: ModelIon[];
  ionicStrengthMolal: number;
  /**
   * Ionic strength the range check uses, when it differs from the one the equations use: the
   * stoichiometric I of the solution as entered, while the equations see the true I of free
   * ions and charged pairs (ion association lowers it). Ranges are stated on the former.
   */
  rangeIonicStrengthMolal?: number;
  temperatureC: number;
  solvent: string;
  constants: DebyeHuckelConstants;
  options?: ActivityModelOptions;
}

export interface ActivityModelOutput {
  /** Natural log of each ion's activity coefficient, in the order of `input.ions`. */
  lnGamma: number[];
  osmoticCoefficient?: number;
  waterActivity?: number;
  /** Range-of-validity messages: empty when the composition is inside the model's range. */
  validityMessages: string[];
  /** Other notes (e.g. "parameters at 25 °C only"). */
  notes: string[];
}

export interface CommonFormCoefficients {
  beta: ArrayLike<number>;
  b: ArrayLike<number>;
}

export interface ActivityModel {
  /** Range of validity in temperature, ionic strength and charge type (models/range.ts). */
  range?: ModelRange;
  id: ActivityModelId;
  label: string;
  /** LaTeX of the equation applied, for the solution block (KaTeX). */
  formulaTex: string;
  compute(input: ActivityModelInput): ActivityModelOutput;
  /** Range of validity in words, with its source (added by part 1). */
  validityNote?: string;
  /** Upper ionic strength (mol/kg) of the model's documented range (added by part 1). */
  maxIonicStrengthMolal?: number;
  /** True for free-ion models (the Debye–Hückel family): ion association applies to them. */
  freeIon?: boolean;
  /**
   * The Debye–Hückel family's per-ion coefficients of the common form
   *   log10 γi = −A zi² √I / (1 + βi √I) + bi I
   * for these ions at this temperature (they do not depend on the molalities), so that the
   * ion-association iteration can evaluate γ without building messages each step.
   */
  commonForm?(input: ActivityModelInput): CommonFormCoefficients;
  /** The equation with this solution's A, B, I (and options) substituted, for KaTeX (added by part 1). */
  substitutedTex?(input: ActivityModelInput): string;
}
