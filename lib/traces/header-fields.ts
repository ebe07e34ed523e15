/**
 * Key–value lines of the header block: "Scan rate (V/s) = 0.1", "Scan Rate: 100 mV/s",
 * "Electrode area\t0.0707 cm2", "Area (mm²);7,07", "Reference electrode: Ag/AgCl (3 M KCl)".
 * The key is split from the value at the first "=", else ":", else tab, ";" or ",". A unit
 * may stand in the key (in brackets) or after the number. A recognised key whose value
 * cannot be read is reported, not guessed.
 */
import { readReferenceElectrode } from "./reference-text";
import type { HeaderFields } from "./types";

const MAX_ENTRIES = 200;
const MAX_VALUE_CHARS = 200;

function splitKeyValue(line: string): { key: string; value: string } | null {
  const text = line.replace(/^\uFEFF/, "").trim();
  if (!text) return null;
  for (const separator of ["=", ":", "\t", ";", ","]) {
    const at = text.indexOf(separator);
    // "Time: 10:30" splits at the first colon; a key never starts with its separator.
    if (at > 0) {
      const key = text
        .slice(0, at)
        .trim()
        .replace(/^"(.*)"$/, "$1");
      const value = text
        .slice(at + 1)
        .trim()
        .replace(/^[=:\t;,\s]+/, "")
        .replace(/[\t;,]+$/, "")
        .replace(/^"(.*)"$/, "$1")
        .trim();
      if (key) return { key, value };
    }
  }
  return null;
}

function numberIn(text: string): { value: number; rest: string } | null {
  const match = /^\s*([+-]?(?:\d+(?:[.,]\d*)?|[.,]\d+)(?:[eE][+-]?\d+)?)\s*(.*)$/.exec(text);
  if (!match) return null;
  const value = Number(match[1].replace(",", "."));
  return Number.isFinite(value) ? { value, rest: match[2].trim() } : null;
}

function unitInKey(key: string): string {
  const bracket = /[([{]\s*([^()[\]{}]+?)\s*[)\]}]/.exec(key);
  if (bracket) return bracket[1];
  const slash = /\s\/\s*(.+)$/.exec(key);
  return slash ? slash[1] : "";
}

function squashUnit(unit: string): string {
  return unit
    .normalize("NFKC")
    .replace(/[μµ]/g, "u")
    .replace(/[\u2212\u207B]/g, "-")
    .replace(/\s+/g, "")
    .replace(/\^/g, "")
    .replace(/·/g, "");
}

const SCAN_RATE_FACTOR: Record<string, number> = {
  "V/s": 1,
  "mV/s": 1e-3,
  "uV/s": 1e-6,
  "Vs-1": 1,
  "mVs-1": 1e-3,
  "V/min": 1 / 60,
  "mV/min": 1e-3 / 60,
};
const AREA_FACTOR_CM2: Record<string, number> = {
  cm2: 1,
  mm2: 1e-2,
  m2: 1e4,
  um2: 1e-8,
};
const TEMPERATURE_UNITS = new Set(["°C", "C", "degC", "deg C", "℃", "oC"]);

const KEYS = {
  scanRate: /^(scan|sweep)\s*(rate|speed)\b|^scanrate\b|^v$|^sr$/i,
  area: /\barea\b|^electrode surface|^surface area/i,
  reference: /^(ref(erence)?\.?(\s*electrode)?|re|ref\.? el\.?)\b/i,
  technique: /^(technique|method|experiment(\s*type)?|mode|measurement(\s*type)?)\b/i,
  temperature: /^(temp|temperature|t\s*\(\s*°?c\s*\))\b/i,
};

export interface HeaderReading {
  fields: HeaderFields;
  problems: string[];
}

export function readHeaderFields(lines: string[]): HeaderReading {
  const fields: HeaderFields = {
    scanRateVPerS: null,
    electrodeAreaCm2: null,
    referenceElectrode: null,
    techniqueName: null,
    temperatureC: null,
    entries: [],
  };
  const problems: string[] = [];
  for (const line of lines) {
    const entry = splitKeyValue(line);
    if (!entry) continue;
    if (fields.entries.length < MAX_ENTRIES)
      fields.entries.push({
        key: entry.key.slice(0, MAX_VALUE_CHARS),
        value: entry.value.slice(0, MAX_VALUE_CHARS),
      });
    const { key, value } = entry;
    const keyWithoutUnit = key.replace(/\s*[([{].*$/, "").trim();
    if (KEYS.scanRate.test(keyWithoutUnit) && fields.scanRateVPerS === null) {
      const number = numberIn(value);
      const unit = squashUnit(number?.rest || unitInKey(key));
      const factor = SCAN_RATE_FACTOR[unit];
      if (number && factor !== undefined && number.value > 0)
        fields.scanRateVPerS = number.value * factor;
      else
        problems.push(
          `Header "${line.trim().slice(0, 80)}": the scan rate or its unit could not be read.`,
        );
    } else if (KEYS.area.test(keyWithoutUnit) && fields.electrodeAreaCm2 === null) {
      const number = numberIn(value);
      const unit = squashUnit(number?.rest || unitInKey(key));
      const factor = AREA_FACTOR_CM2[unit];
      if (number && factor !== undefined && number.value > 0)
        fields.electrodeAreaCm2 = number.value * factor;
      else
        problems.push(
          `Header "${line.trim().slice(0, 80)}": the electrode area or its unit could not be read.`,
        );
    } else if (KEYS.reference.test(keyWithoutUnit) && !fields.referenceElectrode && value) {
      fields.referenceElectrode = readReferenceElectrode(value);
    } else if (KEYS.technique.test(keyWithoutUnit) && !fields.techniqueName && value) {
      fields.techniqueName = value.slice(0, MAX_VALUE_CHARS);
    } else if (KEYS.temperature.test(keyWithoutUnit) && fields.temperatureC === null) {
      const number = numberIn(value);
      const unit = (number?.rest || unitInKey(key) || "°C").normalize("NFKC").trim();
      if (number && TEMPERATURE_UNITS.has(unit)) fields.temperatureC = number.value;
      else if (number && unit === "K") fields.temperatureC = number.value - 273.15;
      else
        problems.push(
          `Header "${line.trim().slice(0, 80)}": the temperature or its unit could not be read.`,
        );
    }
  }
  return { fields, problems };
}
