/**
 * Viscosity of liquid water at 1 atm, 0–100 °C, from the two correlations the CRC Handbook
 * of Chemistry and Physics printed with its "Viscosity of water" table (from memory; checked
 * against that table's values at 0, 25, 50 and 100 °C within 0.4 %, see
 * tests/unit/chem/water-viscosity.test.ts):
 *   0–20 °C:   log10(η / mPa·s) = 1301 / (998.333 + 8.1855 (t − 20) + 0.00585 (t − 20)²) − 1.30233
 *   20–100 °C: log10(η / η₂₀) = (1.3272 (20 − t) − 0.001053 (t − 20)²) / (t + 105),  η₂₀ = 1.002 mPa·s
 * Used for Walden's rule (λ°η ≈ constant) and Stokes–Einstein scaling (D ∝ T/η).
 */
import { ChemInputError } from "../errors";
import { WATER_TEMPERATURE_RANGE_C } from "./water";

const VISCOSITY_20C_MPA_S = 1.002;

/** The range of the water correlations (0–100 °C at 1 atm), as a ChemInputError outside it. */
export function assertLiquidWaterTemperature(temperatureC: number): void {
  const { min, max } = WATER_TEMPERATURE_RANGE_C;
  if (
    typeof temperatureC !== "number" ||
    !Number.isFinite(temperatureC) ||
    temperatureC < min ||
    temperatureC > max
  )
    throw new ChemInputError(
      `Temperature ${temperatureC} °C is outside liquid water at 1 atm (${min}–${max} °C).`,
      {
        field: "temperatureC",
        code: "temperature_out_of_range",
      },
    );
}

export function waterViscosityMPaS(temperatureC: number): number {
  assertLiquidWaterTemperature(temperatureC);
  const dt = temperatureC - 20;
  if (temperatureC < 20)
    return 10 ** (1301 / (998.333 + 8.1855 * dt + 0.00585 * dt * dt) - 1.30233);
  return VISCOSITY_20C_MPA_S * 10 ** ((-1.3272 * dt - 0.001053 * dt * dt) / (temperatureC + 105));
}
