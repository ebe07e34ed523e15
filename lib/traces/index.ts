/**
 * Public API of lib/traces: potentiostat exports read into traces, and voltammetric peaks.
 * Pure and isomorphic; the one Node-only piece, `parseTraceFile`, is imported from
 * "@/lib/traces/parse-file" directly so that browser bundles never see it.
 * Simulations for tests and benches: "@/lib/traces/simulate".
 */
export { createTraceParser, TRACE_PARSER_VERSION } from "./incremental-parser";
export type { TraceParser } from "./incremental-parser";
export { parseTraceText } from "./parse-text";
export { traceColumn } from "./trace-column";
export { TraceParseError, isTraceParseError } from "./errors";
export { readColumnName } from "./column-names";
export type { ColumnNameReading } from "./column-names";
export { readUnit } from "./units";
export type { UnitReading, Dimension } from "./units";
export { TECHNIQUE_LABEL } from "./technique";
export { downsampleForPlot } from "./downsample";
export type { PlotSeries } from "./downsample";
export { analyseVoltammogram, PEAK_BASELINE_METHOD } from "./voltammetry/analyse-voltammogram";
export type { VoltammogramInput, CycleAnalysis } from "./voltammetry/analyse-voltammogram";
export type { Peak } from "./voltammetry/find-peak";
export { QUANTITIES } from "./types";
export type {
  Quantity,
  TechniqueId,
  TraceColumn,
  TraceCycle,
  TraceSummary,
  HeaderFields,
  ParsedTrace,
  ColumnMapping,
  ColumnMappingEntry,
  TraceParseOptions,
  ReferenceElectrodeText,
} from "./types";
