"use client";

import { useEffect, useRef } from "react";
import uPlot from "uplot";
import "uplot/dist/uPlot.min.css";
import type { TraceViewDto } from "@/lib/contract/traces";

const COLOURS = ["#1b6964", "#9c5430", "#52606d", "#7d4226", "#22807a", "#b8683d", "#1f2933"];

interface TracePlotProps {
  series: { label: string; x: number[]; y: number[] }[];
  xLabel: string;
  yLabel: string;
  /** Nyquist plots keep one ohm the same length on both axes. */
  equalAxes: boolean;
  peaks: TraceViewDto["peaks"];
  shift: number;
  perArea: number;
  bode: TraceViewDto["bode"];
}

/**
 * uPlot: one x–y series per cycle (each with its own x values, uPlot's "mode 2"), peaks
 * marked. Drawn on a canvas, so a long trace paints quickly.
 */
function XYPlot({
  series,
  xLabel,
  yLabel,
  equalAxes,
  peaks,
  shift,
  perArea,
}: Omit<TracePlotProps, "bode">) {
  const host = useRef<HTMLDivElement>(null);
  useEffect(() => {
    const el = host.current;
    if (!el) return;
    // A Nyquist plot is square, so one ohm is as long on both axes.
    const width = equalAxes
      ? Math.min(Math.max(280, el.clientWidth), 420)
      : Math.max(280, el.clientWidth);
    const height = equalAxes ? width : 300;
    let range: [number, number] | undefined;
    if (equalAxes) {
      const all = series.flatMap((s) => [...s.x, ...s.y]);
      const lo = Math.min(0, ...all);
      const hi = Math.max(...all);
      range = [lo, hi + (hi - lo) * 0.05];
    }
    const markers = peaks.flatMap((p) =>
      [p.anodic, p.cathodic]
        .filter((k): k is NonNullable<typeof k> => Boolean(k))
        .map((k) => ({ x: k.potentialV + shift, y: k.rawCurrentA * perArea })),
    );
    const data: uPlot.AlignedData = [
      null as unknown as number[],
      ...series.map((s) => [s.x, s.y] as unknown as number[]),
    ];
    const plot = new uPlot(
      {
        width,
        height,
        mode: 2,
        // A long cycling run would list hundreds of rows; its cycles are picked above instead.
        legend: { show: series.length <= 12, live: false },
        // Peaks are marked with rings drawn over the curves.
        hooks: {
          draw: [
            (u: uPlot) => {
              const ctx = u.ctx;
              ctx.save();
              ctx.strokeStyle = "#b91c1c";
              ctx.lineWidth = 2 * devicePixelRatio;
              for (const m of markers) {
                const px = u.valToPos(m.x, "x", true);
                const py = u.valToPos(m.y, "y", true);
                ctx.beginPath();
                ctx.arc(px, py, 5 * devicePixelRatio, 0, 2 * Math.PI);
                ctx.stroke();
              }
              ctx.restore();
            },
          ],
        },
        cursor: { drag: { x: true, y: true, uni: 50 } },
        scales: {
          x: { time: false, ...(range ? { range } : {}) },
          y: range ? { range } : {},
        },
        axes: [
          { label: xLabel, stroke: "#52606d", grid: { stroke: "#e5e7eb" } },
          { label: yLabel, stroke: "#52606d", grid: { stroke: "#e5e7eb" }, size: 70 },
        ],
        series: [
          {},
          ...series.map((s, i) => ({
            label: s.label,
            stroke: COLOURS[i % COLOURS.length],
            width: 1.5,
            points: { show: false },
          })),
        ],
      },
      data,
      el,
    );
    return () => plot.destroy();
  }, [series, xLabel, yLabel, equalAxes, peaks, shift, perArea]);
  return (
    <div
      ref={host}
      className="w-full overflow-hidden"
      data-testid="trace-plot"
      role="img"
      aria-label={`${yLabel} against ${xLabel}`}
    />
  );
}

function BodePlot({ bode }: { bode: NonNullable<TraceViewDto["bode"]> }) {
  const host = useRef<HTMLDivElement>(null);
  useEffect(() => {
    const el = host.current;
    if (!el) return;
    const order = bode.frequencyHz.map((f, i) => [f, i] as const).sort((a, b) => a[0] - b[0]);
    const x = order.map(([f]) => f);
    const plot = new uPlot(
      {
        width: Math.max(280, el.clientWidth),
        height: 260,
        scales: { x: { time: false, distr: 3 }, mod: { distr: 3 }, phase: {} },
        axes: [
          { label: "f / Hz", stroke: "#52606d" },
          { scale: "mod", label: "|Z| / Ω", stroke: "#1b6964", size: 70 },
          { scale: "phase", side: 1, label: "phase / °", stroke: "#9c5430", grid: { show: false } },
        ],
        series: [
          {},
          { label: "|Z|", scale: "mod", stroke: "#1b6964", width: 1.5 },
          { label: "phase", scale: "phase", stroke: "#9c5430", width: 1.5 },
        ],
      },
      [x, order.map(([, i]) => bode.modulusOhm[i]), order.map(([, i]) => bode.phaseDeg[i])],
      el,
    );
    return () => plot.destroy();
  }, [bode]);
  return (
    <div
      ref={host}
      className="w-full overflow-hidden"
      role="img"
      aria-label="Bode plot: |Z| and phase against frequency"
    />
  );
}

export default function TracePlot({ bode, ...xy }: TracePlotProps) {
  return (
    <div className="space-y-3">
      <XYPlot {...xy} />
      {bode ? <BodePlot bode={bode} /> : null}
    </div>
  );
}
