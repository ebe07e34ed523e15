import type { CycleAnalysis, TraceSummary } from "@/lib/traces";

/** The query-cache key of an attachment's trace view: the entry page seeds it, blocks read it. */
export const traceViewQueryKey = (attachmentId: string) => ["trace", attachmentId] as const;

/** GET /api/attachments/:id/trace: an export read back for plotting. */
export interface TraceViewDto {
  attachmentId: string;
  name: string;
  summary: TraceSummary;
  /** Current vs potential per cycle (voltammetry), current or potential vs time, or Nyquist. */
  series: { label: string; x: number[]; y: number[] }[];
  axes: { x: string; y: string };
  /** Impedance: |Z| and phase against frequency. */
  bode: { frequencyHz: number[]; modulusOhm: number[]; phaseDeg: number[] } | null;
  peaks: CycleAnalysis[];
  mapping: Record<string, { column: string | number; unit?: string }> | null;
}

/** POST /api/entries/:id/attachments answers with these. */
export interface AttachmentDto {
  id: string;
  name: string;
  kind: "photo" | "trace" | "file";
  detectedType: string;
  sizeBytes: number;
  sha256: string;
  createdAt: string;
  /** True when the same bytes were already attached to this entry (stored once). */
  duplicate: boolean;
  trace?: { technique: string; points: number; cycles: number; problems: string[] };
  photo?: { width: number; height: number };
}
