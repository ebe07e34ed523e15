// @vitest-environment node
/**
 * The line scanner's fast path gives exactly the double `Number()` gives (Clinger 1990's
 * fast path is correctly rounded), and leaves every cell it cannot read plainly to the
 * general reader. fast-check with a fixed seed; the run count is asserted.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { LineScanner } from "@/lib/traces/line-scanner";

const comma = ",".charCodeAt(0);

describe("LineScanner", () => {
  it("reads plain decimals exactly as Number() does", () => {
    let runs = 0;
    fc.assert(
      fc.property(
        fc.double({ noNaN: true, noDefaultInfinity: true }),
        fc.integer({ min: 0, max: 16 }),
        fc.constantFrom("exponential", "precision", "fixed", "string"),
        (x, digits, style) => {
          runs++;
          const text =
            style === "exponential"
              ? x.toExponential(Math.min(digits, 20))
              : style === "precision"
                ? x.toPrecision(Math.max(1, digits))
                : style === "fixed" && Math.abs(x) < 1e21
                  ? x.toFixed(digits)
                  : String(x);
          const scanner = new LineScanner(comma);
          const value = scanner.scan(`${text},next`, 0);
          if (value === value) {
            expect(Object.is(value, Number(text))).toBe(true);
            expect(scanner.end).toBe(text.length);
          }
        },
      ),
      { seed: 1990, numRuns: 20000 },
    );
    expect(runs).toBe(20000);
  });

  it("reads the common export forms on the fast path", () => {
    const scanner = new LineScanner(comma);
    for (const text of ["0", "-0.2995", "1.23456789e-06", "4.999995E+03", "+.5", "5.", "12"]) {
      expect(scanner.scan(`${text},x`, 0), text).toBe(Number(text));
    }
  });

  it("leaves anything else to the general reader, and marks empty cells", () => {
    const scanner = new LineScanner(comma);
    for (const text of [
      " 1",
      "1 ",
      "0x1f",
      "Infinity",
      "1e",
      "1e+",
      "1e400",
      "-",
      ".",
      "1.2.3",
      "12345678901234567890",
      "1_0",
    ]) {
      expect(Number.isNaN(scanner.scan(`${text},x`, 0)), text).toBe(true);
      expect(scanner.empty).toBe(false);
    }
    expect(Number.isNaN(scanner.scan("a,,b", 2))).toBe(true);
    expect(scanner.empty).toBe(true);
    expect(scanner.end).toBe(2);
    expect(Number.isNaN(scanner.scan("1,", 2))).toBe(true);
    expect(scanner.empty).toBe(true);
  });
});
