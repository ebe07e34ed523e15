/** The Pitzer entry of the "auto" model choice: first choice wherever it is fully parameterised. */
import type { AutoCandidate } from "../auto";
import { pitzerCoverage } from "./coverage";

export const PITZER_AUTO_CANDIDATE: AutoCandidate = {
  id: "pitzer",
  covers: (c) => {
    if (c.solvent !== "water") return null;
    const coverage = pitzerCoverage(c.ions, c.temperatureC, c.ionicStrengthMolal);
    return coverage.covered
      ? "every cation–anion pair has Pitzer parameters (May et al. 2011; Harvie, Møller & Weare 1984; Pitzer & Mayorga 1973) inside their fitted molality range at this temperature"
      : null;
  },
};
