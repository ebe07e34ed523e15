/**
 * Peaks of a cyclic voltammogram, cycle by cycle: anodic and cathodic peak potential and
 * current (see find-peak.ts for the baseline and the smoothing), ΔEp = Epa − Epc,
 * E½ = (Epa + Epc)/2, and two peak-current ratios:
 *  - ipa/ipc from the baseline-corrected currents;
 *  - the reverse-to-forward ratio by Nicholson's empirical relation (Nicholson 1966,
 *    Anal. Chem. 38, 1406; Bard & Faulkner 2001, §6.5), which needs no baseline under the
 *    reverse peak: ipr/ipf = (ipr)₀/ipf + 0.485 (isp)₀/ipf + 0.086, with (ipr)₀ the reverse
 *    peak measured from zero current and (isp)₀ the current at the switching potential.
 *    It is 1 for a chemically reversible couple. It was calibrated on a first sweep from the
 *    bulk solution, so it is given for the first cycle of a trace only.
 * A cycle without a peak gets null for it and for everything that needs it.
 */
import { TraceParseError } from "../errors";
import { sweepSegments } from "../sweeps";
import type { TraceCycle } from "../types";
import { findPeakOnSweep, type Peak } from "./find-peak";
import { savitzkyGolay } from "./smooth";

export interface VoltammogramInput {
  potentialV: ArrayLike<number>;
  currentA: ArrayLike<number>;
  /** From the trace summary; the whole trace is one cycle when omitted. */
  cycles?: readonly TraceCycle[];
  /** Odd number of samples in the smoothing window; default ≈ 1 % of a cycle, 5–51. */
  smoothingWindow?: number;
  /** "anodic-positive" (IUPAC, the default) or "cathodic-positive" (the older US convention). */
  currentConvention?: "anodic-positive" | "cathodic-positive";
}

export interface CycleAnalysis {
  cycle: number;
  anodic: Peak | null;
  cathodic: Peak | null;
  deltaEpV: number | null;
  halfWavePotentialV: number | null;
  /** |ipa| / |ipc| from the baseline-corrected peak currents. */
  anodicToCathodicRatio: number | null;
  /** Reverse-to-forward peak ratio by Nicholson (1966). */
  nicholsonReverseToForwardRatio: number | null;
  smoothingWindow: number;
}

export const PEAK_BASELINE_METHOD =
  "linear baseline fitted to the pre-peak region of the same sweep (5–30 % of the way to the peak), Savitzky–Golay quadratic smoothing";

function defaultWindow(points: number): number {
  const w = Math.round(points * 0.01);
  const odd = w % 2 === 0 ? w + 1 : w;
  return Math.max(5, Math.min(51, odd));
}

function analyseCycle(
  input: VoltammogramInput,
  cycle: TraceCycle,
  polarity: 1 | -1,
  first: boolean,
): CycleAnalysis {
  const { potentialV: e, currentA: i } = input;
  const window = input.smoothingWindow ?? defaultWindow(cycle.endRow - cycle.startRow);
  const smooth = savitzkyGolay(i, cycle.startRow, cycle.endRow, window);
  let low = Infinity;
  let high = -Infinity;
  for (const v of smooth) {
    if (v < low) low = v;
    if (v > high) high = v;
  }
  const range = high > low ? high - low : 0;
  const found: { peak: Peak; anodic: boolean; segmentEnd: number; order: number }[] = [];
  sweepSegments(e, cycle.startRow, cycle.endRow).forEach((segment, order) => {
    // A positive-going sweep oxidises: its peak is anodic (a maximum when anodic is positive).
    const anodic = segment.direction === 1;
    const sign = (anodic ? polarity : -polarity) as 1 | -1;
    const peak = findPeakOnSweep({
      potentialV: e,
      currentA: i,
      start: segment.start,
      end: segment.end,
      sign,
      window,
      cycleCurrentRangeA: range,
    });
    if (peak) found.push({ peak, anodic, segmentEnd: segment.end, order });
  });
  const pick = (anodic: boolean) =>
    found
      .filter((f) => f.anodic === anodic)
      .sort((a, b) => Math.abs(b.peak.currentA) - Math.abs(a.peak.currentA))[0] ?? null;
  const a = pick(true);
  const c = pick(false);
  const result: CycleAnalysis = {
    cycle: cycle.number,
    anodic: a?.peak ?? null,
    cathodic: c?.peak ?? null,
    deltaEpV: null,
    halfWavePotentialV: null,
    anodicToCathodicRatio: null,
    nicholsonReverseToForwardRatio: null,
    smoothingWindow: window,
  };
  if (a && c) {
    result.deltaEpV = a.peak.potentialV - c.peak.potentialV;
    result.halfWavePotentialV = (a.peak.potentialV + c.peak.potentialV) / 2;
    result.anodicToCathodicRatio = Math.abs(a.peak.currentA) / Math.abs(c.peak.currentA);
    const [forward, reverse] = a.order < c.order ? [a, c] : [c, a];
    const forwardSign = Math.sign(forward.peak.currentA);
    const ipf = Math.abs(forward.peak.currentA);
    const switching = forward.segmentEnd - 1;
    const ipr0 = -forwardSign * reverse.peak.rawCurrentA;
    const isp0 = forwardSign * smooth[switching - cycle.startRow];
    if (first && ipf > 0 && isp0 === isp0)
      result.nicholsonReverseToForwardRatio = ipr0 / ipf + (0.485 * isp0) / ipf + 0.086;
  }
  return result;
}

export function analyseVoltammogram(input: VoltammogramInput): CycleAnalysis[] {
  const n = input.potentialV.length;
  if (input.currentA.length !== n)
    throw new TraceParseError("Potential and current must have the same length.", "bad_series");
  if (
    input.smoothingWindow !== undefined &&
    (!Number.isInteger(input.smoothingWindow) || input.smoothingWindow < 1)
  )
    throw new TraceParseError(
      "The smoothing window must be a positive whole number of samples.",
      "bad_series",
    );
  const polarity = input.currentConvention === "cathodic-positive" ? -1 : 1;
  const cycles = input.cycles?.length ? input.cycles : [{ number: 1, startRow: 0, endRow: n }];
  return cycles
    .filter((c) => c.startRow >= 0 && c.endRow <= n && c.endRow > c.startRow)
    .map((c, k) => analyseCycle(input, c, polarity, k === 0));
}
