/**
 * The Pitzer ion-interaction model as an `ActivityModel` (equations in equations.ts,
 * parameters in data/, selection rules in parameter-tables.ts). Valid for aqueous solutions
 * up to the fitted molality of each salt present (typically 2–6 mol/kg), at 0–100 °C where a
 * temperature function is published, 10–40 °C with first-order derivatives, 25 °C otherwise.
 * In a solution it uses the Aφ the temperature functions were fitted with (water-a-phi.ts).
 */
import { ChemInputError } from "../../errors";
import type { ActivityModel, ActivityModelInput, ActivityModelOutput } from "../types";
import { assemblePitzerSystem } from "./assemble";
import { pitzerMixture } from "./equations";
import { pitzerWaterAPhi } from "./water-a-phi";

const PITZER_FORMULA_TEX = String.raw`\ln\gamma_M = z_M^2 F + \sum_a m_a (2B_{Ma} + Z C_{Ma}) + \sum_c m_c \big(2\Phi_{Mc} + \sum_a m_a \psi_{Mca}\big) + \sum_{a<a'} m_a m_{a'} \psi_{Maa'} + |z_M| \sum_c \sum_a m_c m_a C_{ca}`;

function checkInput(input: ActivityModelInput): void {
  if (input.solvent !== "water") {
    throw new ChemInputError(
      `The Pitzer parameters in Ionleaf are for water; they do not apply to ${input.solvent}.`,
      { field: "solvent", code: "model_not_applicable" },
    );
  }
  const aPhi = input.constants?.aPhi;
  if (!(typeof aPhi === "number" && Number.isFinite(aPhi) && aPhi > 0)) {
    throw new ChemInputError("The Debye–Hückel osmotic parameter Aφ must be a positive number.", {
      field: "constants.aPhi",
      code: "invalid_constant",
    });
  }
  input.ions.forEach((ion, i) => {
    if (!(Number.isFinite(ion.molality) && ion.molality >= 0)) {
      throw new ChemInputError(
        `Molality of ${ion.formula} must be a finite, non-negative number.`,
        {
          field: `ions[${i}].molality`,
          code: "invalid_amount",
        },
      );
    }
    if (!Number.isInteger(ion.charge)) {
      throw new ChemInputError(`Charge of ${ion.formula} must be a whole number.`, {
        field: `ions[${i}].charge`,
        code: "invalid_charge",
      });
    }
  });
}

export function computePitzer(input: ActivityModelInput): ActivityModelOutput {
  checkInput(input);
  const assembly = assemblePitzerSystem(input.ions, input.temperatureC, input.ionicStrengthMolal);
  const validityMessages = [...assembly.validityMessages];
  if (assembly.missingPairs.length > 0) {
    validityMessages.push(
      `No Pitzer parameters for ${assembly.missingPairs.join(", ")}: those interactions are taken as zero, ` +
        `so the result is closer to the Debye–Hückel limit for them than it should be.`,
    );
  }
  const result = pitzerMixture(assembly.system, input.constants.aPhi);
  const lnGamma = input.ions.map((_, i) => {
    const c = assembly.cationIndexOf[i];
    const a = assembly.anionIndexOf[i];
    if (c >= 0) return result.lnGammaCations[c];
    if (a >= 0) return result.lnGammaAnions[a];
    return 0;
  });
  const waterActivity = Math.exp(result.lnWaterActivity);
  if (
    !lnGamma.every(Number.isFinite) ||
    !Number.isFinite(result.osmoticCoefficient) ||
    !Number.isFinite(waterActivity)
  ) {
    throw new ChemInputError("The Pitzer model could not be evaluated for this composition.", {
      field: "ions",
      code: "model_failed",
    });
  }
  return {
    lnGamma,
    osmoticCoefficient: result.osmoticCoefficient,
    waterActivity,
    validityMessages,
    notes: [
      ...assembly.notes,
      "Unsymmetrical mixing terms Eθ, Eθ′ from J(x) of Pitzer (1975), closed-form approximation.",
    ],
  };
}

/**
 * The model as a solution computes it: in water with the Aφ of Bradley & Pitzer's (1979)
 * permittivity (water-a-phi.ts) instead of the shared Debye–Hückel constants.
 */
function computePitzerInSolution(input: ActivityModelInput): ActivityModelOutput {
  if (input.solvent !== "water") return computePitzer(input);
  return computePitzer({
    ...input,
    constants: { ...input.constants, aPhi: pitzerWaterAPhi(input.temperatureC) },
  });
}

export const pitzerModel: ActivityModel = {
  id: "pitzer",
  label: "Pitzer ion interaction",
  formulaTex: PITZER_FORMULA_TEX,
  compute: computePitzerInSolution,
  validityNote:
    "Aqueous solutions up to each salt's fitted molality (typically 2–6 mol/kg; May et al. 2011), at 0–100 °C where a published temperature function exists (e.g. NaCl, KCl, CaCl2, MgCl2, the sulfates, NaOH, KOH; HCl 0–55 °C; nitrates and NaClO4 0–50 °C), 10–40 °C with first-order derivatives (Silvester & Pitzer 1978; Pitzer 1991), 25 °C otherwise.",
};
