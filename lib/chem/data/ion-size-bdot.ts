/**
 * Helgeson (1969) B-dot model, Am. J. Sci. 267, 729–804:
 *   log10 γ = −A z² √I / (1 + B å √I) + Ḃ I
 * with ion sizes å of the EQ3/6 data0 / llnl.dat database (largely Kielland 1937) and Ḃ from
 * its LLNL_AQUEOUS_MODEL_PARAMETERS block (tests/fixtures/reference/ion-size.csv, confirmed).
 * The engine uses it inside the Truesdell–Jones model for ions WATEQ4F does not fit.
 */
import { interpolate } from "../interpolate";

// Source: Helgeson (1969) Am. J. Sci. 267, 729; ion sizes and Ḃ of EQ3/6 llnl.dat

/** Ḃ (kg/mol) against temperature (°C), EQ3/6 llnl.dat. */
const BDOT_BY_TEMPERATURE: readonly [number, number][] = [
  [0.01, 0.0374],
  [25, 0.041],
  [60, 0.0438],
  [100, 0.046],
];

export const BDOT_ION_SIZE_ANGSTROM: Readonly<Record<string, number>> = {
  "H+": 9,
  "Li+": 6,
  "Na+": 4,
  "K+": 3,
  "Rb+": 2.5,
  "Cs+": 2.5,
  "NH4+": 2.5,
  "Ag+": 2.5,
  "Mg^2+": 8,
  "Ca^2+": 6,
  "Sr^2+": 5,
  "Ba^2+": 5,
  "Mn^2+": 6,
  "Fe^2+": 6,
  "Fe^3+": 9,
  "Co^2+": 6,
  "Ni^2+": 6,
  "Cu^2+": 6,
  "Zn^2+": 6,
  "Cd^2+": 5,
  "Pb^2+": 4.5,
  "Hg^2+": 5,
  "Al^3+": 9,
  "La^3+": 9,
  "F-": 3.5,
  "Cl-": 3,
  "Br-": 3,
  "I-": 3,
  "OH-": 3.5,
  "NO3-": 3,
  "HCO3-": 4,
  "CO3^2-": 4.5,
  "SO4^2-": 4,
  "HSO4-": 4,
  "H2PO4-": 4,
  "HPO4^2-": 4,
  "PO4^3-": 4,
  "HS-": 3.5,
};

/** Ḃ at a temperature, linear between the llnl.dat grid points (held constant outside). */
export function bDot(temperatureC: number): number {
  return interpolate(BDOT_BY_TEMPERATURE, temperatureC);
}
