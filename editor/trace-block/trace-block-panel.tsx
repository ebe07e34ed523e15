"use client";

import type { Editor } from "@tiptap/core";
import { useQueries, useQuery } from "@tanstack/react-query";
import { lazy, Suspense, useMemo, useState } from "react";
import { convertPotential, listReferenceElectrodes } from "@/lib/chem";
import type { TraceBlockInput } from "@/lib/document/block-schemas";
import { traceViewQueryKey, type TraceViewDto } from "@/lib/contract/traces";
import { apiFetch } from "@/lib/ui/api-client";
import { TECHNIQUE_LABEL } from "@/lib/traces";
import { TextField } from "../ui/text-field";
import { SelectField } from "../ui/select-field";
import { referenceElectrodeLabel } from "../chem-catalogue";
import { MappingDialog } from "./mapping-dialog";
import { PeaksTable } from "./peaks-table";
import { useEntryBlocks } from "../use-entry-blocks";
import { ExpectedVsMeasured, type LinkedVoltammogram } from "./expected-vs-measured";

// uPlot comes with the first trace block only; its fetch starts as soon as this panel's code
// runs, alongside the trace's data, instead of after the data arrived.
const loadTracePlot = () => import("./trace-plot");
const TracePlot = lazy(loadTracePlot);

/** Above this many cycles the cycle checkboxes fold into a disclosure. */
const MANY_CYCLES = 12;

/** Which cycles of a voltammogram are drawn; null means all. */
function CycleChoices({
  labels,
  chosen,
  editable,
  onChange,
}: {
  labels: string[];
  chosen: number[] | null | undefined;
  editable: boolean;
  onChange: (cycles: number[] | null) => void;
}) {
  const boxes = (
    <fieldset className="flex flex-wrap gap-3 text-xs">
      <legend className="sr-only">Cycles shown</legend>
      {labels.map((label, i) => (
        <label key={label} className="flex items-center gap-1">
          <input
            type="checkbox"
            checked={!chosen || chosen.includes(i + 1)}
            disabled={!editable}
            onChange={(e) => {
              const all = labels.map((_, k) => k + 1);
              const current = chosen ?? all;
              const next = e.target.checked
                ? [...new Set([...current, i + 1])].sort((a, b) => a - b)
                : current.filter((c) => c !== i + 1);
              onChange(next.length === all.length ? null : next);
            }}
          />
          {label}
        </label>
      ))}
    </fieldset>
  );
  if (labels.length <= MANY_CYCLES) return boxes;
  // A long cycling run: the list folds away instead of filling the block.
  return (
    <details className="text-xs">
      <summary className="cursor-pointer text-ink-soft">
        Cycles shown: {chosen ? `${chosen.length} of ${labels.length}` : `all ${labels.length}`}
      </summary>
      <div className="mt-2 max-h-48 overflow-y-auto">{boxes}</div>
    </details>
  );
}

interface TraceBlockPanelProps {
  editor: Editor;
  value: TraceBlockInput;
  onChange: (next: TraceBlockInput) => void;
  editable: boolean;
}

const REFERENCES = listReferenceElectrodes().filter((r) => r.id !== "RHE");

const PREFIXES = [
  { factor: 1, symbol: "" },
  { factor: 1e3, symbol: "m" },
  { factor: 1e6, symbol: "µ" },
  { factor: 1e9, symbol: "n" },
];

/** The loaded views only: structurally shared, so unchanged traces keep their identity. */
function combineViews(results: { data?: TraceViewDto }[]): (TraceViewDto | undefined)[] {
  return results.map((r) => r.data);
}

/** The SI prefix that puts the largest current between 1 and 1000 in its unit. */
function currentPrefix(values: number[]) {
  const largest = values.reduce((m, v) => Math.max(m, Math.abs(v)), 0);
  return PREFIXES.find((p) => largest * p.factor >= 1) ?? PREFIXES[PREFIXES.length - 1];
}

/**
 * An instrument export plotted: current against potential per cycle for voltammetry, current
 * or potential against time, Nyquist and Bode plots for impedance. Current can be shown per
 * electrode area (from a linked cell block) and potentials on another reference scale.
 */
export function TraceBlockPanel({ editor, value, onChange, editable }: TraceBlockPanelProps) {
  void loadTracePlot();
  const query = useQuery({
    queryKey: traceViewQueryKey(value.attachmentId),
    queryFn: () => apiFetch<TraceViewDto>(`/api/attachments/${value.attachmentId}/trace`),
    staleTime: Infinity,
  });
  const [mappingOpen, setMappingOpen] = useState(false);
  const cells = useEntryBlocks(editor, "cellBlock");
  const cell = cells.find((c) => c.blockId === value.cellBlockId) ?? null;
  const areaCm2 = cell?.workingElectrode.areaCm2 ?? null;
  const solutions = useEntryBlocks(editor, "solutionBlock");
  const electrolyte = solutions.find((s) => s.blockId === cell?.electrolyteBlockId) ?? null;
  // The entry's traces linked to the same cell, for i_p against √v (the query cache is shared).
  const traceBlocks = useEntryBlocks(editor, "traceBlock");
  const siblings = useMemo(
    () => traceBlocks.filter((t) => cell !== null && t.cellBlockId === cell.blockId),
    [traceBlocks, cell],
  );
  const siblingViews = useQueries({
    queries: siblings.map((t) => ({
      queryKey: traceViewQueryKey(t.attachmentId),
      queryFn: () => apiFetch<TraceViewDto>(`/api/attachments/${t.attachmentId}/trace`),
      staleTime: Infinity,
    })),
    combine: combineViews,
  });
  const linked = useMemo(
    () =>
      siblings.flatMap((t, i): LinkedVoltammogram[] => {
        const data = siblingViews[i];
        const technique = data?.summary.technique;
        return data &&
          (technique === "cyclic-voltammetry" || technique === "linear-sweep-voltammetry")
          ? [{ label: t.name || data.name, view: data }]
          : [];
      }),
    [siblings, siblingViews],
  );
  const patch = (changes: Partial<TraceBlockInput>) => onChange({ ...value, ...changes });
  const view = query.data;
  const fileReference = view?.summary.header.referenceElectrode?.id ?? null;
  const isVoltammetry =
    view?.summary.technique === "cyclic-voltammetry" ||
    view?.summary.technique === "linear-sweep-voltammetry";

  const shown = useMemo(() => {
    if (!view) return null;
    const shift =
      isVoltammetry &&
      value.potentialScale &&
      fileReference &&
      value.potentialScale !== fileReference
        ? convertPotential(0, fileReference, value.potentialScale, { temperatureC: 25 })
        : 0;
    const perArea = value.showCurrentDensity && areaCm2 && areaCm2 > 0 ? 1 / areaCm2 : 1;
    const isCurrent = isVoltammetry || view.axes.y === "I / A";
    const raw = view.series
      .filter((_, i) => !isVoltammetry || !value.cycles || value.cycles.includes(i + 1))
      .map((s) => ({
        label: s.label,
        x: isVoltammetry ? s.x.map((x) => x + shift) : s.x,
        y: isCurrent ? s.y.map((y) => y * perArea) : s.y,
      }));
    // Currents are read in the prefix that suits their size (µA for a microelectrode).
    const prefix = isCurrent ? currentPrefix(raw.flatMap((s) => s.y)) : { factor: 1, symbol: "" };
    const series = raw.map((s) => ({ ...s, y: s.y.map((y) => y * prefix.factor) }));
    const xLabel = isVoltammetry
      ? `E / V vs ${referenceElectrodeLabel(value.potentialScale ?? fileReference ?? "the file's reference")}`
      : view.axes.x;
    const yLabel = !isCurrent
      ? view.axes.y
      : perArea !== 1
        ? `j / ${prefix.symbol}A cm⁻²`
        : `I / ${prefix.symbol}A`;
    const scale = prefix.factor;
    return { series, xLabel, yLabel, shift, perArea, scale };
  }, [view, isVoltammetry, value, fileReference, areaCm2]);

  return (
    <section
      data-live-block="trace"
      id={`block-${value.blockId}`}
      aria-label={`Trace block ${value.name || view?.name || ""}`}
      className="my-4 rounded-lg border border-ink-faint/40 bg-white/70 shadow-sm"
    >
      <header className="flex flex-wrap items-center gap-2 border-b border-ink-faint/30 bg-paper-deep/60 px-3 py-1.5">
        <span className="rounded bg-copper-600 px-1.5 py-0.5 text-[10px] font-semibold tracking-wider text-white uppercase">
          Trace
        </span>
        <TextField
          label="Trace name"
          hideLabel
          maxLength={120}
          className="min-w-40 flex-1"
          placeholder="Name, e.g. CV of ferricyanide at 100 mV/s"
          value={value.name}
          disabled={!editable}
          onValueChange={(name) => patch({ name })}
        />
        <a
          className="text-xs text-copper-700 hover:underline"
          href={`/api/attachments/${value.attachmentId}`}
        >
          {view?.name ?? "file"}
        </a>
      </header>
      <div className="space-y-3 px-3 py-3 text-sm">
        {query.isLoading ? <p className="text-ink-soft">Reading the export…</p> : null}
        {query.error ? (
          <p role="alert" className="text-red-700">
            {query.error.message}
          </p>
        ) : null}
        {view ? (
          <>
            <p className="text-xs text-ink-soft" data-testid="trace-technique">
              <span className="font-medium text-ink">
                {TECHNIQUE_LABEL[view.summary.technique]}
              </span>{" "}
              — {view.summary.techniqueReason}. {view.summary.points.toLocaleString("en-GB")} points
              {view.summary.cycles.length ? `, ${view.summary.cycles.length} cycle(s)` : ""}
              {view.summary.header.scanRateVPerS
                ? `, ${(view.summary.header.scanRateVPerS * 1000).toPrecision(3)} mV/s`
                : ""}
              .
            </p>
            <div className="flex flex-wrap items-end gap-3">
              {isVoltammetry ? (
                <SelectField
                  label="Potential scale"
                  value={value.potentialScale ?? ""}
                  disabled={!editable || !fileReference}
                  options={[
                    {
                      value: "",
                      label: fileReference
                        ? `As recorded (${referenceElectrodeLabel(fileReference)})`
                        : "As recorded",
                    },
                    ...REFERENCES.map((r) => ({ value: r.id, label: r.name })),
                  ]}
                  onValueChange={(v) =>
                    patch({ potentialScale: (v || null) as TraceBlockInput["potentialScale"] })
                  }
                />
              ) : null}
              <SelectField
                label="Cell block"
                value={value.cellBlockId ?? ""}
                disabled={!editable}
                options={[
                  { value: "", label: "Not linked" },
                  ...cells.map((c) => ({
                    value: c.blockId,
                    label: c.name || `Cell ${c.blockId.slice(0, 6)}`,
                  })),
                ]}
                onValueChange={(v) => patch({ cellBlockId: v || null })}
              />
              <label className="flex items-center gap-2 pb-2 text-xs">
                <input
                  type="checkbox"
                  checked={value.showCurrentDensity}
                  disabled={!editable || !areaCm2}
                  onChange={(e) => patch({ showCurrentDensity: e.target.checked })}
                />
                Current density
                {areaCm2 ? ` (${areaCm2} cm²)` : " (link a cell block with an electrode area)"}
              </label>
            </div>
            {isVoltammetry && view.series.length > 1 ? (
              <CycleChoices
                labels={view.series.map((x) => x.label)}
                chosen={value.cycles}
                editable={editable}
                onChange={(cycles) => patch({ cycles })}
              />
            ) : null}
            {shown && shown.series.length ? (
              <Suspense fallback={<div className="h-72 animate-pulse rounded bg-paper-deep" />}>
                <TracePlot
                  series={shown.series}
                  xLabel={shown.xLabel}
                  yLabel={shown.yLabel}
                  equalAxes={view.summary.technique === "impedance"}
                  peaks={
                    isVoltammetry
                      ? view.peaks.filter((p) => !value.cycles || value.cycles.includes(p.cycle))
                      : []
                  }
                  shift={shown.shift}
                  perArea={shown.perArea * shown.scale}
                  bode={view.bode}
                />
              </Suspense>
            ) : (
              <p className="text-ink-soft">
                Nothing to plot: no potential, current or time column was recognised.
              </p>
            )}
            {isVoltammetry ? (
              <PeaksTable
                peaks={view.peaks}
                shift={shown?.shift ?? 0}
                perArea={shown?.perArea ?? 1}
              />
            ) : null}
            {isVoltammetry && cell ? (
              <ExpectedVsMeasured
                cell={cell}
                electrolyte={electrolyte}
                view={view}
                linked={linked}
                editable={editable}
              />
            ) : null}
            {view.summary.problems.length ? (
              <div className="rounded-md border border-amber-200 bg-amber-50 px-3 py-2 text-xs text-amber-900">
                <p className="font-medium">What the reader did not understand</p>
                <ul className="mt-1 list-disc pl-4">
                  {view.summary.problems.map((p) => (
                    <li key={p}>{p}</li>
                  ))}
                </ul>
              </div>
            ) : null}
            {editable ? (
              <button
                type="button"
                className="text-xs text-copper-700 hover:underline"
                onClick={() => setMappingOpen(true)}
              >
                Choose the columns myself…
              </button>
            ) : null}
            {mappingOpen ? (
              <MappingDialog
                view={view}
                onClose={() => setMappingOpen(false)}
                onSaved={() => {
                  setMappingOpen(false);
                  void query.refetch();
                }}
              />
            ) : null}
          </>
        ) : null}
      </div>
    </section>
  );
}
