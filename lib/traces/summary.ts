/**
 * Turns what the parser gathered into the `TraceSummary` (plain JSON, no NaN) and the
 * column arrays: technique, cycles, per-column ranges, and the problems a chemist should
 * see before trusting a plot of the file.
 */
import type { RolePlan } from "./column-roles";
import type { ColumnStore } from "./column-store";
import { cyclesFromColumn, cyclesFromSweep, MAX_CYCLES } from "./cycles";
import type { TableLocation } from "./dialect";
import type { HeaderReading } from "./header-fields";
import type { CellReader } from "./numbers";
import { detectTechnique } from "./technique";
import type { HeaderFields, ParsedTrace, TraceCycle, TraceSummary } from "./types";

export interface SummaryInput {
  table: TableLocation | null;
  plan: RolePlan | null;
  header: HeaderReading | null;
  stores: ColumnStore[];
  points: number;
  reader: CellReader | null;
  problems: string[];
  parserVersion: string;
}

const EMPTY_HEADER: HeaderFields = {
  scanRateVPerS: null,
  electrodeAreaCm2: null,
  referenceElectrode: null,
  techniqueName: null,
  temperatureC: null,
  entries: [],
};

const finiteOrNull = (x: number) => (Number.isFinite(x) ? x : null);

export function buildSummary(input: SummaryInput): ParsedTrace {
  const { table, plan, header, stores, points, reader } = input;
  const problems = [...input.problems];
  const columns = stores.map((s) => s.view(points));
  const roles = plan?.roles ?? {};
  if (plan) problems.push(...plan.problems);
  if (header) problems.push(...header.problems);

  if (table && points === 0) problems.push("The table has column names but no rows of numbers.");
  if (table && table.namesLine === null)
    problems.push(
      "The table has no column names: say in the mapping which column is potential, current and time.",
    );
  if (
    reader &&
    reader.commaCells > 0 &&
    (reader.pointCells > 0 || (table?.sampledPointCells ?? 0) > 0)
  )
    problems.push("Some numbers use a decimal point and others a decimal comma; check the values.");

  const summaryColumns = (plan?.columns ?? []).map((c, k) => {
    const store = stores[k];
    if (store.nonNumeric > 0 && c.name.trim() !== "")
      problems.push(
        `Column "${c.name}": ${store.nonNumeric} of ${points} cells are empty or not numbers.`,
      );
    return {
      ...c,
      minSi: finiteOrNull(store.min),
      maxSi: finiteOrNull(store.max),
      numericCells: store.numeric,
      nonNumericCells: store.nonNumeric,
    };
  });

  const technique = detectTechnique({
    headerTechniqueName: header?.fields.techniqueName ?? null,
    roles,
    columns,
    points,
  });
  problems.push(...technique.problems);
  const has = (q: keyof typeof roles) => roles[q] !== undefined;
  const voltammetric =
    technique.technique === "cyclic-voltammetry" ||
    technique.technique === "linear-sweep-voltammetry" ||
    technique.technique === "chronoamperometry";
  if (table && voltammetric && !has("current") && !has("currentDensity"))
    problems.push("No current column was recognised.");
  if (
    table &&
    (technique.technique === "cyclic-voltammetry" ||
      technique.technique === "linear-sweep-voltammetry") &&
    !has("potential")
  )
    problems.push("No potential column was recognised.");
  if (table && technique.technique === "unknown" && points > 0)
    problems.push("No potential, current or impedance column was recognised: map the columns.");

  let cycles: TraceCycle[] = [];
  let cycleSource: TraceSummary["cycleSource"] = "none";
  if (has("cycle") && points > 0) {
    cycles = cyclesFromColumn(columns[roles.cycle!], points);
    cycleSource = "column";
  } else if (technique.technique === "cyclic-voltammetry" && has("potential") && points > 0) {
    cycles = cyclesFromSweep(columns[roles.potential!], points);
    cycleSource = "sweep-reversal";
  }
  if (cycles.length > MAX_CYCLES) {
    problems.push(
      `More than ${MAX_CYCLES} cycles: the cycle column or the sweep is not read as cycles.`,
    );
    cycles = [];
    cycleSource = "none";
  }

  const summary: TraceSummary = {
    parserVersion: input.parserVersion,
    technique: technique.technique,
    techniqueReason: technique.reason,
    delimiter: table?.delimiter ?? null,
    decimalSeparator: !table ? null : reader && reader.commaCells > 0 ? "," : ".",
    headerLineCount: table ? (table.namesLine ?? table.firstDataLine) : 0,
    header: header?.fields ?? EMPTY_HEADER,
    columns: summaryColumns,
    roles,
    points,
    cycles,
    cycleSource,
    mappingApplied: plan?.mappingApplied ?? false,
    problems,
  };
  return { summary, columns };
}
