/** Input and result of `computeSolution` (docs/architecture.md, "The computation contract"). */
import type { ActivityModelId, ActivityModelOptions, DebyeHuckelConstants } from "../models/types";
import type { SpeciesKind } from "../species/salts";
import type { DensityUsed } from "../density/solution-density";
import type { CounterIonOffer } from "./charge-balance";
import type { SpeciationResult } from "./speciation-result";

export interface SolutionComponentInput {
  formula: string;
  amount: number;
  unit: string;
  /** With a mass unit: the mass of solvent (g, kg) or the final volume of solution (mL, L). */
  per?: { amount: number; unit: string };
}

export interface SolutionInput {
  temperatureC?: number;
  solvent?: string;
  model?: ActivityModelId | "auto";
  components: SolutionComponentInput[];
  densityGPerMl?: number;
  modelOptions?: ActivityModelOptions;
  /**
   * Ion-association speciation with free-ion models (the Debye–Hückel family) in water:
   * on unless false. Pitzer and SIT parameters already describe pairing; they ignore it.
   */
  ionAssociation?: boolean;
}

export interface IonResult {
  formula: string;
  name?: string;
  charge: number;
  molality: number;
  molarity: number;
  gamma: number;
  activity: number;
  log10Gamma: number;
  lnGamma: number;
  /** With ion association: molality and γ of the free ion (activity = freeGamma × freeMolality). */
  freeMolality?: number;
  freeGamma?: number;
}

export interface SaltResult {
  formula: string;
  /** Index of the component this salt came from. */
  component: number;
  meanGamma: number;
  meanActivity: number;
  meanMolality: number;
  log10MeanGamma: number;
  lnMeanGamma: number;
}

export interface ComponentResult {
  formula: string;
  name?: string;
  kind: SpeciesKind;
  molarMassGPerMol: number;
  hydrateWater: number;
  molality: number;
  molarity: number;
  ions: { formula: string; count: number }[];
}

export interface SolutionResult {
  temperatureC: number;
  solvent: { id: string; name: string; relativePermittivity: number; densityGPerMl: number };
  ionicStrength: { molal: number; molar: number };
  /** The density used for molar ↔ molal conversion, and where it came from. */
  density: DensityUsed;
  /** null when no ions are present (the screening length is unbounded). */
  debyeLengthNm: number | null;
  kappaPerNm: number;
  ions: IonResult[];
  salts: SaltResult[];
  components: ComponentResult[];
  osmoticCoefficient?: number;
  waterActivity?: number;
  chargeExcessEqPerKg: number;
  /** Charge balance and the counter-ions that would balance it (component rows to append). */
  chargeBalance: {
    balanced: boolean;
    excessEqPerKg: number;
    offers: CounterIonOffer[];
  };
  /** Set when "auto" had to leave a more accurate model at a range limit: what changed and why. */
  modelChange?: string;
  /** Free ions and ion pairs, when ion association was applied. */
  speciation?: SpeciationResult;
  constants: DebyeHuckelConstants;
  model: {
    requested: ActivityModelId | "auto";
    used: ActivityModelId;
    reason: string;
    label: string;
  };
  /** The model's equation with this solution's numbers, for KaTeX. */
  formulaTex: string;
  formulaTexGeneral: string;
  validity: { ok: boolean; messages: string[] };
  warnings: string[];
  notes: string[];
  hazards: string[];
}
