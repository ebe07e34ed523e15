/**
 * Renders simulated data as the text a potentiostat export would hold, in a given layout.
 * Values are written with 10 significant digits, so reading them back agrees to 5e-10
 * relative; the decimal comma replaces the point when the layout asks for it.
 */
import type { Quantity } from "../types";
import type { NameStyle, TraceFileLayout } from "./layouts";

export interface TraceToWrite {
  columns: { quantity: Quantity; valuesSi: ArrayLike<number> }[];
  header: {
    techniqueName: string;
    scanRateVPerS?: number;
    electrodeAreaCm2?: number;
    referenceElectrodeText?: string;
    temperatureC?: number;
  };
}

const UNIT_FACTOR: Record<string, number> = { V: 1, mV: 1e-3, A: 1, mA: 1e-3, µA: 1e-6, uA: 1e-6 };

const STEMS: Record<NameStyle, Partial<Record<Quantity, string>>> = {
  slash: {
    potential: "E/{u}",
    current: "I/{u}",
    time: "t/s",
    cycle: "Cycle",
    frequency: "Freq/Hz",
    impedanceReal: "Z'/Ohm",
    impedanceImaginaryNegated: "-Z''/Ohm",
    impedanceModulus: "|Z|/Ohm",
    phase: "Phase/deg",
  },
  "spaced-slash": {
    potential: "E / {u}",
    current: "I / {u}",
    time: "t / s",
    cycle: "Cycle",
    frequency: "f / Hz",
    impedanceReal: "Z' / Ω",
    impedanceImaginaryNegated: "-Z'' / Ω",
    impedanceModulus: "|Z| / Ω",
    phase: "Phase / deg",
  },
  words: {
    potential: "Potential ({u})",
    current: "Current ({u})",
    time: "Time (s)",
    cycle: "Cycle number",
    frequency: "Frequency (Hz)",
    impedanceReal: "Z_re (Ohm)",
    impedanceImaginaryNegated: "-Z_im (Ohm)",
    impedanceModulus: "Impedance modulus (Ohm)",
    phase: "Phase angle (deg)",
  },
  "vs-reference": {
    potential: "E / {u} vs Ag/AgCl (3 M KCl)",
    current: "I / {u}",
    time: "Time (s)",
    cycle: "Cycle",
    frequency: "Freq/Hz",
    impedanceReal: "Z'/Ohm",
    impedanceImaginaryNegated: "-Z''/Ohm",
    impedanceModulus: "|Z|/Ohm",
    phase: "Phase/deg",
  },
  brackets: {
    potential: "Potential [{u}]",
    current: "Current [{u}]",
    time: "Time [s]",
    cycle: "Scan",
    frequency: "Freq [Hz]",
    impedanceReal: "Re(Z) [Ohm]",
    impedanceImaginaryNegated: "-Im(Z) [Ohm]",
    impedanceModulus: "|Z| [Ohm]",
    phase: "Phase [deg]",
  },
};

/** The unit a layout writes a quantity in, and the divisor from SI. */
function writtenUnit(
  quantity: Quantity,
  layout: TraceFileLayout,
): { unit: string; factor: number } {
  if (quantity === "potential")
    return { unit: layout.potentialUnit, factor: UNIT_FACTOR[layout.potentialUnit] };
  if (quantity === "current")
    return { unit: layout.currentUnit, factor: UNIT_FACTOR[layout.currentUnit] };
  if (quantity === "phase") return { unit: "deg", factor: Math.PI / 180 };
  return { unit: "", factor: 1 };
}

function columnNameFor(quantity: Quantity, layout: TraceFileLayout): string {
  const stem = STEMS[layout.nameStyle][quantity] ?? quantity;
  return stem.replace("{u}", writtenUnit(quantity, layout).unit);
}

function formatValue(value: number, decimal: "." | ","): string {
  if (!Number.isFinite(value)) return "";
  const text = String(Number(value.toPrecision(10)));
  return decimal === "," ? text.replace(".", ",") : text;
}

function headerLines(trace: TraceToWrite, layout: TraceFileLayout): string[] {
  const h = trace.header;
  const n = (x: number) => formatValue(x, layout.decimal);
  const d = layout.delimiter;
  const lines: string[] = [];
  switch (layout.headerStyle) {
    case "none":
      return [];
    case "equals":
      lines.push(`Technique = ${h.techniqueName}`);
      if (h.scanRateVPerS !== undefined) lines.push(`Scan rate (V/s) = ${n(h.scanRateVPerS)}`);
      if (h.electrodeAreaCm2 !== undefined)
        lines.push(`Electrode area (cm2) = ${n(h.electrodeAreaCm2)}`);
      if (h.referenceElectrodeText) lines.push(`Reference electrode = ${h.referenceElectrodeText}`);
      if (h.temperatureC !== undefined) lines.push(`Temperature (°C) = ${n(h.temperatureC)}`);
      lines.push("Operator = simulated", "");
      return lines;
    case "colon":
      lines.push(`Technique: ${h.techniqueName}`, "Date: 2024-05-01 10:30:00");
      if (h.scanRateVPerS !== undefined) lines.push(`Scan Rate: ${n(h.scanRateVPerS * 1000)} mV/s`);
      if (h.electrodeAreaCm2 !== undefined) lines.push(`Area: ${n(h.electrodeAreaCm2 * 100)} mm²`);
      if (h.referenceElectrodeText) lines.push(`Reference: ${h.referenceElectrodeText}`);
      if (h.temperatureC !== undefined) lines.push(`Temperature: ${n(h.temperatureC)} °C`);
      lines.push("");
      return lines;
    case "delimited":
      lines.push(`Technique${d}${h.techniqueName}`);
      if (h.scanRateVPerS !== undefined)
        lines.push(`Scan rate (mV/s)${d}${n(h.scanRateVPerS * 1000)}`);
      if (h.electrodeAreaCm2 !== undefined)
        lines.push(`Electrode area (cm²)${d}${n(h.electrodeAreaCm2)}`);
      if (h.referenceElectrodeText)
        lines.push(`Reference electrode${d}${h.referenceElectrodeText}`);
      if (h.temperatureC !== undefined) lines.push(`Temperature (°C)${d}${n(h.temperatureC)}`);
      return lines;
  }
}

export function writeTraceFile(trace: TraceToWrite, layout: TraceFileLayout): string {
  const columns = trace.columns.filter((c) => c.quantity !== "cycle" || layout.cycleColumn);
  const lines = headerLines(trace, layout);
  lines.push(columns.map((c) => columnNameFor(c.quantity, layout)).join(layout.delimiter));
  const divisors = columns.map((c) => writtenUnit(c.quantity, layout).factor);
  const rows = columns.length ? columns[0].valuesSi.length : 0;
  for (let r = 0; r < rows; r++) {
    let line = "";
    for (let k = 0; k < columns.length; k++) {
      if (k > 0) line += layout.delimiter;
      line += formatValue(columns[k].valuesSi[r] / divisors[k], layout.decimal);
    }
    lines.push(line);
  }
  return lines.join(layout.newline) + layout.newline;
}
