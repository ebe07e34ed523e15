/** Free ions and ion pairs of a speciated solution, as the solution block shows them. */
import type { PairSpecies } from "../speciation/ion-association";
import type { SolutionIon } from "./solution-ions";

interface SpeciesAmountResult {
  formula: string;
  charge: number;
  molality: number;
  molarity: number;
  gamma: number;
  activity: number;
}

interface IonPairResult extends SpeciesAmountResult {
  /** The ions that form the pair. */
  cation: string;
  anion: string;
  log10K: number;
  source: string;
}

export interface SpeciationResult {
  /** True ionic strength of free ions and charged pairs. */
  ionicStrengthMolal: number;
  free: SpeciesAmountResult[];
  pairs: IonPairResult[];
  note: string;
}

export function speciationResult(
  ions: readonly SolutionIon[],
  litresPerKgSolvent: number,
  s: {
    ionicStrengthMolal: number;
    freeMolality: number[];
    freeLnGamma: number[];
    pairs: PairSpecies[];
  },
): SpeciationResult {
  const sources = [...new Set(s.pairs.map((p) => p.source))].join("; ");
  return {
    ionicStrengthMolal: s.ionicStrengthMolal,
    free: ions.map((ion, i) => {
      const gamma = Math.exp(s.freeLnGamma[i]);
      return {
        formula: ion.formula,
        charge: ion.charge,
        molality: s.freeMolality[i],
        molarity: s.freeMolality[i] / litresPerKgSolvent,
        gamma,
        activity: gamma * s.freeMolality[i],
      };
    }),
    pairs: s.pairs.map((p) => {
      const gamma = Math.exp(p.lnGamma);
      return {
        formula: p.formula,
        charge: p.charge,
        molality: p.molality,
        molarity: p.molality / litresPerKgSolvent,
        gamma,
        activity: gamma * p.molality,
        cation: ions[p.cation].formula,
        anion: ions[p.anion].formula,
        log10K: p.log10K,
        source: p.source,
      };
    }),
    note: `Ion pairs speciated (association constants: ${sources}); γ± of each salt is the stoichiometric value, and each ion's activity is that of its free form.${s.pairs.some((p) => p.charge !== 0) ? " Charged pairs take the ion size the model assumes for an untabulated ion of their charge." : ""}`,
  };
}
