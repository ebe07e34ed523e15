import { ACTIVITY_MODELS, computeSolution, isChemInputError } from "@/lib/chem";
import type { ChemInput, SolutionResult } from "@/lib/document/evaluate-solution-block";

/** Every model lib/chem offers (not "auto"), in its own order: newly registered ones appear too. */
const CHART_MODELS: readonly string[] = ACTIVITY_MODELS.map((model) => model.id).filter(
  (id) => id !== "auto",
);

interface CurvePoint {
  sqrtI: number;
  /** γ± inside the model's stated range, keyed by model id; `${id}:outside` beyond it. */
  [series: string]: number;
}

export interface GammaCurves {
  points: CurvePoint[];
  /** Models that gave a value at one point or more. */
  models: string[];
  own: { sqrtI: number; meanGamma: number; model: string };
}

const STEPS = 24;

/**
 * γ± of one salt against √I for each model. The whole composition is scaled in proportion
 * (every amount times one factor), so the solution's own point lies on the curve of the
 * model it used. Each point is a real computeSolution call; a model that refuses a
 * composition (no parameters for it) simply has no curve there.
 */
export function computeGammaCurves(
  input: ChemInput,
  result: SolutionResult,
  saltFormula: string,
): GammaCurves {
  const ownI = result.ionicStrength.molal;
  const own = result.salts.find((s) => s.formula === saltFormula);
  const maxSqrtI = Math.max(Math.sqrt(ownI) * 1.5, 0.5);
  const points: CurvePoint[] = [];
  const seen = new Set<string>();
  for (let step = 1; step <= STEPS; step++) {
    const sqrtI = (maxSqrtI * step) / STEPS;
    const factor = (sqrtI * sqrtI) / ownI;
    const point: CurvePoint = { sqrtI };
    for (const model of CHART_MODELS) {
      const value = meanGammaAt(input, factor, model, saltFormula);
      if (!value) continue;
      seen.add(model);
      point[value.valid ? model : `${model}:outside`] = value.meanGamma;
    }
    points.push(point);
  }
  bridgeRangeEdges(points);
  return {
    points,
    models: CHART_MODELS.filter((m) => seen.has(m)),
    own: {
      sqrtI: Math.sqrt(ownI),
      meanGamma: own?.meanGamma ?? Number.NaN,
      model: result.model.used,
    },
  };
}

function meanGammaAt(input: ChemInput, factor: number, model: string, saltFormula: string) {
  const scaled = {
    ...input,
    model,
    components: input.components.map((c) => ({ ...c, amount: c.amount * factor })),
  } as ChemInput;
  try {
    const r = computeSolution(scaled);
    const salt = r.salts.find((s) => s.formula === saltFormula);
    if (!salt || !Number.isFinite(salt.meanGamma)) return null;
    return { meanGamma: salt.meanGamma, valid: r.validity.ok };
  } catch (error) {
    if (isChemInputError(error)) return null;
    throw error;
  }
}

/** Repeats the last in-range value on the "outside" series so the dashed line starts where the solid one ends. */
function bridgeRangeEdges(points: CurvePoint[]) {
  for (let i = 1; i < points.length; i++) {
    for (const model of CHART_MODELS) {
      const outside = `${model}:outside`;
      if (
        points[i][outside] !== undefined &&
        points[i - 1][model] !== undefined &&
        points[i - 1][outside] === undefined
      ) {
        points[i - 1][outside] = points[i - 1][model];
      }
    }
  }
}
