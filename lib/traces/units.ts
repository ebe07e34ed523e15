/**
 * Units as potentiostat exports write them ("mV", "µA", "uA", "Ohm", "kΩ", "mA/cm2",
 * "A cm-2", "deg", "min"), read into a dimension and the factor to SI.
 * Case matters for prefixes (mHz against MHz); unit words (ohm, hz) are read in any case.
 */
export type Dimension =
  | "potential"
  | "current"
  | "currentDensity"
  | "time"
  | "charge"
  | "resistance"
  | "frequency"
  | "angle";

export const SI_UNIT_OF_DIMENSION: Record<Dimension, string> = {
  potential: "V",
  current: "A",
  currentDensity: "A/m²",
  time: "s",
  charge: "C",
  resistance: "Ω",
  frequency: "Hz",
  angle: "rad",
};

export interface UnitReading {
  dimension: Dimension;
  /** value in SI = value in this unit × siFactor */
  siFactor: number;
  /** Canonical spelling for display: "µA", "mA/cm²", "kΩ", "deg". */
  canonical: string;
}

const PREFIX: Record<string, number> = {
  p: 1e-12,
  n: 1e-9,
  u: 1e-6,
  m: 1e-3,
  "": 1,
  k: 1e3,
  M: 1e6,
};
const PREFIX_SHOWN: Record<string, string> = { u: "µ" };
const AREA_M2: Record<string, number> = { cm: 1e-4, mm: 1e-6, m: 1 };

/**
 * NFKC turns "²" into "2", the micro sign and Greek mu into one letter, "Ω" (ohm sign) into
 * omega and "⁻" into a minus sign; the rest is spelling.
 */
function normaliseUnitText(text: string): string {
  return text
    .normalize("NFKC")
    .replace(/[μµ]/g, "u")
    .replace(/Ω/g, "ohm")
    .replace(/[\u2212\u2013]/g, "-")
    .replace(/\^/g, "")
    .replace(/\s*([/·*])\s*/g, (_, sep: string) => (sep === "/" ? "/" : " "))
    .replace(/\s+/g, " ")
    .trim();
}

const SIMPLE = /^([pnumkM]?)(V|A|C|s|Hz|hz|HZ|ohms?|Ohms?|OHMS?)$/;
const DENSITY_SLASH = /^([pnumk]?)A\/(cm|mm|m)2$/;
const DENSITY_POWER = /^([pnumk]?)A (cm|mm|m)-2$/;

const BASE: Record<string, { dimension: Dimension; shown: string }> = {
  V: { dimension: "potential", shown: "V" },
  A: { dimension: "current", shown: "A" },
  C: { dimension: "charge", shown: "C" },
  s: { dimension: "time", shown: "s" },
  hz: { dimension: "frequency", shown: "Hz" },
  ohm: { dimension: "resistance", shown: "Ω" },
};

const WORDS: Record<string, UnitReading> = {
  volt: { dimension: "potential", siFactor: 1, canonical: "V" },
  volts: { dimension: "potential", siFactor: 1, canonical: "V" },
  sec: { dimension: "time", siFactor: 1, canonical: "s" },
  min: { dimension: "time", siFactor: 60, canonical: "min" },
  h: { dimension: "time", siFactor: 3600, canonical: "h" },
  hr: { dimension: "time", siFactor: 3600, canonical: "h" },
  deg: { dimension: "angle", siFactor: Math.PI / 180, canonical: "deg" },
  degree: { dimension: "angle", siFactor: Math.PI / 180, canonical: "deg" },
  degrees: { dimension: "angle", siFactor: Math.PI / 180, canonical: "deg" },
  "°": { dimension: "angle", siFactor: Math.PI / 180, canonical: "deg" },
  rad: { dimension: "angle", siFactor: 1, canonical: "rad" },
};

/** Reads a unit as written; null when it is not one this parser knows. */
export function readUnit(text: string): UnitReading | null {
  const key = normaliseUnitText(text);
  if (!key) return null;
  const word = WORDS[key.toLowerCase()];
  if (word) return { ...word };
  const simple = SIMPLE.exec(key);
  if (simple) {
    const [, prefix, baseText] = simple;
    const baseKey = /^ohm/i.test(baseText) ? "ohm" : /^hz$/i.test(baseText) ? "hz" : baseText;
    const base = BASE[baseKey];
    // "ms" is milliseconds; "Ms" (megaseconds) and "kA"-scale prefixes on time are not written.
    if (base.dimension === "time" && prefix !== "m" && prefix !== "u" && prefix !== "") return null;
    return {
      dimension: base.dimension,
      siFactor: PREFIX[prefix],
      canonical: `${PREFIX_SHOWN[prefix] ?? prefix}${base.shown}`,
    };
  }
  const density = DENSITY_SLASH.exec(key) ?? DENSITY_POWER.exec(key);
  if (density) {
    const [, prefix, length] = density;
    return {
      dimension: "currentDensity",
      siFactor: PREFIX[prefix] / AREA_M2[length],
      canonical: `${PREFIX_SHOWN[prefix] ?? prefix}A/${length}²`,
    };
  }
  return null;
}
