/**
 * Reads plain decimal cells straight out of a line, without cutting the line into cell
 * strings first: digits go into an integer mantissa, then one multiplication or division by
 * an exact power of ten. With the mantissa below 2⁵³ and the power at most 10²², both
 * operands are exact and the single rounding makes the result the correctly rounded double,
 * the same number `Number()` gives (Clinger 1990, "How to read floating point numbers
 * accurately", the fast path; tests/unit/traces/line-scanner.test.ts compares them).
 * Anything else — spaces, a decimal comma, a long mantissa, a large exponent, words —
 * is "not plain" and the caller reads that cell the general way (numbers.ts).
 */
const POW10 = Array.from({ length: 23 }, (_, k) => 10 ** k);
const MANTISSA_LIMIT = 2 ** 53 / 10;

export class LineScanner {
  /** Index just past the cell read (the delimiter or the end of the line). */
  end = 0;
  /** True when the cell was empty (two delimiters in a row, or the line's end). */
  empty = false;

  constructor(private readonly delimiter: number) {}

  /** The plain decimal starting at `start`, or NaN when the cell is not plain (see `empty`). */
  scan(line: string, start: number): number {
    const n = line.length;
    const delimiter = this.delimiter;
    let i = start;
    let c = i < n ? line.charCodeAt(i) : delimiter;
    if (c === delimiter) {
      this.end = i;
      this.empty = true;
      return NaN;
    }
    this.empty = false;
    const negative = c === 45;
    if (negative || c === 43) c = ++i < n ? line.charCodeAt(i) : delimiter;
    let mantissa = 0;
    let digits = 0;
    let fractionDigits = 0;
    let dot = false;
    for (;;) {
      if (c >= 48 && c <= 57) {
        if (mantissa >= MANTISSA_LIMIT) return NaN;
        mantissa = mantissa * 10 + (c - 48);
        digits++;
        if (dot) fractionDigits++;
      } else if (c === 46 && !dot) dot = true;
      else break;
      c = ++i < n ? line.charCodeAt(i) : delimiter;
    }
    if (digits === 0) return NaN;
    let exponent = 0;
    if (c === 101 || c === 69) {
      c = ++i < n ? line.charCodeAt(i) : delimiter;
      let exponentNegative = false;
      if (c === 45 || c === 43) {
        exponentNegative = c === 45;
        c = ++i < n ? line.charCodeAt(i) : delimiter;
      }
      let exponentDigits = 0;
      while (c >= 48 && c <= 57) {
        if (++exponentDigits > 3) return NaN;
        exponent = exponent * 10 + (c - 48);
        c = ++i < n ? line.charCodeAt(i) : delimiter;
      }
      if (exponentDigits === 0) return NaN;
      if (exponentNegative) exponent = -exponent;
    }
    if (c !== delimiter) return NaN;
    this.end = i;
    const power = exponent - fractionDigits;
    let value: number;
    if (power >= 0) {
      if (power > 22) return NaN;
      value = mantissa * POW10[power];
    } else {
      if (power < -22) return NaN;
      value = mantissa / POW10[-power];
    }
    return negative ? -value : value;
  }
}
