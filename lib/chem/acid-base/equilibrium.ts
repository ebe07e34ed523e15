/**
 * Acid–base equilibrium in water on the molal scale. For a system with species 0…n
 * (charge z_k = z_0 − k) and thermodynamic constants K_k = a(H+) a_k / a_(k−1):
 *   log10(m_k/m_0) = Σ_{j≤k} (pH − pKa_j) + log10 γ_0 − log10 γ_k
 * Charge balance Σ z m = 0 fixes pH (bisection: the balance falls monotonically with pH);
 * γ depend on I, which depends on the speciation, so the two are iterated to self-consistency.
 */
import { ChemInputError } from "../errors";
import { type AcidSystemData } from "./data/pka-goldberg-2002";

export interface SystemAtT {
  data: AcidSystemData;
  /** pKa of each step at the solution's temperature (I = 0). */
  pKa: number[];
  totalMolal: number;
}

export interface IonAmount {
  formula: string;
  charge: number;
  molality: number;
}

export interface EquilibriumState {
  pH: number;
  ionicStrengthMolal: number;
  /** H+, OH−, every buffer species and every fixed ion, molal. */
  species: IonAmount[];
  iterations: number;
}

export type Log10Gamma = (charge: number) => number;

/** Molalities of a system's species at a given pH and γ. */
export function distribute(system: SystemAtT, pH: number, log10Gamma: Log10Gamma): number[] {
  const n = system.data.species.length;
  const z0 = system.data.charge0;
  const logRel = new Array<number>(n);
  logRel[0] = 0;
  for (let k = 1; k < n; k++)
    logRel[k] =
      logRel[k - 1] + (pH - system.pKa[k - 1]) + log10Gamma(z0 - k + 1) - log10Gamma(z0 - k);
  const top = Math.max(...logRel);
  let sum = 0;
  const w = logRel.map((x) => {
    const v = Math.pow(10, x - top);
    sum += v;
    return v;
  });
  return w.map((v) => (system.totalMolal * v) / sum);
}

export function ionicStrengthOf(species: readonly IonAmount[]): number {
  let s = 0;
  for (const i of species) s += i.molality * i.charge * i.charge;
  return s / 2;
}

/** H+ and OH− molalities at a pH. */
export function waterIons(pH: number, pKw: number, log10Gamma: Log10Gamma): IonAmount[] {
  return [
    { formula: "H+", charge: 1, molality: Math.pow(10, -pH - log10Gamma(1)) },
    { formula: "OH-", charge: -1, molality: Math.pow(10, pH - pKw - log10Gamma(-1)) },
  ];
}

function speciesAt(
  systems: readonly SystemAtT[],
  fixedIons: readonly IonAmount[],
  pH: number,
  pKw: number,
  log10Gamma: Log10Gamma,
): IonAmount[] {
  const out: IonAmount[] = [...waterIons(pH, pKw, log10Gamma)];
  for (const s of systems) {
    const m = distribute(s, pH, log10Gamma);
    s.data.species.forEach((formula, k) =>
      out.push({ formula, charge: s.data.charge0 - k, molality: m[k] }),
    );
  }
  for (const f of fixedIons) out.push({ ...f });
  return out;
}

const PH_LOW = -2;
const PH_HIGH = 16;
/** A root this close to a search bound is not a root: the bound was hit. */
const BOUND_MARGIN = 1e-6;

/** The pH at which the solution is electrically neutral, for fixed γ. */
function neutralPH(
  systems: readonly SystemAtT[],
  fixedIons: readonly IonAmount[],
  pKw: number,
  log10Gamma: Log10Gamma,
): number {
  const balance = (pH: number) =>
    speciesAt(systems, fixedIons, pH, pKw, log10Gamma).reduce(
      (a, i) => a + i.charge * i.molality,
      0,
    );
  let lo = PH_LOW;
  let hi = PH_HIGH;
  for (let i = 0; i < 80 && hi - lo > 1e-12; i++) {
    const mid = (lo + hi) / 2;
    if (balance(mid) > 0) lo = mid;
    else hi = mid;
  }
  const pH = (lo + hi) / 2;
  if (!Number.isFinite(pH) || pH - PH_LOW < BOUND_MARGIN || PH_HIGH - pH < BOUND_MARGIN) {
    throw new ChemInputError(
      `No pH between ${PH_LOW} and ${PH_HIGH} balances the charges of this composition; check the amounts (an excess of strong acid or base beyond that range is not an aqueous buffer).`,
      { field: "components", code: "no_solution" },
    );
  }
  return pH;
}

/** pH and speciation, iterated with I to self-consistency. */
export function solveEquilibrium(
  systems: readonly SystemAtT[],
  fixedIons: readonly IonAmount[],
  pKw: number,
  gammaAt: (ionicStrengthMolal: number) => Log10Gamma,
): EquilibriumState {
  let I = ionicStrengthOf(fixedIons);
  let pH = 7;
  for (let it = 1; it <= 100; it++) {
    const g = gammaAt(I);
    pH = neutralPH(systems, fixedIons, pKw, g);
    const species = speciesAt(systems, fixedIons, pH, pKw, g);
    const nextI = ionicStrengthOf(species);
    if (Math.abs(nextI - I) <= 1e-12 * Math.max(1, I))
      return { pH, ionicStrengthMolal: nextI, species, iterations: it };
    I = nextI;
  }
  throw new ChemInputError(
    "The speciation did not converge (pH and ionic strength did not settle in 100 iterations) for this composition.",
    { field: "components", code: "model_failed" },
  );
}
