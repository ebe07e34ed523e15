/**
 * One cell to a number. `Number()` is strict about trailing text ("1.5abc" is NaN, unlike
 * parseFloat) and fast; what it gets wrong for exports is fixed around it: "" and "  " are
 * missing (not 0), a decimal comma is read when no point is present, hexadecimal and
 * "Infinity" are not numbers.
 */
const enum CellKind {
  Number = 0,
  Empty = 1,
  Text = 2,
}

export interface CellReader {
  /** The cell's value, or NaN; `lastKind` says whether it was empty or text. */
  read(cell: string): number;
  lastKind: CellKind;
  /** Cells that needed the decimal comma, and cells with a decimal point seen after one did. */
  commaCells: number;
  pointCells: number;
}

const HAS_DIGIT = /\d/;
const RADIX_PREFIX = /^\s*[+-]?0[xXbBoO]/;

/** Cheap pre-check: a letter x, b or o in the second or third character. */
export function mayHaveRadixPrefix(cell: string): boolean {
  const c1 = cell.charCodeAt(1) | 32;
  const c2 = cell.charCodeAt(2) | 32;
  return c1 === 120 || c1 === 98 || c1 === 111 || c2 === 120 || c2 === 98 || c2 === 111;
}

export function createCellReader(allowDecimalComma: boolean): CellReader {
  const reader: CellReader = {
    lastKind: CellKind.Number,
    commaCells: 0,
    pointCells: 0,
    read(cell: string): number {
      let value = +cell;
      // value − value is 0 only for finite numbers (NaN and ±Infinity give NaN).
      if (value - value === 0) {
        // +"" and +"  " are 0; "0x1f" is 31: neither is a number in an export.
        if (value === 0) {
          if (!HAS_DIGIT.test(cell)) {
            reader.lastKind = CellKind.Empty;
            return NaN;
          }
        } else if (mayHaveRadixPrefix(cell) && RADIX_PREFIX.test(cell)) {
          reader.lastKind = CellKind.Text;
          return NaN;
        }
        // A point after a comma has been seen means the file mixes both separators.
        if (reader.commaCells > 0 && cell.indexOf(".") !== -1) reader.pointCells++;
        reader.lastKind = CellKind.Number;
        return value;
      }
      if (allowDecimalComma && cell.indexOf(",") !== -1 && cell.indexOf(".") === -1) {
        value = +cell.replace(",", ".");
        if (value === value && value !== Infinity && value !== -Infinity) {
          reader.commaCells++;
          reader.lastKind = CellKind.Number;
          return value;
        }
      }
      reader.lastKind = cell.trim() === "" ? CellKind.Empty : CellKind.Text;
      return NaN;
    },
  };
  return reader;
}

/** For sniffing lines before the table is known: is this text a number (point or comma decimal)? */
export function looksNumeric(cell: string, allowDecimalComma: boolean): boolean {
  const text = cell.trim().replace(/^"(.*)"$/, "$1");
  if (!text || !HAS_DIGIT.test(text) || RADIX_PREFIX.test(text)) return false;
  if (Number.isFinite(+text)) return true;
  return allowDecimalComma && text.indexOf(".") === -1 && Number.isFinite(+text.replace(",", "."));
}
