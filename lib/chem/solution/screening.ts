/**
 * Ionic strength on both scales and Debye screening (charge balance: charge-balance.ts):
 *   I = ½ Σ mi zi²  (mol/kg),  I_c = ½ Σ ci zi²  (mol/L)
 *   κ² = 2 N_A e² I_c / (ε0 εr k T)   with I_c in mol/m³;  Debye length λ_D = 1/κ
 * (the general expression for any solvent; CODATA 2018 constants).
 */
import {
  AVOGADRO_PER_MOL,
  BOLTZMANN_J_PER_K,
  ELEMENTARY_CHARGE_C,
  VACUUM_PERMITTIVITY_F_PER_M,
  kelvin,
} from "../constants";

export interface IonAmount {
  formula: string;
  charge: number;
  molality: number;
  molarity: number;
}

export function ionicStrength(ions: readonly IonAmount[]): { molal: number; molar: number } {
  let molal = 0;
  let molar = 0;
  for (const ion of ions) {
    const z2 = ion.charge * ion.charge;
    molal += ion.molality * z2;
    molar += ion.molarity * z2;
  }
  return { molal: molal / 2, molar: molar / 2 };
}

/** κ in nm⁻¹ from the molar ionic strength. */
export function kappaPerNm(
  ionicStrengthMolar: number,
  relativePermittivity: number,
  temperatureC: number,
): number {
  const molPerM3 = ionicStrengthMolar * 1000;
  const kappaPerM = Math.sqrt(
    (2 * AVOGADRO_PER_MOL * ELEMENTARY_CHARGE_C ** 2 * molPerM3) /
      (VACUUM_PERMITTIVITY_F_PER_M *
        relativePermittivity *
        BOLTZMANN_J_PER_K *
        kelvin(temperatureC)),
  );
  return kappaPerM * 1e-9;
}

/** Bjerrum length e² / (4π ε0 εr k T) in nm: the distance at which ion–ion energy equals kT. */
export function bjerrumLengthNm(relativePermittivity: number, temperatureC: number): number {
  return (
    (ELEMENTARY_CHARGE_C ** 2 /
      (4 *
        Math.PI *
        VACUUM_PERMITTIVITY_F_PER_M *
        relativePermittivity *
        BOLTZMANN_J_PER_K *
        kelvin(temperatureC))) *
    1e9
  );
}

/**
 * In solvents of low permittivity most ions are paired (Bjerrum 1926, K. Dan. Vidensk.
 * Selsk. Mat.-Fys. Medd. 7, 1): below εr ≈ 20 free-ion models describe only a minority of
 * the salt (the threshold is common practice, no single source).
 */
export function ionPairingMessage(
  relativePermittivity: number,
  temperatureC: number,
  ionicStrengthMolar: number,
): string[] {
  if (relativePermittivity >= 20 || ionicStrengthMolar <= 1e-4) return [];
  return [
    `εr = ${relativePermittivity.toFixed(1)}: the Bjerrum length is ${bjerrumLengthNm(relativePermittivity, temperatureC).toFixed(1)} nm, so most ions are paired; free-ion activity coefficients and I overstate the dissociated salt.`,
  ];
}
