/** The SIT entry of the "auto" model choice: second choice, where every pair has an NEA-TDB ε. */
import type { AutoCandidate } from "../auto";
import { sitCoverage } from "./sit-model";

export const SIT_AUTO_CANDIDATE: AutoCandidate = {
  id: "sit",
  label: "SIT",
  assess: (c) => {
    if (c.solvent !== "water" || c.chargeBalanced === false)
      return { applicable: false, outside: [], reason: "" };
    const coverage = sitCoverage(c.ions, c.temperatureC, c.ionicStrengthMolal);
    return {
      applicable: coverage.parameters,
      outside: coverage.parameters ? coverage.reasons : [],
      reason:
        "every cation–anion pair has an SIT ε (NEA-TDB) and the solution is inside the SIT range (20–30 °C)",
    };
  },
};
