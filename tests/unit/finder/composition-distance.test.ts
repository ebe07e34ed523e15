import { describe, expect, it } from "vitest";
import { compositionDistance, describeDifference } from "@/lib/finder/composition-distance";
import { compositionSummary } from "@/lib/document/composition-summary";
import { formulaAsText } from "@/lib/document/formula-text";

// I = ½ Σ m z² (definition): 0.1 mol/kg NaCl → 0.1; 0.1 mol/kg Na2SO4 → 0.3.
const nacl = (m: number, t = 25) => ({
  temperatureC: t,
  solvent: "water",
  ionicStrengthMolal: m,
  composition: { "Na+": m, "Cl-": m },
});

describe("composition distance", () => {
  it("is zero for the same solution and symmetric", () => {
    expect(compositionDistance(nacl(0.1), nacl(0.1))).toBe(0);
    const a = nacl(0.1);
    const b = { ...nacl(0.1), composition: { "Na+": 0.3, "SO4^2-": 0.1 }, ionicStrengthMolal: 0.3 };
    expect(compositionDistance(a, b)).toBeCloseTo(compositionDistance(b, a), 12);
  });

  it("counts decades of concentration, ionic strength and 25 °C steps", () => {
    // Ten times stronger: each ion one decade, I one decade → √(1 + 1).
    expect(compositionDistance(nacl(0.01), nacl(0.1))).toBeCloseTo(Math.SQRT2, 12);
    // Same recipe 25 °C warmer: one unit.
    expect(compositionDistance(nacl(0.1, 25), nacl(0.1, 50))).toBeCloseTo(1, 12);
    // KCl against NaCl at the same strength: K⁺ and Na⁺ each missing (2 decades), Cl⁻ equal.
    const kcl = { ...nacl(0.1), composition: { "K+": 0.1, "Cl-": 0.1 } };
    expect(compositionDistance(nacl(0.1), kcl)).toBeCloseTo(Math.sqrt(8 / 3), 12);
    // Another solvent adds two decades.
    expect(compositionDistance(nacl(0.1), { ...nacl(0.1), solvent: "methanol" })).toBeCloseTo(
      2,
      12,
    );
  });

  it("says the difference in words", () => {
    expect(describeDifference(nacl(0.1), nacl(0.108, 22))).toBe(
      "same species, I 8 % higher, 3 °C colder",
    );
    expect(describeDifference(nacl(0.1), nacl(0.1))).toBe("same species, same I, same temperature");
    expect(describeDifference(nacl(0.1), nacl(0.03, 40))).toBe(
      "same species, I 3.3× lower, 15 °C warmer",
    );
    const mixed = {
      ...nacl(0.3),
      composition: { "Na+": 0.3, "SO4^2-": 0.1 },
      solvent: "methanol",
    };
    expect(describeDifference(nacl(0.1), mixed)).toBe(
      "also SO₄²⁻, no Cl⁻, I 3× higher, same temperature, in methanol, not water",
    );
  });
});

describe("formulas as text", () => {
  it("typesets counts and charges as chemists write them", () => {
    expect(formulaAsText("SO4^2-")).toBe("SO₄²⁻");
    expect(formulaAsText("Na+")).toBe("Na⁺");
    expect(formulaAsText("Fe(CN)6^3-")).toBe("Fe(CN)₆³⁻");
    expect(formulaAsText("CuSO4·5H2O")).toBe("CuSO₄·5H₂O");
    expect(formulaAsText("NO3-")).toBe("NO₃⁻");
    expect(formulaAsText("Mg^2+")).toBe("Mg²⁺");
  });

  it("summarises a recipe in one line", () => {
    expect(
      compositionSummary([
        { formula: "KCl", amount: 0.1, unit: "mol/kg" },
        { formula: "K3Fe(CN)6", amount: 5, unit: "mmol/L" },
        { formula: "", amount: 1, unit: "g" },
        { formula: "KCl", amount: 22.37, unit: "g", perAmount: 100, perUnit: "mL" },
        { formula: "NaCl", amount: null, unit: "mol/kg" },
      ]),
    ).toBe("0.1 mol/kg KCl + 5 mmol/L K₃Fe(CN)₆ + 22.4 g per 100 mL KCl + ? mol/kg NaCl");
    expect(compositionSummary("not a list")).toBe("");
  });
});
