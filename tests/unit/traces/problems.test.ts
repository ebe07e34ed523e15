// @vitest-environment node
/** Bad files: the parser says what it did not understand instead of guessing silently. */
import { describe, expect, it } from "vitest";
import { createTraceParser, isTraceParseError, parseTraceText } from "@/lib/traces";

const good =
  "E/V,I/A\n" + Array.from({ length: 10 }, (_, k) => `${k / 10},${k}e-6`).join("\n") + "\n";

describe("problems reported for bad files", () => {
  it("an empty file", () => {
    const { summary } = parseTraceText("");
    expect(summary.points).toBe(0);
    expect(summary.problems).toEqual(["The file is empty."]);
    expect(summary.technique).toBe("unknown");
  });

  it("a file without rows of numbers", () => {
    const { summary } = parseTraceText("Report\nNo data was recorded.\nE/V,I/A\n");
    expect(summary.points).toBe(0);
    expect(summary.problems.join(" ")).toMatch(/No table of numbers was found/);
  });

  it("column names but no numbers under them, then one number line", () => {
    const { summary } = parseTraceText("E/V,I/A\nn/a,n/a\n0.1,2e-6\n");
    expect(summary.points).toBe(1);
  });

  it("unknown columns are listed and left unused", () => {
    const { summary } = parseTraceText(
      good
        .replace("E/V,I/A", "E/V,I/A")
        .replace(/\n/g, ",1\n")
        .replace("E/V,I/A,1", "E/V,I/A,Glorp"),
    );
    expect(summary.problems).toContain('Column "Glorp" is not a quantity this parser recognises.');
    expect(summary.columns[2].quantity).toBeNull();
  });

  it("ragged rows and non-numeric cells are counted with the first line", () => {
    const text =
      "E/V,I/A\n0.1,1e-6\n0.2,2e-6\n0.3\n0.4,4e-6,9\n0.5,oops\n0.6,6e-6\n0.7,7e-6\n0.8,8e-6\n";
    const { summary, columns } = parseTraceText(text);
    expect(summary.points).toBe(8);
    expect(summary.problems).toContain(
      "2 rows have a different number of fields than the column names (first at line 4).",
    );
    expect(summary.problems).toContain('Column "I/A": 2 of 8 cells are empty or not numbers.');
    expect(Number.isNaN(columns[1][4])).toBe(true);
  });

  it("a repeated header inside the table is skipped and counted", () => {
    const text = good + "E/V,I/A\n" + "1.1,1e-6\n";
    const { summary } = parseTraceText(text);
    expect(summary.points).toBe(11);
    expect(summary.problems).toContain(
      "1 lines inside the table hold no numbers and were skipped (first at line 12).",
    );
  });

  it("NUL bytes (a binary file or UTF-16 read as UTF-8) are removed and reported", () => {
    const utf16AsUtf8 = Array.from(good)
      .map((ch) => ch + "\u0000")
      .join("");
    const { summary } = parseTraceText(utf16AsUtf8);
    expect(summary.points).toBe(10);
    expect(summary.problems[0]).toMatch(/contains \d+ NUL characters \(50 %/);
  });

  it("an extremely long line before any table: the parser gives up after its limit", () => {
    const { summary } = parseTraceText("x".repeat(300_000) + "\n" + good, {
      maxHeadChars: 200_000,
      maxLineChars: 100_000,
    });
    expect(summary.points).toBe(0);
    expect(summary.problems.join(" ")).toMatch(/A line of \d+ characters/);
  });

  it("an extremely long line inside the table is skipped and reported", () => {
    const long = "1".repeat(50_000);
    const text = good + `0.5,${long}\n` + "0.6,1e-6\n";
    const { summary } = parseTraceText(text, { maxLineChars: 10_000 }, 4096);
    expect(summary.points).toBe(11);
    expect(summary.problems.join(" ")).toMatch(/1 lines longer than 10000 characters were skipped/);
  });

  it("a table without column names asks for the mapping", () => {
    const { summary } = parseTraceText(
      "0.1,1e-6\n0.2,2e-6\n0.3,3e-6\n0.4,4e-6\n0.5,5e-6\n0.6,6e-6\n",
    );
    expect(summary.columns.map((c) => c.name)).toEqual(["column 1", "column 2"]);
    expect(summary.problems.join(" ")).toMatch(/no column names/);
  });

  it("a column without a unit is read in the SI unit and says so", () => {
    const { summary } = parseTraceText(good.replace("E/V,I/A", "Potential,Current"));
    expect(summary.problems).toContain('Column "Potential" states no unit; it is read as V.');
    expect(summary.problems).toContain('Column "Current" states no unit; it is read as A.');
  });

  it("two columns of the same quantity in different units: the first is used and both are named", () => {
    const { summary } = parseTraceText(
      good
        .replace("E/V,I/A", "E/V,I/mA")
        .replace(/\n(?=.)/g, "\n")
        .replace(/^(E\/V,I\/mA)/, "$1"),
    );
    expect(summary.roles.current).toBe(1);
    const twice = parseTraceText(
      "E/V,I/A,I/mA\n" + Array.from({ length: 8 }, (_, k) => `${k},${k},${k}`).join("\n"),
    );
    expect(twice.summary.problems).toContain(
      'Two columns hold current: "I/A" and "I/mA" (in A and mA); "I/A" is used.',
    );
  });

  it("a potential sweep without a current column", () => {
    const text =
      "Technique: Cyclic Voltammetry\nE/V,t/s\n" +
      Array.from({ length: 8 }, (_, k) => `${k / 10},${k}`).join("\n");
    expect(parseTraceText(text).summary.problems).toContain("No current column was recognised.");
  });

  it("mixed decimal separators", () => {
    const text = "E/V;I/A\n0,1;1e-6\n0,2;2e-6\n0,3;3e-6\n0,4;4e-6\n0,5;5e-6\n0,6;6e-6\n0.7;7e-6\n";
    expect(parseTraceText(text).summary.problems).toContain(
      "Some numbers use a decimal point and others a decimal comma; check the values.",
    );
  });

  it("hexadecimal and Infinity are not numbers", () => {
    const text =
      "E/V,I/A\n0.1,1e-6\n0x10,1e-6\n0.2,Infinity\n0.3,3e-6\n0.4,4e-6\n0.5,5e-6\n0.6,6e-6\n0.7,7e-6\n";
    const { summary, columns } = parseTraceText(text);
    expect(summary.columns.map((c) => c.name)).toEqual(["E/V", "I/A"]);
    expect(Number.isNaN(columns[0][1])).toBe(true);
    expect(Number.isNaN(columns[1][2])).toBe(true);
    expect(summary.columns[0].nonNumericCells).toBe(1);
  });

  it("pushing after finish is a misuse, and the only thing that throws", () => {
    const parser = createTraceParser();
    parser.push(good);
    parser.finish();
    let caught: unknown;
    try {
      parser.push("more");
    } catch (e) {
      caught = e;
    }
    expect(isTraceParseError(caught)).toBe(true);
  });
});
