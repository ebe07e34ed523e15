// @vitest-environment node
/**
 * Peaks found in simulated voltammograms (written as files and parsed back) match the
 * simulation: ΔEp within 2 mV of the simulated value and within 57–60 mV, ip within 2 % of
 * Randles–Ševčík (Bard & Faulkner, Electrochemical Methods, 2nd ed. 2001, eq. 6.2.18), and
 * Nicholson's reverse-to-forward ratio ≈ 1 for a chemically reversible couple
 * (Nicholson 1966, Anal. Chem. 38, 1406).
 */
import { describe, expect, it } from "vitest";
import { randlesSevcikPeakCurrent } from "@/lib/chem";
import { analyseVoltammogram, isTraceParseError, parseTraceText, traceColumn } from "@/lib/traces";
import {
  allLayoutVariants,
  cvTrace,
  simulateReversibleCv,
  writeTraceFile,
} from "@/lib/traces/simulate";

const settings = {
  electrodeAreaCm2: 0.0707,
  concentrationMolPerL: 1e-3,
  diffusionCoefficientCm2PerS: 1e-5,
  scanRateVPerS: 0.1,
};
const expectedIp = randlesSevcikPeakCurrent({ electrons: 1, ...settings });

function rawDeltaEp(sim: ReturnType<typeof simulateReversibleCv>): number {
  let max = 0;
  let min = 0;
  for (let k = 0; k < sim.currentA.length; k++) {
    if (sim.currentA[k] > sim.currentA[max]) max = k;
    if (sim.currentA[k] < sim.currentA[min]) min = k;
  }
  return sim.potentialV[max] - sim.potentialV[min];
}

function analyseFile(sim: ReturnType<typeof simulateReversibleCv>, layoutIndex = 0) {
  const layout = allLayoutVariants()[layoutIndex];
  const parsed = parseTraceText(writeTraceFile(cvTrace(sim), layout));
  return analyseVoltammogram({
    potentialV: traceColumn(parsed, "potential")!,
    currentA: traceColumn(parsed, "current")!,
    cycles: parsed.summary.cycles,
  });
}

describe("peaks of a simulated reversible voltammogram, read from a file", () => {
  const sim = simulateReversibleCv({ ...settings, cycles: 2 });
  const [first, second] = analyseFile(sim, 37);
  const simulatedDeltaEp = rawDeltaEp(simulateReversibleCv(settings));

  it("finds both peaks in both cycles", () => {
    expect(first.anodic).not.toBeNull();
    expect(first.cathodic).not.toBeNull();
    expect(second.anodic).not.toBeNull();
    expect(second.cathodic).not.toBeNull();
  });

  it("ΔEp within 2 mV of the simulation and within 57–60 mV", () => {
    expect(Math.abs(first.deltaEpV! - simulatedDeltaEp) * 1000).toBeLessThan(2);
    expect(first.deltaEpV! * 1000).toBeGreaterThan(57);
    expect(first.deltaEpV! * 1000).toBeLessThan(60);
  });

  it("anodic ip within 2 % of Randles–Ševčík (B&F eq. 6.2.18)", () => {
    expect(Math.abs(first.anodic!.currentA / expectedIp - 1)).toBeLessThan(0.02);
  });

  it("E½ at E°′ (0 V) within 1 mV, and Nicholson's ratio 1 within 3 %", () => {
    expect(Math.abs(first.halfWavePotentialV!) * 1000).toBeLessThan(1);
    expect(first.nicholsonReverseToForwardRatio!).toBeGreaterThan(0.97);
    expect(first.nicholsonReverseToForwardRatio!).toBeLessThan(1.03);
    expect(second.nicholsonReverseToForwardRatio).toBeNull();
  });

  it("reports the baseline-corrected cathodic current with its sign", () => {
    expect(first.cathodic!.currentA).toBeLessThan(0);
    expect(first.anodicToCathodicRatio!).toBeGreaterThan(0.9);
    expect(first.anodicToCathodicRatio!).toBeLessThan(1.15);
  });
});

describe("robustness", () => {
  it.each([1, 2, 3, 4, 5, 6])(
    "current noise of 1 % of ip (seed %i): ΔEp within 2 mV, ip within 2 %",
    (seed) => {
      const sim = simulateReversibleCv({ ...settings, noiseA: 0.01 * expectedIp, seed });
      const [cycle] = analyseFile(sim);
      expect(
        Math.abs(cycle.deltaEpV! - rawDeltaEp(simulateReversibleCv(settings))) * 1000,
      ).toBeLessThan(2);
      expect(Math.abs(cycle.anodic!.currentA / expectedIp - 1)).toBeLessThan(0.02);
    },
  );

  it("a charging current (20 µF/cm²) leaves ip and ΔEp where they were: the baseline takes it", () => {
    const [plain] = analyseFile(simulateReversibleCv(settings));
    const [charged] = analyseFile(
      simulateReversibleCv({ ...settings, doubleLayerCapacitanceFPerCm2: 20e-6 }),
    );
    expect(charged.anodic!.currentA / plain.anodic!.currentA).toBeCloseTo(1, 3);
    expect(Math.abs(charged.deltaEpV! - plain.deltaEpV!) * 1000).toBeLessThan(0.2);
  });

  it("a blank (charging current and noise only) has no peaks, never a made-up one", () => {
    const sim = simulateReversibleCv({
      ...settings,
      concentrationMolPerL: 1e-12,
      doubleLayerCapacitanceFPerCm2: 20e-6,
      noiseA: 2e-8,
      seed: 3,
    });
    const [cycle] = analyseFile(sim);
    expect(cycle.anodic).toBeNull();
    expect(cycle.cathodic).toBeNull();
    expect(cycle.deltaEpV).toBeNull();
    expect(cycle.halfWavePotentialV).toBeNull();
  });

  it("a sweep that stops on the rising wave has no peak there", () => {
    const sim = simulateReversibleCv({ ...settings, vertexPotentialV: 0.0 });
    const [cycle] = analyseVoltammogram({ potentialV: sim.potentialV, currentA: sim.currentA });
    expect(cycle.anodic).toBeNull();
  });

  it("the older convention (cathodic current positive) is read when asked", () => {
    const sim = simulateReversibleCv(settings);
    const flipped = sim.currentA.map((i) => -i);
    const [cycle] = analyseVoltammogram({
      potentialV: sim.potentialV,
      currentA: flipped,
      currentConvention: "cathodic-positive",
    });
    expect(cycle.deltaEpV! * 1000).toBeCloseTo(rawDeltaEp(sim) * 1000, 0);
    expect(cycle.anodic!.currentA).toBeLessThan(0);
  });

  it("rejects series of different lengths with the module's error", () => {
    let caught: unknown;
    try {
      analyseVoltammogram({ potentialV: [1, 2], currentA: [1] });
    } catch (e) {
      caught = e;
    }
    expect(isTraceParseError(caught)).toBe(true);
  });
});
