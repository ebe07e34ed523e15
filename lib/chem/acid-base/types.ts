/** Inputs and results of `speciate` and `designBuffer` (exported from lib/chem/index.ts). */
import type { ActivityConvention } from "./activity";
import type { BufferSystemId } from "./data/pka-goldberg-2002";

export type { ActivityConvention, BufferSystemId };

/** One thing put into the solution: weighed (massG), counted (amountMol) or a stock (volumeMl of concentrationMolar). */
export interface SpeciateComponent {
  formula: string;
  massG?: number;
  amountMol?: number;
  volumeMl?: number;
  concentrationMolar?: number;
}

export interface SpeciateInput {
  components: SpeciateComponent[];
  /** Final volume of solution (mL), or … */
  volumeMl?: number;
  /** … the mass of water the components were dissolved in (g); standards are defined per kg of water. */
  waterMassG?: number;
  temperatureC?: number;
  /** Single-ion activity convention for γ and pH (default "davies"). */
  activityConvention?: ActivityConvention;
}

export interface SpeciesResult {
  formula: string;
  charge: number;
  molality: number;
  molarity: number;
  gamma: number;
  activity: number;
  /** For buffer species: the system and the fraction of its total. */
  system?: BufferSystemId;
  fraction?: number;
}

interface SystemResult {
  id: BufferSystemId;
  name: string;
  totalMolar: number;
  totalMolal: number;
  /** Thermodynamic pKa (I = 0) of each step at the temperature. */
  pKa: number[];
  pKaSource: string;
}

export interface SpeciateResult {
  pH: number;
  temperatureC: number;
  ionicStrength: { molal: number; molar: number };
  species: SpeciesResult[];
  systems: SystemResult[];
  /** How pH = −log10 a(H+) and single-ion γ are defined here. */
  pHConvention: string;
  notes: string[];
  warnings: string[];
  /** Safety cautions for the reagents involved (strong acid/base stocks, special hazards). */
  cautions: string[];
}

export interface DesignBufferInput {
  buffer: BufferSystemId;
  pH: number;
  /** Total concentration of the buffer system (all its forms), mol/L. */
  totalConcentrationMolar: number;
  volumeMl: number;
  temperatureC?: number;
  /**
   * "two-forms": weigh an acid form and a base form (default);
   * "titrate": weigh one form and add a strong acid or base stock.
   */
  method?: "two-forms" | "titrate";
  /** Forms to weigh (formulas as in the catalogue, e.g. ["NaH2PO4·H2O", "Na2HPO4·7H2O"]); defaults per buffer. */
  reagents?: string[];
  /** Stock for "titrate" (default 1 mol/L HCl or NaOH, whichever the pH needs). */
  titrant?: { formula: "HCl" | "NaOH" | "KOH"; concentrationMolar: number };
  /** Raise the ionic strength to this value (mol/L) with an inert salt. */
  targetIonicStrengthMolar?: number;
  salt?: "NaCl" | "KCl";
  activityConvention?: ActivityConvention;
}

export interface RecipeComponent {
  formula: string;
  name: string;
  role: "acid form" | "base form" | "buffer form" | "titrant" | "salt";
  amountMol: number;
  /** Mass to weigh (g), for solids. */
  massG?: number;
  /** Volume of stock to add (mL), for titrants. */
  volumeMl?: number;
  molarMassGPerMol?: number;
}

export interface DesignBufferResult extends SpeciateResult {
  buffer: BufferSystemId;
  targetPH: number;
  volumeMl: number;
  components: RecipeComponent[];
  /** Make-up instruction in words. */
  procedure: string[];
}
