/**
 * `model: "auto"`: the most accurate model whose range (temperature, ionic strength, charge
 * type; models/range.ts) contains the solution. Candidates are tried in order of accuracy; a
 * candidate is *applicable* when it has every parameter the composition needs, and *inside*
 * when the composition is within its stated range. The first applicable candidate inside its
 * range wins. When a more accurate candidate was applicable but outside its range, the choice
 * says that the model changed and why (results on either side of such a boundary differ).
 * When no candidate is inside, the least poor extrapolation is taken (ion-interaction models
 * before ion-size models: Pitzer just beyond its fitted molality stays within a few per cent
 * where the Debye–Hückel family is off by tens of per cent) and the choice says so.
 * A composition whose charges do not balance is never handed to an ion-interaction model.
 */
import { ChemInputError } from "../errors";
import { PITZER_AUTO_CANDIDATE } from "./pitzer/auto-candidate";
import { SIT_AUTO_CANDIDATE } from "./sit/auto-candidate";
import { DH_FAMILY_CANDIDATES } from "./dh-candidates";
import type { ActivityModelId, ModelIon } from "./types";

export { DH_FAMILY_CANDIDATES };

export interface AutoContext {
  ions: readonly ModelIon[];
  ionicStrengthMolal: number;
  temperatureC: number;
  solvent: string;
  /** False when the ions' charges do not balance (default true). */
  chargeBalanced?: boolean;
}

interface CandidateAssessment {
  /** Every parameter the composition needs exists (whatever the range). */
  applicable: boolean;
  /** Why the composition is outside the stated range; empty when inside. */
  outside: string[];
  /** Why this model fits, in a chemist's words (shown when it is chosen). */
  reason: string;
}

export interface AutoCandidate {
  id: ActivityModelId;
  label: string;
  assess(context: AutoContext): CandidateAssessment;
}

export const AUTO_CANDIDATES: readonly AutoCandidate[] = [
  PITZER_AUTO_CANDIDATE,
  SIT_AUTO_CANDIDATE,
  ...DH_FAMILY_CANDIDATES,
];

/** Order for the least poor extrapolation when no candidate is inside its range. */
const FALLBACK_ORDER: readonly ActivityModelId[] = [
  "pitzer",
  "sit",
  "truesdell-jones",
  "davies",
  "dh-extended",
  "guntelberg",
  "dh-limiting",
];

export interface AutoChoice {
  id: ActivityModelId;
  reason: string;
  /** False when no candidate covers the composition and an extrapolation was taken. */
  covered: boolean;
  /**
   * Set when a more accurate model applies to the composition but is outside its range:
   * the model changed at a boundary of temperature or ionic strength, said in words.
   */
  change?: string;
}

/** The context comes from computeSolution, but the function is public: bad input is a typed error. */
function checkContext(c: AutoContext): void {
  const bad = (field: string, message: string) =>
    new ChemInputError(message, { field, code: "invalid_input" });
  const ions: unknown = c?.ions;
  if (!Array.isArray(ions)) throw bad("ions", "The ions must be a list.");
  (ions as readonly (Partial<ModelIon> | null | undefined)[]).forEach((ion, i) => {
    if (!ion || typeof ion.formula !== "string")
      throw bad(`ions[${i}].formula`, "Each ion needs a formula.");
    const { charge, molality } = ion;
    if (!(typeof charge === "number" && Number.isInteger(charge) && Math.abs(charge) <= 12))
      throw bad(`ions[${i}].charge`, "An ion's charge must be a whole number from −12 to 12.");
    if (!(typeof molality === "number" && Number.isFinite(molality) && molality >= 0))
      throw bad(`ions[${i}].molality`, "A molality must be a finite, non-negative number.");
  });
  if (!(Number.isFinite(c.ionicStrengthMolal) && c.ionicStrengthMolal >= 0))
    throw bad("ionicStrengthMolal", "The ionic strength must be a finite, non-negative number.");
  if (!Number.isFinite(c.temperatureC))
    throw bad("temperatureC", "The temperature must be a number in °C.");
  if (typeof c.solvent !== "string") throw bad("solvent", "The solvent must be named.");
}

export function chooseModel(
  context: AutoContext,
  candidates: readonly AutoCandidate[] = AUTO_CANDIDATES,
): AutoChoice {
  checkContext(context);
  // Outside water only the limiting law has no water parameters: it goes first there.
  const ordered =
    context.solvent === "water"
      ? candidates
      : [
          ...candidates.filter((c) => c.id === "dh-limiting"),
          ...candidates.filter((c) => c.id !== "dh-limiting"),
        ];
  const assessed = ordered.map((c) => ({ c, a: c.assess(context) }));
  const chosen = assessed.find(({ a }) => a.applicable && a.outside.length === 0);
  const skipped = assessed.find(
    ({ c, a }) => a.applicable && a.outside.length > 0 && (!chosen || c !== chosen.c),
  );
  if (chosen) {
    const before = assessed.indexOf(chosen);
    const changed = skipped && assessed.indexOf(skipped) < before ? skipped : undefined;
    return {
      id: chosen.c.id,
      reason: chosen.a.reason,
      covered: true,
      ...(changed
        ? {
            change: `${changed.c.label} is not used: ${changed.a.outside[0]} ${chosen.c.label} is used instead, so results on either side of this limit differ.`,
          }
        : {}),
    };
  }
  const applicable = assessed.filter(({ a }) => a.applicable);
  applicable.sort((x, y) => FALLBACK_ORDER.indexOf(x.c.id) - FALLBACK_ORDER.indexOf(y.c.id));
  const fallback = applicable[0] ?? assessed[assessed.length - 1];
  const why = fallback.a.outside[0] ?? "no model has the parameters this composition needs.";
  return {
    id: fallback.c.id,
    reason: `no model covers this solution; ${fallback.c.label} is the least poor extrapolation (${why})`,
    covered: false,
    change: `No model is inside its range here: ${why} ${fallback.c.label} is extrapolated.`,
  };
}
