import "server-only";
import type { TraceViewDto } from "@/lib/contract/traces";
import type { Readable } from "node:stream";
import { createHash } from "node:crypto";
import { mkdtemp, rm, writeFile } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { derivedKey, type BlobStorage } from "@/lib/storage";
import {
  analyseVoltammogram,
  downsampleForPlot,
  traceColumn,
  type ColumnMapping,
  type ParsedTrace,
} from "@/lib/traces";

/** Points per plotted series: enough for a crisp line, few enough for a quick first paint. */
const MAX_PLOT_POINTS = 4000;
/**
 * Points over all cycles of a voltammogram together, with at least MIN_CYCLE_POINTS per cycle
 * (min–max buckets keep each cycle's peaks). Without a total, a long cycling run (hundreds of
 * cycles) sent 200 points for every cycle: 80 000 points, megabytes of JSON for one block.
 */
const MAX_TOTAL_CYCLE_POINTS = 16_000;
const MIN_CYCLE_POINTS = 40;

/**
 * Bumped whenever what a plot view holds changes (downsampling, peak finding, fields), so a
 * view kept from an earlier version is computed again instead of being served.
 */
const PLOT_VIEW_VERSION = 2;

/** What the trace route answers for an export, apart from the attachment's id and name. */
export type TracePlotView = Omit<TraceViewDto, "attachmentId" | "name">;
type TraceSeries = TraceViewDto["series"][number];

/** Plain numbers for JSON, to 7 significant digits (far below a pixel; a third of the bytes). */
const plain = (a: ArrayLike<number>) =>
  Array.from(a, (v) => (Number.isFinite(v) ? Number(v.toPrecision(7)) : 0));

function seriesOf(trace: ParsedTrace): Pick<TracePlotView, "series" | "axes" | "bode" | "peaks"> {
  const { summary } = trace;
  const potential = traceColumn(trace, "potential");
  const current = traceColumn(trace, "current");
  const time = traceColumn(trace, "time");
  const series: TraceSeries[] = [];
  if (summary.technique === "impedance") {
    const re = traceColumn(trace, "impedanceReal");
    const im = traceColumn(trace, "impedanceImaginaryNegated");
    const f = traceColumn(trace, "frequency");
    const mod = traceColumn(trace, "impedanceModulus");
    const phase = traceColumn(trace, "phase");
    if (re && im) {
      const d = downsampleForPlot(re, im, MAX_PLOT_POINTS);
      series.push({ label: "Nyquist", x: plain(d.x), y: plain(d.y) });
    }
    const bode =
      f && re && im
        ? {
            frequencyHz: plain(f),
            modulusOhm: mod ? plain(mod) : Array.from(f, (_, i) => Math.hypot(re[i], im[i])),
            phaseDeg: phase
              ? Array.from(phase, (p) => (p * 180) / Math.PI)
              : Array.from(f, (_, i) => (-Math.atan2(im[i], re[i]) * 180) / Math.PI),
          }
        : null;
    return { series, axes: { x: "Z′ / Ω", y: "−Z″ / Ω" }, bode, peaks: [] };
  }
  if (
    (summary.technique === "cyclic-voltammetry" ||
      summary.technique === "linear-sweep-voltammetry") &&
    potential &&
    current
  ) {
    const cycles = summary.cycles.length
      ? summary.cycles
      : [{ number: 1, startRow: 0, endRow: summary.points }];
    const perCycle = Math.min(
      MAX_PLOT_POINTS,
      Math.max(MIN_CYCLE_POINTS, Math.floor(MAX_TOTAL_CYCLE_POINTS / cycles.length)),
    );
    for (const c of cycles) {
      const d = downsampleForPlot(
        potential.subarray(c.startRow, c.endRow),
        current.subarray(c.startRow, c.endRow),
        perCycle,
      );
      series.push({ label: `Cycle ${c.number}`, x: plain(d.x), y: plain(d.y) });
    }
    const peaks = analyseVoltammogram({
      potentialV: potential,
      currentA: current,
      cycles: summary.cycles,
    });
    return { series, axes: { x: "E / V", y: "I / A" }, bode: null, peaks };
  }
  const y = current ?? potential;
  if (time && y) {
    const d = downsampleForPlot(time, y, MAX_PLOT_POINTS);
    series.push({ label: current ? "Current" : "Potential", x: plain(d.x), y: plain(d.y) });
    return { series, axes: { x: "t / s", y: current ? "I / A" : "E / V" }, bode: null, peaks: [] };
  }
  return { series, axes: { x: "", y: "" }, bode: null, peaks: [] };
}

/** A parsed export turned into plot series (downsampled) and voltammetric peaks. */
export function plotViewOf(trace: ParsedTrace, mapping: ColumnMapping | null): TracePlotView {
  return { summary: trace.summary, mapping, ...seriesOf(trace) };
}

/** JSON with object keys sorted: a mapping read back from jsonb names the same view. */
function canonicalJson(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(",")}]`;
  if (value && typeof value === "object")
    return `{${Object.keys(value)
      .sort()
      .map((k) => `${JSON.stringify(k)}:${canonicalJson((value as Record<string, unknown>)[k])}`)
      .join(",")}}`;
  return JSON.stringify(value) ?? "null";
}

/**
 * Where the plot view of an original read with a mapping is kept: a derived object beside the
 * original, named by the view's version and the mapping, so it never goes stale.
 */
export function plotViewKey(sha256: string, mapping: ColumnMapping | null): string {
  const mappingHash = createHash("sha256")
    .update(canonicalJson(mapping))
    .digest("hex")
    .slice(0, 16);
  return derivedKey(sha256, `plot-v${PLOT_VIEW_VERSION}-${mappingHash}.json`);
}

/** Writes a view as JSON into `dir` (a temporary folder) for BlobStorage.putFile. */
export async function writePlotViewFile(dir: string, view: TracePlotView): Promise<string> {
  const path = join(dir, `plot-view-${process.pid}-${Date.now()}.json`);
  await writeFile(path, JSON.stringify({ version: PLOT_VIEW_VERSION, view }));
  return path;
}

async function text(stream: Readable): Promise<string> {
  const chunks: Buffer[] = [];
  for await (const piece of stream) chunks.push(piece as Buffer);
  return Buffer.concat(chunks).toString("utf8");
}

/** The kept view, or null when there is none (or it cannot be read: it is then computed again). */
export async function readPlotView(
  storage: BlobStorage,
  sha256: string,
  mapping: ColumnMapping | null,
): Promise<TracePlotView | null> {
  const key = plotViewKey(sha256, mapping);
  try {
    if ((await storage.size(key)) === null) return null;
    const kept = JSON.parse(await text(await storage.read(key))) as {
      version?: number;
      view?: TracePlotView;
    };
    return kept.version === PLOT_VIEW_VERSION && kept.view ? kept.view : null;
  } catch {
    return null;
  }
}

/** Keeps a view computed on demand, so the next reader (on any instance) does not parse again. */
export async function keepPlotView(
  storage: BlobStorage,
  sha256: string,
  view: TracePlotView,
): Promise<void> {
  const dir = await mkdtemp(join(tmpdir(), "ionleaf-plot-"));
  try {
    const path = await writePlotViewFile(dir, view);
    await storage.putFile(plotViewKey(sha256, view.mapping), path, "application/json");
  } finally {
    await rm(dir, { recursive: true, force: true });
  }
}
