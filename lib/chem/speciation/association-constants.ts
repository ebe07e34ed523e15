/**
 * Association constants at temperature, on the molal scale at I = 0:
 *   analytical (where published):  log10 K = A1 + A2 T + A3/T + A4 log10 T + A5/T²
 *   otherwise van 't Hoff with constant ΔrH°:  log10 K(T) = log10 K(25 °C) − ΔrH°/(R ln10) (1/T − 1/298.15 K)
 * (the two forms WATEQ4F uses; Ball & Nordstrom 1991). Pairs are looked up by ion key.
 */
import { GAS_CONSTANT_J_PER_MOL_K, LN10, kelvin } from "../constants";
import { ionKey, pairKey } from "../models/pitzer/ion-key";
import { ION_PAIRS, type IonPairRow } from "./data/ion-pairs-wateq4f";

const T_REF_K = 298.15;

const byIons = new Map<string, IonPairRow>();
for (const row of ION_PAIRS) byIons.set(pairKey(row.cation, row.anion), row);

/** The tabulated pair of a cation and an anion (keys as `ionKey` writes them), if any. */
export function ionPair(cationKey: string, anionKey: string): IonPairRow | undefined {
  return byIons.get(pairKey(cationKey, anionKey));
}

export function log10AssociationConstant(row: IonPairRow, temperatureC: number): number {
  const T = kelvin(temperatureC);
  if (row.analytic) {
    const [a1, a2, a3, a4, a5] = row.analytic;
    return a1 + a2 * T + a3 / T + a4 * Math.log10(T) + a5 / (T * T);
  }
  return (
    row.log10K25 -
    ((row.deltaHkJPerMol * 1000) / (GAS_CONSTANT_J_PER_MOL_K * LN10)) * (1 / T - 1 / T_REF_K)
  );
}

export { ionKey };
