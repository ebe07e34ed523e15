// @vitest-environment node
import { describe, expect, it } from "vitest";
import { parseTraceText } from "@/lib/traces";

const rows = (delimiter: string, decimal: string, n = 8) =>
  Array.from({ length: n }, (_, k) =>
    [(k * 0.1 - 0.3).toFixed(2), (k * 1.5e-6).toExponential(2)]
      .map((v) => v.replace(".", decimal))
      .join(delimiter),
  ).join("\n");

describe("delimiter and decimal separator", () => {
  it.each([
    [",", "."],
    [";", "."],
    [";", ","],
    ["\t", "."],
    ["\t", ","],
  ])("delimiter %j with decimal %j", (delimiter, decimal) => {
    const text = `E/V${delimiter}I/A\n${rows(delimiter, decimal)}\n`;
    const { summary, columns } = parseTraceText(text);
    expect(summary.delimiter).toBe(delimiter);
    expect(summary.decimalSeparator).toBe(decimal);
    expect(summary.points).toBe(8);
    expect(columns[0][1]).toBeCloseTo(-0.2, 12);
    expect(columns[1][2]).toBeCloseTo(3e-6, 18);
    expect(summary.problems).toEqual([]);
  });

  it("a single column in decimal comma is one column, not two integers", () => {
    const { summary, columns } = parseTraceText("E/V\n0,5\n0,6\n0,7\n0,8\n0,9\n1,0\n1,1\n");
    expect(summary.columns).toHaveLength(1);
    expect(columns[0][0]).toBe(0.5);
    expect(summary.decimalSeparator).toBe(",");
  });

  it("reads a separate units row under the names", () => {
    const { summary, columns } = parseTraceText(
      `Potential\tCurrent\tTime\nmV\tµA\ts\n${rows("\t", ".")}\t\n`.replace(
        /\n(-?[\d.]+\t[\de.+-]+)\t?(?=\n)/g,
        "\n$1\t1",
      ),
    );
    expect(summary.columns.map((c) => [c.quantity, c.unit])).toEqual([
      ["potential", "mV"],
      ["current", "µA"],
      ["time", "s"],
    ]);
    expect(columns[0][1]).toBeCloseTo(-0.2e-3, 15);
  });

  it("accepts quoted names and cells and a trailing delimiter", () => {
    const text =
      `"E/V","I/A",\n` + Array.from({ length: 6 }, (_, k) => `"${k / 10}","${k}e-6",`).join("\n");
    const { summary, columns } = parseTraceText(text);
    expect(summary.columns.map((c) => c.name)).toEqual(["E/V", "I/A"]);
    expect(Array.from(columns[1])).toEqual([0, 1e-6, 2e-6, 3e-6, 4e-6, 5e-6]);
    expect(summary.problems).toEqual([]);
  });

  it("reads a file of one line ending in CR only (old line endings)", () => {
    const text = `E/V,I/A\r${rows(",", ".").replace(/\n/g, "\r")}\r`;
    expect(parseTraceText(text).summary.points).toBe(8);
  });
});

describe("header block", () => {
  const table = `E/V,I/A\n${rows(",", ".")}\n`;

  it.each([
    ["Scan rate (V/s) = 0.1", 0.1],
    ["Scan Rate: 100 mV/s", 0.1],
    ["scan rate\t50 mV/s", 0.05],
    ["Sweep rate [mV/s]: 20", 0.02],
    ["Scan rate / V s-1 = 0.25", 0.25],
  ])("%s → %f V/s", (line, expected) => {
    const { summary } = parseTraceText(`${line}\n${table}`);
    expect(summary.header.scanRateVPerS).toBeCloseTo(expected, 12);
    expect(summary.headerLineCount).toBe(1);
  });

  it.each([
    ["Electrode area (cm2) = 0.0707", 0.0707],
    ["Area: 7.07 mm2", 0.0707],
    ["Electrode area\t0.0707 cm²", 0.0707],
    ["Area (mm²);7,07", 0.0707],
    ["Electrode Area = 1.96e-5 m^2", 0.196],
  ])("%s → %f cm²", (line, expected) => {
    const { summary } = parseTraceText(`${line}\n${table}`);
    expect(summary.header.electrodeAreaCm2).toBeCloseTo(expected, 10);
  });

  it("reads reference electrode, technique and temperature, and keeps every entry", () => {
    const { summary } = parseTraceText(
      `Technique: Cyclic Voltammetry\nReference electrode: Ag/AgCl (sat. KCl)\nTemperature (°C) = 25.0\nDate: 2024-05-01 10:30:00\n\n${table}`,
    );
    expect(summary.header.referenceElectrode).toEqual({
      text: "Ag/AgCl (sat. KCl)",
      id: "Ag/AgCl-satKCl",
    });
    expect(summary.header.techniqueName).toBe("Cyclic Voltammetry");
    expect(summary.header.temperatureC).toBe(25);
    expect(summary.header.entries).toContainEqual({ key: "Date", value: "2024-05-01 10:30:00" });
  });

  it("reports a scan rate without a unit instead of guessing one", () => {
    const { summary } = parseTraceText(`Scan rate = 100\n${table}`);
    expect(summary.header.scanRateVPerS).toBeNull();
    expect(summary.problems.join(" ")).toMatch(/scan rate or its unit could not be read/);
  });
});
