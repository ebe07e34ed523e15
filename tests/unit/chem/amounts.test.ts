// @vitest-environment node
/** Unit definitions and the molal–molar relation are common practice (no single source) unless a row names one. */
import { describe, expect, it } from "vitest";
import {
  ChemInputError,
  computeSolution,
  molarMass,
  type SolutionComponentInput,
} from "@/lib/chem";

const solve = (components: SolutionComponentInput[], densityGPerMl?: number) =>
  computeSolution({ model: "davies", components, densityGPerMl });

function errorOf(fn: () => unknown): ChemInputError {
  try {
    fn();
  } catch (error) {
    if (error instanceof ChemInputError) return error;
    throw error;
  }
  throw new Error("expected a ChemInputError");
}

describe("amounts in every unit the issue names (through mathjs)", () => {
  it.each([
    ["mol/kg", 0.1, 0.1],
    ["mmol/kg", 100, 0.1],
    ["µmol/kg", 1e5, 0.1],
    ["mol kg-1", 0.1, 0.1],
    ["mol kg⁻¹", 0.1, 0.1],
  ])("%s", (unit, amount, molality) => {
    expect(solve([{ formula: "NaCl", amount, unit }]).components[0].molality).toBeCloseTo(
      molality,
      12,
    );
  });

  it.each([
    ["mol/L", 0.1],
    ["M", 0.1],
    ["mol dm-3", 0.1],
    ["mol/dm3", 0.1],
    ["mol L-1", 0.1],
    ["mmol L⁻¹", 100],
    ["mmol/L", 100],
    ["mM", 100],
    ["µmol/L", 1e5],
    ["umol/L", 1e5],
    ["μM", 1e5],
  ])("%s", (unit, amount) => {
    expect(solve([{ formula: "NaCl", amount, unit }]).components[0].molarity).toBeCloseTo(0.1, 12);
  });

  it("molar → molal with the solution density: m = c / (ρ − c M) (definition)", () => {
    // 1 mol/kg NaCl has ρ = 1.03623 g/mL at 25 °C (Pitzer, Peiper & Busey 1984, via worked_examples.md §9)
    const rho = 1.03623;
    const c = (1 * rho) / (1 + (1 * molarMass("NaCl")) / 1000);
    const r = solve([{ formula: "NaCl", amount: c, unit: "mol/L" }], rho);
    expect(r.components[0].molality).toBeCloseTo(1, 9);
    expect(r.warnings.join(" ")).not.toMatch(/No solution density/);
    const back = solve([{ formula: "NaCl", amount: 1, unit: "mol/kg" }], rho);
    expect(back.components[0].molarity).toBeCloseTo(c, 9);
  });

  it("without a density, a solute the density model lacks uses the solvent density and says it is a dilute-solution approximation", () => {
    // LiPF6 has no Laliberté (2009) coefficients; KCl has (density.test.ts).
    const r = solve([{ formula: "LiPF6", amount: 10, unit: "mmol/L" }]);
    expect(r.components[0].molality).toBeCloseTo(0.01 / 0.997045, 5);
    expect(r.warnings.join(" ")).toMatch(
      /No solution density given.*approximation for dilute solutions/,
    );
    expect(r.density.source).toBe("solvent");
  });

  it("a mass per final volume: 1.25 g CuSO4·5H2O in 50 mL is 0.1001 mol/L", () => {
    const r = solve([
      { formula: "CuSO4·5H2O", amount: 1.25, unit: "g", per: { amount: 50, unit: "mL" } },
    ]);
    expect(r.components[0].molarity).toBeCloseTo(1.25 / molarMass("CuSO4·5H2O") / 0.05, 9);
  });

  it("a weighed hydrate's water of crystallisation joins the solvent", () => {
    const m = molarMass("CuSO4·5H2O");
    const r = solve([
      { formula: "CuSO4·5H2O", amount: 0.01 * m, unit: "g", per: { amount: 100, unit: "g" } },
    ]);
    const waterKg = 0.1 + (0.01 * 5 * 18.015) / 1000;
    expect(r.components[0].molality).toBeCloseTo(0.01 / waterKg, 9);
    expect(r.components[0].molality).toBeLessThan(0.1);
  });

  it("components weighed into the same mass of solvent share the hydrate water", () => {
    const m = molarMass("CuSO4·5H2O");
    const r = solve([
      { formula: "CuSO4·5H2O", amount: 0.01 * m, unit: "g", per: { amount: 100, unit: "g" } },
      { formula: "NaCl", amount: 0.585, unit: "g", per: { amount: 0.1, unit: "kg" } },
    ]);
    const waterKg = 0.1 + (0.01 * 5 * 18.015) / 1000;
    expect(r.components[1].molality).toBeCloseTo(0.585 / molarMass("NaCl") / waterKg, 9);
  });

  it("in a non-aqueous solvent, a hydrate's water is flagged: the solvent is no longer pure", () => {
    const r = computeSolution({
      solvent: "acetonitrile",
      components: [
        { formula: "LiClO4·3H2O", amount: 1, unit: "g", per: { amount: 100, unit: "g" } },
      ],
    });
    expect(r.warnings.join(" ")).toMatch(/water of crystallisation of LiClO4·3H2O.*no longer pure/);
  });

  it("mg and mass concentration (g/L)", () => {
    expect(
      solve([{ formula: "NaCl", amount: 584.4, unit: "mg", per: { amount: 1, unit: "kg" } }])
        .components[0].molality,
    ).toBeCloseTo(0.01, 6);
    expect(
      solve([{ formula: "NaCl", amount: 5.844, unit: "g/L" }]).components[0].molarity,
    ).toBeCloseTo(0.1, 6);
  });

  it("mass fraction: 5 wt% NaCl is w / (M (1 − w)) mol/kg; a hydrate's water counts as solvent", () => {
    const M = molarMass("NaCl") / 1000;
    expect(solve([{ formula: "NaCl", amount: 5, unit: "wt%" }]).components[0].molality).toBeCloseTo(
      0.05 / (M * 0.95),
      9,
    );
    expect(
      solve([{ formula: "NaCl", amount: 0.05, unit: "mass fraction" }]).components[0].molality,
    ).toBeCloseTo(0.05 / (M * 0.95), 9);
    const hydrate = solve([{ formula: "CuSO4·5H2O", amount: 10, unit: "%" }]).components[0]
      .molality;
    const mol = 100 / molarMass("CuSO4·5H2O");
    expect(hydrate).toBeCloseTo(mol / ((1000 - mol * molarMass("CuSO4")) / 1000), 9);
  });
});

describe("amounts that cannot be right are typed errors", () => {
  it.each([
    [{ formula: "NaCl", amount: -1, unit: "mol/kg" }, "components[0].amount", /cannot be negative/],
    [
      { formula: "NaCl", amount: Number.NaN, unit: "mol/kg" },
      "components[0].amount",
      /must be a number/,
    ],
    [
      { formula: "NaCl", amount: Number.POSITIVE_INFINITY, unit: "mol/kg" },
      "components[0].amount",
      /must be a number/,
    ],
    [{ formula: "NaCl", amount: 1, unit: "m/s" }, "components[0].unit", /not a unit of amount/],
    [{ formula: "NaCl", amount: 1, unit: "parsecs" }, "components[0].unit", /not a unit of amount/],
    [{ formula: "NaCl", amount: 1, unit: "mL" }, "components[0].unit", /volume/],
    [{ formula: "NaCl", amount: 1, unit: "g" }, "components[0].per", /needs the mass of solvent/],
    [
      { formula: "NaCl", amount: 1, unit: "mol/kg", per: { amount: 1, unit: "kg" } },
      "components[0].per",
      /applies to a weighed mass only/,
    ],
    [
      { formula: "NaCl", amount: 1, unit: "g", per: { amount: 1, unit: "mol" } },
      "components[0].per.unit",
      /not a unit|must be a mass/,
    ],
    [
      { formula: "NaCl", amount: 1, unit: "g", per: { amount: 0, unit: "mL" } },
      "components[0].per.amount",
      /greater than zero/,
    ],
    [{ formula: "NaCl", amount: 120, unit: "wt%" }, "components[0].amount", /below 1/],
    [{ formula: "NaCl", amount: 1, unit: "" }, "components[0].unit", /missing/],
  ])("%j → %s", (component, field, message) => {
    const error = errorOf(() => solve([component]));
    expect(error.field).toBe(field);
    expect(error.message).toMatch(message);
  });

  it("amounts that add up to more than the solution are refused", () => {
    const error = errorOf(() =>
      solve([
        { formula: "NaCl", amount: 60, unit: "wt%" },
        { formula: "KCl", amount: 50, unit: "wt%" },
      ]),
    );
    expect(error.field).toBe("components");
  });
});
