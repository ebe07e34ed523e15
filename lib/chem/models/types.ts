/**
 * The interface every activity model implements, so that `computeSolution` can dispatch
 * to the Debye–Hückel family (part 1) and to Pitzer and SIT (part 2) the same way.
 */

export type ActivityModelId =
  | "dh-limiting"
  | "dh-extended"
  | "guntelberg"
  | "davies"
  | "truesdell-jones"
  | "pitzer"
  | "sit";

/** An ion as the models see it: molal concentration on the molality scale (mol/kg solvent). */
export interface ModelIon {
  /** Canonical ion formula, e.g. "Na+", "SO4^2-". */
  formula: string;
  charge: number;
  molality: number;
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

export interface ActivityModelInput {
  ions: ModelIon[];
  ionicStrengthMolal: number;
  temperatureC: number;
  solvent: string;
  constants: DebyeHuckelConstants;
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

export interface ActivityModel {
  id: ActivityModelId;
  label: string;
  /** LaTeX of the equation applied, for the solution block (KaTeX). */
  formulaTex: string;
  compute(input: ActivityModelInput): ActivityModelOutput;
}
