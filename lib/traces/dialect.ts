/**
 * Where the table starts and how it is written. A line whose every cell is a number, followed
 * by lines most of which (two in three) are numbers with the same field count, is inside
 * the table. Walking up from it over lines that start with a number (data rows with a bad
 * cell), the first line without any number holds the column names (and the one above it the
 * names, when that line is a row of units). Everything before is the header block.
 *
 * Delimiter: each of tab, semicolon and comma is tried. A comma decimal cannot go with a
 * comma delimiter, so "0,1;2,3" is only numbers when split on ";" (two cells), and "0,5"
 * under a one-column "E/V" name is one cell in decimal comma, not two integers: the names
 * line must have as many fields as the data rows.
 */
import { looksNumeric } from "./numbers";
import { readUnit } from "./units";

export type Delimiter = "," | ";" | "\t";

export interface TableLocation {
  delimiter: Delimiter;
  /** Line index (0-based) of the column names, or null when the table has none. */
  namesLine: number | null;
  /** Line index of a separate units row under the names, or null. */
  unitsLine: number | null;
  firstDataLine: number;
  columnCount: number;
  /** Names with the units row folded in ("E" + "V" → "E (V)"); "column 1"… when absent. */
  names: string[];
  decimalCommaAllowed: boolean;
  sampledCommaCells: number;
  sampledPointCells: number;
}

export type LocateResult =
  { status: "found"; table: TableLocation } | { status: "need-more" } | { status: "none" };

const DELIMITERS: Delimiter[] = ["\t", ";", ","];
/** Rows that must follow the first data row, all numeric with the same field count. */
const CONFIRMING_ROWS = 5;

/** Splits one line on a delimiter, honouring double quotes ("a,b" is one field). */
function splitLine(line: string, delimiter: string): string[] {
  if (line.indexOf('"') === -1) return line.split(delimiter);
  const fields: string[] = [];
  let field = "";
  let quoted = false;
  for (let i = 0; i < line.length; i++) {
    const ch = line[i];
    if (quoted) {
      if (ch === '"' && line[i + 1] === '"') {
        field += '"';
        i++;
      } else if (ch === '"') quoted = false;
      else field += ch;
    } else if (ch === '"') quoted = true;
    else if (ch === delimiter) {
      fields.push(field);
      field = "";
    } else field += ch;
  }
  fields.push(field);
  return fields;
}

function numericRow(line: string, delimiter: Delimiter): number {
  const fields = splitLine(line, delimiter);
  const comma = delimiter !== ",";
  let numbers = 0;
  for (const field of fields) {
    if (field.trim() === "") continue;
    if (!looksNumeric(field, comma)) return -1;
    numbers++;
  }
  return numbers > 0 ? fields.length : -1;
}

/** A data row with a bad cell or a missing field still starts with a number; a header key never does. */
function startsWithNumber(line: string, delimiter: Delimiter): boolean {
  const first = splitLine(line, delimiter)[0];
  return first !== undefined && looksNumeric(first, delimiter !== ",");
}

function hasNumber(line: string, delimiter: Delimiter): boolean {
  return splitLine(line, delimiter).some((f) => looksNumeric(f, delimiter !== ","));
}

interface Candidate {
  delimiter: Delimiter;
  firstDataLine: number;
  columnCount: number;
  namesLine: number | null;
  namesMatch: boolean;
}

/** Lines looked at after a candidate first row; at least twice as many must agree as not. */
const LOOK_AHEAD = 8;

function findCandidate(
  lines: string[],
  delimiter: Delimiter,
  final: boolean,
): Candidate | "need-more" | null {
  for (let i = 0; i < lines.length; i++) {
    const count = numericRow(lines[i], delimiter);
    if (count < 0) continue;
    let agree = 0;
    let disagree = 0;
    let seen = 0;
    for (let j = i + 1; j < lines.length && seen < LOOK_AHEAD; j++) {
      if (lines[j].trim() === "") continue;
      seen++;
      if (numericRow(lines[j], delimiter) === count) agree++;
      else disagree++;
    }
    const endReached = seen < LOOK_AHEAD;
    if (endReached && !final && agree < CONFIRMING_ROWS) return "need-more";
    if (agree < 2 * disagree || (agree < CONFIRMING_ROWS && !endReached)) continue;
    // Walk up over rows that start with a number (data rows with a bad cell) to the names.
    let first = i;
    let names: number | null = null;
    for (let k = i - 1, steps = 0; k >= 0 && steps < 50; k--) {
      if (lines[k].trim() === "") continue;
      steps++;
      if (startsWithNumber(lines[k], delimiter)) {
        first = k;
        continue;
      }
      if (!hasNumber(lines[k], delimiter)) names = k;
      break;
    }
    const namesMatch = names !== null && splitLine(lines[names], delimiter).length === count;
    return { delimiter, firstDataLine: first, columnCount: count, namesLine: names, namesMatch };
  }
  return null;
}
function previousNonEmpty(lines: string[], index: number): number | null {
  for (let i = index - 1; i >= 0; i--) if (lines[i].trim() !== "") return i;
  return null;
}

function isUnitsRow(fields: string[]): boolean {
  const filled = fields.filter((f) => f.trim() !== "");
  return (
    filled.length > 0 &&
    filled.every((f) => readUnit(f.trim().replace(/^[([{](.*)[)\]}]$/, "$1")) !== null)
  );
}

export function locateTable(lines: string[], final: boolean, only?: Delimiter): LocateResult {
  const found: Candidate[] = [];
  for (const delimiter of only ? [only] : DELIMITERS) {
    const candidate = findCandidate(lines, delimiter, final);
    // A run of numbers cut off by the end of what has arrived: wait for more text.
    if (candidate === "need-more") return { status: "need-more" };
    if (candidate) found.push(candidate);
  }
  if (found.length === 0) return final ? { status: "none" } : { status: "need-more" };
  // Names above the data decide (with the same field count first); then more columns; then the earlier table.
  found.sort(
    (a, b) =>
      Number(b.namesMatch) - Number(a.namesMatch) ||
      Number(b.namesLine !== null) - Number(a.namesLine !== null) ||
      b.columnCount - a.columnCount ||
      a.firstDataLine - b.firstDataLine,
  );
  const best = found[0];
  const clean = (f: string) =>
    f
      .trim()
      .replace(/^"(.*)"$/, "$1")
      .trim();
  let namesLine = best.namesLine;
  let unitsLine: number | null = null;
  let columnCount = best.columnCount;
  let names = Array.from({ length: columnCount }, (_, k) => `column ${k + 1}`);
  if (namesLine !== null) {
    names = splitLine(lines[namesLine], best.delimiter).map(clean);
    // A trailing delimiter on one side only: pad or trim the empty names.
    while (names.length > columnCount && names[names.length - 1] === "") names.pop();
    while (names.length < columnCount) names.push("");
    columnCount = names.length;
    const above = previousNonEmpty(lines, namesLine);
    if (above !== null && isUnitsRow(names)) {
      const aboveFields = splitLine(lines[above], best.delimiter).map(clean);
      if (aboveFields.length === columnCount) {
        unitsLine = namesLine;
        namesLine = above;
        names = aboveFields.map((n, k) =>
          names[k] ? `${n} (${names[k].replace(/^[([{](.*)[)\]}]$/, "$1")})` : n,
        );
      }
    }
  }
  let sampledCommaCells = 0;
  let sampledPointCells = 0;
  for (let i = best.firstDataLine; i < Math.min(lines.length, best.firstDataLine + 200); i++) {
    for (const field of splitLine(lines[i], best.delimiter)) {
      if (field.indexOf(".") !== -1) sampledPointCells++;
      else if (best.delimiter !== "," && field.indexOf(",") !== -1) sampledCommaCells++;
    }
  }
  return {
    status: "found",
    table: {
      delimiter: best.delimiter,
      namesLine,
      unitsLine,
      firstDataLine: best.firstDataLine,
      columnCount,
      names,
      decimalCommaAllowed: best.delimiter !== ",",
      sampledCommaCells,
      sampledPointCells,
    },
  };
}
