/**
 * Turns a list of ions into the numeric Pitzer system: picks the binary and mixing parameters
 * for every pair present, corrects them to the solution's temperature where derivatives are
 * published, and collects what the result must say about its own validity.
 */
import type { ModelIon } from "../types";
import type { PitzerBinaryTerms, PitzerSystem } from "./equations";
import { ionKey } from "./ion-key";
import { binaryParameters, psiParameter, temperatureDerivatives, thetaParameter } from "./parameter-tables";

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

const REFERENCE_TEMPERATURE_C = 25;
/** Within this many kelvin of 25 °C no correction is applied (common practice, no source). */
const TEMPERATURE_TOLERANCE_K = 0.5;
/**
 * First-order derivative corrections hold within about ±15 K of 25 °C: measured against
 * Pitzer, Peiper & Busey (1984) NaCl, γ± stays within 2 % at 10–40 °C but errs by up to 5 %
 * at 0 °C and 3–5 mol/kg, where the curvature of β0(T) matters (tests/chem/pitzer-temperature).
 */
const DERIVATIVE_SPAN_K = 15;

/** Ionic strength of a pure salt of these charges at molality m: ½ m (ν+ z+² + ν− z−²). */
function saltIonicStrength(zc: number, za: number, molality: number): number {
  const a = Math.abs(zc);
  const b = Math.abs(za);
  const g = gcd(a, b);
  const nuC = b / g;
  const nuA = a / g;
  return 0.5 * molality * (nuC * a * a + nuA * b * b);
}

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

function fmt(x: number, digits = 3): string {
  return Number(x.toPrecision(digits)).toString();
}

export function assemblePitzerSystem(
  ions: readonly ModelIon[],
  temperatureC: number,
  ionicStrengthMolal: number,
): PitzerAssembly {
  const cations: { key: string; charge: number; molality: number }[] = [];
  const anions: { key: string; charge: number; molality: number }[] = [];
  const cationIndexOf: number[] = [];
  const anionIndexOf: number[] = [];
  const notes: string[] = [];
  const validityMessages: string[] = [];
  const missingPairs: string[] = [];

  for (const ion of ions) {
    const entry = { key: ionKey(ion.formula, ion.charge), charge: ion.charge, molality: ion.molality };
    cationIndexOf.push(ion.charge > 0 ? cations.push(entry) - 1 : -1);
    anionIndexOf.push(ion.charge < 0 ? anions.push(entry) - 1 : -1);
    if (ion.charge === 0) notes.push(`${ion.formula}: neutral species are given γ = 1 in this Pitzer implementation (no λ terms).`);
  }

  const dT = temperatureC - REFERENCE_TEMPERATURE_C;
  const atReference = Math.abs(dT) < TEMPERATURE_TOLERANCE_K;
  const usedSources = new Set<string>();
  const binary: (PitzerBinaryTerms | null)[][] = cations.map((c) =>
    anions.map((a) => {
      const row = binaryParameters(c.key, a.key);
      const present = c.molality > 0 && a.molality > 0;
      if (!row) {
        if (present) missingPairs.push(`${c.key}–${a.key}`);
        return null;
      }
      if (!present) return null;
      usedSources.add(row.source.split(",")[0]);
      const maxI = row.maxIonicStrengthMolal ?? saltIonicStrength(c.charge, a.charge, row.maxMolality);
      if (ionicStrengthMolal > maxI * (1 + 1e-9)) {
        validityMessages.push(
          `I = ${fmt(ionicStrengthMolal)} mol/kg is beyond the fitted range of the ${row.salt} parameters ` +
            `(${row.maxIonicStrengthMolal ? "in mixtures" : `${row.salt} to ${fmt(row.maxMolality, 4)} mol/kg,`} I ≤ ${fmt(maxI)}; ${row.source}).`,
        );
      }
      const terms: PitzerBinaryTerms = { ...row };
      if (!atReference) {
        const d = temperatureDerivatives(c.key, a.key);
        if (!d) {
          validityMessages.push(
            `Pitzer parameters for ${row.salt} exist at 25 °C only; the result at ${fmt(temperatureC)} °C uses them unchanged.`,
          );
        } else {
          terms.beta0 += d.dBeta0 * dT;
          terms.beta1 += d.dBeta1 * dT;
          terms.beta2 += d.dBeta2 * dT;
          terms.cPhi += d.dCPhi * dT;
          notes.push(`${row.salt}: β and Cφ moved from 25 °C with the ∂P/∂T of ${d.source}.`);
          if (Math.abs(dT) > DERIVATIVE_SPAN_K) {
            validityMessages.push(
              `${row.salt}: the first-order temperature correction from 25 °C holds for about 10–40 °C; ${fmt(temperatureC)} °C is outside it.`,
            );
          }
          if (ionicStrengthMolal > saltIonicStrength(c.charge, a.charge, d.maxMolality) * (1 + 1e-9)) {
            validityMessages.push(
              `${row.salt}: the temperature derivatives were fitted only to ${fmt(d.maxMolality)} mol/kg (${d.source}).`,
            );
          }
        }
      }
      return terms;
    }),
  );
  if (usedSources.size > 0) notes.push(`Pitzer binary parameters: ${[...usedSources].join("; ")}.`);

  const mixing = (list: typeof cations, others: typeof anions) => {
    const theta = list.map(() => new Array<number>(list.length).fill(0));
    const psi = list.map(() => list.map(() => new Array<number>(others.length).fill(0)));
    for (let i = 0; i < list.length; i++)
      for (let j = i + 1; j < list.length; j++) {
        if (!(list[i].molality > 0 && list[j].molality > 0)) continue;
        const t = thetaParameter(list[i].key, list[j].key);
        if (t) theta[i][j] = t.value;
        else notes.push(`θ(${list[i].key}, ${list[j].key}) not tabulated: taken as 0.`);
        for (let k = 0; k < others.length; k++) {
          const p = psiParameter(list[i].key, list[j].key, others[k].key);
          if (p) psi[i][j][k] = p.value;
        }
      }
    return { theta, psi };
  };
  const mc = mixing(cations, anions);
  const ma = mixing(anions, cations);

  return {
    system: {
      cationCharges: cations.map((c) => c.charge),
      anionCharges: anions.map((a) => a.charge),
      cationMolalities: cations.map((c) => c.molality),
      anionMolalities: anions.map((a) => a.molality),
      binary,
      thetaCations: mc.theta,
      thetaAnions: ma.theta,
      psiCations: mc.psi,
      psiAnions: ma.psi,
    },
    cationIndexOf,
    anionIndexOf,
    missingPairs,
    validityMessages,
    notes,
  };
}
