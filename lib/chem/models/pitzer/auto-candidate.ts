/** The Pitzer entry of the "auto" model choice: first choice wherever it is fully parameterised. */
import type { AutoCandidate } from "../auto";
import { pitzerCoverage } from "./coverage";

export const PITZER_AUTO_CANDIDATE: AutoCandidate = {
  id: "pitzer",
  label: "Pitzer",
  assess: (c) => {
    if (c.solvent !== "water") return { applicable: false, outside: [], reason: "" };
    if (c.chargeBalanced === false) return { applicable: false, outside: [], reason: "" };
    const coverage = pitzerCoverage(c.ions, c.temperatureC, c.ionicStrengthMolal);
    return {
      applicable: coverage.parameters,
      outside: coverage.reasons,
      reason:
        "every cation–anion pair has Pitzer parameters (published temperature functions, May et al. 2011, Harvie, Møller & Weare 1984, Pitzer & Mayorga 1973) inside their fitted molality and temperature range",
    };
  },
};
