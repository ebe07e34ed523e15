/**
 * "auto" with part 2: Pitzer where every ion pair is parameterised and in range, SIT where it
 * covers, otherwise the Debye–Hückel family, always with the reason. Expected choices follow
 * the coverage rules (common practice, no source); the γ± check names its table.
 */
import { describe, expect, it } from "vitest";
import { computeSolution } from "@/lib/chem";

const solve = (
  components: { formula: string; amount: number; unit: string }[],
  temperatureC = 25,
) => computeSolution({ temperatureC, solvent: "water", model: "auto", components });

describe("auto model choice with Pitzer and SIT", () => {
  it("1 mol/kg NaCl: Pitzer, γ± 0.657 (Pitzer, Peiper & Busey 1984 table) within 0.5 %", () => {
    const r = solve([{ formula: "NaCl", amount: 1, unit: "mol/kg" }]);
    expect(r.model.used).toBe("pitzer");
    expect(r.model.reason).toMatch(/Pitzer parameters/);
    expect(Math.abs(r.salts[0].meanGamma / 0.657 - 1)).toBeLessThan(0.005);
    expect(r.osmoticCoefficient).toBeGreaterThan(0.93);
    expect(r.waterActivity).toBeLessThan(0.97);
  });

  it("seawater-like mixture (Na, K, Mg, Ca, Cl, SO4): Pitzer", () => {
    const r = solve([
      { formula: "NaCl", amount: 0.42, unit: "mol/kg" },
      { formula: "MgSO4", amount: 0.03, unit: "mol/kg" },
      { formula: "MgCl2", amount: 0.025, unit: "mol/kg" },
      { formula: "CaCl2", amount: 0.01, unit: "mol/kg" },
      { formula: "KCl", amount: 0.01, unit: "mol/kg" },
    ]);
    expect(r.model.used).toBe("pitzer");
    expect(r.validity.ok).toBe(true);
  });

  it("0.5 mol/kg Cu(ClO4)2 (no Pitzer pair, NEA ε(Cu2+, ClO4−) exists): SIT", () => {
    const r = solve([{ formula: "Cu(ClO4)2", amount: 0.5, unit: "mol/kg" }]);
    expect(r.model.used).toBe("sit");
    expect(r.model.reason).toMatch(/SIT/);
  });

  it("NaCl beyond its fitted range (6.148 mol/kg) and beyond SIT's I ≤ 3.5: neither is chosen", () => {
    const r = solve([{ formula: "NaCl", amount: 6.5, unit: "mol/kg" }]);
    expect(["pitzer", "sit"]).not.toContain(r.model.used);
    expect(r.model.reason.length).toBeGreaterThan(0);
  });

  it("at 37 °C a salt with 25 °C-only Pitzer parameters is not given to Pitzer (NaHCO3)", () => {
    const r = solve([{ formula: "NaHCO3", amount: 0.1, unit: "mol/kg" }], 37);
    expect(r.model.used).not.toBe("pitzer");
  });
});
