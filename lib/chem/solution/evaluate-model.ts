/**
 * Runs the activity model on the solution's ions, with ion-association speciation first when
 * the model is a free-ion model (the Debye–Hückel family) in water and asked for: such models
 * overestimate γ± of salts whose ions pair (2:2 sulfates above about 1 mmol/kg; Davies 1962,
 * Ion Association). Returns stoichiometric ln γ of every ion as entered, so that γ± of a salt
 * is the stoichiometric value published tables give.
 */
import type { ActivityModel, ActivityModelInput, ActivityModelOutput } from "../models/types";
import {
  associate,
  hasIonPairs,
  pairedFractionEstimate,
  type PairSpecies,
} from "../speciation/ion-association";

/** Above this estimated paired fraction, free-ion results without speciation are flagged. */
const PAIRING_MATTERS = 0.02;

interface SpeciationSummary {
  /** True ionic strength of free ions and charged pairs (mol/kg). */
  ionicStrengthMolal: number;
  freeMolality: number[];
  freeLnGamma: number[];
  pairs: PairSpecies[];
  iterations: number;
}

export interface ModelEvaluation {
  output: ActivityModelOutput;
  /** Stoichiometric ln γ of each ion of `input.ions`. */
  lnGamma: number[];
  /** Osmotic coefficient over the ions (stoichiometric basis), when the model gives one. */
  osmoticCoefficient?: number;
  speciation?: SpeciationSummary;
}

export function evaluateModel(
  model: ActivityModel,
  input: ActivityModelInput,
  ionAssociation: boolean,
): ModelEvaluation {
  if (ionAssociation && model.freeIon && input.solvent === "water" && hasIonPairs(input.ions)) {
    const { ions, ionicStrengthMolal, ...conditions } = input;
    void ionicStrengthMolal;
    const r = associate(ions, model, {
      ...conditions,
      options: { ...conditions.options, ionPairsSpeciated: true },
    });
    return {
      output: r.output,
      lnGamma: r.lnGammaStoichiometric,
      osmoticCoefficient: r.osmoticCoefficient,
      speciation: {
        ionicStrengthMolal: r.ionicStrengthMolal,
        freeMolality: r.freeMolality,
        freeLnGamma: r.freeLnGamma,
        pairs: r.pairs,
        iterations: r.iterations,
      },
    };
  }
  const output = model.compute(input);
  if (model.freeIon && input.solvent === "water" && hasIonPairs(input.ions)) {
    const estimate = pairedFractionEstimate(input.ions, input.temperatureC);
    if (estimate.fraction > PAIRING_MATTERS)
      output.validityMessages.push(
        `Ion association is off, but about ${Math.round(100 * Math.min(estimate.fraction, 1))} % of an ion would be paired as ${estimate.pair}: free-ion activity coefficients overestimate γ± here.`,
      );
  }
  return { output, lnGamma: output.lnGamma, osmoticCoefficient: output.osmoticCoefficient };
}
