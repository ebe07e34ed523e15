/**
 * pKa at temperature from the 25 °C values with constant ΔrCp° (integrated van 't Hoff;
 * Goldberg, Kishore & Lennen 2002, eq. 9):
 *   ln K(T) = ln K(θ) − (ΔrH°/R)(1/T − 1/θ) + (ΔrCp°/R)(θ/T − 1 + ln(T/θ)),  θ = 298.15 K
 */
import { GAS_CONSTANT_J_PER_MOL_K, ZERO_CELSIUS_K } from "../constants";
import type { DissociationStep } from "./data/pka-goldberg-2002";

const THETA_K = 298.15;

export function pKaAt(step: DissociationStep, temperatureC: number): number {
  const T = temperatureC + ZERO_CELSIUS_K;
  const R = GAS_CONSTANT_J_PER_MOL_K;
  const lnK25 = -step.pKa25 * Math.LN10;
  const lnK =
    lnK25 -
    ((step.deltaHkJPerMol * 1000) / R) * (1 / T - 1 / THETA_K) +
    (step.deltaCpJPerMolK / R) * (THETA_K / T - 1 + Math.log(T / THETA_K));
  return -lnK / Math.LN10;
}
