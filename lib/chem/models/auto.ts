/**
 * `model: "auto"`: the most accurate model that covers the composition. Candidates are
 * tried in order of accuracy; the first whose `covers` accepts wins and its reason is shown.
 * Part 2 puts Pitzer and SIT at the head of AUTO_CANDIDATES (their coverage checks say
 * whether every ion pair is parameterised at this I and T).
 */
import { limitingLawSqrtIMax } from "./dh-limiting";
import { chargeProductMagnitude } from "./dh-common";
import { bDotIonSize, kiellandIonSize, truesdellJonesParameters } from "./ion-parameters";
import { truesdellJonesIon } from "./truesdell-jones";
import { PITZER_AUTO_CANDIDATE } from "./pitzer/auto-candidate";
import { SIT_AUTO_CANDIDATE } from "./sit/auto-candidate";
import type { ActivityModelId, ModelIon } from "./types";

export interface AutoContext {
  ions: readonly ModelIon[];
  ionicStrengthMolal: number;
  temperatureC: number;
  solvent: string;
}

export interface AutoCandidate {
  id: ActivityModelId;
  /** A reason in a chemist's words when this model covers the composition, else null. */
  covers(context: AutoContext): string | null;
}

const present = (c: AutoContext) => c.ions.filter((i) => i.molality > 0 && i.charge !== 0);
const isWater = (c: AutoContext) => c.solvent === "water";
const sqrtILimit = (c: AutoContext) => limitingLawSqrtIMax(chargeProductMagnitude(c.ions));

export const DH_FAMILY_CANDIDATES: readonly AutoCandidate[] = [
  {
    id: "truesdell-jones",
    covers: (c) =>
      isWater(c) &&
      c.ionicStrengthMolal <= 2 &&
      present(c).every(
        (i) => truesdellJonesIon(i.formula, i.charge, c.temperatureC).source === "WATEQ4F",
      )
        ? "every ion has a fitted Truesdell–Jones b (WATEQ4F) and I ≤ 2 mol/kg"
        : null,
  },
  {
    id: "dh-extended",
    covers: (c) =>
      isWater(c) &&
      c.ionicStrengthMolal <= 0.1 &&
      present(c).every((i) => kiellandIonSize(i.formula) !== undefined)
        ? "I ≤ 0.1 mol/kg and every ion has a Kielland ion size"
        : null,
  },
  {
    id: "truesdell-jones",
    covers: (c) =>
      isWater(c) &&
      c.ionicStrengthMolal <= 0.5 &&
      present(c).every(
        (i) =>
          truesdellJonesParameters(i.formula) ||
          bDotIonSize(i.formula) !== undefined ||
          kiellandIonSize(i.formula) !== undefined,
      )
        ? "I ≤ 0.5 mol/kg and every ion has a tabulated size (b-dot form for ions without a fitted b)"
        : null,
  },
  {
    id: "dh-limiting",
    covers: (c) =>
      !isWater(c) && Math.sqrt(c.ionicStrengthMolal) <= sqrtILimit(c)
        ? `dilute solution in ${c.solvent}: the limiting law needs only εr and ρ of the solvent`
        : null,
  },
  {
    id: "dh-extended",
    covers: (c) =>
      !isWater(c) && c.ionicStrengthMolal <= 0.1
        ? `I ≤ 0.1 mol/kg in ${c.solvent}; ion sizes are water values`
        : null,
  },
  {
    id: "davies",
    covers: (c) =>
      c.ionicStrengthMolal <= 0.5
        ? "I ≤ 0.5 mol/kg and some ions have no tabulated size: Davies needs none"
        : null,
  },
];

/** Part 2: insert the Pitzer and SIT candidates before the Debye–Hückel family. */
export const AUTO_CANDIDATES: AutoCandidate[] = [
  PITZER_AUTO_CANDIDATE,
  SIT_AUTO_CANDIDATE,
  ...DH_FAMILY_CANDIDATES,
];

export interface AutoChoice {
  id: ActivityModelId;
  reason: string;
  /** False when no candidate covers the composition and a fallback was taken. */
  covered: boolean;
}

export function chooseModel(
  context: AutoContext,
  candidates: readonly AutoCandidate[] = AUTO_CANDIDATES,
): AutoChoice {
  for (const candidate of candidates) {
    const reason = candidate.covers(context);
    if (reason) return { id: candidate.id, reason, covered: true };
  }
  const fallback: ActivityModelId = isWater(context) ? "truesdell-jones" : "davies";
  return {
    id: fallback,
    reason: `no available model covers I = ${context.ionicStrengthMolal.toPrecision(3)} mol/kg for this composition; ${fallback} is the least poor extrapolation`,
    covered: false,
  };
}
