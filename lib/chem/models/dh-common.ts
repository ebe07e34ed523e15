/** Pieces shared by the Debye–Hückel family of models. */
import { LN10 } from "../constants";
import type { ActivityModelInput, ModelIon } from "./types";

/** Number formatted for a KaTeX formula (4 significant figures, no exponent noise). */
export function texNumber(value: number): string {
  if (value === 0) return "0";
  const abs = Math.abs(value);
  if (abs >= 1e-3 && abs < 1e4) return String(Number(value.toPrecision(4)));
  const [mantissa, exponent] = value.toExponential(3).split("e");
  return `${Number(mantissa)}\\times10^{${Number(exponent)}}`;
}

export function log10ToLn(log10Gamma: number): number {
  return log10Gamma * LN10;
}

export function ionicStrengthMessage(label: string, maxIonicStrengthMolal: number, input: ActivityModelInput): string[] {
  if (input.ionicStrengthMolal <= maxIonicStrengthMolal) return [];
  return [
    `${label} is documented up to I = ${maxIonicStrengthMolal} mol/kg; this solution has I = ${texNumber(input.ionicStrengthMolal)} mol/kg, so its activity coefficients are extrapolated.`,
  ];
}

export function waterOnlyNote(label: string, what: string, solvent: string): string[] {
  return solvent === "water" ? [] : [`${label}: ${what} were fitted for water; for ${solvent} they are an extrapolation.`];
}

/** Largest cation charge × largest anion charge magnitude among the ions present. */
export function chargeProductMagnitude(ions: readonly ModelIon[]): number {
  let zPlus = 0;
  let zMinus = 0;
  for (const ion of ions) {
    if (ion.molality <= 0) continue;
    if (ion.charge > zPlus) zPlus = ion.charge;
    if (-ion.charge > zMinus) zMinus = -ion.charge;
  }
  return Math.max(zPlus, 1) * Math.max(zMinus, 1);
}

export function substitutedCore(input: ActivityModelInput): { A: string; B: string; I: string; sqrtI: string } {
  return {
    A: texNumber(input.constants.aLog10),
    B: texNumber(input.constants.bPerAngstrom),
    I: texNumber(input.ionicStrengthMolal),
    sqrtI: texNumber(Math.sqrt(input.ionicStrengthMolal)),
  };
}

/**
 * Ions of charge ≥ 2 with counter-ions associate (NaSO4⁻, KSO4⁻, MgSO4⁰): free-ion models
 * without speciation then overestimate stoichiometric γ± (CRC K2SO4 and Na2SO4 data are
 * 5–15 % below the Debye–Hückel family at I = 0.05–0.3 mol/kg; see tests). Above this
 * ionic strength the result says so.
 */
export const ION_ASSOCIATION_ONSET_MOLAL = 0.05;

export function ionAssociationMessage(input: ActivityModelInput): string[] {
  if (input.ionicStrengthMolal <= ION_ASSOCIATION_ONSET_MOLAL) return [];
  const multivalentAnions = input.ions.filter((i) => i.charge <= -2 && i.molality > 0).map((i) => i.formula);
  if (multivalentAnions.length === 0 || !input.ions.some((i) => i.charge > 0 && i.molality > 0)) return [];
  return [`${multivalentAnions.join(", ")} form ion pairs with cations above I ≈ ${ION_ASSOCIATION_ONSET_MOLAL} mol/kg; without speciation these free-ion activity coefficients overestimate γ±.`];
}
