import { formulaAsText } from "@/lib/document/formula-text";

/**
 * How far one solution is from another, for "similar solutions". Pure, documented in
 * docs/architecture.md ("Similar solutions"):
 *
 *   d² = (1/n) Σ Δᵢ²  +  (log₁₀ I_b/I_a)²  +  ((T_b − T_a) / 25 °C)²  +  (4 if the solvents differ)
 *
 * over the n ions of either solution, where Δᵢ = log₁₀(m_b/m_a) for an ion both contain and
 * Δᵢ = 2 (as if a hundred times apart) for an ion only one contains. So d is in decades of
 * concentration: 0.1 is every ion about 26 % apart, or 2.5 °C; the same recipe ten times
 * stronger is about 1.4; a different salt at the same strength about 1.4–2.
 */
export interface DistancePoint {
  temperatureC: number;
  solvent: string;
  ionicStrengthMolal: number;
  /** Molality (mol/kg) of each ion. */
  composition: Record<string, number>;
}

const MISSING_ION_DECADES = 2;
const DEGREES_PER_DECADE = 25;
const SOLVENT_PENALTY = 4;

function ionsOf(p: DistancePoint): string[] {
  return Object.keys(p.composition).filter((ion) => p.composition[ion] > 0);
}

export function compositionDistance(a: DistancePoint, b: DistancePoint): number {
  const ions = new Set([...ionsOf(a), ...ionsOf(b)]);
  let sum = 0;
  for (const ion of ions) {
    const ma = a.composition[ion] ?? 0;
    const mb = b.composition[ion] ?? 0;
    sum += ma > 0 && mb > 0 ? Math.log10(mb / ma) ** 2 : MISSING_ION_DECADES ** 2;
  }
  const ionTerm = ions.size ? sum / ions.size : 0;
  const ionic =
    a.ionicStrengthMolal > 0 && b.ionicStrengthMolal > 0
      ? Math.log10(b.ionicStrengthMolal / a.ionicStrengthMolal) ** 2
      : 0;
  const temperature = ((b.temperatureC - a.temperatureC) / DEGREES_PER_DECADE) ** 2;
  const solvent = a.solvent === b.solvent ? 0 : SOLVENT_PENALTY;
  return Math.sqrt(ionTerm + ionic + temperature + solvent);
}

const trim = (x: number, digits: number) => Number(x.toFixed(digits)).toString();
const list = (ions: string[]) => ions.map(formulaAsText).join(", ");

/**
 * The difference of `b` from `a` in words, in the order a chemist reads it: species, then
 * ionic strength, then temperature, then solvent — "same species, I 8 % higher, 3 °C colder".
 */
export function describeDifference(a: DistancePoint, b: DistancePoint): string {
  const ia = new Set(ionsOf(a));
  const ib = new Set(ionsOf(b));
  const extra = [...ib].filter((ion) => !ia.has(ion)).sort();
  const missing = [...ia].filter((ion) => !ib.has(ion)).sort();
  const parts: string[] = [];
  if (!extra.length && !missing.length) parts.push("same species");
  if (extra.length) parts.push(`also ${list(extra)}`);
  if (missing.length) parts.push(`no ${list(missing)}`);

  const ratio = b.ionicStrengthMolal / a.ionicStrengthMolal;
  if (!Number.isFinite(ratio) || ratio <= 0) parts.push("I unknown");
  else if (Math.abs(ratio - 1) < 0.005) parts.push("same I");
  else if (ratio >= 2) parts.push(`I ${trim(ratio, 1)}× higher`);
  else if (ratio <= 0.5) parts.push(`I ${trim(1 / ratio, 1)}× lower`);
  else if (ratio > 1) parts.push(`I ${Math.round((ratio - 1) * 100)} % higher`);
  else parts.push(`I ${Math.round((1 - ratio) * 100)} % lower`);

  const dt = b.temperatureC - a.temperatureC;
  if (Math.abs(dt) < 0.05) parts.push("same temperature");
  else
    parts.push(
      `${trim(Math.abs(dt), Math.abs(dt) < 10 ? 1 : 0)} °C ${dt < 0 ? "colder" : "warmer"}`,
    );

  if (a.solvent !== b.solvent) parts.push(`in ${b.solvent}, not ${a.solvent}`);
  return parts.join(", ");
}
