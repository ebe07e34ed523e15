import { iRDrop, isChemInputError, judgeVoltammogram, reversiblePeakSeparationV } from "@/lib/chem";
import type { CellBlockInput, SolutionBlockInput } from "./block-schemas";
import {
  evaluateCellElectrochemistry,
  type PeakSection,
  type Section,
} from "./evaluate-cell-electrochem";
import type { SolutionEvaluation } from "./evaluate-solution-block";

/*
 * A measured voltammogram beside what its cell block expects: ΔEp and the peak currents of
 * the first cycle against the reversible ΔEp and Randles–Ševčík at the file's scan rate,
 * lib/chem's verdict in words, and the iR drop at the measured peak. The peaks come from
 * lib/traces (passed in as plain numbers: lib/document does not import it).
 */

interface MeasuredPeak {
  potentialV: number;
  /** Baseline-corrected, signed (anodic positive). */
  currentA: number;
  /** Measured from zero: the current that actually flows through R_u. */
  rawCurrentA?: number;
}

interface MeasuredCycle {
  cycle: number;
  anodic: MeasuredPeak | null;
  cathodic: MeasuredPeak | null;
  deltaEpV: number | null;
}

export interface MeasuredVoltammogram {
  /** From the file's header; null when it does not say. */
  scanRateVPerS: number | null;
  cycles: readonly MeasuredCycle[];
}

export type VoltammogramComparison =
  | { status: "idle"; message: string }
  | {
      status: "ok";
      cycle: number;
      temperatureC: number;
      electrons: number;
      measured: {
        deltaEpV: number | null;
        anodicPeakCurrentA: number | null;
        cathodicPeakCurrentA: number | null;
      };
      scanRateVPerS: number | null;
      scanRateFrom: "trace" | "cell" | null;
      reversibleDeltaEpV: number;
      expected: Section<PeakSection>;
      verdict: string;
      notes: string[];
      resistanceOhm: number | null;
      /** i R_u at the larger measured peak (current from zero). */
      iRDrop: { peak: "anodic" | "cathodic"; currentA: number; dropV: number } | null;
    };

/** The first cycle with a peak: a first sweep from the bulk is what Randles–Ševčík describes. */
function firstCycleWithPeaks(cycles: readonly MeasuredCycle[]): MeasuredCycle | null {
  const sorted = [...cycles].sort((a, b) => a.cycle - b.cycle);
  return sorted.find((c) => c.anodic || c.cathodic) ?? null;
}

export function compareVoltammogram(
  cell: CellBlockInput,
  electrolyte: SolutionBlockInput | null,
  measured: MeasuredVoltammogram,
  stored?: SolutionEvaluation,
): VoltammogramComparison {
  const cycle = firstCycleWithPeaks(measured.cycles);
  if (!cycle) return { status: "idle", message: "No peak was found in this voltammogram." };
  const cellScanRate =
    cell.redoxProbe?.scanRateMVPerS != null ? cell.redoxProbe.scanRateMVPerS / 1000 : null;
  const fromTrace = measured.scanRateVPerS !== null && measured.scanRateVPerS > 0;
  const scanRateVPerS = fromTrace ? measured.scanRateVPerS : cellScanRate;
  const scanRateFrom = fromTrace ? "trace" : cellScanRate !== null ? "cell" : null;
  const chem = evaluateCellElectrochemistry(
    cell,
    electrolyte,
    stored,
    scanRateVPerS !== null ? { scanRateVPerS } : {},
  );
  const expected = chem.peak;
  const electrons = expected.status === "ok" ? expected.electrons : 1;
  const resistanceOhm = chem.resistance.status === "ok" ? chem.resistance.resistanceOhm : null;
  const notes: string[] = [];
  if (scanRateFrom === "cell")
    notes.push("The file does not state its scan rate: the cell block's scan rate is used.");
  if (expected.status !== "ok" && scanRateVPerS === null)
    notes.push("Neither the file nor the cell block gives a scan rate.");
  try {
    const judged = judgeVoltammogram({
      measured: {
        deltaEpV: cycle.deltaEpV,
        anodicPeakCurrentA: cycle.anodic?.currentA ?? null,
        cathodicPeakCurrentA: cycle.cathodic?.currentA ?? null,
      },
      ...(expected.status === "ok"
        ? {
            expected: { peakCurrentA: expected.peakCurrentA, forwardPeak: expected.forwardPeak },
          }
        : {}),
      electrons,
      temperatureC: chem.temperatureC,
      ...(resistanceOhm !== null ? { uncompensatedResistanceOhm: resistanceOhm } : {}),
    });
    notes.push(...judged.notes);
    const larger = [
      cycle.anodic ? { peak: "anodic" as const, p: cycle.anodic } : null,
      cycle.cathodic ? { peak: "cathodic" as const, p: cycle.cathodic } : null,
    ]
      .filter((x): x is NonNullable<typeof x> => x !== null)
      .map((x) => ({ peak: x.peak, currentA: x.p.rawCurrentA ?? x.p.currentA }))
      .sort((a, b) => Math.abs(b.currentA) - Math.abs(a.currentA))[0];
    const drop =
      resistanceOhm !== null && larger
        ? {
            ...larger,
            dropV: iRDrop({ currentA: larger.currentA, resistanceOhm }),
          }
        : null;
    return {
      status: "ok",
      cycle: cycle.cycle,
      temperatureC: chem.temperatureC,
      electrons,
      measured: {
        deltaEpV: cycle.deltaEpV,
        anodicPeakCurrentA: cycle.anodic?.currentA ?? null,
        cathodicPeakCurrentA: cycle.cathodic?.currentA ?? null,
      },
      scanRateVPerS,
      scanRateFrom,
      reversibleDeltaEpV: reversiblePeakSeparationV(electrons, chem.temperatureC),
      expected,
      verdict: judged.verdict,
      notes,
      resistanceOhm,
      iRDrop: drop,
    };
  } catch (error) {
    if (!isChemInputError(error)) throw error;
    return { status: "idle", message: error.message };
  }
}

export interface ScanRatePoint {
  label: string;
  sqrtScanRate: number;
  /** |forward peak|, A. */
  peakCurrentA: number;
}

export interface ScanRateSeries {
  forwardPeak: "anodic" | "cathodic";
  points: ScanRatePoint[];
  /** Voltammograms left out: no scan rate in the file, or no forward peak. */
  skipped: string[];
  /** Randles–Ševčík i_p / √v, A (V/s)^−½; null without a probe, area or concentration. */
  expectedSlope: number | null;
}

/**
 * Forward peak current against √v across the voltammograms linked to one cell, with the
 * Randles–Ševčík line through the origin (i_p ∝ √v for a reversible, diffusing couple).
 */
export function peakCurrentAgainstScanRate(
  cell: CellBlockInput,
  electrolyte: SolutionBlockInput | null,
  voltammograms: readonly { label: string; measured: MeasuredVoltammogram }[],
  stored?: SolutionEvaluation,
): ScanRateSeries {
  // At 1 V/s the expected current is the slope itself.
  const unit = evaluateCellElectrochemistry(cell, electrolyte, stored, { scanRateVPerS: 1 }).peak;
  const forwardPeak =
    unit.status === "ok"
      ? unit.forwardPeak
      : cell.redoxProbe?.form === "oxidized"
        ? "cathodic"
        : "anodic";
  const points: ScanRatePoint[] = [];
  const skipped: string[] = [];
  for (const { label, measured } of voltammograms) {
    const cycle = firstCycleWithPeaks(measured.cycles);
    const peak = cycle ? cycle[forwardPeak] : null;
    if (!measured.scanRateVPerS || measured.scanRateVPerS <= 0 || !peak) {
      skipped.push(label);
      continue;
    }
    points.push({
      label,
      sqrtScanRate: Math.sqrt(measured.scanRateVPerS),
      peakCurrentA: Math.abs(peak.currentA),
    });
  }
  points.sort((a, b) => a.sqrtScanRate - b.sqrtScanRate);
  return {
    forwardPeak,
    points,
    skipped,
    expectedSlope: unit.status === "ok" ? unit.peakCurrentA : null,
  };
}
