/**
 * Mean activity coefficient, osmotic coefficient and water activity of one salt M_νM X_νX in
 * water, from the mixture equations with just its two ions:
 *   ln γ± = (νM ln γM + νX ln γX)/(νM + νX)
 */
import { ChemInputError } from "../../errors";
import type { ActivityModelOutput } from "../types";
import { computePitzer } from "./pitzer-model";
import { saltIonicStrength, stoichiometry } from "./stoichiometry";

export interface BinarySaltInput {
  cation: string;
  cationCharge: number;
  anion: string;
  anionCharge: number;
  /** Molality of the salt (mol/kg). */
  molality: number;
  temperatureC: number;
  aPhi: number;
}

export interface BinarySaltResult extends ActivityModelOutput {
  meanActivityCoefficient: number;
}

function meanLnGamma(
  lnGammaCation: number,
  lnGammaAnion: number,
  cationCharge: number,
  anionCharge: number,
): number {
  const { nuCation, nuAnion } = stoichiometry(cationCharge, anionCharge);
  return (nuCation * lnGammaCation + nuAnion * lnGammaAnion) / (nuCation + nuAnion);
}

export function pitzerBinarySalt(input: BinarySaltInput): BinarySaltResult {
  if (!(input.cationCharge > 0 && input.anionCharge < 0)) {
    throw new ChemInputError(
      "A salt needs a cation (positive charge) and an anion (negative charge).",
      {
        field: "cationCharge",
        code: "invalid_charge",
      },
    );
  }
  const { nuCation, nuAnion } = stoichiometry(input.cationCharge, input.anionCharge);
  const mc = nuCation * input.molality;
  const ma = nuAnion * input.molality;
  const ionicStrengthMolal = saltIonicStrength(
    input.cationCharge,
    input.anionCharge,
    input.molality,
  );
  const out = computePitzer({
    ions: [
      { formula: input.cation, charge: input.cationCharge, molality: mc },
      { formula: input.anion, charge: input.anionCharge, molality: ma },
    ],
    ionicStrengthMolal,
    temperatureC: input.temperatureC,
    solvent: "water",
    // Pitzer uses only Aφ; aLog10 follows from it (A = 3Aφ/ln 10) and B is not used.
    constants: {
      temperatureK: input.temperatureC + 273.15,
      aLog10: (3 * input.aPhi) / Math.LN10,
      bPerAngstrom: Number.NaN,
      aPhi: input.aPhi,
    },
  });
  const meanActivityCoefficient = Math.exp(
    meanLnGamma(out.lnGamma[0], out.lnGamma[1], input.cationCharge, input.anionCharge),
  );
  return { ...out, meanActivityCoefficient };
}
