// @vitest-environment node
/**
 * Solution density without a user-given value: the Laliberté & Cooper (2004) model with the
 * coefficients of Laliberté (2009), against the CRC Handbook (102nd ed.) table "Concentrative
 * Properties of Aqueous Solutions" at 20 °C (tests/fixtures/reference/density-crc-20C.csv).
 * Away from 20 °C no table was at hand: there the checks are self-consistency (pure-water limit,
 * smooth in temperature).
 */
import { describe, expect, it } from "vitest";
import { computeSolution, waterDensityGPerMl } from "@/lib/chem";
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
