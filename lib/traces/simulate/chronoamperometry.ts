/**
 * A potential step to the diffusion limit: the Cottrell equation,
 *   i(t) = nFAC √(D / (π t))   (Bard & Faulkner 2001, eq. 5.2.11),
 * for t after the step, and zero current at the rest potential before it.
 */
import { FARADAY_C_PER_MOL } from "./constants";
import { seededGaussian } from "./random";

export interface ChronoamperometryInput {
  electrons?: number;
  concentrationMolPerL?: number;
  diffusionCoefficientCm2PerS?: number;
  electrodeAreaCm2?: number;
  restPotentialV?: number;
  stepPotentialV?: number;
  restTimeS?: number;
  stepDurationS?: number;
  sampleIntervalS?: number;
  noiseA?: number;
  seed?: number;
}

export interface SimulatedChronoamperometry {
  timeS: Float64Array;
  potentialV: Float64Array;
  currentA: Float64Array;
  /** Cottrell current at t after the step, for checking: i(t) = nFAC√(D/(πt)). */
  cottrellCurrentA: (secondsAfterStep: number) => number;
}

export function simulateChronoamperometry(
  input: ChronoamperometryInput = {},
): SimulatedChronoamperometry {
  const s = {
    electrons: 1,
    concentrationMolPerL: 1e-3,
    diffusionCoefficientCm2PerS: 1e-5,
    electrodeAreaCm2: 0.0707,
    restPotentialV: 0,
    stepPotentialV: 0.5,
    restTimeS: 1,
    stepDurationS: 10,
    sampleIntervalS: 0.01,
    noiseA: 0,
    seed: 1,
    ...input,
  };
  const nfac =
    s.electrons * FARADAY_C_PER_MOL * s.electrodeAreaCm2 * 1e-4 * s.concentrationMolPerL * 1000;
  const d = s.diffusionCoefficientCm2PerS * 1e-4;
  const cottrellCurrentA = (t: number) => nfac * Math.sqrt(d / (Math.PI * t));
  const samples = Math.round((s.restTimeS + s.stepDurationS) / s.sampleIntervalS) + 1;
  const timeS = new Float64Array(samples);
  const potentialV = new Float64Array(samples);
  const currentA = new Float64Array(samples);
  const noise = seededGaussian(s.seed);
  for (let k = 0; k < samples; k++) {
    const t = k * s.sampleIntervalS;
    const after = t - s.restTimeS;
    timeS[k] = t;
    potentialV[k] = after > 0 ? s.stepPotentialV : s.restPotentialV;
    currentA[k] =
      (after > 0 ? cottrellCurrentA(after) : 0) + (s.noiseA > 0 ? s.noiseA * noise() : 0);
  }
  return { timeS, potentialV, currentA, cottrellCurrentA };
}
