// @vitest-environment node
/**
 * The simulated fixtures against the theory they come from. Expected values: Bard &
 * Faulkner, Electrochemical Methods, 2nd ed. (2001): Randles–Ševčík ip = 0.4463 nFAC
 * (nFvD/RT)^½ (eq. 6.2.18); Ep − E½ = 1.109 RT/nF = 28.5 mV at 25 °C (eq. 6.2.4); ΔEp of a
 * reversible wave with the switching potential 300 mV past E½ between the 57.8 mV the
 * book's Table 6.2.1 gives for 271.5 mV and the limit 2.218 RT/F = 57.0 mV (table values
 * from memory, so a ±0.5 mV band); Cottrell i = nFAC√(D/πt) (eq. 5.2.11).
 */
import { describe, expect, it } from "vitest";
import { randlesSevcikPeakCurrent, reversiblePeakSeparationV } from "@/lib/chem";
import {
  randlesImpedance,
  simulateChronoamperometry,
  simulateRandlesSpectrum,
  simulateReversibleCv,
} from "@/lib/traces/simulate";

/** Extremes of the raw simulated current with a parabola through the three samples around each. */
function rawPeaks(sim: ReturnType<typeof simulateReversibleCv>) {
  const { potentialV: e, currentA: i } = sim;
  let max = 1;
  let min = 1;
  for (let k = 1; k < e.length - 1; k++) {
    if (i[k] > i[max]) max = k;
    if (i[k] < i[min]) min = k;
  }
  const vertex = (k: number) => {
    const d = (i[k - 1] - i[k + 1]) / (2 * (i[k - 1] - 2 * i[k] + i[k + 1]));
    return {
      potentialV: e[k] + d * (e[k + 1] - e[k]),
      currentA: i[k] - 0.25 * (i[k - 1] - i[k + 1]) * d,
    };
  };
  return { anodic: vertex(max), cathodic: vertex(min) };
}

const settings = {
  electrodeAreaCm2: 0.0707,
  concentrationMolPerL: 1e-3,
  diffusionCoefficientCm2PerS: 1e-5,
  scanRateVPerS: 0.1,
};
const expectedIp = randlesSevcikPeakCurrent({ electrons: 1, temperatureC: 25, ...settings });

describe("reversible CV by explicit finite differences (Bard & Faulkner App. B)", () => {
  const sim = simulateReversibleCv(settings);
  const peaks = rawPeaks(sim);
  const deltaEp = peaks.anodic.potentialV - peaks.cathodic.potentialV;

  it("anodic peak current within 0.5 % of Randles–Ševčík (B&F eq. 6.2.18)", () => {
    expect(Math.abs(peaks.anodic.currentA / expectedIp - 1)).toBeLessThan(0.005);
  });

  it("ΔEp between the B&F Table 6.2.1 values for 271.5 mV and infinite switching (57.0–57.8 mV, ±0.5 mV)", () => {
    expect(deltaEp * 1000).toBeGreaterThan(reversiblePeakSeparationV(1, 25) * 1000 - 0.5);
    expect(deltaEp * 1000).toBeLessThan(57.8 + 0.5);
  });

  it("Epa − E°′ = 1.109 RT/F = 28.5 mV (B&F eq. 6.2.4)", () => {
    expect(peaks.anodic.potentialV * 1000).toBeCloseTo(28.5, 0);
  });

  it("has converged: a grid twice as fine moves ip by < 0.1 % and ΔEp by < 0.2 mV", () => {
    const fine = rawPeaks(simulateReversibleCv({ ...settings, stepV: 2.5e-4, substeps: 8 }));
    expect(Math.abs(fine.anodic.currentA / peaks.anodic.currentA - 1)).toBeLessThan(0.001);
    expect(
      Math.abs((fine.anodic.potentialV - fine.cathodic.potentialV - deltaEp) * 1000),
    ).toBeLessThan(0.2);
  });

  it("scales as √v and linearly in C (Randles–Ševčík)", () => {
    const fast = rawPeaks(simulateReversibleCv({ ...settings, scanRateVPerS: 0.4 }));
    expect(fast.anodic.currentA / peaks.anodic.currentA).toBeCloseTo(2, 2);
    const double = rawPeaks(simulateReversibleCv({ ...settings, concentrationMolPerL: 2e-3 }));
    expect(double.anodic.currentA / peaks.anodic.currentA).toBeCloseTo(2, 6);
  });

  it("a reduction-first scan mirrors it: cathodic peak −ip, 28.5 mV below E°′", () => {
    const mirror = rawPeaks(
      simulateReversibleCv({
        ...settings,
        startingSpecies: "oxidized",
        startPotentialV: 0.3,
        vertexPotentialV: -0.3,
      }),
    );
    expect(mirror.cathodic.currentA).toBeCloseTo(-peaks.anodic.currentA, 12);
    expect(mirror.cathodic.potentialV).toBeCloseTo(-peaks.anodic.potentialV, 9);
  });

  it("is deterministic with a seed, and noise has the asked spread", () => {
    const a = simulateReversibleCv({ ...settings, noiseA: 1e-7, seed: 5 });
    const b = simulateReversibleCv({ ...settings, noiseA: 1e-7, seed: 5 });
    expect(Array.from(a.currentA)).toEqual(Array.from(b.currentA));
    let sq = 0;
    for (let k = 0; k < a.currentA.length; k++) sq += (a.currentA[k] - sim.currentA[k]) ** 2;
    expect(Math.sqrt(sq / a.currentA.length)).toBeCloseTo(1e-7, 8);
  });
});

describe("chronoamperometry (Cottrell, B&F eq. 5.2.11)", () => {
  it("i√t is constant after the step and equals nFAC√(D/π)", () => {
    const sim = simulateChronoamperometry({
      restTimeS: 1,
      stepDurationS: 5,
      sampleIntervalS: 0.01,
    });
    const nfac = 96485.33212 * 0.0707e-4 * 1;
    for (const k of [150, 300, 600]) {
      const t = sim.timeS[k] - 1;
      expect(sim.currentA[k] * Math.sqrt(t)).toBeCloseTo(nfac * Math.sqrt(1e-9 / Math.PI), 12);
    }
    expect(sim.currentA[50]).toBe(0);
  });
});

describe("Randles circuit impedance", () => {
  const s = {
    solutionResistanceOhm: 50,
    chargeTransferResistanceOhm: 500,
    doubleLayerCapacitanceF: 2e-6,
    warburgCoefficientOhmPerSqrtS: 150,
    highFrequencyHz: 1e5,
    lowFrequencyHz: 0.1,
    pointsPerDecade: 10,
  };

  it("tends to Rs at high frequency and to Rs + Rct (+ Warburg) at low frequency", () => {
    expect(randlesImpedance(2 * Math.PI * 1e9, s).re).toBeCloseTo(50, 3);
    const noWarburg = { ...s, warburgCoefficientOhmPerSqrtS: 0 };
    expect(randlesImpedance(2 * Math.PI * 1e-6, noWarburg).re).toBeCloseTo(550, 3);
  });

  it("without Warburg, the semicircle's top sits at ω = 1/(Rct Cdl) with −Z″ = Rct/2", () => {
    const noWarburg = { ...s, warburgCoefficientOhmPerSqrtS: 0 };
    const z = randlesImpedance(1 / (500 * 2e-6), noWarburg);
    expect(-z.im).toBeCloseTo(250, 9);
    expect(z.re).toBeCloseTo(300, 9);
  });

  it("at low frequency the Warburg line has slope 1 (−Z″ and Z′ grow alike)", () => {
    const a = randlesImpedance(2 * Math.PI * 1e-4, s);
    const b = randlesImpedance(2 * Math.PI * 4e-4, s);
    expect((-a.im + b.im) / (a.re - b.re)).toBeCloseTo(1, 1);
  });

  it("spectrum: 61 points from 100 kHz to 0.1 Hz, |Z| and phase consistent with Z′ and −Z″", () => {
    const sim = simulateRandlesSpectrum(s);
    expect(sim.frequencyHz.length).toBe(61);
    for (let k = 0; k < 61; k += 10) {
      expect(sim.modulusOhm[k]).toBeCloseTo(
        Math.hypot(sim.realOhm[k], sim.imaginaryNegatedOhm[k]),
        9,
      );
      expect(sim.phaseDeg[k]).toBeLessThan(0);
    }
  });
});
