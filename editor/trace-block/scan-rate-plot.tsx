"use client";

import { useEffect, useRef } from "react";
import uPlot from "uplot";
import "uplot/dist/uPlot.min.css";
import type { ScanRatePoint } from "@/lib/document/compare-voltammogram";

interface ScanRatePlotProps {
  points: readonly ScanRatePoint[];
  /** Randles–Ševčík i_p/√v, A (V/s)^−½; null: points only. */
  expectedSlope: number | null;
}

/** Measured forward peak currents (µA) against √v, and the Randles–Ševčík line through 0. */
export default function ScanRatePlot({ points, expectedSlope }: ScanRatePlotProps) {
  const host = useRef<HTMLDivElement>(null);
  useEffect(() => {
    const el = host.current;
    if (!el) return;
    const xMax = Math.max(...points.map((p) => p.sqrtScanRate)) * 1.15;
    const measured = [points.map((p) => p.sqrtScanRate), points.map((p) => p.peakCurrentA * 1e6)];
    const line =
      expectedSlope !== null
        ? [
            [0, xMax],
            [0, expectedSlope * xMax * 1e6],
          ]
        : null;
    const data = [
      null as unknown as number[],
      measured as unknown as number[],
      ...(line ? [line as unknown as number[]] : []),
    ] as uPlot.AlignedData;
    const yMax = Math.max(...measured[1], ...(line ? line[1] : []));
    const plot = new uPlot(
      {
        width: Math.min(Math.max(260, el.clientWidth), 480),
        height: 200,
        mode: 2,
        legend: { show: true, live: false },
        hooks: {
          draw: [
            (u: uPlot) => {
              const ctx = u.ctx;
              ctx.save();
              ctx.fillStyle = "#9c5430";
              for (const p of points) {
                ctx.beginPath();
                ctx.arc(
                  u.valToPos(p.sqrtScanRate, "x", true),
                  u.valToPos(p.peakCurrentA * 1e6, "y", true),
                  4.5 * devicePixelRatio,
                  0,
                  2 * Math.PI,
                );
                ctx.fill();
              }
              ctx.restore();
            },
          ],
        },
        scales: { x: { time: false, range: [0, xMax] }, y: { range: [0, yMax * 1.1] } },
        axes: [
          { label: "√v / (V/s)^½", stroke: "#52606d", grid: { stroke: "#e5e7eb" } },
          { label: "ip / µA", stroke: "#52606d", grid: { stroke: "#e5e7eb" }, size: 60 },
        ],
        series: [
          {},
          // Drawn by the hook below: uPlot's own points need a path in its x–y mode.
          { label: "measured", stroke: "#9c5430", paths: () => null, points: { show: false } },
          ...(line
            ? [
                {
                  label: "Randles–Ševčík",
                  stroke: "#1b6964",
                  width: 1.5,
                  dash: [6, 4],
                  points: { show: false },
                },
              ]
            : []),
        ],
      },
      data,
      el,
    );
    return () => plot.destroy();
  }, [points, expectedSlope]);
  return (
    <div
      ref={host}
      className="w-full overflow-hidden"
      data-testid="scan-rate-plot"
      role="img"
      aria-label="Peak current against the square root of the scan rate"
    />
  );
}
