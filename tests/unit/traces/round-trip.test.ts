// @vitest-environment node
/**
 * Every layout variant (delimiter × decimal × header block × column-name style × units ×
 * cycle column, lib/traces/simulate/layouts.ts) is written from one simulation and read
 * back: same number of points, same values in SI (to the 10 significant digits written),
 * the technique, the cycles, the header fields, and no problems.
 */
import { describe, expect, it } from "vitest";
import { parseTraceText, traceColumn, type ParsedTrace } from "@/lib/traces";
import {
  allLayoutVariants,
  chronoamperometryTrace,
  cvTrace,
  describeLayout,
  impedanceTrace,
  openCircuitTrace,
  simulateChronoamperometry,
  simulateOpenCircuit,
  simulateRandlesSpectrum,
  simulateReversibleCv,
  writeTraceFile,
  type TraceFileLayout,
} from "@/lib/traces/simulate";

const layouts = allLayoutVariants();

function expectColumn(
  trace: ParsedTrace,
  quantity: "potential" | "current" | "time",
  expected: ArrayLike<number>,
) {
  const column = traceColumn(trace, quantity);
  expect(column, quantity).not.toBeNull();
  let worst = 0;
  let scale = 0;
  for (let k = 0; k < expected.length; k++) scale = Math.max(scale, Math.abs(expected[k]));
  for (let k = 0; k < expected.length; k++)
    worst = Math.max(worst, Math.abs(column![k] - expected[k]));
  // 10 significant digits written: the largest error is below 1e-9 of the column's scale.
  expect(worst / scale, quantity).toBeLessThan(1e-9);
}

describe("layout variants", () => {
  it("covers every combination: 5 dialects × 4 header styles × 5 name styles × 4 unit sets × cycle column or not", () => {
    expect(layouts).toHaveLength(800);
    expect(new Set(layouts.map(describeLayout)).size).toBe(800);
  });
});

describe("cyclic voltammogram, two cycles, in every layout", () => {
  const sim = simulateReversibleCv({ stepV: 4e-3, cycles: 2 });
  const trace = cvTrace(sim);
  const points = sim.potentialV.length;

  it.each(layouts.map((l) => [describeLayout(l), l] as [string, TraceFileLayout]))(
    "%s",
    (_, layout) => {
      const parsed = parseTraceText(writeTraceFile(trace, layout), {}, 2048);
      const s = parsed.summary;
      expect(s.problems).toEqual([]);
      expect(s.points).toBe(points);
      expect(s.technique).toBe("cyclic-voltammetry");
      expect(s.delimiter).toBe(layout.delimiter);
      expect(s.cycles.map((c) => [c.number, c.startRow, c.endRow])).toEqual([
        [1, 0, (points - 1) / 2],
        [2, (points - 1) / 2, points],
      ]);
      expect(s.cycleSource).toBe(layout.cycleColumn ? "column" : "sweep-reversal");
      expectColumn(parsed, "potential", sim.potentialV);
      expectColumn(parsed, "current", sim.currentA);
      expectColumn(parsed, "time", sim.timeS);
      if (layout.headerStyle !== "none") {
        expect(s.header.scanRateVPerS).toBeCloseTo(0.1, 12);
        expect(s.header.electrodeAreaCm2).toBeCloseTo(0.0707, 12);
        expect(s.header.referenceElectrode?.id).toBe("Ag/AgCl-3MKCl");
        expect(s.techniqueReason).toMatch(/header/);
      } else {
        expect(s.techniqueReason).toMatch(/sweeps and reverses 3 times/);
      }
      const potential = s.columns[s.roles.potential!];
      if (layout.nameStyle === "vs-reference")
        expect(potential.referenceElectrode?.id).toBe("Ag/AgCl-3MKCl");
      expect(potential.unit).toBe(layout.potentialUnit);
    },
  );
});

describe("other techniques in every dialect and name style", () => {
  const few = layouts.filter(
    (l) => l.potentialUnit === "mV" && l.currentUnit === "µA" && !l.cycleColumn,
  );

  it("there are 100 such layouts", () => expect(few).toHaveLength(100));

  it("chronoamperometry (Cottrell) is read as chronoamperometry", () => {
    const sim = simulateChronoamperometry({ stepDurationS: 2 });
    for (const layout of few) {
      const parsed = parseTraceText(writeTraceFile(chronoamperometryTrace(sim), layout));
      expect(parsed.summary.technique, describeLayout(layout)).toBe("chronoamperometry");
      expect(parsed.summary.problems).toEqual([]);
      expectColumn(parsed, "current", sim.currentA);
    }
  });

  it("a Randles-circuit impedance spectrum is read as impedance, −Z″ positive", () => {
    const sim = simulateRandlesSpectrum();
    for (const layout of few) {
      const parsed = parseTraceText(writeTraceFile(impedanceTrace(sim), layout));
      const s = parsed.summary;
      expect(s.technique, describeLayout(layout)).toBe("impedance");
      expect(s.problems).toEqual([]);
      const minusZ2 = traceColumn(parsed, "impedanceImaginaryNegated")!;
      for (let k = 0; k < sim.frequencyHz.length; k++)
        expect(minusZ2[k]).toBeCloseTo(sim.imaginaryNegatedOhm[k], 6);
      expect(traceColumn(parsed, "phase")![0]).toBeCloseTo((sim.phaseDeg[0] * Math.PI) / 180, 9);
    }
  });

  it("open-circuit potential over time is read as open-circuit potential", () => {
    const sim = simulateOpenCircuit();
    for (const layout of few) {
      const parsed = parseTraceText(writeTraceFile(openCircuitTrace(sim), layout));
      expect(parsed.summary.technique, describeLayout(layout)).toBe("open-circuit-potential");
      expect(parsed.summary.problems).toEqual([]);
      expectColumn(parsed, "potential", sim.potentialV);
    }
  });
});
