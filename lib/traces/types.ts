/**
 * Shapes shared by the trace parser, the analysis and the simulation. A `TraceSummary` is
 * plain JSON (no NaN, no Infinity, no undefined values) so it can go into a database row;
 * the numbers themselves stay in the file and come back as `Float64Array`s in SI units.
 */
import type { ReferenceElectrodeId } from "@/lib/chem";

/** What a column holds. Values are stored in the SI unit of the quantity (see SI_UNIT). */
export type Quantity =
  | "potential"
  | "current"
  | "currentDensity"
  | "time"
  | "charge"
  | "impedanceReal"
  /** −Z″, the imaginary part with its sign flipped, as impedance plots show it. */
  | "impedanceImaginaryNegated"
  | "impedanceModulus"
  | "frequency"
  | "phase"
  | "cycle";

export const QUANTITIES: readonly Quantity[] = [
  "potential",
  "current",
  "currentDensity",
  "time",
  "charge",
  "impedanceReal",
  "impedanceImaginaryNegated",
  "impedanceModulus",
  "frequency",
  "phase",
  "cycle",
];

export type TechniqueId =
  | "cyclic-voltammetry"
  | "linear-sweep-voltammetry"
  | "chronoamperometry"
  | "open-circuit-potential"
  | "impedance"
  | "unknown";

export interface ReferenceElectrodeText {
  /** As written in the file, e.g. "Ag/AgCl (3 M KCl)". */
  text: string;
  /** lib/chem's id when the text names one of its electrodes unambiguously, else null. */
  id: ReferenceElectrodeId | null;
}

export interface TraceColumn {
  index: number;
  name: string;
  quantity: Quantity | null;
  /** How the quantity was decided: from the name, from the unit alone, or by the mapping. */
  recognisedBy: "name" | "unit" | "mapping" | null;
  /** The unit as read (canonical spelling, e.g. "µA", "mA/cm²", "kΩ"), null if none. */
  unit: string | null;
  /** SI unit the stored values are in ("V", "A", "A/m²", "s", "C", "Ω", "Hz", "rad"), null for cycle numbers and unknown columns. */
  siUnit: string | null;
  /** value in SI = value as written × siFactor (1 for unknown columns, which are kept as written). */
  siFactor: number;
  referenceElectrode: ReferenceElectrodeText | null;
  minSi: number | null;
  maxSi: number | null;
  numericCells: number;
  nonNumericCells: number;
}

export interface TraceCycle {
  /** 1-based, or the value of the file's cycle column. */
  number: number;
  startRow: number;
  /** Exclusive. */
  endRow: number;
}

export interface HeaderFields {
  scanRateVPerS: number | null;
  electrodeAreaCm2: number | null;
  referenceElectrode: ReferenceElectrodeText | null;
  techniqueName: string | null;
  temperatureC: number | null;
  /** Every key–value line of the header block (the first 200, values cut at 200 characters). */
  entries: { key: string; value: string }[];
}

export interface TraceSummary {
  parserVersion: string;
  technique: TechniqueId;
  /** Why, in a chemist's words ("the potential sweeps and reverses 5 times"). */
  techniqueReason: string;
  delimiter: "," | ";" | "\t" | null;
  decimalSeparator: "." | "," | null;
  /** Lines before the column names (the header block). */
  headerLineCount: number;
  header: HeaderFields;
  columns: TraceColumn[];
  /** Column index used for each quantity (the first that holds it, or the mapping's). */
  roles: Partial<Record<Quantity, number>>;
  points: number;
  cycles: TraceCycle[];
  cycleSource: "column" | "sweep-reversal" | "none";
  mappingApplied: boolean;
  /** What the parser did not understand or had to assume; empty for a clean file. */
  problems: string[];
}

export interface ParsedTrace {
  summary: TraceSummary;
  /** One array per column (same order as summary.columns), `points` long, SI units, NaN where a cell was not a number. */
  columns: Float64Array[];
}

/** One entry of the mapping dialog: which column (name or 0-based index) and in which unit. */
export interface ColumnMappingEntry {
  column: string | number;
  /** As the user picked it, e.g. "mV", "µA", "mA/cm2"; omitted for cycle numbers or to keep the unit read from the name. */
  unit?: string;
}

/** The mapping dialog's answer, remembered per lab. Mapped quantities bypass detection. */
export type ColumnMapping = Partial<Record<Quantity, ColumnMappingEntry>>;

export interface TraceParseOptions {
  mapping?: ColumnMapping;
  /** Give up looking for the table after this many characters (default 4 MB). */
  maxHeadChars?: number;
  /** Lines longer than this are skipped and reported (default 1 MB). */
  maxLineChars?: number;
}
