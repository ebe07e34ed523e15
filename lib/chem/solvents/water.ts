/**
 * Properties of liquid water at 1 atm, 0–100 °C, from published correlations.
 *
 * - Relative permittivity: Malmberg & Maryott (1956), J. Res. Natl. Bur. Stand. 56, 1–8,
 *   εr(t) = 87.740 − 0.40008 t + 9.398e-4 t² − 1.410e-6 t³  (t in °C, 0–100 °C).
 * - Density: Kell (1975), J. Chem. Eng. Data 20, 97–105, 1 atm equation (0–150 °C), with
 *   Kell's denominator coefficient 16.879850e-3 (a transposed 16.897850e-3 circulates; it
 *   gives densities 0.03 % low).
 */
import { ChemInputError } from "../errors";

export const WATER_TEMPERATURE_RANGE_C = { min: 0, max: 100 } as const;

/** Malmberg & Maryott (1956) polynomial coefficients, t in °C. */
const MALMBERG_MARYOTT_1956 = [87.74, -0.40008, 9.398e-4, -1.41e-6] as const;

/** Kell (1975) numerator coefficients (kg/m³, t in °C) and denominator coefficient. */
const KELL_1975_NUMERATOR = [
  999.83952, 16.945176, -7.9870401e-3, -46.170461e-6, 105.56302e-9, -280.54253e-12,
] as const;
const KELL_1975_DENOMINATOR = 16.87985e-3;

function polynomial(coefficients: readonly number[], x: number): number {
  let value = 0;
  for (let i = coefficients.length - 1; i >= 0; i--) value = value * x + coefficients[i];
  return value;
}

function assertWaterTemperature(temperatureC: number): void {
  const { min, max } = WATER_TEMPERATURE_RANGE_C;
  if (!Number.isFinite(temperatureC) || temperatureC < min || temperatureC > max) {
    throw new ChemInputError(
      `Temperature ${temperatureC} °C is outside the range of the water correlations (${min}–${max} °C at 1 atm).`,
      { field: "temperatureC", code: "temperature_out_of_range" },
    );
  }
}

/** εr of water, Malmberg & Maryott (1956). */
export function waterRelativePermittivity(temperatureC: number): number {
  assertWaterTemperature(temperatureC);
  return polynomial(MALMBERG_MARYOTT_1956, temperatureC);
}

/** Density of water in g/mL (= g/cm³) at 1 atm, Kell (1975). */
export function waterDensityGPerMl(temperatureC: number): number {
  assertWaterTemperature(temperatureC);
  const kgPerM3 =
    polynomial(KELL_1975_NUMERATOR, temperatureC) / (1 + KELL_1975_DENOMINATOR * temperatureC);
  return kgPerM3 / 1000;
}
