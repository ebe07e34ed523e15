// @vitest-environment node
/** Catalogue contents follow the list; dissociation stoichiometry is common practice (no single source). */
import { describe, expect, it } from "vitest";
import { ChemInputError, resolveSpecies, searchSpecies } from "@/lib/chem";
import { CATALOGUE_SALTS, dissociationBalance } from "@/lib/chem/species/catalogue";
import { allIons } from "@/lib/chem/species/ion-index";

describe("built-in species catalogue", () => {
  it("holds at least 80 salts, acids and bases, and the ions they form", () => {
    expect(CATALOGUE_SALTS.length).toBeGreaterThanOrEqual(80);
    expect(allIons().length).toBeGreaterThanOrEqual(60);
  });

  it.each(CATALOGUE_SALTS.filter((s) => s.ions.length > 0).map((s) => [s.formula, s]))(
    "%s dissociates into ions whose atoms and charges add up to it",
    (_formula, salt) => {
      const balance = dissociationBalance(salt.ions);
      expect(balance.charge).toBe(0);
      expect(balance.key).toBe(salt.key);
    },
  );

  // The families the issue names, one or more members each.
  it.each([
    ["alkali halide", ["LiCl", "NaCl", "KCl", "NaBr", "KI", "CsCl"]],
    ["alkaline-earth halide", ["MgCl2", "CaCl2", "SrCl2", "BaCl2"]],
    ["nitrate", ["KNO3", "NaNO3", "AgNO3", "Ca(NO3)2"]],
    ["perchlorate", ["LiClO4", "NaClO4", "HClO4", "N(C4H9)4ClO4"]],
    ["sulfate", ["Na2SO4", "K2SO4", "CuSO4", "ZnSO4", "NiSO4"]],
    ["hydroxide", ["NaOH", "KOH", "LiOH", "Ba(OH)2"]],
    ["phosphate", ["NaH2PO4", "Na2HPO4", "K3PO4"]],
    ["carbonate", ["Na2CO3", "K2CO3", "NaHCO3"]],
    ["acetate", ["CH3COONa", "CH3COOK"]],
    ["hexacyanoferrate", ["K3Fe(CN)6", "K4Fe(CN)6"]],
    ["ruthenium hexaammine", ["Ru(NH3)6Cl3"]],
    [
      "tetraalkylammonium supporting electrolyte",
      ["N(C4H9)4PF6", "N(C4H9)4BF4", "N(C4H9)4N(SO2CF3)2", "N(C2H5)4BF4"],
    ],
    ["lithium salt", ["LiPF6", "LiBF4", "LiN(SO2CF3)2", "LiClO4"]],
    ["transition-metal chloride", ["FeCl3", "CuCl2", "NiCl2", "CoCl2", "ZnCl2"]],
    ["strong acid", ["HCl", "HNO3", "H2SO4", "HClO4"]],
  ])("includes %s salts", (_family, formulas) => {
    for (const formula of formulas)
      expect(CATALOGUE_SALTS.some((s) => s.formula === formula)).toBe(true);
  });

  it("knows salts by trade abbreviation and name", () => {
    expect(resolveSpecies("TBAPF6").saltFormula).toBe("N(C4H9)4PF6");
    expect(resolveSpecies("LiTFSI").ions.map((i) => i.formula)).toEqual(["Li+", "N(SO2CF3)2-"]);
    expect(resolveSpecies("potassium ferricyanide").ions).toEqual([
      expect.objectContaining({ formula: "K+", count: 3 }),
      expect.objectContaining({ formula: "Fe(CN)6^3-", count: 1 }),
    ]);
    expect(resolveSpecies("[Ru(NH3)6]Cl3").ions[0]).toMatchObject({
      formula: "Ru(NH3)6^3+",
      charge: 3,
    });
  });

  it("recognises a hydrate as its salt, keeping the weighed molar mass", () => {
    const s = resolveSpecies("CuSO4·5H2O");
    expect(s.saltFormula).toBe("CuSO4");
    expect(s.hydrateWater).toBe(5);
    expect(s.molarMassGPerMol - s.anhydrousMolarMassGPerMol).toBeCloseTo(5 * 18.015, 2);
  });

  it("accepts an unknown formula whose ions follow from charges, with a warning", () => {
    const rb = resolveSpecies("RbBr");
    expect(rb.ions.map((i) => [i.formula, i.count])).toEqual([
      ["Rb+", 1],
      ["Br-", 1],
    ]);
    expect(rb.warnings[0]).toMatch(/inferred from ionic charges/);
    const eu = resolveSpecies("EuCl3");
    expect(eu.ions.map((i) => [i.formula, i.count])).toEqual([
      ["Eu^3+", 1],
      ["Cl-", 3],
    ]);
  });

  it("refuses a formula it cannot split into ions, naming it", () => {
    expect(() => resolveSpecies("Cu2O")).toThrow(ChemInputError);
    expect(() => resolveSpecies("Cu2O")).toThrow(/"Cu2O" is not in the species catalogue/);
    let thrown: unknown = null;
    try {
      resolveSpecies("NaXq", "components[0].formula");
    } catch (error) {
      thrown = error;
    }
    expect(thrown).toBeInstanceOf(ChemInputError);
    expect((thrown as ChemInputError).field).toBe("components[0].formula");
  });

  it("does not guess that an unknown acid or an organic molecule gives up protons", () => {
    expect(() => resolveSpecies("C6H12O6")).toThrow(/cannot be inferred.*C6H12O6\(aq\)/);
    expect(() => resolveSpecies("glucose")).toThrow(/not a name in the species catalogue/);
  });

  it("takes a formula marked (aq) as a dissolved non-electrolyte, with a warning", () => {
    const glucose = resolveSpecies("C6H12O6(aq)");
    expect(glucose.kind).toBe("molecule");
    expect(glucose.ions).toEqual([]);
    expect(glucose.molarMassGPerMol).toBeCloseTo(6 * 12.011 + 12 * 1.008 + 6 * 15.999, 6);
    expect(glucose.warnings[0]).toMatch(/non-electrolyte/);
    expect(() => resolveSpecies("NaCl(aq)")).toThrow(/is an electrolyte/);
  });

  it("reads H3O+ as H+ (the same thermodynamic species)", () => {
    expect(resolveSpecies("H3O+").ions[0].formula).toBe("H+");
  });

  it("carries hazards: perchlorate, cyanide, fluorinated anions, HF", () => {
    expect(resolveSpecies("LiClO4").hazards.join(" ")).toMatch(/perchlorate/i);
    expect(resolveSpecies("KCN").hazards.join(" ")).toMatch(/HCN/);
    expect(resolveSpecies("LiPF6").hazards.join(" ")).toMatch(/HF/);
    expect(resolveSpecies("HF").hazards.join(" ")).toMatch(/calcium gluconate/);
  });

  it("treats weak acids as undissociated molecules, with a note", () => {
    const acetic = resolveSpecies("acetic acid");
    expect(acetic.kind).toBe("acid");
    expect(acetic.ions).toEqual([]);
    expect(acetic.notes[0]).toMatch(/Weak electrolyte/);
  });
});

describe("searchSpecies (type-ahead)", () => {
  it("ranks formula prefixes first and returns {formula, name, kind}", () => {
    const hits = searchSpecies("NaC");
    expect(hits[0]).toEqual({ formula: "NaCl", name: "sodium chloride", kind: "salt" });
  });
  it("finds by abbreviation and by part of the name", () => {
    expect(searchSpecies("TBAP").map((h) => h.formula)).toContain("N(C4H9)4ClO4");
    expect(searchSpecies("ferricyanide").map((h) => h.formula)).toEqual(
      expect.arrayContaining(["K3Fe(CN)6", "Fe(CN)6^3-"]),
    );
    expect(searchSpecies("hexaammine").length).toBeGreaterThanOrEqual(2);
  });
  it("returns nothing for an empty query and respects the limit", () => {
    expect(searchSpecies("  ")).toEqual([]);
    expect(searchSpecies("chloride", 3)).toHaveLength(3);
  });
});
