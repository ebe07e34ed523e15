/**
 * Density of an aqueous electrolyte solution, Laliberté & Cooper (2004) J. Chem. Eng. Data
 * 49, 1141, eqs. 1 and 8: each solute i has an apparent density
 *   ρ_app,i = (c0 (1 − w_w) + c1) exp(10⁻⁶ (t + c4)²) / ((1 − w_w) + c2 + c3 t)     (kg/m³, t in °C)
 * and the solution's specific volume is the mass-weighted sum
 *   1/ρ = w_w/ρ_w + Σ w_i/ρ_app,i,
 * with w the mass fractions and ρ_w the density of water at t (Kell 1975, solvents/water.ts;
 * the same equation Laliberté uses). Coefficients: data/laliberte-2009.ts.
 */
import { waterDensityGPerMl } from "../solvents/water";
import { LALIBERTE_2009_DENSITY, type LaliberteRow } from "./data/laliberte-2009";

const BY_SALT = new Map(LALIBERTE_2009_DENSITY.map((row) => [row.salt, row]));

export function laliberteRow(saltFormula: string): LaliberteRow | undefined {
  return BY_SALT.get(saltFormula);
}

function apparentDensityKgPerM3(row: LaliberteRow, soluteFraction: number, t: number): number {
  const [c0, c1, c2, c3, c4] = row.c;
  return (
    ((c0 * soluteFraction + c1) * Math.exp(1e-6 * (t + c4) ** 2)) / (soluteFraction + c2 + c3 * t)
  );
}

/** Solution density (g/mL) from the solutes' mass fractions (same order as `rows`). */
export function laliberteDensityGPerMl(
  rows: readonly LaliberteRow[],
  massFractions: readonly number[],
  temperatureC: number,
): number {
  let soluteFraction = 0;
  for (const w of massFractions) soluteFraction += w;
  const waterFraction = 1 - soluteFraction;
  let specificVolume = waterFraction / (waterDensityGPerMl(temperatureC) * 1000);
  rows.forEach((row, i) => {
    if (massFractions[i] > 0)
      specificVolume +=
        massFractions[i] / apparentDensityKgPerM3(row, soluteFraction, temperatureC);
  });
  return 1 / specificVolume / 1000;
}
