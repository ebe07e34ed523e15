// @vitest-environment node
/** Formula notations are common practice (no single source); molar masses check IUPAC 2021. */
import { describe, expect, it } from "vitest";
import { ChemInputError, molarMass, parseFormula } from "@/lib/chem";
import { ELEMENTS } from "@/lib/chem/data/atomic-weights";
import { readFixture } from "../../support/read-reference";

describe("parseFormula: notations chemists type", () => {
  it.each([
    ["CuSO4·5H2O", "CuSO4·5H2O", 0, 5],
    ["CuSO4.5H2O", "CuSO4·5H2O", 0, 5],
    ["CuSO4*5H2O", "CuSO4·5H2O", 0, 5],
    ["(NH4)2Fe(SO4)2·6H2O", "(NH4)2Fe(SO4)2·6H2O", 0, 6],
    ["SO4^2-", "SO4^2-", -2, 0],
    ["SO4-2", "SO4^2-", -2, 0],
    ["SO4--", "SO4^2-", -2, 0],
    ["SO4 2-", "SO4^2-", -2, 0],
    ["SO₄²⁻", "SO4^2-", -2, 0],
    ["SO42-", "SO4^2-", -2, 0],
    ["Fe(CN)6^3-", "Fe(CN)6^3-", -3, 0],
    ["[Fe(CN)6]3-", "Fe(CN)6^3-", -3, 0],
    ["Fe(CN)6^{4-}", "Fe(CN)6^4-", -4, 0],
    ["NH4+", "NH4+", 1, 0],
    ["Na⁺", "Na+", 1, 0],
    ["Fe3+", "Fe^3+", 3, 0],
    ["Fe+3", "Fe^3+", 3, 0],
    ["Ce4+", "Ce^4+", 4, 0],
    ["H2PO4-", "H2PO4-", -1, 0],
    ["HPO42-", "HPO4^2-", -2, 0],
    ["Cl−", "Cl-", -1, 0],
  ])("%s → %s (charge %i, %i H2O)", (text, formula, charge, water) => {
    const parsed = parseFormula(text);
    expect(parsed.formula).toBe(formula);
    expect(parsed.charge).toBe(charge);
    expect(parsed.hydrateWater).toBe(water);
  });

  it("counts elements through nested brackets and hydrate water", () => {
    expect(parseFormula("K3[Fe(CN)6]").elements).toEqual({ K: 3, Fe: 1, C: 6, N: 6 });
    expect(parseFormula("[Ru(NH3)6]Cl3").elements).toEqual({ Ru: 1, N: 6, H: 18, Cl: 3 });
    expect(parseFormula("CuSO4·5H2O").elements).toEqual({ Cu: 1, S: 1, O: 9, H: 10 });
    expect(parseFormula("CuSO4·5H2O").anhydrousElements).toEqual({ Cu: 1, S: 1, O: 4 });
  });

  it("writes the same ion the same way whatever the notation (one key)", () => {
    expect(parseFormula("SO4-2").key).toBe(parseFormula("SO₄²⁻").key);
    expect(parseFormula("[Fe(CN)6]3-").key).toBe(parseFormula("Fe(CN)6^3-").key);
  });

  it.each([
    ["", "empty"],
    ["NaXx", '"Xx"'],
    ["Na(Cl", "not closed"],
    ["NaCl)", "Unbalanced"],
    ["nacl", "capital letter"],
    ["Na0Cl", "subscript of 0"],
    ["CuSO4·", "Nothing follows"],
  ])("rejects %j with a chemist's message", (text, fragment) => {
    try {
      parseFormula(text);
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(ChemInputError);
      expect((error as ChemInputError).field).toBe("formula");
      expect((error as ChemInputError).message).toContain(fragment);
    }
  });
});

describe("molarMass: IUPAC 2021 abridged standard atomic weights", () => {
  const weights = new Map(
    readFixture("constants.csv")
      .filter((r) => r.quantity.startsWith("standard atomic weight"))
      .map((r) => [r.symbol, Number(r.value)]),
  );

  it("has all 118 elements", () => {
    expect(ELEMENTS.size).toBe(118);
    expect([...ELEMENTS.values()].map((e) => e.atomicNumber)).toEqual(
      Array.from({ length: 118 }, (_, i) => i + 1),
    );
  });

  // Source: IUPAC 2021 abridged standard atomic weights (CIAAW, Prohaska et al. 2022), constants.csv
  it.each([...weights.entries()])("%s = %f g/mol (IUPAC 2021 abridged)", (symbol, value) => {
    expect(ELEMENTS.get(symbol)!.atomicWeight).toBeCloseTo(value, 4);
  });

  it("sums weights of the formula unit, hydrate water included", () => {
    const w = (s: string) => weights.get(s)!;
    expect(molarMass("NaCl")).toBeCloseTo(w("Na") + w("Cl"), 6);
    expect(molarMass("CuSO4·5H2O")).toBeCloseTo(w("Cu") + w("S") + 9 * w("O") + 10 * w("H"), 6);
    expect(molarMass("K3Fe(CN)6")).toBeCloseTo(3 * w("K") + w("Fe") + 6 * w("C") + 6 * w("N"), 6);
    // CRC Handbook molar masses (rounded there to 0.01): CuSO4·5H2O 249.69, K3Fe(CN)6 329.24 (from memory)
    expect(molarMass("CuSO4·5H2O")).toBeCloseTo(249.68, 1);
    expect(molarMass("K3Fe(CN)6")).toBeCloseTo(329.24, 1);
  });

  it("covers heavy and radioactive elements (mass number of the longest-lived isotope)", () => {
    expect(molarMass("UO2(NO3)2")).toBeCloseTo(238.03 + 2 * 14.007 + 8 * 15.999, 2);
    expect(molarMass("PuO2")).toBeCloseTo(244 + 2 * 15.999, 2);
    expect(molarMass("Og")).toBe(294);
  });
});
