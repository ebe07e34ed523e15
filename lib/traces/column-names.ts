/**
 * Column names as exports write them — "E/V", "Potential (V)", "E / V vs Ag/AgCl",
 * "I/mA", "Current (A)", "I / µA", "t/s", "Time (s)", "Z'/Ohm", "-Z''/Ohm", "Freq/Hz",
 * "Phase/deg", "Cycle" — read into a quantity, a unit and a reference electrode.
 * A name is split into stem, unit and "vs <reference>"; the stem says the quantity, the
 * unit its scale. Where they disagree, or the unit is missing, the reading says so.
 */
import { readReferenceElectrode } from "./reference-text";
import type { Quantity, ReferenceElectrodeText } from "./types";
import { readUnit, type Dimension, type UnitReading } from "./units";

export interface ColumnNameReading {
  quantity: Quantity | null;
  recognisedBy: "name" | "unit" | null;
  unit: UnitReading | null;
  /** −1 when the column holds the negative of its quantity (Z″ read as −Z″, "-Phase"). */
  sign: 1 | -1;
  referenceElectrode: ReferenceElectrodeText | null;
  /** True for row counters and the like, which are not data and not a problem either. */
  ignorable: boolean;
  problem: string | null;
}

/** The dimension a quantity's unit must have. */
export const DIMENSION_OF_QUANTITY: Record<Quantity, Dimension | null> = {
  potential: "potential",
  current: "current",
  currentDensity: "currentDensity",
  time: "time",
  charge: "charge",
  impedanceReal: "resistance",
  impedanceImaginaryNegated: "resistance",
  impedanceModulus: "resistance",
  frequency: "frequency",
  phase: "angle",
  cycle: null,
};

/** Unit assumed when a recognised column states none (reported as a problem). */
export const DEFAULT_UNIT: Partial<Record<Quantity, string>> = {
  potential: "V",
  current: "A",
  currentDensity: "A/m2",
  time: "s",
  charge: "C",
  impedanceReal: "Ohm",
  impedanceImaginaryNegated: "Ohm",
  impedanceModulus: "Ohm",
  frequency: "Hz",
  phase: "deg",
};

const STEMS: [RegExp, Quantity, 1 | -1][] = [
  [
    /^(e|u|ewe|e ?we|e ?(app|applied|cell|meas|measured|set|ocp|oc)|potential|voltage|applied potential|cell potential|cell voltage|we potential|working electrode potential|open circuit potential|ocp|ocv)$/,
    "potential",
    1,
  ],
  [
    /^(i|im|i ?(we|meas|measured|cell)|current|cell current|we current|working electrode current)$/,
    "current",
    1,
  ],
  [/^(j|current density|i density)$/, "currentDensity", 1],
  [/^(t|time|elapsed time|time elapsed|t elapsed|run time|runtime)$/, "time", 1],
  [/^(q|charge|cumulative charge)$/, "charge", 1],
  [/^(z'|z ?re|re ?\(z\)|re z|z real|real|real impedance|real part|z')$/, "impedanceReal", 1],
  [
    /^-(z''|z ?im|im ?\(z\)|im z|z imag|zimag|imag|imaginary|imaginary impedance|imaginary part)$/,
    "impedanceImaginaryNegated",
    1,
  ],
  [
    /^(z''|z ?im|im ?\(z\)|im z|z imag|zimag|imag|imaginary|imaginary impedance|imaginary part)$/,
    "impedanceImaginaryNegated",
    -1,
  ],
  [
    /^(\|z\||z|z ?mod|mod ?z|modulus|impedance|impedance modulus|abs ?\(z\)|\|z\| modulus)$/,
    "impedanceModulus",
    1,
  ],
  [/^(f|freq|frequency)$/, "frequency", 1],
  [/^(phase|phase angle|phase ?\(z\)|phi|φ|theta|θ)$/, "phase", 1],
  [/^-(phase|phase angle|phase ?\(z\)|phi|φ|theta|θ)$/, "phase", -1],
  [
    /^(cycle|cycles|cycle ?(number|no|nr|#|n)|scan|scan ?(number|no|nr|#)|sweep|sweep ?(number|no))$/,
    "cycle",
    1,
  ],
];

const IGNORABLE =
  /^(#|n|no|nr|index|idx|point|points|pt|row|record|data point|point number|sample)$/;

const QUANTITY_OF_DIMENSION: Partial<Record<Dimension, Quantity>> = {
  potential: "potential",
  current: "current",
  currentDensity: "currentDensity",
  time: "time",
  charge: "charge",
  frequency: "frequency",
  angle: "phase",
};

/** Primes and quotes as typed in many fonts, one spelling: Z′ Z’ → Z', Z″ Z" → Z''. */
export function normaliseColumnName(name: string): string {
  return name
    .normalize("NFKC")
    .replace(/^\uFEFF/, "")
    .replace(/[\u2032\u2019\u2018\u00B4`]/g, "'")
    .replace(/[\u2033\u201C\u201D"]/g, "''")
    .replace(/[\u2212\u2013]/g, "-")
    .replace(/\s+/g, " ")
    .trim();
}

/** "(V)", "[mA]", "{s}" at the end, or "/ V", "in V", ", V". */
function splitUnit(text: string): { stem: string; unitText: string | null } {
  const bracket = /^(.*?)\s*[([{]\s*([^()[\]{}]+?)\s*[)\]}]$/.exec(text);
  if (bracket && bracket[1] && readUnit(bracket[2]))
    return { stem: bracket[1], unitText: bracket[2] };
  // Last slash first ("I/mA"), then the first ("j / mA/cm2").
  for (const at of [text.lastIndexOf("/"), text.indexOf("/")]) {
    if (at > 0) {
      const unitText = text.slice(at + 1).trim();
      if (readUnit(unitText)) return { stem: text.slice(0, at).trim(), unitText };
    }
  }
  const spelled = /^(.*?)(?:\s+in|,)\s+(\S+)$/.exec(text);
  if (spelled && readUnit(spelled[2])) return { stem: spelled[1], unitText: spelled[2] };
  if (bracket && bracket[1]) return { stem: bracket[1], unitText: bracket[2] };
  // "I/furlong": a unit in the slash position that is not one we know is still the unit.
  const slash = text.lastIndexOf("/");
  if (slash > 0 && slash < text.length - 1)
    return { stem: text.slice(0, slash).trim(), unitText: text.slice(slash + 1).trim() };
  return { stem: text, unitText: null };
}

/** "E / V vs Ag/AgCl", "Potential vs SCE (V)", "E vs. Ag/AgCl / mV". */
function splitReference(text: string): {
  rest: string;
  reference: string | null;
  unitText: string | null;
} {
  // "E (V vs. Hg/HgO)": the reference inside the unit's brackets.
  const inside = /^(.*?)\s*[([]\s*(\S+)\s+(?:vs\.?|versus)\s*(.+?)\s*[)\]]$/i.exec(text);
  if (inside && readUnit(inside[2])?.dimension === "potential")
    return { rest: inside[1].trim(), reference: inside[3].trim(), unitText: inside[2] };
  const vs = /^(.*?)\s*\b(?:vs\.?|versus)\s*(.+)$/i.exec(text);
  if (!vs) return { rest: text, reference: null, unitText: null };
  let reference = vs[2].trim();
  let unitText: string | null = null;
  const trailing =
    /^(.*?)\s*[([]\s*([^()[\]]+?)\s*[)\]]$/.exec(reference) ??
    /^(.*?)\s+\/\s*(\S+)$/.exec(reference);
  if (trailing && readUnit(trailing[2])?.dimension === "potential") {
    reference = trailing[1].trim();
    unitText = trailing[2];
  }
  return { rest: vs[1].trim(), reference, unitText };
}

export function readColumnName(rawName: string): ColumnNameReading {
  const name = normaliseColumnName(rawName);
  const { rest, reference, unitText: unitAfterReference } = splitReference(name);
  const split = splitUnit(rest);
  const unitText = split.unitText ?? unitAfterReference;
  const unit = unitText ? readUnit(unitText) : null;
  const stem = split.stem.toLowerCase().replace(/[_.]+/g, " ").replace(/\s+/g, " ").trim();
  const referenceElectrode = reference ? readReferenceElectrode(reference) : null;
  const base = { referenceElectrode, ignorable: false, problem: null, sign: 1 as const };

  if (IGNORABLE.test(stem) && !unitText)
    return { ...base, quantity: null, recognisedBy: null, unit: null, ignorable: true };

  const stemMatch = STEMS.find(([pattern]) => pattern.test(stem));
  if (stemMatch) {
    let [, quantity] = stemMatch;
    const sign = stemMatch[2];
    if (unitText && !unit) {
      return {
        ...base,
        quantity: null,
        recognisedBy: null,
        unit: null,
        problem: `Column "${rawName}": the unit "${unitText}" is not one this parser knows.`,
      };
    }
    // "I (mA/cm2)": a current column written per area is a current density.
    if (quantity === "current" && unit?.dimension === "currentDensity") quantity = "currentDensity";
    const wanted = DIMENSION_OF_QUANTITY[quantity];
    if (unit && wanted && unit.dimension !== wanted) {
      return {
        ...base,
        quantity: null,
        recognisedBy: null,
        unit,
        problem: `Column "${rawName}": the name says ${quantity} but the unit "${unitText}" does not fit it; the column is not used.`,
      };
    }
    return { ...base, sign, quantity, recognisedBy: "name", unit };
  }
  if (unit) {
    const quantity = QUANTITY_OF_DIMENSION[unit.dimension] ?? null;
    if (quantity) return { ...base, quantity, recognisedBy: "unit", unit };
    return {
      ...base,
      quantity: null,
      recognisedBy: null,
      unit,
      problem: `Column "${rawName}": the unit says resistance but the name does not say which impedance part (Z′, −Z″, |Z|).`,
    };
  }
  return {
    ...base,
    quantity: null,
    recognisedBy: null,
    unit: null,
    problem: `Column "${rawName}" is not a quantity this parser recognises.`,
  };
}
