// @vitest-environment node
/**
 * Solution density without a user-given value: the Laliberté & Cooper (2004) model with the
 * coefficients of Laliberté (2009), against the CRC Handbook (102nd ed.) table "Concentrative
 * Properties of Aqueous Solutions" at 20 °C (tests/fixtures/reference/density-crc-20C.csv).
 * Away from 20 °C no single-salt table was at hand: there the checks are self-consistency
 * (pure-water limit, smooth in temperature). Mixtures (the mixing rule of Laliberté & Cooper
 * 2004): seawater of practical salinity 35 made up as salts, against TEOS-10
 * (tests/fixtures/reference/density-seawater.csv), 0–40 °C.
 */
import { describe, expect, it } from "vitest";
import { computeSolution, molarMass, waterDensityGPerMl } from "@/lib/chem";
import { readFixture } from "../../support/read-reference";

const rows = readFixture("density-crc-20C.csv");

describe("density model against the CRC Handbook table at 20 °C", () => {
  it("within 0.1 % for NaCl, KCl, CaCl2, KNO3, K2SO4, CuSO4 at 1–30 % by mass (CaCl2 at 40 %: 0.2 %; KOH: 0.7 %)", () => {
    const worst: Record<string, number> = {};
    let checked = 0;
    for (const row of rows) {
      const r = computeSolution({
        temperatureC: 20,
        components: [
          { formula: row.salt, amount: Number(row.molality_mol_per_kg), unit: "mol/kg" },
        ],
      });
      expect(r.density.source).toBe("laliberte-cooper");
      const dev =
        (100 * (r.density.gPerMl - Number(row.density_g_per_mL))) / Number(row.density_g_per_mL);
      // KOH: the fit sits 0.3–0.6 % above the CRC values at 10–30 % (measured; a disagreement
      // between the two compilations, kept visible rather than hidden in a wide tolerance for all).
      // CaCl2 at 40 % (6 mol/kg) is 0.18 % high, at the edge of the fit (51 % by mass).
      const tolerance =
        row.salt === "KOH" ? 0.7 : row.salt === "CaCl2" && row.mass_percent === "40" ? 0.2 : 0.1;
      expect(Math.abs(dev), `${row.salt} ${row.mass_percent} %`).toBeLessThan(tolerance);
      worst[row.salt] = Math.max(worst[row.salt] ?? 0, Number(Math.abs(dev).toFixed(3)));
      checked++;
    }
    console.table(worst);
    expect(checked).toBe(33);
  });

  it("3 mol/L KCl (the filling solution of the common reference electrode): 3.31 mol/kg, not 3.01 (CRC: 20 % is 3.039 mol/L, 3.353 mol/kg)", () => {
    const r = computeSolution({
      temperatureC: 20,
      components: [{ formula: "KCl", amount: 3.039, unit: "mol/L" }],
    });
    expect(r.components[0].molality).toBeCloseTo(3.353, 2);
    expect(r.density.label).toMatch(/Laliberté & Cooper \(2004\)/);
    expect(r.warnings.join(" ")).not.toMatch(/No solution density given/);
  });

  it("a mixture uses the mixing rule; the result says which density it used", () => {
    const r = computeSolution({
      temperatureC: 25,
      components: [
        { formula: "NaCl", amount: 0.5, unit: "mol/L" },
        { formula: "KCl", amount: 0.1, unit: "mol/L" },
      ],
    });
    expect(r.density.source).toBe("laliberte-cooper");
    expect(r.density.gPerMl).toBeGreaterThan(waterDensityGPerMl(25) + 0.02);
  });
});

describe("density: what it falls back to and where it stops", () => {
  it("a given density wins; a solute without coefficients falls back to water, said", () => {
    const given = computeSolution({
      components: [{ formula: "NaCl", amount: 1, unit: "mol/L" }],
      densityGPerMl: 1.04,
    });
    expect(given.density).toMatchObject({ source: "given", gPerMl: 1.04 });
    const unknown = computeSolution({
      components: [{ formula: "LiPF6", amount: 0.1, unit: "mol/L" }],
    });
    expect(unknown.density.source).toBe("solvent");
    expect(unknown.warnings.join(" ")).toMatch(/no coefficients for LiPF6/);
  });

  it("the pure-water limit is the water density (self-consistency), and the density falls smoothly with T", () => {
    const at = (t: number, m: number) =>
      computeSolution({
        temperatureC: t,
        components: [{ formula: "NaCl", amount: m, unit: "mol/kg" }],
      }).density.gPerMl;
    expect(at(25, 1e-9)).toBeCloseTo(waterDensityGPerMl(25), 8);
    let previous = at(0, 1);
    for (let t = 5; t <= 100; t += 5) {
      const rho = at(t, 1);
      expect(rho).toBeLessThan(previous);
      expect(previous - rho).toBeLessThan(0.005);
      previous = rho;
    }
  });

  it("beyond the fitted temperature range the density is an extrapolation, said (K2SO4 fitted 0–98.67 °C is inside; KCl fitted from 5 °C at 1 °C is not)", () => {
    const kcl = computeSolution({
      temperatureC: 1,
      components: [{ formula: "KCl", amount: 1, unit: "mol/kg" }],
    });
    expect(kcl.density.note).toMatch(/extrapolated for KCl/);
  });
});

describe("density of a mixture: seawater (Laliberté & Cooper 2004 mixing rule)", () => {
  // Artificial seawater of salinity 35, Kester, Duedall, Connors & Pytkowicz (1967) Limnol.
  // Oceanogr. 12, 176, Table 1 (from memory): g per kg of solution for the weighed salts, mol
  // per kg of solution for the chlorides added as solutions. H3BO3 (0.026 g) is left out: a
  // neutral solute the density model has no row for (0.003 % of the mass).
  const perKgSolution: [string, number][] = [
    ["NaCl", 23.926],
    ["Na2SO4", 4.008],
    ["KCl", 0.677],
    ["NaHCO3", 0.196],
    ["KBr", 0.098],
    ["NaF", 0.003],
    ["MgCl2", 0.05327 * molarMass("MgCl2")],
    ["CaCl2", 0.01033 * molarMass("CaCl2")],
    ["SrCl2", 0.00009 * molarMass("SrCl2")],
  ];
  const soluteGrams = perKgSolution.reduce((a, [, g]) => a + g, 0);
  const kgWater = 1 - soluteGrams / 1000;
  const components = perKgSolution.map(([formula, g]) => ({
    formula,
    amount: g / molarMass(formula) / kgWater,
    unit: "mol/kg" as const,
  }));
  const teos10 = readFixture("density-seawater.csv");

  it("0–40 °C against TEOS-10 (IOC, SCOR & IAPSO 2010; SA 35.16504 g/kg, 0 dbar): within 0.03 % at 20–40 °C, 0.1 % below, where the result says which salts are extrapolated (CaCl2, SrCl2 fitted from 15 °C, KCl from 5 °C)", () => {
    // The recipe holds 35.14 g of solutes per kg against TEOS-10's 35.165 (bicarbonate,
    // carbonate and borate are simplified in it): about 0.002 % in density.
    expect(soluteGrams).toBeCloseTo(35.14, 2);
    const table: Record<string, { teos10: number; model: number; percent: number }> = {};
    for (const row of teos10) {
      const T = Number(row.temperature_C);
      const r = computeSolution({ temperatureC: T, components });
      expect(r.density.source).toBe("laliberte-cooper");
      const reference = Number(row.density_kg_per_m3);
      const model = 1000 * r.density.gPerMl;
      const percent = (100 * (model - reference)) / reference;
      // Measured: −0.013 % at 25 °C (UNESCO 1981 EOS-80 gives the same 1023.343 kg/m3 at
      // S = 35, 25 °C, from memory); −0.08 % at 0 °C, where three salts are extrapolated.
      expect(Math.abs(percent), `${T} °C`).toBeLessThan(T >= 20 ? 0.03 : 0.1);
      if (T < 15) expect(r.density.note, `${T} °C`).toMatch(/extrapolated for .*CaCl2/);
      else expect(r.density.note, `${T} °C`).toBeUndefined();
      table[`${T} °C`] = {
        teos10: reference,
        model: Number(model.toFixed(3)),
        percent: Number(percent.toFixed(4)),
      };
    }
    console.table(table);
    expect(Object.keys(table).length).toBe(9);
  });

  it("the mixture's range: each salt's fit must cover the temperature and the total solute fraction (NaF, fitted to 3.7 % by mass, is extrapolated in 10 % NaCl)", () => {
    const r = computeSolution({
      temperatureC: 25,
      components: [
        { formula: "NaCl", amount: 2, unit: "mol/kg" },
        { formula: "NaF", amount: 0.01, unit: "mol/kg" },
      ],
    });
    expect(r.density.source).toBe("laliberte-cooper");
    expect(r.density.note).toMatch(/extrapolated for NaF/);
    expect(r.density.note).not.toMatch(/NaCl/);
  });
});
