/**
 * The trace parser, fed with text in chunks of any size so a 50 MB export never has to be
 * one string. Until the table is found, text is kept (the header block, up to 4 MB); from
 * then on papaparse's core parser tokenises each chunk (the unfinished last line is carried
 * to the next chunk) and every cell goes straight into a Float64Array in SI units.
 *
 *   const parser = createTraceParser({ mapping });
 *   parser.push(chunk); …  // strings, split anywhere
 *   const { summary, columns } = parser.finish();
 */
import Papa from "papaparse";
import { planColumns, type RolePlan } from "./column-roles";
import { ColumnStore } from "./column-store";
import { locateTable, type TableLocation } from "./dialect";
import { TraceParseError } from "./errors";
import { readHeaderFields, type HeaderReading } from "./header-fields";
import { createCellReader, type CellReader } from "./numbers";
import { buildSummary } from "./summary";
import type { ParsedTrace, TraceParseOptions } from "./types";

export const TRACE_PARSER_VERSION = "ionleaf-traces/1";

const DEFAULT_MAX_HEAD_CHARS = 4 * 1024 * 1024;
const DEFAULT_MAX_LINE_CHARS = 1024 * 1024;

export interface TraceParser {
  push(chunk: string): void;
  finish(): ParsedTrace;
}

interface LineIssue {
  count: number;
  firstLine: number;
}

/** Lines with the offset where each starts; "\r\n", "\n" and "\r" all end a line. */
function splitLines(text: string): { lines: string[]; starts: number[]; endsWithNewline: boolean } {
  const lines: string[] = [];
  const starts: number[] = [];
  const pattern = /\r\n|\n|\r/g;
  let start = 0;
  for (let m = pattern.exec(text); m; m = pattern.exec(text)) {
    lines.push(text.slice(start, m.index));
    starts.push(start);
    start = m.index + m[0].length;
  }
  const endsWithNewline = start === text.length;
  if (!endsWithNewline) {
    lines.push(text.slice(start));
    starts.push(start);
  }
  return { lines, starts, endsWithNewline };
}

function detectNewline(text: string): "\n" | "\r\n" | "\r" {
  const at = text.search(/[\r\n]/);
  if (at === -1 || text[at] === "\n") return "\n";
  return text[at + 1] === "\n" ? "\r\n" : "\r";
}

export function createTraceParser(options: TraceParseOptions = {}): TraceParser {
  const maxHeadChars = options.maxHeadChars ?? DEFAULT_MAX_HEAD_CHARS;
  const maxLineChars = options.maxLineChars ?? DEFAULT_MAX_LINE_CHARS;
  let state: "head" | "table" | "gave-up" | "done" = "head";
  let head = "";
  let started = false;
  let nulChars = 0;
  let totalChars = 0;
  let nextAttemptAt = 0;
  const problems: string[] = [];

  let table: TableLocation | null = null;
  let plan: RolePlan | null = null;
  let header: HeaderReading | null = null;
  let papa: Papa.Parser | null = null;
  let partial = "";
  let skippingLongLine = false;
  let reader: CellReader | null = null;
  let stores: ColumnStore[] = [];
  let factors: number[] = [];
  let minimum = new Float64Array(0);
  let maximum = new Float64Array(0);
  let numeric = new Float64Array(0);
  let nonNumeric = new Float64Array(0);
  let storedColumns = 0;
  let capacity = 0;
  let points = 0;
  let tableLine = 0;
  const ragged: LineIssue = { count: 0, firstLine: 0 };
  const textRows: LineIssue = { count: 0, firstLine: 0 };
  const longLines: LineIssue = { count: 0, firstLine: 0 };

  const note = (issue: LineIssue, line: number) => {
    if (issue.count++ === 0) issue.firstLine = line;
  };

  function startTable(
    location: TableLocation,
    lines: string[],
    starts: number[],
    text: string,
    final: boolean,
  ) {
    table = location;
    const headerEnd = location.namesLine ?? location.firstDataLine;
    header = readHeaderFields(lines.slice(0, headerEnd));
    plan = planColumns(location.names, options.mapping);
    // A trailing delimiter makes an empty last column: not data, not a problem.
    storedColumns = location.names.length;
    while (
      storedColumns > 1 &&
      location.names[storedColumns - 1].trim() === "" &&
      location.namesLine !== null
    )
      storedColumns--;
    plan.columns = plan.columns.slice(0, storedColumns);
    stores = plan.columns.map(() => new ColumnStore());
    capacity = stores.length ? stores[0].values.length : 0;
    factors = plan.columns.map((c) => c.siFactor);
    minimum = new Float64Array(stores.length).fill(Infinity);
    maximum = new Float64Array(stores.length).fill(-Infinity);
    numeric = new Float64Array(stores.length);
    nonNumeric = new Float64Array(stores.length);
    reader = createCellReader(location.decimalCommaAllowed);
    const newline = detectNewline(text);
    papa = new Papa.Parser({ delimiter: location.delimiter, newline, quoteChar: '"' });
    tableLine = location.firstDataLine;
    state = "table";
    head = "";
    feedTable(text.slice(starts[location.firstDataLine]), final);
  }

  /** One papaparse batch into the columns; locals hoisted because this runs per cell. */
  function storeRows(rows: string[][]) {
    const r = reader!;
    const columnCount = table!.columnCount;
    const width = storedColumns;
    let values = stores.map((s) => s.values);
    for (let n = 0; n < rows.length; n++) {
      const fields = rows[n];
      tableLine++;
      const count = fields.length;
      if (count === 1 && fields[0].trim() === "") continue;
      if (count !== columnCount) {
        let extraFilled = false;
        for (let k = columnCount; k < count; k++) if (fields[k].trim() !== "") extraFilled = true;
        if (count < columnCount || extraFilled) note(ragged, tableLine);
      }
      const row = points;
      if (row >= capacity) {
        for (const store of stores) store.ensure(row + 1);
        capacity = stores[0].values.length;
        values = stores.map((s) => s.values);
      }
      let numbers = 0;
      for (let k = 0; k < width; k++) {
        const value = k < count ? r.read(fields[k]) : NaN;
        if (value === value) {
          numbers++;
          const si = value * factors[k];
          values[k][row] = si;
          numeric[k]++;
          if (si < minimum[k]) minimum[k] = si;
          if (si > maximum[k]) maximum[k] = si;
        } else {
          values[k][row] = NaN;
          nonNumeric[k]++;
        }
      }
      if (numbers === 0) {
        // A line of text inside the table (a repeated header, "Cycle 2"): not a data point.
        for (let k = 0; k < width; k++) nonNumeric[k]--;
        note(textRows, tableLine);
        continue;
      }
      points++;
    }
  }

  function feedTable(text: string, final: boolean) {
    if (skippingLongLine) {
      const at = text.search(/[\r\n]/);
      if (at === -1) return;
      text = text.slice(at + 1);
      skippingLongLine = false;
    }
    const aggregate = partial + text;
    const result = papa!.parse(aggregate, 0, !final) as Papa.ParseResult<string[]>;
    storeRows(result.data);
    partial = final ? "" : aggregate.slice(result.meta.cursor);
    if (partial.length > maxLineChars) {
      note(longLines, tableLine + 1);
      tableLine++;
      partial = "";
      skippingLongLine = true;
    }
  }

  function tryLocate(final: boolean) {
    if (!final && head.length < nextAttemptAt && head.length <= maxHeadChars) return;
    const { lines, starts, endsWithNewline } = splitLines(head);
    // Without the last, unfinished line unless the text has ended.
    const complete = final || endsWithNewline ? lines : lines.slice(0, -1);
    const found = locateTable(complete, final);
    if (found.status === "found") return startTable(found.table, lines, starts, head, final);
    if (found.status === "need-more" && !final && head.length <= maxHeadChars) {
      nextAttemptAt = Math.max(head.length + 4096, Math.floor(head.length * 1.5));
      return;
    }
    const longest = lines.reduce((m, l) => Math.max(m, l.length), 0);
    if (longest > maxLineChars)
      problems.push(`A line of ${longest} characters: this does not look like a text table.`);
    problems.push(
      head.length > maxHeadChars
        ? `No table of numbers was found in the first ${(maxHeadChars / 1048576).toPrecision(2)} MB of the file.`
        : head.trim() === ""
          ? "The file is empty."
          : "No table of numbers was found: no run of lines whose every cell is a number.",
    );
    state = "gave-up";
    head = "";
  }

  return {
    push(chunk: string) {
      if (state === "done")
        throw new TraceParseError("The parser has already finished.", "finished");
      if (typeof chunk !== "string") throw new TraceParseError("Chunks must be text.", "bad_chunk");
      if (!started && chunk.length > 0) {
        started = true;
        if (chunk.charCodeAt(0) === 0xfeff) chunk = chunk.slice(1);
      }
      totalChars += chunk.length;
      if (chunk.indexOf("\u0000") !== -1) {
        const stripped = chunk.replace(/\u0000/g, "");
        nulChars += chunk.length - stripped.length;
        chunk = stripped;
      }
      if (state === "head") {
        head += chunk;
        tryLocate(false);
      } else if (state === "table") feedTable(chunk, false);
    },
    finish(): ParsedTrace {
      if (state === "done")
        throw new TraceParseError("The parser has already finished.", "finished");
      if (state === "head") tryLocate(true);
      if (state === "table") feedTable("", true);
      state = "done";
      if (nulChars > 0)
        problems.unshift(
          `The file contains ${nulChars} NUL characters (${Math.round((100 * nulChars) / Math.max(totalChars, 1))} % of it): a binary file, or text saved as UTF-16? They were removed before reading.`,
        );
      if (ragged.count)
        problems.push(
          `${ragged.count} rows have a different number of fields than the column names (first at line ${ragged.firstLine}).`,
        );
      if (textRows.count)
        problems.push(
          `${textRows.count} lines inside the table hold no numbers and were skipped (first at line ${textRows.firstLine}).`,
        );
      if (longLines.count)
        problems.push(
          `${longLines.count} lines longer than ${maxLineChars} characters were skipped (first at line ${longLines.firstLine}).`,
        );
      stores.forEach((store, k) => {
        store.min = minimum[k];
        store.max = maximum[k];
        store.numeric = numeric[k];
        store.nonNumeric = nonNumeric[k];
      });
      return buildSummary({
        table,
        plan,
        header,
        stores,
        points,
        reader,
        problems,
        parserVersion: TRACE_PARSER_VERSION,
      });
    },
  };
}
