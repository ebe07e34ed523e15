"use client";

import { lazy, Suspense, useMemo } from "react";
import type { TraceViewDto } from "@/lib/contract/traces";
import type { CellBlockInput, SolutionBlockInput } from "@/lib/document/block-schemas";
import {
  compareVoltammogram,
  peakCurrentAgainstScanRate,
  type MeasuredVoltammogram,
} from "@/lib/document/compare-voltammogram";
import { evaluationFromStored } from "@/lib/document/stored-evaluation";
import { formatCurrentA, formatSignificant } from "@/lib/ui/format-number";
import { useStoredSolution } from "../stored-results";

// uPlot again, fetched with the first comparison that has points to plot.
const ScanRatePlot = lazy(() => import("./scan-rate-plot"));

export interface LinkedVoltammogram {
  label: string;
  view: TraceViewDto;
}

interface ExpectedVsMeasuredProps {
  cell: CellBlockInput;
  electrolyte: SolutionBlockInput | null;
  view: TraceViewDto;
  /** Every voltammogram of the entry linked to the same cell, this one included. */
  linked: readonly LinkedVoltammogram[];
  editable: boolean;
}

function measuredFrom(view: TraceViewDto): MeasuredVoltammogram {
  return { scanRateVPerS: view.summary.header.scanRateVPerS ?? null, cycles: view.peaks };
}

const mV = (v: number | null) =>
  v === null ? "—" : `${v < 0 ? "−" : ""}${Math.abs(v * 1000).toFixed(1)} mV`;

/**
 * The voltammogram beside what its cell block expects: ΔEp, the peak currents and the verdict
 * in words, the iR drop at the peak, and i_p against √v over the cell's voltammograms.
 */
export function ExpectedVsMeasured({
  cell,
  electrolyte,
  view,
  linked,
  editable,
}: ExpectedVsMeasuredProps) {
  const stored = useStoredSolution(electrolyte?.blockId);
  const storedEvaluation = useMemo(
    () =>
      stored && electrolyte && !editable ? evaluationFromStored(electrolyte, stored) : undefined,
    [stored, electrolyte, editable],
  );
  const comparison = useMemo(
    () => compareVoltammogram(cell, electrolyte, measuredFrom(view), storedEvaluation),
    [cell, electrolyte, view, storedEvaluation],
  );
  const series = useMemo(
    () =>
      peakCurrentAgainstScanRate(
        cell,
        electrolyte,
        linked.map((l) => ({ label: l.label, measured: measuredFrom(l.view) })),
        storedEvaluation,
      ),
    [cell, electrolyte, linked, storedEvaluation],
  );
  const cellName = cell.name || "the linked cell";

  return (
    <section
      aria-label="Expected and measured"
      className="space-y-2 rounded-md border border-lagoon-100 bg-lagoon-50/40 px-3 py-2"
    >
      <h4 className="text-xs font-semibold tracking-wide text-ink uppercase">
        Expected ({cellName}) and measured
      </h4>
      {comparison.status === "idle" ? (
        <p className="text-sm text-ink-soft">{comparison.message}</p>
      ) : (
        <>
          <p className="text-sm font-medium text-ink" data-testid="voltammogram-verdict">
            {comparison.verdict}
          </p>
          <div className="overflow-x-auto">
            <table className="w-full text-xs tabular-nums" aria-label="Expected and measured">
              <thead className="text-left text-ink-soft">
                <tr>
                  <th scope="col" className="py-1 pr-3 font-normal">
                    Cycle {comparison.cycle}
                  </th>
                  <th scope="col" className="py-1 pr-3 font-normal">
                    Measured
                  </th>
                  <th scope="col" className="py-1 pr-3 font-normal">
                    Expected
                  </th>
                  <th scope="col" className="py-1 font-normal">
                    Basis
                  </th>
                </tr>
              </thead>
              <tbody className="font-mono">
                <tr>
                  <th scope="row" className="py-1 pr-3 text-left font-sans font-normal">
                    ΔE<sub>p</sub>
                  </th>
                  <td className="py-1 pr-3" data-testid="measured-delta-ep">
                    {mV(comparison.measured.deltaEpV)}
                  </td>
                  <td className="py-1 pr-3" data-testid="expected-delta-ep">
                    {mV(comparison.reversibleDeltaEpV)}
                  </td>
                  <td className="py-1 font-sans text-ink-soft">
                    reversible, 2.218 RT/nF, n = {comparison.electrons}, {comparison.temperatureC}{" "}
                    °C
                  </td>
                </tr>
                {(["anodic", "cathodic"] as const).map((kind) => {
                  const measured =
                    kind === "anodic"
                      ? comparison.measured.anodicPeakCurrentA
                      : comparison.measured.cathodicPeakCurrentA;
                  const expected = comparison.expected;
                  const forward = expected.status === "ok" && expected.forwardPeak === kind;
                  return (
                    <tr key={kind}>
                      <th scope="row" className="py-1 pr-3 text-left font-sans font-normal">
                        i<sub>p{kind === "anodic" ? "a" : "c"}</sub>
                        {forward ? " (forward)" : ""}
                      </th>
                      <td className="py-1 pr-3" data-testid={`measured-${kind}-peak`}>
                        {formatCurrentA(measured, 3)}
                      </td>
                      <td className="py-1 pr-3" data-testid={forward ? "expected-peak" : undefined}>
                        {forward && expected.status === "ok"
                          ? formatCurrentA((kind === "anodic" ? 1 : -1) * expected.peakCurrentA, 3)
                          : "—"}
                      </td>
                      <td className="py-1 font-sans text-ink-soft">
                        {forward && expected.status === "ok"
                          ? `Randles–Ševčík at ${formatSignificant(expected.scanRateVPerS * 1000, 3)} mV/s${
                              comparison.scanRateFrom === "cell" ? " (cell block's)" : " (file's)"
                            }`
                          : kind === "anodic" || expected.status !== "ok"
                            ? ""
                            : "reverse peak: |ipa/ipc| ≈ 1 when reversible"}
                      </td>
                    </tr>
                  );
                })}
                <tr>
                  <th scope="row" className="py-1 pr-3 text-left font-sans font-normal">
                    iR drop
                  </th>
                  <td className="py-1 pr-3" data-testid="ir-drop">
                    {comparison.iRDrop ? mV(comparison.iRDrop.dropV) : "—"}
                  </td>
                  <td className="py-1 pr-3">—</td>
                  <td className="py-1 font-sans text-ink-soft">
                    {comparison.iRDrop && comparison.resistanceOhm !== null
                      ? `at the ${comparison.iRDrop.peak} peak, ${formatCurrentA(comparison.iRDrop.currentA, 3)} from zero, × Ru ${formatSignificant(comparison.resistanceOhm, 3)} Ω`
                      : "needs R_u: the cell block's disk radius and a linked electrolyte"}
                  </td>
                </tr>
              </tbody>
            </table>
          </div>
          {comparison.expected.status !== "ok" ? (
            <p className="text-xs text-ink-soft">Expected peak: {comparison.expected.message}</p>
          ) : null}
          {comparison.notes.length ? (
            <ul className="list-disc pl-4 text-xs text-ink-soft">
              {comparison.notes.map((note) => (
                <li key={note}>{note}</li>
              ))}
            </ul>
          ) : null}
        </>
      )}
      {series.points.length ? (
        <figure>
          <figcaption className="text-xs text-ink-soft">
            Forward ({series.forwardPeak}) peak current against √v: {series.points.length} of{" "}
            {linked.length} voltammogram(s) linked to {cellName}
            {series.expectedSlope !== null
              ? "; the line is Randles–Ševčík through the origin"
              : "; choose a redox probe in the cell block for the expected line"}
            {series.skipped.length
              ? `; without a scan rate or peak: ${series.skipped.join(", ")}`
              : ""}
            .
          </figcaption>
          <Suspense fallback={<div className="h-48 animate-pulse rounded bg-paper-deep" />}>
            <ScanRatePlot points={series.points} expectedSlope={series.expectedSlope} />
          </Suspense>
        </figure>
      ) : null}
    </section>
  );
}
