/**
 * Ionization constant of water, H2O ⇌ H⁺ + OH⁻, on the molal scale at 1 bar, from the
 * analytical expression of WATEQ4F (Ball & Nordstrom 1991, U.S. Geol. Surv. Open-File Report
 * 91-183; public copy usgs-coupled/phreeqc3 database/wateq4f.dat, species OH-):
 *   log10 Kw = −283.971 − 0.05069842 T + 13323.0/T + 102.24447 log10 T − 1119669/T²   (T in K)
 * stated for 0–100 °C here (the water range of the engine).
 */
import { kelvin } from "../constants";

const WATEQ4F_LOG_KW = [-283.971, -0.05069842, 13323.0, 102.24447, -1119669.0] as const;

export const WATER_IONIZATION_SOURCE = "WATEQ4F (Ball & Nordstrom 1991) analytical log Kw(T)";

/** pKw = −log10 Kw at a temperature (°C). */
export function pKwAt(temperatureC: number): number {
  const T = kelvin(temperatureC);
  const [a1, a2, a3, a4, a5] = WATEQ4F_LOG_KW;
  return -(a1 + a2 * T + a3 / T + a4 * Math.log10(T) + a5 / (T * T));
}
