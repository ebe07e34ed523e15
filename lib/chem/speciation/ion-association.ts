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
  ModelIon,
} from "../models/types";
import { ionKey, ionPair, log10AssociationConstant } from "./association-constants";
import type { IonPairRow } from "./data/ion-pairs-wateq4f";
import { solveMassBalance, type PairLink } from "./mass-balance";

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
const I_TOLERANCE = 1e-11;

interface PairPlan {
  rows: IonPairRow[];
  links: PairLink[];
}

const planCache = new Map<string, PairPlan>();

function planFor(ions: readonly ModelIon[]): PairPlan {
  let cacheKey = "";
  for (const ion of ions) cacheKey += ion.formula + "|" + ion.charge + ";";
  let plan = planCache.get(cacheKey);
  if (plan) return plan;
  plan = { rows: [], links: [] };
  const keys = ions.map((i) => ionKey(i.formula, i.charge));
  for (let c = 0; c < ions.length; c++) {
    if (ions[c].charge <= 0) continue;
    for (let a = 0; a < ions.length; a++) {
      if (ions[a].charge >= 0) continue;
      const row = ionPair(keys[c], keys[a]);
      if (row) {
        plan.rows.push(row);
        plan.links.push({ cation: c, anion: a });
      }
    }
  }
  if (planCache.size > 256) planCache.clear();
  planCache.set(cacheKey, plan);
  return plan;
}

/** True when some tabulated pair can form among the ions present. */
export function hasIonPairs(ions: readonly ModelIon[]): boolean {
  const plan = planFor(ions);
  return plan.links.some((l) => ions[l.cation].molality > 0 && ions[l.anion].molality > 0);
}

export function associate(
  ions: readonly ModelIon[],
  model: ActivityModel,
  conditions: Omit<ActivityModelInput, "ions" | "ionicStrengthMolal">,
): AssociationResult {
  const plan = planFor(ions);
  const n = ions.length;
  let stoichiometricI = 0;
  for (const ion of ions) stoichiometricI += Math.max(ion.molality, 0) * ion.charge * ion.charge;
  stoichiometricI /= 2;
  const np = plan.rows.length;
  const totals = ions.map((i) => Math.max(i.molality, 0));
  const free = Float64Array.from(totals);
  const log10K = plan.rows.map((r) => log10AssociationConstant(r, conditions.temperatureC));
  const K = log10K.map((x) => 10 ** x);
  const pairCharge = plan.links.map((l) => ions[l.cation].charge + ions[l.anion].charge);
  const kPrime = new Float64Array(np);
  const pairMolality = new Float64Array(np);
  // Species passed to the model: every ion, then the charged pairs.
  const charged = plan.links.flatMap((_, p) => (pairCharge[p] !== 0 ? [p] : []));
  const species: ModelIon[] = [
    ...ions.map((i) => ({ ...i })),
    ...charged.map((p) => ({
      formula: plan.rows[p].pair,
      charge: pairCharge[p],
      molality: 0,
      pair: true,
    })),
  ];
  let I = Number.NaN;
  let output: ActivityModelOutput | null = null;
  let lnGamma: number[] = [];
  let iterations = 0;
  let failed = false;
  for (; iterations < MAX_ITERATIONS; iterations++) {
    let nextI = 0;
    for (let i = 0; i < n; i++) {
      species[i].molality = free[i];
      nextI += free[i] * ions[i].charge * ions[i].charge;
    }
    charged.forEach((p, k) => {
      species[n + k].molality = pairMolality[p];
      nextI += pairMolality[p] * pairCharge[p] * pairCharge[p];
    });
    nextI /= 2;
    if (Math.abs(nextI - I) <= I_TOLERANCE * Math.max(nextI, 1e-12) && output) break;
    I = nextI;
    output = model.compute({
      ...conditions,
      ions: species,
      ionicStrengthMolal: I,
      rangeIonicStrengthMolal: stoichiometricI,
    });
    lnGamma = output.lnGamma;
    for (let p = 0; p < np; p++) {
      const { cation, anion } = plan.links[p];
      const k = charged.indexOf(p);
      const lnGammaPair = k >= 0 ? lnGamma[n + k] : 0;
      kPrime[p] = K[p] * Math.exp(lnGamma[cation] + lnGamma[anion] - lnGammaPair);
    }
    if (!solveMassBalance(totals, free, plan.links, kPrime)) {
      failed = true;
      break;
    }
    for (let p = 0; p < np; p++) {
      const { cation, anion } = plan.links[p];
      pairMolality[p] = kPrime[p] * free[cation] * free[anion];
    }
  }
  if (failed || !output || iterations >= MAX_ITERATIONS || !Number.isFinite(I)) {
    throw new ChemInputError(
      "The ion-pair speciation did not converge for this composition; switch ion association off or check the amounts.",
      { field: "components", code: "speciation_failed" },
    );
  }
  const freeLnGamma = Array.from({ length: n }, (_, i) => lnGamma[i]);
  const lnGammaStoichiometric = freeLnGamma.map((lg, i) =>
    totals[i] > 0 && free[i] > 0 ? lg + Math.log(free[i] / totals[i]) : lg,
  );
  const pairs: PairSpecies[] = plan.rows.map((row, p) => {
    const k = charged.indexOf(p);
    return {
      formula: row.pair,
      charge: pairCharge[p],
      molality: pairMolality[p],
      lnGamma: k >= 0 ? lnGamma[n + k] : 0,
      log10K: log10K[p],
      source: row.source,
      cation: plan.links[p].cation,
      anion: plan.links[p].anion,
    };
  });
  // φ of the model covers the charged species passed to it; neutral pairs count as ideal.
  let chargedSum = 0;
  for (const s of species) chargedSum += s.molality;
  let neutralSum = 0;
  for (const pair of pairs) if (pair.charge === 0) neutralSum += pair.molality;
  let stoichSum = 0;
  for (const t of totals) stoichSum += t;
  const phiTrue = output.osmoticCoefficient ?? 1;
  const osmoticCoefficient = stoichSum > 0 ? (chargedSum * phiTrue + neutralSum) / stoichSum : 1;
  return {
    freeMolality: Array.from(free),
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
  let best = { fraction: 0, pair: "" };
  plan.links.forEach((l, p) => {
    const K = 10 ** log10AssociationConstant(plan.rows[p], temperatureC);
    const mc = Math.max(ions[l.cation].molality, 0);
    const ma = Math.max(ions[l.anion].molality, 0);
    const paired = K * mc * ma;
    // The ion in short supply bounds the pair: report its paired fraction.
    const fraction = Math.min(1, paired / Math.max(Math.min(mc, ma), 1e-300));
    if (fraction > best.fraction) best = { fraction, pair: plan.rows[p].pair };
  });
  return best;
}
