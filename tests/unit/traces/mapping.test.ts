// @vitest-environment node
/** The mapping dialog's answer bypasses detection for the quantities it names. */
import { describe, expect, it } from "vitest";
import { isTraceParseError, parseTraceText, traceColumn } from "@/lib/traces";

const rows = Array.from({ length: 12 }, (_, k) => `${k},${(k - 6) * 10},${k * 2}`).join("\n");
const unknownLayout = `Kanal A,Kanal B,Kanal C\n${rows}\n`;

describe("column mapping override", () => {
  it("an unknown layout is unmapped and says so", () => {
    const { summary } = parseTraceText(unknownLayout);
    expect(summary.technique).toBe("unknown");
    expect(summary.mappingApplied).toBe(false);
    expect(summary.problems).toContain(
      'Column "Kanal A" is not a quantity this parser recognises.',
    );
  });

  it("the mapping names columns by name or index, with units; values come out in SI", () => {
    const parsed = parseTraceText(unknownLayout, {
      mapping: {
        time: { column: "Kanal A", unit: "s" },
        potential: { column: 1, unit: "mV" },
        current: { column: "Kanal C", unit: "µA" },
      },
    });
    const s = parsed.summary;
    expect(s.mappingApplied).toBe(true);
    expect(s.problems).toEqual([]);
    expect(s.roles).toEqual({ time: 0, potential: 1, current: 2 });
    expect(s.columns[1]).toMatchObject({
      quantity: "potential",
      recognisedBy: "mapping",
      unit: "mV",
      siUnit: "V",
      siFactor: 1e-3,
    });
    expect(traceColumn(parsed, "potential")![0]).toBeCloseTo(-0.06, 15);
    expect(traceColumn(parsed, "current")![3]).toBeCloseTo(6e-6, 18);
    expect(s.technique).toBe("linear-sweep-voltammetry");
  });

  it("overrides a recognised column and its unit (a file that wrote mV in a column named V)", () => {
    const text = `E/V,I/A\n${Array.from({ length: 8 }, (_, k) => `${k * 100},${k}e-6`).join("\n")}\n`;
    const parsed = parseTraceText(text, { mapping: { potential: { column: "E/V", unit: "mV" } } });
    expect(traceColumn(parsed, "potential")![1]).toBeCloseTo(0.1, 15);
    expect(parsed.summary.roles.current).toBe(1);
  });

  it("a remembered mapping naming a column this file lacks falls back to detection and says so", () => {
    const text = `E/V,I/A\n${Array.from({ length: 8 }, (_, k) => `${k / 10},${k}e-6`).join("\n")}\n`;
    const { summary } = parseTraceText(text, {
      mapping: { potential: { column: "Kanal B", unit: "mV" } },
    });
    expect(summary.roles.potential).toBe(0);
    expect(summary.columns[0].unit).toBe("V");
    expect(summary.problems).toEqual([
      'The saved mapping names column "Kanal B" for potential, but the file has no such column.',
    ]);
  });

  it("gives a headerless table its meaning", () => {
    const parsed = parseTraceText(rows + "\n", {
      mapping: {
        potential: { column: 1, unit: "mV" },
        current: { column: 2, unit: "nA" },
        cycle: { column: 0 },
      },
    });
    expect(parsed.summary.roles).toEqual({ potential: 1, current: 2, cycle: 0 });
    expect(parsed.summary.cycles).toHaveLength(12);
  });

  it("a unit that does not fit its quantity is a misuse and throws the module's error", () => {
    let caught: unknown;
    try {
      parseTraceText(unknownLayout, { mapping: { potential: { column: 0, unit: "mA" } } });
    } catch (e) {
      caught = e;
    }
    expect(isTraceParseError(caught)).toBe(true);
    expect((caught as Error).message).toMatch(/does not fit/);
  });
});
