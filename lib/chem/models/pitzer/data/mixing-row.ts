/** Row shapes of the Pitzer mixing tables: θ for a like-charged pair, ψ for a pair plus a common ion. */

export type PitzerMixingRow =
  | { kind: "theta"; ionI: string; ionJ: string; value: number; source: string }
  | { kind: "psi"; ionI: string; ionJ: string; commonIon: string; value: number; source: string };

export function thetaRow(
  ionI: string,
  ionJ: string,
  value: number,
  source: string,
): PitzerMixingRow {
  return { kind: "theta", ionI, ionJ, value, source };
}

export function psiRow(
  ionI: string,
  ionJ: string,
  commonIon: string,
  value: number,
  source: string,
): PitzerMixingRow {
  return { kind: "psi", ionI, ionJ, commonIon, value, source };
}
