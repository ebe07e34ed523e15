/**
 * Ion association with a free-ion activity model (the Debye–Hückel family): the ions pair as
 * M + L ⇌ ML with K(T) from data/ion-pairs-wateq4f.ts, and
 *   K = a_ML / (a_M a_L) = (γ_ML m_ML) / (γ_M m_M γ_L m_L),     T_i = m_i + Σ_{p ∋ i} m_p,
 * the γ of free ions and charged pairs from the model at the true ionic strength
 *   I = ½ (Σ free m_i z_i² + Σ charged pairs m_p z_p²),   neutral pairs γ = 1.
 * Mass balance (Newton, mass-balance.ts) and ionic strength are iterated to self-consistency.
 * Stoichiometric single-ion coefficients follow as γ_i,stoich = γ_i m_i / T_i, so that
 * a_i = γ_i m_i = γ_i,stoich T_i and γ± of each salt is the stoichiometric one the tables give.
 * The osmotic coefficient on the stoichiometric basis: Σ_true m φ_true = Σ_stoich m φ_stoich.
 */
import { ChemInputError } from "../errors";
import type {
  ActivityModel,
  ActivityModelInput,
  ActivityModelOutput,
  CommonFormCoefficients,
  ModelIon,
} from "../models/types";
import { ionKey, ionPair, log10AssociationConstant } from "./association-constants";
import type { IonPairRow } from "./data/ion-pairs-wateq4f";
import { commonFormLnGamma } from "../models/dh-common";
import {
  initialFreeEstimate,
  massBalanceSystem,
  solveMassBalance,
  type MassBalanceSystem,
  type PairLink,
} from "./mass-balance";

export interface PairSpecies {
  formula: string;
  charge: number;
  molality: number;
  lnGamma: number;
  log10K: number;
  source: string;
  /** Indices of the cation and the anion in the input ion list. */
  cation: number;
  anion: number;
}

export interface AssociationResult {
  freeMolality: number[];
  freeLnGamma: number[];
  /** ln of the stoichiometric single-ion γ, γ m_free / m_total. */
  lnGammaStoichiometric: number[];
  pairs: PairSpecies[];
  /** True ionic strength of free ions and charged pairs (mol/kg). */
  ionicStrengthMolal: number;
  /** Osmotic coefficient on the stoichiometric basis (ions as entered). */
  osmoticCoefficient: number;
  /** The model's output at the converged composition (validity, notes). */
  output: ActivityModelOutput;
  iterations: number;
}

const MAX_ITERATIONS = 100;
const I_TOLERANCE = 1e-9;

/** What depends only on the ions present (cached): the pairs, their charges, the species list. */
interface PairPlan {
  rows: IonPairRow[];
  links: PairLink[];
  pairCharge: number[];
  /** Index of each pair among the species passed to the model (−1: neutral, γ = 1). */
  speciesIndex: number[];
  /** Formula and charge of every species passed to the model: the ions, then charged pairs. */
  speciesTemplate: { formula: string; charge: number; pair?: boolean }[];
  /** log10 K and K at the temperature of the last call. */
  temperatureC: number;
  log10K: number[];
  K: number[];
  /** Mass-balance systems by the pattern of ions present (usually one). */
  systems: Map<string, MassBalanceSystem>;
  /** The model's common-form coefficients for these species, with what they depend on. */
  form?: { key: string; coefficients: CommonFormCoefficients };
}

const planCache = new Map<string, PairPlan>();

function planFor(ions: readonly ModelIon[]): PairPlan {
  let cacheKey = "";
  for (const ion of ions) cacheKey += ion.formula + "|" + ion.charge + ";";
  let plan = planCache.get(cacheKey);
  if (plan) return plan;
  const rows: IonPairRow[] = [];
  const links: PairLink[] = [];
  const keys = ions.map((i) => ionKey(i.formula, i.charge));
  for (let c = 0; c < ions.length; c++) {
    if (ions[c].charge <= 0) continue;
    for (let a = 0; a < ions.length; a++) {
      if (ions[a].charge >= 0) continue;
      const row = ionPair(keys[c], keys[a]);
      if (row) {
        rows.push(row);
        links.push({ cation: c, anion: a });
      }
    }
  }
  const speciesTemplate: PairPlan["speciesTemplate"] = ions.map((i) => ({
    formula: i.formula,
    charge: i.charge,
  }));
  const pairCharge = links.map((l) => ions[l.cation].charge + ions[l.anion].charge);
  const speciesIndex = pairCharge.map((z, p) => {
    if (z === 0) return -1;
    speciesTemplate.push({ formula: rows[p].pair, charge: z, pair: true });
    return speciesTemplate.length - 1;
  });
  plan = {
    rows,
    links,
    pairCharge,
    speciesIndex,
    speciesTemplate,
    temperatureC: Number.NaN,
    log10K: [],
    K: [],
    systems: new Map(),
  };
  if (planCache.size > 256) planCache.clear();
  planCache.set(cacheKey, plan);
  return plan;
}

function constantsAt(plan: PairPlan, temperatureC: number): { log10K: number[]; K: number[] } {
  if (plan.temperatureC !== temperatureC) {
    plan.log10K = plan.rows.map((row) => log10AssociationConstant(row, temperatureC));
    plan.K = plan.log10K.map((x) => 10 ** x);
    plan.temperatureC = temperatureC;
  }
  return plan;
}

/** The Debye–Hückel family's coefficients (models/types.ts, commonForm), cached per plan. */
function commonFormFor(
  plan: PairPlan,
  model: ActivityModel,
  input: ActivityModelInput,
): CommonFormCoefficients | undefined {
  if (!model.commonForm) return undefined;
  const { constants, temperatureC, options } = input;
  // Everything the coefficients depend on besides the species: model, T, A, B, options.
  const key = `${model.id};${temperatureC};${constants.aLog10};${constants.bPerAngstrom};${options?.daviesCoefficient ?? ""}`;
  if (plan.form?.key !== key) plan.form = { key, coefficients: model.commonForm(input) };
  return plan.form.coefficients;
}

function systemFor(plan: PairPlan, totals: readonly number[]): MassBalanceSystem {
  let presence = "";
  for (const t of totals) presence += t > 0 ? "1" : "0";
  let system = plan.systems.get(presence);
  if (!system) {
    system = massBalanceSystem(totals, plan.links);
    if (plan.systems.size > 16) plan.systems.clear();
    plan.systems.set(presence, system);
  }
  return system;
}

/** True when some tabulated pair can form among the ions present. */
export function hasIonPairs(ions: readonly ModelIon[]): boolean {
  const plan = planFor(ions);
  return plan.links.some((l) => ions[l.cation].molality > 0 && ions[l.anion].molality > 0);
}

/**
 * Writes the free and charged-pair molalities into the model's species list (ions first, then
 * charged pairs at `speciesIndex`) and returns their ionic strength ½ Σ m z².
 */
function loadSpecies(
  species: ModelIon[],
  free: readonly number[],
  pairMolality: readonly number[],
  speciesIndex: readonly number[],
): number {
  let twiceI = 0;
  for (let i = 0; i < free.length; i++) {
    species[i].molality = free[i];
    twiceI += free[i] * species[i].charge * species[i].charge;
  }
  for (let p = 0; p < pairMolality.length; p++) {
    const k = speciesIndex[p];
    if (k < 0) continue;
    species[k].molality = pairMolality[p];
    twiceI += pairMolality[p] * species[k].charge * species[k].charge;
  }
  return twiceI / 2;
}

export function associate(
  ions: readonly ModelIon[],
  model: ActivityModel,
  conditions: Omit<ActivityModelInput, "ions" | "ionicStrengthMolal">,
): AssociationResult {
  const plan = planFor(ions);
  const n = ions.length;
  const np = plan.rows.length;
  let stoichiometricI = 0;
  for (const ion of ions) stoichiometricI += Math.max(ion.molality, 0) * ion.charge * ion.charge;
  stoichiometricI /= 2;
  const totals: number[] = [];
  for (let i = 0; i < n; i++) totals.push(Math.max(ions[i].molality, 0));
  const free = totals.slice();
  const { pairCharge, speciesIndex } = plan;
  const { log10K, K } = constantsAt(plan, conditions.temperatureC);
  // One object shape for every species (the loops below read and write them each step).
  const species: ModelIon[] = plan.speciesTemplate.map((t) => ({
    formula: t.formula,
    charge: t.charge,
    molality: 0,
    pair: t.pair === true,
  }));
  const ns = species.length;
  const kPrime = new Array<number>(np).fill(0);
  const pairMolality = new Array<number>(np).fill(0);
  const system = systemFor(plan, totals);
  // The Debye–Hückel family gives its coefficients once; any other model is called each step.
  const input: ActivityModelInput = {
    ions: species,
    ionicStrengthMolal: 0,
    temperatureC: conditions.temperatureC,
    solvent: conditions.solvent,
    constants: conditions.constants,
    options: conditions.options,
  };
  const form = commonFormFor(plan, model, input);
  const formLnGamma = new Array<number>(ns).fill(0);
  // Fixed point in I: γ(I) → K′ → mass balance → true I; secant steps on g(I) − I once two
  // points are known (plain substitution takes about twice as many model evaluations).
  let I = loadSpecies(species, free, pairMolality, speciesIndex);
  let previousI = Number.NaN;
  let previousResidual = Number.NaN;
  let iterations = 0;
  let converged = false;
  for (; iterations < MAX_ITERATIONS; iterations++) {
    const lnGamma = form
      ? commonFormLnGamma(conditions.constants.aLog10, species, form, I, formLnGamma)
      : model.compute({ ...input, ionicStrengthMolal: I }).lnGamma;
    for (let p = 0; p < np; p++) {
      const { cation, anion } = plan.links[p];
      const lnGammaPair = speciesIndex[p] >= 0 ? lnGamma[speciesIndex[p]] : 0;
      kPrime[p] = K[p] * Math.exp(lnGamma[cation] + lnGamma[anion] - lnGammaPair);
    }
    if (iterations === 0) initialFreeEstimate(system, totals, free, kPrime);
    if (!solveMassBalance(system, totals, free, kPrime)) break;
    for (let p = 0; p < np; p++) {
      const { cation, anion } = plan.links[p];
      pairMolality[p] = kPrime[p] * free[cation] * free[anion];
    }
    const trueI = loadSpecies(species, free, pairMolality, speciesIndex);
    const residual = trueI - I;
    if (Math.abs(residual) <= I_TOLERANCE * Math.max(trueI, 1e-12)) {
      converged = true;
      break;
    }
    let nextI = trueI;
    if (Number.isFinite(previousResidual) && residual !== previousResidual) {
      const secant = I - (residual * (I - previousI)) / (residual - previousResidual);
      if (secant > 0 && Number.isFinite(secant)) nextI = secant;
    }
    previousI = I;
    previousResidual = residual;
    I = nextI;
  }
  if (!converged || !Number.isFinite(I)) {
    throw new ChemInputError(
      "The ion-pair speciation did not converge for this composition; switch ion association off or check the amounts.",
      { field: "components", code: "speciation_failed" },
    );
  }
  // The model once more at the converged composition: its γ, φ, range and notes.
  input.ionicStrengthMolal = I;
  input.rangeIonicStrengthMolal = stoichiometricI;
  const output = model.compute(input);
  const lnGamma = output.lnGamma;
  const freeLnGamma = lnGamma.slice(0, n);
  const lnGammaStoichiometric = freeLnGamma.map((lg, i) =>
    totals[i] > 0 && free[i] > 0 ? lg + Math.log(free[i] / totals[i]) : lg,
  );
  const pairs: PairSpecies[] = plan.rows.map((row, p) => ({
    formula: row.pair,
    charge: pairCharge[p],
    molality: pairMolality[p],
    lnGamma: speciesIndex[p] >= 0 ? lnGamma[speciesIndex[p]] : 0,
    log10K: log10K[p],
    source: row.source,
    cation: plan.links[p].cation,
    anion: plan.links[p].anion,
  }));
  // φ of the model covers the charged species passed to it; neutral pairs count as ideal.
  let chargedSum = 0;
  for (const s of species) chargedSum += s.molality;
  let neutralSum = 0;
  let stoichSum = 0;
  for (let p = 0; p < np; p++) if (speciesIndex[p] < 0) neutralSum += pairMolality[p];
  for (let i = 0; i < n; i++) stoichSum += totals[i];
  const phiTrue = output.osmoticCoefficient ?? 1;
  const osmoticCoefficient = stoichSum > 0 ? (chargedSum * phiTrue + neutralSum) / stoichSum : 1;
  return {
    freeMolality: free,
    freeLnGamma,
    lnGammaStoichiometric,
    pairs,
    ionicStrengthMolal: I,
    osmoticCoefficient,
    output,
    iterations,
  };
}

/**
 * Largest fraction of an ion that would be paired, from K at 25 °C-free conditions and the
 * totals (γ = 1): a quick estimate for saying, when association is off, that it matters.
 */
export function pairedFractionEstimate(
  ions: readonly ModelIon[],
  temperatureC: number,
): { fraction: number; pair: string } {
  const plan = planFor(ions);
  const { K: constants } = constantsAt(plan, temperatureC);
  let best = { fraction: 0, pair: "" };
  plan.links.forEach((l, p) => {
    const K = constants[p];
    const mc = Math.max(ions[l.cation].molality, 0);
    const ma = Math.max(ions[l.anion].molality, 0);
    const paired = K * mc * ma;
    // The ion in short supply bounds the pair: report its paired fraction.
    const fraction = Math.min(1, paired / Math.max(Math.min(mc, ma), 1e-300));
    if (fraction > best.fraction) best = { fraction, pair: plan.rows[p].pair };
  });
  return best;
}
