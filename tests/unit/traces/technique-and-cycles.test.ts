// @vitest-environment node
import { describe, expect, it } from "vitest";
import { parseTraceText } from "@/lib/traces";

function table(names: string[], rows: number[][]): string {
  return [names.join(","), ...rows.map((r) => r.join(","))].join("\n") + "\n";
}
const ramp = (from: number, to: number, n: number) =>
  Array.from({ length: n }, (_, k) => from + ((to - from) * k) / (n - 1));

describe("technique from the columns, with the reason", () => {
  it("a sweep that reverses is cyclic voltammetry", () => {
    const e = [...ramp(-0.2, 0.4, 30), ...ramp(0.38, -0.2, 30)];
    const s = parseTraceText(
      table(
        ["E/V", "I/A"],
        e.map((x) => [x, x * 1e-6]),
      ),
    ).summary;
    expect(s.technique).toBe("cyclic-voltammetry");
    expect(s.techniqueReason).toBe("the potential sweeps and reverses once");
  });

  it("a sweep in one direction is linear sweep voltammetry", () => {
    const s = parseTraceText(
      table(
        ["E/V", "I/A"],
        ramp(0, 1, 50).map((x) => [x, x * 1e-6]),
      ),
    ).summary;
    expect(s.technique).toBe("linear-sweep-voltammetry");
    expect(s.cycles).toEqual([]);
  });

  it("a held or stepped potential with current is chronoamperometry", () => {
    const rows = Array.from({ length: 200 }, (_, k) => [
      k * 0.01,
      k < 100 ? 0 : 0.5,
      k < 100 ? 0 : 1e-5 / Math.sqrt(k - 99),
    ]);
    const s = parseTraceText(table(["t/s", "E/V", "I/A"], rows)).summary;
    expect(s.technique).toBe("chronoamperometry");
    expect(s.techniqueReason).toMatch(/held or stepped/);
  });

  it("current over time alone is chronoamperometry", () => {
    const s = parseTraceText(
      table(
        ["t/s", "I/A"],
        ramp(0, 10, 20).map((t) => [t, 1e-6]),
      ),
    ).summary;
    expect(s.technique).toBe("chronoamperometry");
  });

  it("potential over time without current is open-circuit potential", () => {
    const s = parseTraceText(
      table(
        ["Time (s)", "Potential (V)"],
        ramp(0, 10, 20).map((t) => [t, 0.2 + 0.001 * t]),
      ),
    ).summary;
    expect(s.technique).toBe("open-circuit-potential");
  });

  it("frequency with impedance is impedance", () => {
    const s = parseTraceText(
      table(
        ["Freq/Hz", "Z'/Ohm", "-Z''/Ohm"],
        ramp(1, 100, 20).map((f) => [f, 10, 100 / f]),
      ),
    ).summary;
    expect(s.technique).toBe("impedance");
  });

  it("follows the header, and says when the columns disagree", () => {
    const text = `Technique: Chronoamperometry\n${table(
      ["E/V", "I/A"],
      [...ramp(-0.2, 0.4, 30), ...ramp(0.38, -0.2, 30)].map((x) => [x, 1e-6]),
    )}`;
    const s = parseTraceText(text).summary;
    expect(s.technique).toBe("chronoamperometry");
    expect(s.problems.join(" ")).toMatch(
      /header says chronoamperometry but the columns look like cyclic voltammetry/,
    );
  });

  it("names nothing it cannot see", () => {
    const s = parseTraceText(
      table(
        ["a", "b"],
        ramp(0, 1, 10).map((x) => [x, x]),
      ),
    ).summary;
    expect(s.technique).toBe("unknown");
    expect(s.problems).toContain(
      "No potential, current or impedance column was recognised: map the columns.",
    );
  });
});

describe("cycles", () => {
  const cycle = [...ramp(-0.3, 0.3, 61).slice(0, -1), ...ramp(0.3, -0.3, 61).slice(0, -1)];

  it("from sweep reversals when there is no cycle column, starting at a vertex", () => {
    const e = [...cycle, ...cycle, ...cycle, -0.3];
    const s = parseTraceText(
      table(
        ["E/V", "I/A"],
        e.map((x) => [x, 0]),
      ),
    ).summary;
    expect(s.cycleSource).toBe("sweep-reversal");
    expect(s.cycles.map((c) => [c.startRow, c.endRow])).toEqual([
      [0, 120],
      [120, 240],
      [240, 361],
    ]);
  });

  it("from sweep reversals when the scan starts mid-window: a cycle ends on passing the start again", () => {
    const e = [
      ...ramp(0, 0.5, 51),
      ...ramp(0.49, -0.5, 100),
      ...ramp(-0.49, 0.5, 100),
      ...ramp(0.49, -0.5, 100),
      ...ramp(-0.49, 0, 50),
    ];
    const s = parseTraceText(
      table(
        ["E/V", "I/A"],
        e.map((x) => [x, 0]),
      ),
    ).summary;
    expect(s.cycles).toHaveLength(2);
    expect(e[s.cycles[1].startRow]).toBeGreaterThanOrEqual(0);
    expect(e[s.cycles[1].startRow - 1]).toBeLessThan(0);
  });

  it("noise on the potential readback is not a reversal", () => {
    const e = ramp(0, 0.5, 500).map((x, k) => x + (k % 2 ? 3e-4 : -3e-4));
    const s = parseTraceText(
      table(
        ["E/V", "I/A"],
        e.map((x) => [x, 0]),
      ),
    ).summary;
    expect(s.technique).toBe("linear-sweep-voltammetry");
  });

  it("from the cycle column, numbered as in the file", () => {
    const rows = cycle.concat(cycle).map((x, k) => [x, 0, k < 120 ? 3 : 4]);
    const s = parseTraceText(table(["E/V", "I/A", "Cycle"], rows)).summary;
    expect(s.cycleSource).toBe("column");
    expect(s.cycles).toEqual([
      { number: 3, startRow: 0, endRow: 120 },
      { number: 4, startRow: 120, endRow: 240 },
    ]);
  });
});
