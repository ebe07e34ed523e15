/**
 * Debye–Hückel constants on the molality scale from the solvent's relative permittivity εr
 * and density ρ (the general expression, valid for any solvent; see e.g. Pitzer 1991,
 * Activity Coefficients in Electrolyte Solutions, ch. 3):
 *
 *   Aφ        = (1/3) (2π N_A ρ)^½ ( e² / (4π ε0 εr k T) )^{3/2}        (kg/mol)^½, ρ in kg/m³
 *   A (log10) = 3 Aφ / ln 10
 *   B         = ( 2 N_A ρ e² / (ε0 εr k T) )^½                         m⁻¹ (kg/mol)^½ → ×1e-10 per Å
 *
 * Constants: CODATA 2018. Water εr and ρ: Malmberg & Maryott (1956) and Kell (1975). The Pitzer
 * model in water takes Aφ from Bradley & Pitzer's (1979) εr instead (models/pitzer/water-a-phi.ts).
 *
 * Published A at 25 °C spans 0.5085–0.5115 with the permittivity used (εr 78.30–78.54).
 * This engine's choice gives A = 0.5108, B = 0.3287 Å⁻¹ and Aφ = 0.3921 at 25 °C, which
 * reproduce Robinson & Stokes (1959) App. 7.1 within 0.2 % over 0–100 °C (see tests).
 */
import {
  AVOGADRO_PER_MOL,
  BOLTZMANN_J_PER_K,
  ELEMENTARY_CHARGE_C,
  LN10,
  VACUUM_PERMITTIVITY_F_PER_M,
  kelvin,
} from "./constants";
import { ChemInputError } from "./errors";
import type { DebyeHuckelConstants } from "./models/types";
import { solventState } from "./solvents/properties";

export function debyeHuckelConstantsFrom(
  relativePermittivity: number,
  densityGPerMl: number,
  temperatureC: number,
): DebyeHuckelConstants {
  const temperatureK = kelvin(temperatureC);
  if (!(relativePermittivity >= 1 && relativePermittivity <= 1000))
    throw new ChemInputError("The relative permittivity must be a number from 1 to 1000.", {
      field: "relativePermittivity",
      code: "invalid_constant",
    });
  if (!(densityGPerMl > 0.01 && densityGPerMl <= 25))
    throw new ChemInputError("The solvent density must be a number from 0.01 to 25 g/mL.", {
      field: "densityGPerMl",
      code: "invalid_constant",
    });
  if (!(temperatureK >= 1 && temperatureK <= 2000))
    throw new ChemInputError("The temperature must be between −272 and 1727 °C.", {
      field: "temperatureC",
      code: "bad_temperature",
    });
  const rhoKgPerM3 = densityGPerMl * 1000;
  const e2 = ELEMENTARY_CHARGE_C * ELEMENTARY_CHARGE_C;
  const bjerrum =
    e2 /
    (4 *
      Math.PI *
      VACUUM_PERMITTIVITY_F_PER_M *
      relativePermittivity *
      BOLTZMANN_J_PER_K *
      temperatureK);
  const aPhi =
    (1 / 3) * Math.sqrt(2 * Math.PI * AVOGADRO_PER_MOL * rhoKgPerM3) * Math.pow(bjerrum, 1.5);
  const bPerMetre = Math.sqrt(
    (2 * AVOGADRO_PER_MOL * rhoKgPerM3 * e2) /
      (VACUUM_PERMITTIVITY_F_PER_M * relativePermittivity * BOLTZMANN_J_PER_K * temperatureK),
  );
  return { temperatureK, aLog10: (3 * aPhi) / LN10, bPerAngstrom: bPerMetre * 1e-10, aPhi };
}

/** A, B and Aφ (molal scale) for a catalogue solvent at a temperature. */
export function debyeHuckelConstants(
  temperatureC: number,
  solventId = "water",
): DebyeHuckelConstants {
  const state = solventState(solventId, temperatureC);
  return debyeHuckelConstantsFrom(state.relativePermittivity, state.densityGPerMl, temperatureC);
}
