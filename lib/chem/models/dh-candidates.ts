/**
 * The Debye–Hückel family as "auto" candidates (auto.ts), in order of accuracy: Truesdell–Jones
 * with fitted b, the extended equation with Kielland sizes, Truesdell–Jones in b-dot form,
 * Davies, Güntelberg, the limiting law. Outside water the limiting law comes first (auto.ts):
 * the others carry water parameters.
 */
import type { AutoCandidate, AutoContext } from "./auto";
import { bDotIonSize, kiellandIonSize, truesdellJonesParameters } from "./ion-parameters";
import { DAVIES_RANGE, DH_EXTENDED_RANGE, GUNTELBERG_RANGE } from "./dh-ranges";
import { TRUESDELL_JONES_BDOT_RANGE, TRUESDELL_JONES_FITTED_RANGE } from "./dh-ranges";
import { rangeViolations, type ModelRange } from "./range";
import { limitingLawSqrtIMax } from "./dh-limiting";
import { chargeProductMagnitude } from "./dh-common";

const present = (c: AutoContext) => c.ions.filter((i) => i.molality > 0 && i.charge !== 0);
const isWater = (c: AutoContext) => c.solvent === "water";

function inRange(label: string, range: ModelRange, c: AutoContext): string[] {
  return rangeViolations(label, range, c.ions, c.ionicStrengthMolal, c.temperatureC);
}

/** WATEQ4F b = 0 means "not fitted" (truesdell-jones.ts reads it the same way). */
const fitted = (formula: string) => (truesdellJonesParameters(formula)?.b ?? 0) !== 0;
const hasSize = (formula: string) =>
  fitted(formula) || bDotIonSize(formula) !== undefined || kiellandIonSize(formula) !== undefined;

export const DH_FAMILY_CANDIDATES: readonly AutoCandidate[] = [
  {
    id: "truesdell-jones",
    label: "Truesdell–Jones",
    assess: (c) => ({
      applicable: isWater(c) && present(c).every((i) => fitted(i.formula)),
      outside: inRange("Truesdell–Jones", TRUESDELL_JONES_FITTED_RANGE, c),
      reason:
        "every ion has a fitted Truesdell–Jones b (WATEQ4F) and the solution is inside its range",
    }),
  },
  {
    id: "dh-extended",
    label: "the extended Debye–Hückel equation",
    assess: (c) => ({
      applicable: present(c).every((i) => kiellandIonSize(i.formula) !== undefined),
      outside: inRange("The extended Debye–Hückel equation", DH_EXTENDED_RANGE, c),
      reason: isWater(c)
        ? "every ion has a Kielland ion size and the solution is inside the range of the extended equation"
        : `every ion has a Kielland ion size (water values, used in ${c.solvent})`,
    }),
  },
  {
    id: "truesdell-jones",
    label: "Truesdell–Jones with b-dot ions",
    assess: (c) => ({
      applicable: isWater(c) && present(c).every((i) => hasSize(i.formula)),
      outside: inRange("Truesdell–Jones with b-dot ions", TRUESDELL_JONES_BDOT_RANGE, c),
      reason:
        "every ion has a tabulated size (b-dot form for ions without a fitted b) and the solution is inside its range",
    }),
  },
  {
    id: "davies",
    label: "Davies",
    assess: (c) => ({
      applicable: true,
      outside: inRange("Davies", DAVIES_RANGE, c),
      reason: "some ions have no tabulated size: Davies needs none",
    }),
  },
  {
    id: "guntelberg",
    label: "Güntelberg",
    assess: (c) => ({
      applicable: true,
      outside: inRange("Güntelberg", GUNTELBERG_RANGE, c),
      reason: "dilute solution: the Güntelberg form needs no ion size",
    }),
  },
  {
    id: "dh-limiting",
    label: "the Debye–Hückel limiting law",
    assess: (c) => {
      const product = chargeProductMagnitude(c.ions);
      const limit = limitingLawSqrtIMax(product);
      const sqrtI = Math.sqrt(c.ionicStrengthMolal);
      return {
        applicable: true,
        outside:
          sqrtI > limit
            ? [
                `the limiting law holds only to √I = ${Number(limit.toPrecision(3))} for |z₊z₋| = ${product}.`,
              ]
            : [],
        reason: isWater(c)
          ? "very dilute solution: the limiting law is exact in this limit"
          : `dilute solution in ${c.solvent}: the limiting law needs only εr and ρ of the solvent`,
      };
    },
  },
];
