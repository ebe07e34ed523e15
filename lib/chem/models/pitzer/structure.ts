/**
 * The part of a Pitzer system that depends only on which ions are present and on the
 * temperature: the chosen parameter rows, their temperature correction, θ and ψ. Cached per
 * ion set and temperature, because the editor re-evaluates the same solution on every keystroke.
 */
import type { ModelIon } from "../types";
import type { PitzerBinaryRow } from "./data/binary-row";
import type { PitzerBinaryTerms } from "./equations";
import { ionKey } from "./ion-key";
import { binaryParameters, psiParameter, thetaParameter } from "./parameter-tables";
import { pairAtTemperature } from "./temperature/pair-at-temperature";

export function fmt(x: number, digits = 3): string {
  return Number(x.toPrecision(digits)).toString();
}

/** Everything about a pair that does not depend on the molalities (cached per ion set and T). */
interface PairStructure {
  row: PitzerBinaryRow;
  terms: PitzerBinaryTerms;
  maxI: number;
  /** Top of the fitted molality range and source of the parameter set used at this T. */
  maxMolality: number;
  source: string;
  /** Temperatures (°C) the set used is stated for. */
  rangeC: { min: number; max: number };
  derivativeMaxI: number | null;
  /** Temperature messages that hold whatever the composition. */
  temperatureMessages: string[];
  temperatureNote: string | null;
}

export interface Structure {
  cations: { key: string; charge: number }[];
  anions: { key: string; charge: number }[];
  cationIndexOf: number[];
  anionIndexOf: number[];
  pairs: (PairStructure | null)[][];
  thetaCations: number[][];
  thetaAnions: number[][];
  psiCations: number[][][];
  psiAnions: number[][][];
  thetaMissing: { cations: boolean[][]; anions: boolean[][] };
}

const structureCache = new Map<string, Structure>();
const CACHE_LIMIT = 64;

function pairStructure(
  c: { key: string; charge: number },
  a: { key: string; charge: number },
  temperatureC: number,
): PairStructure | null {
  const row = binaryParameters(c.key, a.key);
  if (!row) return null;
  const at = pairAtTemperature(row, { cation: c.charge, anion: a.charge }, temperatureC);
  return {
    row,
    terms: at.terms,
    maxI: at.maxI,
    maxMolality: at.maxMolality,
    source: at.source,
    rangeC: at.rangeC,
    derivativeMaxI: at.derivativeMaxI,
    temperatureMessages: at.temperatureMessages,
    temperatureNote: at.temperatureNote,
  };
}

function mixingTerms(list: { key: string }[], others: { key: string }[]) {
  const theta = list.map(() => new Array<number>(list.length).fill(0));
  const missing = list.map(() => new Array<boolean>(list.length).fill(false));
  const psi = list.map(() => list.map(() => new Array<number>(others.length).fill(0)));
  for (let i = 0; i < list.length; i++)
    for (let j = i + 1; j < list.length; j++) {
      const t = thetaParameter(list[i].key, list[j].key);
      if (t) theta[i][j] = t.value;
      else missing[i][j] = true;
      for (let k = 0; k < others.length; k++)
        psi[i][j][k] = psiParameter(list[i].key, list[j].key, others[k].key)?.value ?? 0;
    }
  return { theta, psi, missing };
}

export function structureFor(ions: readonly ModelIon[], temperatureC: number): Structure {
  const cacheKey = ions.map((i) => `${i.formula}|${i.charge}`).join(";") + `@${temperatureC}`;
  const hit = structureCache.get(cacheKey);
  if (hit) return hit;
  const cations: Structure["cations"] = [];
  const anions: Structure["anions"] = [];
  const cationIndexOf: number[] = [];
  const anionIndexOf: number[] = [];
  for (const ion of ions) {
    const entry = { key: ionKey(ion.formula, ion.charge), charge: ion.charge };
    cationIndexOf.push(ion.charge > 0 ? cations.push(entry) - 1 : -1);
    anionIndexOf.push(ion.charge < 0 ? anions.push(entry) - 1 : -1);
  }
  const mc = mixingTerms(cations, anions);
  const ma = mixingTerms(anions, cations);
  const structure: Structure = {
    cations,
    anions,
    cationIndexOf,
    anionIndexOf,
    pairs: cations.map((c) => anions.map((a) => pairStructure(c, a, temperatureC))),
    thetaCations: mc.theta,
    thetaAnions: ma.theta,
    psiCations: mc.psi,
    psiAnions: ma.psi,
    thetaMissing: { cations: mc.missing, anions: ma.missing },
  };
  if (structureCache.size >= CACHE_LIMIT) structureCache.clear();
  structureCache.set(cacheKey, structure);
  return structure;
}
