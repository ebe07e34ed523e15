/**
 * The table's columns as they fill: rows from papaparse go into Float64Arrays in SI units,
 * with each column's range and counts, and the rows that did not fit noted by line.
 *
 * Two ways in, chosen per chunk by the parser: `addFieldRows` takes rows papaparse has cut
 * into cells (any chunk with a quote character in it), `addLines` takes whole lines (the
 * common quote-free chunk) and reads plain decimals straight out of the line
 * (line-scanner.ts), cutting out a cell only when it is not plain. Both give the same
 * numbers and the same notes (tests/unit/traces/property.test.ts compares them).
 */
import { ColumnStore } from "./column-store";
import { LineScanner } from "./line-scanner";
import { mayHaveRadixPrefix, type CellReader } from "./numbers";

export interface LineIssue {
  count: number;
  firstLine: number;
}

export class TableColumns {
  readonly stores: ColumnStore[];
  points = 0;
  readonly ragged: LineIssue = { count: 0, firstLine: 0 };
  readonly textRows: LineIssue = { count: 0, firstLine: 0 };
  /** 1-based number of the last line read. */
  line: number;
  private values: Float64Array[];
  private readonly minimum: Float64Array;
  private readonly maximum: Float64Array;
  private readonly numeric: Float64Array;
  private readonly nonNumeric: Float64Array;
  private readonly scanner: LineScanner;

  constructor(
    /** Fields the column names line has (the stored columns may be one fewer: a trailing empty name). */
    private readonly columnCount: number,
    private readonly factors: number[],
    private readonly reader: CellReader,
    private readonly delimiter: string,
    linesBefore: number,
  ) {
    this.stores = factors.map(() => new ColumnStore());
    this.values = this.stores.map((s) => s.values);
    const n = factors.length;
    this.minimum = new Float64Array(n).fill(Infinity);
    this.maximum = new Float64Array(n).fill(-Infinity);
    this.numeric = new Float64Array(n);
    this.nonNumeric = new Float64Array(n);
    this.scanner = new LineScanner(delimiter.charCodeAt(0));
    this.line = linesBefore;
  }

  private note(issue: LineIssue): void {
    if (issue.count++ === 0) issue.firstLine = this.line;
  }

  /** Makes room for the next row and returns its index. */
  private nextRow(): number {
    const row = this.points;
    if (row >= this.values[0].length) {
      for (const store of this.stores) store.ensure(row + 1);
      this.values = this.stores.map((s) => s.values);
    }
    return row;
  }

  /** Stores one value (NaN for a cell that is not a number); true when it was a number. */
  private put(k: number, row: number, value: number): boolean {
    if (value === value) {
      const si = value * this.factors[k];
      this.values[k][row] = si;
      this.numeric[k]++;
      if (si < this.minimum[k]) this.minimum[k] = si;
      if (si > this.maximum[k]) this.maximum[k] = si;
      return true;
    }
    this.values[k][row] = NaN;
    this.nonNumeric[k]++;
    return false;
  }

  /** A row without a single number (a repeated header, "Cycle 2") is not a data point. */
  private endRow(numbers: number, blank: boolean): void {
    if (numbers === 0) {
      for (let k = 0; k < this.factors.length; k++) this.nonNumeric[k]--;
      if (!blank) this.note(this.textRows);
      return;
    }
    this.points++;
  }

  addFieldRows(rows: string[][]): void {
    const r = this.reader;
    const width = this.factors.length;
    for (let n = 0; n < rows.length; n++) {
      const fields = rows[n];
      this.line++;
      const count = fields.length;
      if (count === 1 && fields[0].trim() === "") continue;
      if (count !== this.columnCount) {
        let extraFilled = false;
        for (let k = this.columnCount; k < count; k++)
          if (fields[k].trim() !== "") extraFilled = true;
        if (count < this.columnCount || extraFilled) this.note(this.ragged);
      }
      const row = this.nextRow();
      let numbers = 0;
      for (let k = 0; k < width; k++) {
        let value = NaN;
        if (k < count) {
          const cell = fields[k];
          value = +cell;
          // A finite, non-zero result needs no further look, except an integer that may be
          // hexadecimal ("0x1f"), or any cell once the file has shown a decimal comma (then a
          // point means mixed separators).
          if (
            !(value - value === 0) ||
            value === 0 ||
            r.commaCells > 0 ||
            (Number.isInteger(value) && mayHaveRadixPrefix(cell))
          )
            value = r.read(cell);
        }
        if (this.put(k, row, value)) numbers++;
      }
      this.endRow(numbers, false);
    }
  }

  addLines(rows: string[][]): void {
    const r = this.reader;
    const scanner = this.scanner;
    const delimiter = this.delimiter;
    const width = this.factors.length;
    for (let n = 0; n < rows.length; n++) {
      // Papaparse cut on a delimiter that never occurs: each row is one whole line.
      const line = rows[n].length === 1 ? rows[n][0] : rows[n].join("\u0001");
      this.line++;
      const length = line.length;
      if (length === 0) continue;
      const row = this.nextRow();
      let numbers = 0;
      let position = 0;
      let fields = 0;
      for (let k = 0; k < width; k++) {
        let value = NaN;
        if (position <= length) {
          fields++;
          value = r.commaCells > 0 ? NaN : scanner.scan(line, position);
          let end: number;
          if (value === value || (scanner.empty && r.commaCells === 0)) end = scanner.end;
          else {
            end = line.indexOf(delimiter, position);
            if (end === -1) end = length;
            value = r.read(line.slice(position, end));
          }
          position = end + 1;
        }
        if (this.put(k, row, value)) numbers++;
      }
      // Fields beyond the stored columns: count them, and whether any holds something.
      let extraFilled = false;
      while (position <= length) {
        let end = line.indexOf(delimiter, position);
        if (end === -1) end = length;
        if (fields >= this.columnCount && line.slice(position, end).trim() !== "")
          extraFilled = true;
        fields++;
        position = end + 1;
      }
      const blank = fields === 1 && line.trim() === "";
      if (!blank && (fields < this.columnCount || (fields > this.columnCount && extraFilled)))
        this.note(this.ragged);
      this.endRow(numbers, blank);
    }
  }

  /** The stores with their ranges and counts, `points` long. */
  finish(): ColumnStore[] {
    this.stores.forEach((store, k) => {
      store.min = this.minimum[k];
      store.max = this.maximum[k];
      store.numeric = this.numeric[k];
      store.nonNumeric = this.nonNumeric[k];
    });
    return this.stores;
  }
}
