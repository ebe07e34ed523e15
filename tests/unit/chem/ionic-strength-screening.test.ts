// @vitest-environment node
import { describe, expect, it } from "vitest";
import { computeSolution, type SolutionComponentInput } from "@/lib/chem";

const solve = (components: SolutionComponentInput[], solvent = "water") =>
  computeSolution({
    model: "davies",
    solvent,
    components,
    densityGPerMl: solvent === "water" ? 0.997045 : undefined,
  });

describe("ionic strength on both scales", () => {
  it("0.01 mol/kg CaCl2 + 0.02 mol/kg NaCl: I = 0.050 mol/kg (definition, common practice)", () => {
    const r = solve([
      { formula: "CaCl2", amount: 0.01, unit: "mol/kg" },
      { formula: "NaCl", amount: 0.02, unit: "mol/kg" },
    ]);
    expect(r.ionicStrength.molal).toBeCloseTo(0.05, 12);
    expect(r.ions.find((i) => i.formula === "Cl-")!.molality).toBeCloseTo(0.04, 12);
  });

  it("0.0100 M Na2SO4: I = 0.0300 M; 0.020 M KBr + 0.010 M Na2SO4: I = 0.050 M (Harris, Quantitative Chemical Analysis; from memory)", () => {
    expect(
      solve([{ formula: "Na2SO4", amount: 0.01, unit: "mol/L" }]).ionicStrength.molar,
    ).toBeCloseTo(0.03, 12);
    expect(
      solve([
        { formula: "KBr", amount: 0.02, unit: "M" },
        { formula: "Na2SO4", amount: 0.01, unit: "M" },
      ]).ionicStrength.molar,
    ).toBeCloseTo(0.05, 12);
  });
});

describe("Debye screening length from εr (general expression)", () => {
  it("0.1 M NaCl at 25 °C: 0.961 nm (Israelachvili 2011, κ⁻¹ = 0.304/√M nm; from memory), within 0.5 %", () => {
    const r = solve([{ formula: "NaCl", amount: 0.1, unit: "M" }]);
    expect(Math.abs(r.debyeLengthNm! / 0.961 - 1)).toBeLessThan(0.005);
    expect(r.kappaPerNm * r.debyeLengthNm!).toBeCloseTo(1, 12);
  });

  it.each([
    ["NaCl", 1e-4, 31],
    ["NaCl", 0.01, 3.1],
    ["Na2SO4", 1e-4, 18],
    ["Na2SO4", 0.01, 1.8],
  ])(
    "%s %f M: %f nm within 3 % (Hu & Mi 2013, Environ. Sci. Technol. 47, 3715, as tested in pyEQL)",
    (salt, c, nm) => {
      const r = solve([{ formula: salt, amount: c, unit: "mol/L" }]);
      expect(Math.abs(r.debyeLengthNm! / nm - 1)).toBeLessThan(0.03);
    },
  );

  it("scales as √εr in another solvent (acetonitrile vs water at the same molar I)", () => {
    const w = solve([{ formula: "N(C4H9)4PF6", amount: 0.01, unit: "M" }]);
    const a = solve([{ formula: "N(C4H9)4PF6", amount: 0.01, unit: "M" }], "acetonitrile");
    expect(a.debyeLengthNm! / w.debyeLengthNm!).toBeCloseTo(
      Math.sqrt(35.94 / w.solvent.relativePermittivity),
      6,
    );
  });

  it("is null (unbounded), not Infinity, when no ions are present", () => {
    const r = solve([{ formula: "acetic acid", amount: 0.1, unit: "mol/kg" }]);
    expect(r.ionicStrength.molal).toBe(0);
    expect(r.debyeLengthNm).toBeNull();
    expect(r.kappaPerNm).toBe(0);
    expect(r.osmoticCoefficient).toBe(1);
  });
});

describe("ion pairing in low-permittivity solvents", () => {
  it("Bjerrum length of water at 25 °C: 0.716 nm computed from CODATA 2018 and εr = 78.30 (commonly quoted as 0.7 nm; common practice)", async () => {
    const { bjerrumLengthNm } = await import("@/lib/chem/solution/screening");
    expect(bjerrumLengthNm(78.3033, 25)).toBeCloseTo(0.7156, 3);
  });
  it("dichloromethane (εr 8.93) carries a validity message; acetonitrile (35.9) does not", () => {
    const dcm = solve([{ formula: "TBAPF6", amount: 0.1, unit: "M" }], "dichloromethane");
    expect(dcm.validity.messages.join(" ")).toMatch(/most ions are paired/);
    const mecn = solve([{ formula: "TBAPF6", amount: 0.0001, unit: "M" }], "acetonitrile");
    expect(mecn.validity.messages.join(" ")).not.toMatch(/paired/);
  });
});

describe("charge balance", () => {
  it("a lone ion is a warning, not silence", () => {
    const r = solve([{ formula: "Na+", amount: 0.1, unit: "mol/kg" }]);
    expect(r.warnings.join(" ")).toMatch(/do not balance: 0.100 mol\/kg of excess positive charge/);
    expect(r.chargeExcessEqPerKg).toBeCloseTo(0.1, 12);
  });
  it("ions entered separately that balance give no warning", () => {
    const r = solve([
      { formula: "Ca2+", amount: 0.01, unit: "mol/kg" },
      { formula: "Cl-", amount: 0.02, unit: "mol/kg" },
    ]);
    expect(r.warnings.join(" ")).not.toMatch(/balance/);
    expect(r.chargeExcessEqPerKg).toBe(0);
  });
});
