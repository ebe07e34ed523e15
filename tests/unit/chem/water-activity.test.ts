import { describe, expect, it } from "vitest";
import { computeSolution } from "@/lib/chem";
import { WATER_MOLAR_MASS_KG_PER_MOL } from "@/lib/chem/constants";

// ln a_w = −φ M_w Σm, the definition of the practical osmotic coefficient (common practice,
// no source; e.g. Robinson & Stokes 1959, ch. 2). A dissolved non-electrolyte counts in Σm.
describe("water activity with a dissolved non-electrolyte", () => {
  for (const model of ["pitzer", "sit", "davies"] as const) {
    it(`${model}: a_w follows the combined osmotic coefficient, glucose included`, () => {
      const withSugar = computeSolution({
        temperatureC: 25,
        model,
        components: [
          { formula: "NaCl", amount: 1, unit: "mol/kg" },
          { formula: "C6H12O6(aq)", amount: 1, unit: "mol/kg" },
        ],
      });
      const saltOnly = computeSolution({
        temperatureC: 25,
        model,
        components: [{ formula: "NaCl", amount: 1, unit: "mol/kg" }],
      });
      const phi = withSugar.osmoticCoefficient!;
      expect(withSugar.waterActivity).toBeCloseTo(
        Math.exp(-phi * WATER_MOLAR_MASS_KG_PER_MOL * 3),
        12,
      );
      // One more mole of solute per kilogram lowers a_w by about M_w (≈ 1.8 %): it must show.
      expect(saltOnly.waterActivity! - withSugar.waterActivity!).toBeGreaterThan(0.015);
    });
  }
});
