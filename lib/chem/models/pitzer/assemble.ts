/**
 * Turns a list of ions into the numeric Pitzer system: picks the binary and mixing parameters
 * for every pair present, corrects them to the solution's temperature where derivatives are
 * published, and collects what the result must say about its own validity.
 */
import type { ModelIon } from "../types";
import type { PitzerSystem } from "./equations";
import { fmt, structureFor } from "./structure";

export interface PitzerAssembly {
  system: PitzerSystem;
  /** Index into `system` cations/anions for each input ion, or −1 for neutral species. */
  cationIndexOf: number[];
  anionIndexOf: number[];
  /** Cation–anion pairs (both present) without binary parameters, e.g. "Na+–HEPES-". */
  missingPairs: string[];
  validityMessages: string[];
  notes: string[];
}

export function assemblePitzerSystem(
  ions: readonly ModelIon[],
  temperatureC: number,
  ionicStrengthMolal: number,
): PitzerAssembly {
  const s = structureFor(ions, temperatureC);
  const mc = s.cationIndexOf.flatMap((k, i) => (k >= 0 ? [ions[i].molality] : []));
  const ma = s.anionIndexOf.flatMap((k, i) => (k >= 0 ? [ions[i].molality] : []));
  const notes: string[] = [];
  const validityMessages: string[] = [];
  const missingPairs: string[] = [];
  ions.forEach((ion) => {
    if (ion.charge === 0)
      notes.push(
        `${ion.formula}: neutral species are given γ = 1 in this Pitzer implementation (no λ terms).`,
      );
  });
  const usedSources = new Set<string>();
  // Only pairs that are present (both molalities > 0) speak; absent pairs contribute m_c m_a = 0 anyway.
  const binary = s.pairs.map((row, c) =>
    row.map((p, a) => {
      if (!(mc[c] > 0 && ma[a] > 0)) return p?.terms ?? null;
      if (!p) {
        missingPairs.push(`${s.cations[c].key}–${s.anions[a].key}`);
        return null;
      }
      usedSources.add(p.source.split(",")[0]);
      if (ionicStrengthMolal > p.maxI * (1 + 1e-9)) {
        validityMessages.push(
          `I = ${fmt(ionicStrengthMolal)} mol/kg is beyond the fitted range of the ${p.row.salt} parameters ` +
            `(${p.row.maxIonicStrengthMolal ? "in mixtures" : `${p.row.salt} to ${fmt(p.maxMolality, 4)} mol/kg,`} I ≤ ${fmt(p.maxI)}; ${p.source}).`,
        );
      }
      validityMessages.push(...p.temperatureMessages);
      if (p.temperatureNote) notes.push(p.temperatureNote);
      if (p.derivativeMaxI !== null && ionicStrengthMolal > p.derivativeMaxI * (1 + 1e-9)) {
        validityMessages.push(
          `${p.row.salt}: the temperature derivatives were fitted only up to I = ${fmt(p.derivativeMaxI)} mol/kg.`,
        );
      }
      return p.terms;
    }),
  );
  if (usedSources.size > 0) notes.push(`Pitzer binary parameters: ${[...usedSources].join("; ")}.`);
  const thetaNotes = (list: { key: string }[], m: number[], missing: boolean[][]) => {
    for (let i = 0; i < list.length; i++)
      for (let j = i + 1; j < list.length; j++)
        if (missing[i][j] && m[i] > 0 && m[j] > 0)
          notes.push(`θ(${list[i].key}, ${list[j].key}) not tabulated: taken as 0.`);
  };
  thetaNotes(s.cations, mc, s.thetaMissing.cations);
  thetaNotes(s.anions, ma, s.thetaMissing.anions);
  return {
    system: {
      cationCharges: s.cations.map((c) => c.charge),
      anionCharges: s.anions.map((a) => a.charge),
      cationMolalities: mc,
      anionMolalities: ma,
      binary,
      thetaCations: s.thetaCations,
      thetaAnions: s.thetaAnions,
      psiCations: s.psiCations,
      psiAnions: s.psiAnions,
    },
    cationIndexOf: s.cationIndexOf,
    anionIndexOf: s.anionIndexOf,
    missingPairs,
    validityMessages,
    notes,
  };
}
