// @vitest-environment node
/**
 * Property tests (fast-check, fixed seeds, run counts asserted): whatever text arrives, the
 * parser throws nothing (its only error is for misuse), the summary is plain JSON with no
 * NaN or Infinity, and the result does not depend on where the text was cut into chunks.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { createTraceParser, parseTraceText, type ParsedTrace } from "@/lib/traces";
import {
  cvTrace,
  simulateReversibleCv,
  writeTraceFile,
  allLayoutVariants,
} from "@/lib/traces/simulate";

function allNumbersFinite(value: unknown): boolean {
  if (typeof value === "number") return Number.isFinite(value);
  if (value === undefined) return false;
  if (Array.isArray(value)) return value.every(allNumbersFinite);
  if (value && typeof value === "object") return Object.values(value).every(allNumbersFinite);
  return true;
}

const cell = fc.oneof(
  fc.double({ noNaN: false }).map(String),
  fc.integer().map(String),
  fc.constantFrom(
    "",
    " ",
    "E/V",
    "I/mA",
    "t/s",
    "Cycle",
    "-Z''/Ohm",
    "Freq/Hz",
    "1,5",
    "0x1f",
    "Infinity",
    "NaN",
    '"',
    '""',
    "\u0000",
    "é",
    "µA",
    "1e400",
  ),
  fc.string({ maxLength: 6 }),
);
const line = fc
  .tuple(fc.array(cell, { maxLength: 6 }), fc.constantFrom(",", ";", "\t"))
  .map(([cells, d]) => cells.join(d));
const file = fc
  .tuple(fc.array(line, { maxLength: 30 }), fc.constantFrom("\n", "\r\n", "\r"))
  .map(([lines, nl]) => lines.join(nl));

describe("parser properties", () => {
  it("never throws on any text and keeps the summary plain JSON without NaN", () => {
    let runs = 0;
    fc.assert(
      fc.property(file, fc.integer({ min: 1, max: 64 }), (text, chunk) => {
        runs++;
        const { summary } = parseTraceText(text, {}, chunk);
        expect(allNumbersFinite(summary)).toBe(true);
        expect(JSON.parse(JSON.stringify(summary))).toEqual(summary);
      }),
      { seed: 20240501, numRuns: 400 },
    );
    expect(runs).toBe(400);
  });

  it("never throws on arbitrary Unicode either", () => {
    let runs = 0;
    fc.assert(
      fc.property(fc.string({ unit: "binary", maxLength: 400 }), (text) => {
        runs++;
        expect(allNumbersFinite(parseTraceText(text, {}, 7).summary)).toBe(true);
      }),
      { seed: 7, numRuns: 300 },
    );
    expect(runs).toBe(300);
  });

  it("reads a file the same with some cells in quotes (papaparse's field splitting) as without", () => {
    const sim = simulateReversibleCv({ stepV: 2e-2, cycles: 2 });
    const layouts = allLayoutVariants();
    let runs = 0;
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: layouts.length - 1 }),
        fc.integer({ min: 2, max: 40 }),
        fc.integer({ min: 16, max: 400 }),
        (layoutIndex, every, chunk) => {
          runs++;
          const layout = layouts[layoutIndex];
          const plain = writeTraceFile(cvTrace(sim), layout);
          // Quote every n-th data cell, so quote-free and quoted chunks alternate.
          let cell = 0;
          const lines = plain.split(layout.newline);
          const start = lines.findIndex((l) => /^-?\d/.test(l));
          const quoted = lines
            .map((l, i) =>
              i < start || l === ""
                ? l
                : l
                    .split(layout.delimiter)
                    .map((c) => (++cell % every === 0 ? `"${c}"` : c))
                    .join(layout.delimiter),
            )
            .join(layout.newline);
          const a = parseTraceText(plain, {}, chunk);
          const b = parseTraceText(quoted, {}, chunk);
          expect(b.summary).toEqual(a.summary);
          expect(b.columns.map((c) => Array.from(c))).toEqual(a.columns.map((c) => Array.from(c)));
        },
      ),
      { seed: 4242, numRuns: 80 },
    );
    expect(runs).toBe(80);
  });

  it("gives the same summary and columns however the text is cut into chunks", () => {
    const sim = simulateReversibleCv({ stepV: 2e-2, cycles: 2 });
    const layouts = allLayoutVariants();
    let runs = 0;
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: layouts.length - 1 }),
        fc.array(fc.integer({ min: 1, max: 200 }), { minLength: 1, maxLength: 40 }),
        (layoutIndex, cuts) => {
          runs++;
          const text = writeTraceFile(cvTrace(sim), layouts[layoutIndex]);
          const whole = parseTraceText(text, {}, text.length + 1);
          const parser = createTraceParser();
          let at = 0;
          for (let k = 0; at < text.length; k++) {
            const size = cuts[k % cuts.length];
            parser.push(text.slice(at, at + size));
            at += size;
          }
          const pieces: ParsedTrace = parser.finish();
          expect(pieces.summary).toEqual(whole.summary);
          expect(pieces.columns.map((c) => Array.from(c))).toEqual(
            whole.columns.map((c) => Array.from(c)),
          );
        },
      ),
      { seed: 99, numRuns: 120 },
    );
    expect(runs).toBe(120);
  });
});
