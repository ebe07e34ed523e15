// @vitest-environment node
import { describe, expect, it } from "vitest";
import { pKwAt } from "@/lib/chem/electrochem/water-ionization";
import {
  ChemInputError,
  convertPotential,
  listCouples,
  listReferenceElectrodes,
  nernstPotential,
  nernstPotentialDetailed,
  nernstSlopeV,
  referencePotentialVsShe,
} from "@/lib/chem";
import { readFixture } from "../../support/read-reference";

const potentials = readFixture("electrode-potentials.csv");

describe("Nernst slope RT ln10 / nF (CODATA 2018 R and F)", () => {
  it.each([
    [25, 0.0591593],
    [0, 0.054199],
    [37, 0.06154],
  ])("%i °C: %f V per decade (worked_examples.md §3, computed from CODATA 2018)", (t, slope) => {
    expect(nernstSlopeV(t)).toBeCloseTo(slope, 6);
  });
});

describe("Nernst equation with activities", () => {
  it("Fe3+/Fe2+ at equal activities is E°; a tenfold ratio shifts it by one slope", () => {
    expect(
      nernstPotential({
        couple: "Fe3+/Fe2+",
        activities: { "Fe3+": 1e-3, "Fe2+": 1e-3 },
        temperatureC: 25,
      }),
    ).toBeCloseTo(0.771, 12);
    expect(
      nernstPotential({
        couple: "Fe3+/Fe2+",
        activities: { "Fe^3+": 1e-2, "Fe2+": 1e-3 },
        temperatureC: 25,
      }),
    ).toBeCloseTo(0.771 + nernstSlopeV(25), 12);
  });

  it("O2/H2O at pH 7 and 1 bar: 1.229 − 7 × 0.05916 V (CRC E°)", () => {
    const r = nernstPotentialDetailed({ couple: "O2/H2O", pH: 7 });
    expect(r.potentialV).toBeCloseTo(1.229 - 7 * nernstSlopeV(25), 10);
    expect(r.notes.join(" ")).toMatch(/O2 taken at 1 bar/);
  });

  it("uses the temperature in the slope (n = 2 for Cu2+/Cu at 37 °C)", () => {
    expect(
      nernstPotential({ couple: "Cu2+/Cu", activities: { "Cu2+": 0.01 }, temperatureC: 37 }),
    ).toBeCloseTo(0.3419 - nernstSlopeV(37, 2) * 2, 10);
  });

  it("AgCl/Ag E° follows the Bates & Bower (1954) table at 0–60 °C within 0.1 mV (their smoothing equation; table and equation from memory)", () => {
    const bb = potentials.filter((r) => r.original_source.startsWith("Bates & Bower"));
    expect(bb.length).toBe(13);
    for (const row of bb) {
      const e = nernstPotentialDetailed({
        couple: "AgCl/Ag",
        activities: { "Cl-": 1 },
        temperatureC: Number(row.temperature_C),
      }).standardPotentialV;
      expect(Math.abs(e - Number(row.E0_V_vs_SHE)), `${row.temperature_C} °C`).toBeLessThan(1e-4);
    }
  });

  it("standard and reference potentials are continuous over 0–100 °C (no step above 0.5 mV per 0.1 K; self-consistency)", () => {
    const e0 = (couple: string, t: number) =>
      nernstPotentialDetailed({
        couple,
        activities: { "Cl-": 1, "OH-": 1, H2: 1 },
        temperatureC: t,
      }).standardPotentialV;
    let steps = 0;
    for (const couple of ["AgCl/Ag", "H2O/H2,OH-", "Hg2Cl2/Hg"]) {
      for (let t = 0.1; t <= 100; t += 0.1) {
        expect(Math.abs(e0(couple, t) - e0(couple, t - 0.1)), `${couple} at ${t} °C`).toBeLessThan(
          5e-4,
        );
        steps++;
      }
    }
    for (const ref of ["SCE", "Ag/AgCl-satKCl", "Ag/AgCl-3MKCl", "Hg/HgO-1MNaOH"]) {
      for (let t = 0.1; t <= 100; t += 0.1) {
        const jump =
          referencePotentialVsShe(ref, { temperatureC: t }) -
          referencePotentialVsShe(ref, { temperatureC: t - 0.1 });
        expect(Math.abs(jump), `${ref} at ${t} °C`).toBeLessThan(5e-4);
        steps++;
      }
    }
    expect(steps).toBe(7 * 1000);
  });

  it("OH⁻ from pH uses Kw at the temperature (WATEQ4F: pKw 14.942 at 0 °C, 13.999 at 25 °C, 12.265 at 100 °C)", () => {
    // Harned & Owen (1958) give pKw 14.943 at 0 °C and 13.996 at 25 °C (from memory): within 0.005.
    expect(pKwAt(0)).toBeCloseTo(14.943, 2);
    expect(pKwAt(25)).toBeCloseTo(13.996, 2);
    const at = (t: number) =>
      nernstPotentialDetailed({ couple: "O2/OH-", activities: { O2: 1 }, pH: 12, temperatureC: t });
    const r = at(60);
    expect(r.log10Q).toBeCloseTo(4 * (12 - pKwAt(60)), 10);
    expect(r.notes.join(" ")).toMatch(/pKw = 13.03/);
  });

  it("offers formal potentials where the trade uses them (hexacyanoferrate: Skoog et al.)", () => {
    const r = nernstPotentialDetailed({
      couple: "Fe(CN)6 3-/4-",
      activities: { "Fe(CN)6^3-": 1, "Fe(CN)6^4-": 1 },
    });
    expect(r.formalPotentials).toEqual(
      expect.arrayContaining([{ medium: "1 M HCl", potentialV: 0.71 }]),
    );
  });

  it.each([
    [{ couple: "Unobtainium/U", activities: {} }, "couple", /Unknown couple/],
    [
      { couple: "Fe3+/Fe2+", activities: { "Fe3+": 1e-3 } },
      "activities.Fe^2+",
      /needs the activity of Fe\^2\+/,
    ],
    [
      { couple: "Fe3+/Fe2+", activities: { "Fe3+": 0, "Fe2+": 1 } },
      "activities.Fe3+",
      /positive number/,
    ],
    [
      { couple: "Fe3+/Fe2+", activities: { "Fe3+": 1, "Fe2+": 1 }, temperatureC: 999 },
      "temperatureC",
      /outside/,
    ],
  ])("bad input %j is a ChemInputError on %s", (input, field, message) => {
    try {
      nernstPotential(input);
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(ChemInputError);
      expect((error as ChemInputError).field).toBe(field);
      expect((error as ChemInputError).message).toMatch(message);
    }
  });
});

describe("catalogue of standard potentials (CRC Handbook, Vanýsek 2011)", () => {
  const couples = listCouples();
  it("has at least 30 couples", () => expect(couples.length).toBeGreaterThanOrEqual(30));

  // Published values in electrode_potentials.csv (sources named there); tolerance covers
  // differences between handbook editions (README "known disagreements" #4): 2 mV, except
  // K+/K, Mg2+/Mg and Ni2+/Ni whose older editions differ by 7–27 mV.
  const pairs: [string, string, number][] = [
    ["Ag+/Ag", "Ag+ + e- = Ag(s)", 0.002],
    ["AgCl/Ag", "AgCl(s) + e- = Ag(s) + Cl-", 0.0002],
    ["Hg2Cl2/Hg", "Hg2Cl2(s) + 2e- = 2Hg(l) + 2Cl-", 0.0002],
    ["Cu2+/Cu", "Cu2+ + 2e- = Cu(s)", 0.005],
    ["Zn2+/Zn", "Zn2+ + 2e- = Zn(s)", 0.0015],
    ["Fe3+/Fe2+", "Fe3+ + e- = Fe2+", 0.002],
    ["Fe(CN)6 3-/4-", "[Fe(CN)6]3- + e- = [Fe(CN)6]4-", 0.0021],
    ["O2/H2O", "O2(g) + 4H+ + 4e- = 2H2O(l)", 0.0005],
    ["O2/OH-", "O2(g) + 2H2O + 4e- = 4OH-", 0.0005],
    ["Pb2+/Pb", "Pb2+ + 2e- = Pb(s)", 0.0005],
    ["Ni2+/Ni", "Ni2+ + 2e- = Ni(s)", 0.03],
    ["Cd2+/Cd", "Cd2+ + 2e- = Cd(s)", 0.0005],
    ["Li+/Li", "Li+ + e- = Li(s)", 0.005],
    ["Na+/Na", "Na+ + e- = Na(s)", 0.004],
    ["K+/K", "K+ + e- = K(s)", 0.008],
    ["Mg2+/Mg", "Mg2+ + 2e- = Mg(s)", 0.017],
    ["Ca2+/Ca", "Ca2+ + 2e- = Ca(s)", 0.0005],
    ["Ba2+/Ba", "Ba2+ + 2e- = Ba(s)", 0.0005],
    ["Al3+/Al", "Al3+ + 3e- = Al(s)", 0.015],
    ["Cl2/Cl-", "Cl2(g) + 2e- = 2Cl-", 0.0005],
    ["Br2/Br-", "Br2(aq) + 2e- = 2Br-", 0.0005],
    ["H2O/H2,OH-", "2H2O + 2e- = H2(g) + 2OH-", 0.001],
  ];
  it.each(pairs)(
    "%s agrees with every published row for %s within %f V",
    (id, csvCouple, tolerance) => {
      const rows = potentials.filter((r) => r.couple === csvCouple);
      expect(rows.length).toBeGreaterThan(0);
      const e = couples.find((c) => c.id === id)!.standardPotentialV;
      for (const row of rows)
        expect(Math.abs(e - Number(row.E0_V_vs_SHE))).toBeLessThanOrEqual(tolerance);
    },
  );
});

describe("reference electrode conversions", () => {
  it("has exactly the contract's ids", () => {
    expect(listReferenceElectrodes().map((r) => r.id)).toEqual([
      "SHE",
      "SCE",
      "Ag/AgCl-satKCl",
      "Ag/AgCl-3.5MKCl",
      "Ag/AgCl-3MKCl",
      "Hg/HgO-1MNaOH",
      "Hg/Hg2SO4-satK2SO4",
      "RHE",
    ]);
  });

  it.each([
    ["SCE", "SCE: Hg/Hg2Cl2, KCl (sat)", 0.003],
    ["Ag/AgCl-satKCl", "Ag/AgCl, KCl (sat)", 0.0021],
    ["Ag/AgCl-3MKCl", "Ag/AgCl, KCl (3 M)", 0.0005],
    ["Ag/AgCl-3.5MKCl", "Ag/AgCl, KCl (3.5 M)", 0.0005],
    ["Hg/HgO-1MNaOH", "Hg/HgO, NaOH (1 M)", 0.0005],
    ["Hg/Hg2SO4-satK2SO4", "Hg/Hg2SO4, K2SO4 (sat)", 0.0005],
  ])("%s vs SHE at 25 °C matches the published rows for %s", (id, csvCouple, tolerance) => {
    const rows = potentials.filter((r) => r.couple === csvCouple);
    expect(rows.length).toBeGreaterThan(0);
    for (const row of rows)
      expect(
        Math.abs(convertPotential(0, id, "SHE") - Number(row.E0_V_vs_SHE)),
      ).toBeLessThanOrEqual(tolerance);
  });

  it("converts a potential between any two electrodes (0.5 V vs Ag/AgCl sat. → 0.4558 V vs SCE)", () => {
    expect(convertPotential(0.5, "Ag/AgCl-satKCl", "SCE", { temperatureC: 25 })).toBeCloseTo(
      0.5 + 0.197 - 0.2412,
      12,
    );
    expect(
      convertPotential(convertPotential(0.3, "SCE", "Hg/HgO-1MNaOH"), "Hg/HgO-1MNaOH", "SCE"),
    ).toBeCloseTo(0.3, 12);
  });

  it("RHE needs the pH: E(RHE) = −0.05916 pH V vs SHE at 25 °C", () => {
    expect(convertPotential(0, "RHE", "SHE", { pH: 14 })).toBeCloseTo(-14 * nernstSlopeV(25), 12);
    expect(convertPotential(1.23, "SHE", "RHE", { pH: 0 })).toBeCloseTo(1.23, 12);
    expect(() => convertPotential(0, "RHE", "SCE")).toThrow(/needs the pH/);
  });

  it("applies published temperature coefficients, and says when none is known", () => {
    expect(convertPotential(0, "SCE", "SHE", { temperatureC: 35 })).toBeCloseTo(0.2412 - 0.0066, 6);
    expect(() => convertPotential(0, "Nope", "SHE")).toThrow(ChemInputError);
  });
});
