/**
 * The range of validity every model declares: temperature, ionic strength and charge type.
 * Each row covers the solutions whose largest cation charge and largest anion charge do not
 * exceed its own (rows are ordered from the most specific), optionally within a temperature
 * window. A solution outside every row is outside the model's range, and the result says so.
 *
 * The ionic-strength limits of the Debye–Hückel family are Ionleaf's, measured: the largest I at
 * which every confirmed table value (CRC Handbook 92nd ed. at 25 °C; Pitzer, Peiper & Busey 1984
 * for NaCl at 0–100 °C) is reproduced within 2 % (tests/unit/chem/model-range-sweep.test.ts).
 */
import type { ModelIon } from "./types";

export interface ChargeTypeLimit {
  zCation: number;
  zAnion: number;
  maxIonicStrengthMolal: number;
  /** Temperatures (°C) this row holds for; the model's whole range when absent. */
  temperatureC?: { min: number; max: number };
}

export interface ModelRange {
  temperatureC: { min: number; max: number };
  limits: readonly ChargeTypeLimit[];
  /** Where the limits come from, in words. */
  basis: string;
}

interface ChargeType {
  zCation: number;
  zAnion: number;
}

/** Largest cation charge and largest anion charge magnitude among the ions present (at least 1). */
function chargeTypeOf(ions: readonly ModelIon[]): ChargeType {
  let zCation = 1;
  let zAnion = 1;
  for (const ion of ions) {
    if (!(ion.molality > 0)) continue;
    if (ion.charge > zCation) zCation = ion.charge;
    if (-ion.charge > zAnion) zAnion = -ion.charge;
  }
  return { zCation, zAnion };
}

function chargeTypeLabel(ct: ChargeType): string {
  return `${ct.zCation}:${ct.zAnion}`;
}

function within(t: number, window?: { min: number; max: number }): boolean {
  return !window || (t >= window.min - 1e-9 && t <= window.max + 1e-9);
}

/** The row that applies to a charge type at a temperature, if any. */
function limitFor(
  range: ModelRange,
  ct: ChargeType,
  temperatureC: number,
): ChargeTypeLimit | undefined {
  return range.limits.find(
    (l) => ct.zCation <= l.zCation && ct.zAnion <= l.zAnion && within(temperatureC, l.temperatureC),
  );
}

/** Largest ionic strength the model states for this charge type at this temperature (0 if none). */
function maxIonicStrengthFor(range: ModelRange, ct: ChargeType, temperatureC: number): number {
  return limitFor(range, ct, temperatureC)?.maxIonicStrengthMolal ?? 0;
}

/**
 * Rows for the usual charge types, most specific first: 1:1, 2:1, 1:2, 2:2, then every
 * charge up to `maxCharge` with the `higher` limit (types without a table to check against).
 */
export function chargeTypeRows(
  limits: { "1:1": number; "2:1": number; "1:2": number; "2:2": number; higher?: number },
  maxCharge: number,
  temperatureC?: { min: number; max: number },
): ChargeTypeLimit[] {
  const rows: ChargeTypeLimit[] = [
    { zCation: 1, zAnion: 1, maxIonicStrengthMolal: limits["1:1"], temperatureC },
    { zCation: 2, zAnion: 1, maxIonicStrengthMolal: limits["2:1"], temperatureC },
    { zCation: 1, zAnion: 2, maxIonicStrengthMolal: limits["1:2"], temperatureC },
    { zCation: 2, zAnion: 2, maxIonicStrengthMolal: limits["2:2"], temperatureC },
  ];
  if (limits.higher !== undefined && maxCharge > 2)
    rows.push({
      zCation: maxCharge,
      zAnion: maxCharge,
      maxIonicStrengthMolal: limits.higher,
      temperatureC,
    });
  return rows;
}

function fmt(x: number): string {
  return Number(x.toPrecision(3)).toString();
}

/** Why a solution is outside the range, in a chemist's words; empty when inside. */
export function rangeViolations(
  label: string,
  range: ModelRange,
  ions: readonly ModelIon[],
  ionicStrengthMolal: number,
  temperatureC: number,
): string[] {
  const { min, max } = range.temperatureC;
  if (temperatureC < min - 1e-9 || temperatureC > max + 1e-9)
    return [`${label} is stated for ${min}–${max} °C; ${fmt(temperatureC)} °C is outside it.`];
  const ct = chargeTypeOf(ions);
  const limit = maxIonicStrengthFor(range, ct, temperatureC);
  if (limit === 0)
    return [
      `${label} is not stated for ${chargeTypeLabel(ct)} electrolytes at ${fmt(temperatureC)} °C.`,
    ];
  if (ionicStrengthMolal > limit * (1 + 1e-9))
    return [
      `${label} is stated up to I = ${fmt(limit)} mol/kg for ${chargeTypeLabel(ct)} electrolytes at ${fmt(temperatureC)} °C (${range.basis}); this solution has I = ${fmt(ionicStrengthMolal)} mol/kg.`,
    ];
  return [];
}
