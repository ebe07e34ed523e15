/**
 * The trace parser, fed with text in chunks of any size so a 50 MB export never has to be
 * one string. Until the table is found, text is kept (the header block, up to 4 MB); from
 * then papaparse's core parser cuts each chunk into rows (the unfinished last line is carried
 * to the next chunk) and table-columns.ts puts every cell straight into a Float64Array in SI
 * units.
 *
 *   const parser = createTraceParser({ mapping });
 *   parser.push(chunk); …  // strings, split anywhere
 *   const { summary, columns } = parser.finish();
 */
import Papa from "papaparse";
import { planColumns, type RolePlan } from "./column-roles";
import { locateTable, type TableLocation } from "./dialect";
import { TraceParseError } from "./errors";
import { readHeaderFields, type HeaderReading } from "./header-fields";
import { createCellReader, type CellReader } from "./numbers";
import { buildSummary } from "./summary";
import { TableColumns, type LineIssue } from "./table-columns";
import type { ParsedTrace, TraceParseOptions } from "./types";

export const TRACE_PARSER_VERSION = "ionleaf-traces/1";

const DEFAULT_MAX_HEAD_CHARS = 4 * 1024 * 1024;
const DEFAULT_MAX_LINE_CHARS = 1024 * 1024;

export interface TraceParser {
  push(chunk: string): void;
  finish(): ParsedTrace;
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
  let columns: TableColumns | null = null;
  let linePapa: Papa.Parser | null = null;
  const longLines: LineIssue = { count: 0, firstLine: 0 };

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
    let storedColumns = location.names.length;
    while (
      storedColumns > 1 &&
      location.names[storedColumns - 1].trim() === "" &&
      location.namesLine !== null
    )
      storedColumns--;
    plan.columns = plan.columns.slice(0, storedColumns);
    reader = createCellReader(location.decimalCommaAllowed);
    columns = new TableColumns(
      location.columnCount,
      plan.columns.map((c) => c.siFactor),
      reader,
      location.delimiter,
      location.firstDataLine,
    );
    const newline = detectNewline(text);
    papa = new Papa.Parser({ delimiter: location.delimiter, newline, quoteChar: '"' });
    // The same core with a delimiter that never occurs returns whole lines (quote-free chunks).
    linePapa = new Papa.Parser({ delimiter: "\u0001", newline, quoteChar: '"' });
    state = "table";
    head = "";
    feedTable(text.slice(starts[location.firstDataLine]), final);
  }

  function feedTable(text: string, final: boolean) {
    if (skippingLongLine) {
      const at = text.search(/[\r\n]/);
      if (at === -1) return;
      text = text.slice(at + 1);
      skippingLongLine = false;
    }
    const aggregate = partial + text;
    // Quotes need papaparse's field splitting; without them whole lines are read faster.
    const quoted = aggregate.indexOf('"') !== -1;
    const result = (quoted ? papa! : linePapa!).parse(aggregate, 0, !final) as Papa.ParseResult<
      string[]
    >;
    if (quoted) columns!.addFieldRows(result.data);
    else columns!.addLines(result.data);
    partial = final ? "" : aggregate.slice(result.meta.cursor);
    if (partial.length > maxLineChars) {
      columns!.line++;
      if (longLines.count++ === 0) longLines.firstLine = columns!.line;
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
      const ragged = columns?.ragged;
      const textRows = columns?.textRows;
      if (ragged?.count)
        problems.push(
          `${ragged.count} rows have a different number of fields than the column names (first at line ${ragged.firstLine}).`,
        );
      if (textRows?.count)
        problems.push(
          `${textRows.count} lines inside the table hold no numbers and were skipped (first at line ${textRows.firstLine}).`,
        );
      if (longLines.count)
        problems.push(
          `${longLines.count} lines longer than ${maxLineChars} characters were skipped (first at line ${longLines.firstLine}).`,
        );
      return buildSummary({
        table,
        plan,
        header,
        stores: columns?.finish() ?? [],
        points: columns?.points ?? 0,
        reader,
        problems,
        parserVersion: TRACE_PARSER_VERSION,
      });
    },
  };
}
