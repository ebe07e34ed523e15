/**
 * Open-circuit potential settling after immersion: E(t) = E∞ + (E₀ − E∞) e^(−t/τ), with
 * optional Gaussian noise. A shape for testing the parser, not a model of any electrode.
 */
import { seededGaussian } from "./random";

export interface OpenCircuitInput {
  initialPotentialV?: number;
  finalPotentialV?: number;
  timeConstantS?: number;
  durationS?: number;
  sampleIntervalS?: number;
  noiseV?: number;
  seed?: number;
}

export function simulateOpenCircuit(input: OpenCircuitInput = {}): {
  timeS: Float64Array;
  potentialV: Float64Array;
} {
  const s = {
    initialPotentialV: 0.25,
    finalPotentialV: 0.2,
    timeConstantS: 30,
    durationS: 300,
    sampleIntervalS: 1,
    noiseV: 2e-4,
    seed: 7,
    ...input,
  };
  const samples = Math.round(s.durationS / s.sampleIntervalS) + 1;
  const timeS = new Float64Array(samples);
  const potentialV = new Float64Array(samples);
  const noise = seededGaussian(s.seed);
  for (let k = 0; k < samples; k++) {
    const t = k * s.sampleIntervalS;
    timeS[k] = t;
    potentialV[k] =
      s.finalPotentialV +
      (s.initialPotentialV - s.finalPotentialV) * Math.exp(-t / s.timeConstantS) +
      s.noiseV * noise();
  }
  return { timeS, potentialV };
}
