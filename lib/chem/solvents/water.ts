/**
 * Properties of liquid water at 1 atm, 0–100 °C, from published correlations.
 *
 * - Relative permittivity: Malmberg & Maryott (1956), J. Res. Natl. Bur. Stand. 56, 1–8,
 *   εr(t) = 87.740 − 0.40008 t + 9.398e-4 t² − 1.410e-6 t³  (t in °C, 0–100 °C).
 * - Relative permittivity for the Pitzer model: Bradley & Pitzer (1979), J. Phys. Chem. 83,
 *   1599–1603 (the εr behind the Aφ the Pitzer temperature functions were fitted with; see
 *   models/pitzer/water-a-phi.ts). Coefficients as in PHREEQC src (calc_dielectrics).
 * - Density: Kell (1975), J. Chem. Eng. Data 20, 97–105, 1 atm equation (0–150 °C), with
 *   Kell's denominator coefficient 16.879850e-3 (a transposed 16.897850e-3 circulates; it
 *   gives densities 0.03 % low).
 */
import { ChemInputError } from "../errors";

export const WATER_TEMPERATURE_RANGE_C = { min: 0, max: 100 } as const;

/** Malmberg & Maryott (1956) polynomial coefficients, t in °C. */
const MALMBERG_MARYOTT_1956 = [87.74, -0.40008, 9.398e-4, -1.41e-6] as const;

/** Bradley & Pitzer (1979) u1…u9: εr(1000 bar) = u1 exp(u2 T + u3 T²), C = u4 + u5/(u6 + T), B = u7 + u8/T + u9 T. */
const BRADLEY_PITZER_1979 = [
  342.79, -5.0866e-3, 9.469e-7, -2.0525, 3115.9, -182.89, -8032.5, 4.2142e6, 2.1417,
] as const;
/** 1 atm in bar. */
const ONE_ATMOSPHERE_BAR = 1.01325;

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

/**
 * εr of water at 1 atm, Bradley & Pitzer (1979): εr = εr(1000 bar) + C ln((B + p)/(B + 1000)),
 * p in bar. Within 0.1 % of Archer & Wang (1990) at 0–100 °C; Malmberg & Maryott (1956) is up
 * to 0.5 % above both at 100 °C.
 */
export function waterRelativePermittivityBradleyPitzer(temperatureC: number): number {
  assertWaterTemperature(temperatureC);
  const [u1, u2, u3, u4, u5, u6, u7, u8, u9] = BRADLEY_PITZER_1979;
  const T = temperatureC + 273.15;
  const at1000Bar = u1 * Math.exp(T * (u2 + T * u3));
  const c = u4 + u5 / (u6 + T);
  const b = u7 + u8 / T + u9 * T;
  return at1000Bar + c * Math.log((b + ONE_ATMOSPHERE_BAR) / (b + 1000));
}

/** Density of water in g/mL (= g/cm³) at 1 atm, Kell (1975). */
export function waterDensityGPerMl(temperatureC: number): number {
  assertWaterTemperature(temperatureC);
  const kgPerM3 =
    polynomial(KELL_1975_NUMERATOR, temperatureC) / (1 + KELL_1975_DENOMINATOR * temperatureC);
  return kgPerM3 / 1000;
}
