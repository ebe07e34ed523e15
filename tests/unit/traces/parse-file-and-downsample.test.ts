// @vitest-environment node
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { downsampleForPlot, isTraceParseError, parseTraceText } from "@/lib/traces";
import { parseTraceFile } from "@/lib/traces/parse-file";
import {
  cvTrace,
  simulateReversibleCv,
  writeTraceFile,
  allLayoutVariants,
} from "@/lib/traces/simulate";

const dir = mkdtempSync(join(tmpdir(), "ionleaf-traces-"));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe("parseTraceFile (Node adapter)", () => {
  const sim = simulateReversibleCv({ stepV: 1e-3 });
  const layout = allLayoutVariants().find(
    (l) => l.nameStyle === "spaced-slash" && l.currentUnit === "µA" && l.decimal === ",",
  )!;
  const text = writeTraceFile(cvTrace(sim), layout);
  const expected = parseTraceText(text);

  it.each([
    ["UTF-8", Buffer.from(text, "utf8")],
    [
      "UTF-8 with byte-order mark",
      Buffer.concat([Buffer.from([0xef, 0xbb, 0xbf]), Buffer.from(text, "utf8")]),
    ],
    [
      "UTF-16 LE with byte-order mark",
      Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from(text, "utf16le")]),
    ],
  ])("streams a %s file to the same result as the text", async (name, bytes) => {
    const path = join(dir, `${name.replace(/\W+/g, "-")}.txt`);
    writeFileSync(path, bytes);
    const parsed = await parseTraceFile(path);
    expect(parsed.summary).toEqual(expected.summary);
    expect(Array.from(parsed.columns[2])).toEqual(Array.from(expected.columns[2]));
    expect(parsed.summary.columns[2].name).toBe("I / µA");
  });

  it("an empty file", async () => {
    const path = join(dir, "empty.txt");
    writeFileSync(path, "");
    expect((await parseTraceFile(path)).summary.problems).toEqual(["The file is empty."]);
  });
});

describe("downsampleForPlot", () => {
  const n = 1_000_000;
  const x = new Float64Array(n).map((_, k) => k);
  const y = new Float64Array(n).map((_, k) => Math.sin(k / 5000));
  y[123_457] = 50; // a one-sample spike
  y[654_321] = -50;

  it("keeps at most maxPoints, the ends, and one-sample extremes", () => {
    const out = downsampleForPlot(x, y, 2000);
    expect(out.x.length).toBeLessThanOrEqual(2000);
    expect(out.x.length).toBeGreaterThan(1900);
    expect(out.x[0]).toBe(0);
    expect(out.x[out.x.length - 1]).toBe(n - 1);
    expect(Math.max(...out.y)).toBe(50);
    expect(Math.min(...out.y)).toBe(-50);
    expect(Array.from(out.x)).toContain(123_457);
    for (let k = 1; k < out.x.length; k++) expect(out.x[k]).toBeGreaterThan(out.x[k - 1]);
  });

  it("returns short series unchanged, skips NaN, and rejects bad arguments", () => {
    expect(Array.from(downsampleForPlot([1, 2, 3], [4, 5, 6], 10).y)).toEqual([4, 5, 6]);
    const withGaps = downsampleForPlot(
      x.subarray(0, 100),
      new Float64Array(100).fill(NaN).map((v, k) => (k % 2 ? k : v)),
      10,
    );
    expect(withGaps.y.slice(1, -1).every((v) => !Number.isNaN(v))).toBe(true);
    for (const bad of [
      () => downsampleForPlot([1], [1, 2], 10),
      () => downsampleForPlot([1], [1], 3),
    ]) {
      let caught: unknown;
      try {
        bad();
      } catch (e) {
        caught = e;
      }
      expect(isTraceParseError(caught)).toBe(true);
    }
  });
});
