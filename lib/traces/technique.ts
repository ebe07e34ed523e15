/**
 * Which technique a trace comes from, with the reason in words. A technique named in the
 * header wins (the file knows best) but is checked against the columns; otherwise the
 * columns decide: frequency with impedance → impedance; potential with current → a sweep
 * that reverses (cyclic voltammetry), one that does not (linear sweep), or a potential held
 * or stepped (chronoamperometry); potential over time without current → open-circuit
 * potential; current over time without potential → chronoamperometry.
 */
import { findSweepShape } from "./sweeps";
import type { Quantity, TechniqueId } from "./types";

const NAMED: [RegExp, TechniqueId][] = [
  [/cyclic\s*voltamm|\bcv\b|\bcvs\b/i, "cyclic-voltammetry"],
  [/linear\s*sweep|\blsv\b|\bpolari[sz]ation\s*curve/i, "linear-sweep-voltammetry"],
  [/chrono\s*-?\s*amper|\bca\b|amperometric\s*i\s*-?\s*t|\bi\s*-\s*t\b/i, "chronoamperometry"],
  [/open\s*-?\s*circuit|\bocp\b|\bocv\b/i, "open-circuit-potential"],
  [/impedance|\beis\b|\bpeis\b|\bgeis\b/i, "impedance"],
];

export const TECHNIQUE_LABEL: Record<TechniqueId, string> = {
  "cyclic-voltammetry": "cyclic voltammetry",
  "linear-sweep-voltammetry": "linear sweep voltammetry",
  chronoamperometry: "chronoamperometry",
  "open-circuit-potential": "open-circuit potential",
  impedance: "impedance spectroscopy",
  unknown: "unknown technique",
};

function techniqueFromName(name: string): TechniqueId | null {
  for (const [pattern, id] of NAMED) if (pattern.test(name)) return id;
  return null;
}

export interface TechniqueInput {
  headerTechniqueName: string | null;
  roles: Partial<Record<Quantity, number>>;
  columns: Float64Array[];
  points: number;
}

export interface TechniqueReading {
  technique: TechniqueId;
  reason: string;
  problems: string[];
}

/** Share of steps where the potential moves by more than 0.1 mV: high for a sweep, near 0 for a hold. */
function movingShare(potential: Float64Array, points: number): number {
  let moving = 0;
  let steps = 0;
  for (let i = 1; i < points; i++) {
    const d = potential[i] - potential[i - 1];
    if (!(d === d)) continue;
    steps++;
    if (Math.abs(d) > 1e-4) moving++;
  }
  return steps ? moving / steps : 0;
}

function fromColumns(input: TechniqueInput): { technique: TechniqueId; reason: string } {
  const { roles, columns, points } = input;
  const has = (q: Quantity) => roles[q] !== undefined;
  const hasCurrent = has("current") || has("currentDensity");
  if (has("frequency") && (has("impedanceReal") || has("impedanceModulus")))
    return { technique: "impedance", reason: "the file has frequency and impedance columns" };
  if (has("potential") && hasCurrent) {
    const potential = columns[roles.potential!];
    if (movingShare(potential, points) < 0.05)
      return {
        technique: "chronoamperometry",
        reason: "the potential is held or stepped while the current is recorded",
      };
    const shape = findSweepShape(potential, 0, points);
    const reversals = shape.vertices.length;
    if (reversals > 0)
      return {
        technique: "cyclic-voltammetry",
        reason: `the potential sweeps and reverses ${reversals === 1 ? "once" : `${reversals} times`}`,
      };
    return {
      technique: "linear-sweep-voltammetry",
      reason: "the potential sweeps in one direction",
    };
  }
  if (has("potential") && has("time"))
    return {
      technique: "open-circuit-potential",
      reason: "potential over time, with no current column",
    };
  if (hasCurrent && has("time"))
    return {
      technique: "chronoamperometry",
      reason: "current over time, with no potential column",
    };
  return {
    technique: "unknown",
    reason: "no potential and current, or frequency and impedance, columns were recognised",
  };
}

export function detectTechnique(input: TechniqueInput): TechniqueReading {
  const detected = fromColumns(input);
  const named = input.headerTechniqueName ? techniqueFromName(input.headerTechniqueName) : null;
  if (!named) return { ...detected, problems: [] };
  const reason = `the header says "${input.headerTechniqueName}"`;
  const problems =
    detected.technique !== named && detected.technique !== "unknown"
      ? [
          `The header says ${TECHNIQUE_LABEL[named]} but the columns look like ${TECHNIQUE_LABEL[detected.technique]} (${detected.reason}); the header is followed.`,
        ]
      : [];
  return { technique: named, reason, problems };
}
