/** The SIT entry of the "auto" model choice: second choice, where every pair has an NEA-TDB ε. */
import type { AutoCandidate } from "../auto";
import { sitCoverage } from "./sit-model";

export const SIT_AUTO_CANDIDATE: AutoCandidate = {
  id: "sit",
  covers: (c) =>
    c.solvent === "water" && sitCoverage(c.ions, c.temperatureC, c.ionicStrengthMolal).covered
      ? "not every pair has Pitzer parameters in range, but every cation–anion pair has an SIT ε (NEA-TDB) and I ≤ 3.5 mol/kg"
      : null,
};
