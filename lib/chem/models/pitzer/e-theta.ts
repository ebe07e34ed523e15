/**
 * Unsymmetrical mixing terms Eθ(I) and Eθ′(I) for two ions of the same sign but different
 * charge (Pitzer 1975, J. Solution Chem. 4, 249; as used by Harvie, Møller & Weare 1984):
 *
 *   x_ij  = 6 z_i z_j Aφ √I
 *   Eθ_ij  = (z_i z_j / 4I) [J(x_ij) − J(x_ii)/2 − J(x_jj)/2]
 *   Eθ′_ij = −Eθ_ij / I + (z_i z_j / 8I²) [x_ij J′(x_ij) − x_ii J′(x_ii)/2 − x_jj J′(x_jj)/2]
 *
 * For ions of equal charge both terms vanish, which is why θ values fitted without them
 * (Pitzer & Kim 1974) stay valid for same-charge pairs.
 */
import { jFunction } from "./j-function";

export interface ETheta {
  eTheta: number;
  eThetaPrime: number;
}

export function eTheta(zi: number, zj: number, ionicStrengthMolal: number, aPhi: number): ETheta {
  const a = Math.abs(zi);
  const b = Math.abs(zj);
  if (a === b || !(ionicStrengthMolal > 0)) return { eTheta: 0, eThetaPrime: 0 };
  const I = ionicStrengthMolal;
  const base = 6 * aPhi * Math.sqrt(I);
  const xij = base * a * b;
  const xii = base * a * a;
  const xjj = base * b * b;
  const jij = jFunction(xij);
  const jii = jFunction(xii);
  const jjj = jFunction(xjj);
  const zz = a * b;
  const value = (zz / (4 * I)) * (jij.j - 0.5 * jii.j - 0.5 * jjj.j);
  const prime =
    -value / I +
    (zz / (8 * I * I)) * (xij * jij.jPrime - 0.5 * xii * jii.jPrime - 0.5 * xjj * jjj.jPrime);
  return { eTheta: value, eThetaPrime: prime };
}
