/**
 * Physical constants, CODATA 2018 recommended values
 * (Tiesinga, Mohr, Newell & Taylor 2021, Rev. Mod. Phys. 93, 025010).
 * e, N_A, k are exact since the 2019 SI redefinition; R = N_A k and F = N_A e follow.
 */
export const ELEMENTARY_CHARGE_C = 1.602176634e-19;
export const AVOGADRO_PER_MOL = 6.02214076e23;
export const BOLTZMANN_J_PER_K = 1.380649e-23;
/** ε0, CODATA 2018 (not exact after 2019; standard uncertainty 1.3e-21 F/m). */
export const VACUUM_PERMITTIVITY_F_PER_M = 8.8541878128e-12;
export const FARADAY_C_PER_MOL = AVOGADRO_PER_MOL * ELEMENTARY_CHARGE_C;
export const GAS_CONSTANT_J_PER_MOL_K = AVOGADRO_PER_MOL * BOLTZMANN_J_PER_K;
/** 0 °C in kelvin (definition of the Celsius scale). */
export const ZERO_CELSIUS_K = 273.15;
export const LN10 = Math.LN10;
/** Molar mass of water, kg/mol, from the IUPAC 2021 abridged standard atomic weights (2 × 1.008 + 15.999 g/mol). */
export const WATER_MOLAR_MASS_KG_PER_MOL = 0.018015;

export function kelvin(temperatureC: number): number {
  return temperatureC + ZERO_CELSIUS_K;
}
