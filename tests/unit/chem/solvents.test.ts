// @vitest-environment node
import { describe, expect, it } from "vitest";
import { computeSolution, listSolvents } from "@/lib/chem";

describe("solvent catalogue", () => {
  const solvents = listSolvents();

  it("has water and the common non-aqueous electrochemistry solvents, each with its source", () => {
    for (const id of [
      "water",
      "acetonitrile",
      "dmso",
      "dmf",
      "propylene-carbonate",
      "methanol",
      "ethanol",
      "dichloromethane",
    ]) {
      const s = solvents.find((x) => x.id === id);
      expect(s, id).toBeDefined();
      expect(s!.source.length).toBeGreaterThan(10);
    }
  });

  // Ranges that cover the values of the CRC Handbook "Permittivity (dielectric constant) of
  // liquids" and Riddick, Bunger & Sakano (1986) at 20–25 °C (from memory): a check that a
  // catalogue value is the right solvent's, not a second copy of the same number.
  it.each([
    ["acetonitrile", 35.5, 37.5, 0.776, 0.786],
    ["dmso", 46, 47.3, 1.09, 1.101],
    ["dmf", 36.5, 38.3, 0.94, 0.95],
    ["propylene-carbonate", 64, 66.2, 1.195, 1.206],
    ["methanol", 32.5, 33.1, 0.786, 0.792],
    ["ethanol", 24.3, 25.4, 0.78, 0.79],
    ["dichloromethane", 8.8, 9.2, 1.31, 1.33],
  ])("%s: εr in [%f, %f], ρ in [%f, %f] g/mL at 25 °C", (id, epsLow, epsHigh, rhoLow, rhoHigh) => {
    const s = solvents.find((x) => x.id === id)!;
    expect(s.relativePermittivity25C).toBeGreaterThanOrEqual(epsLow);
    expect(s.relativePermittivity25C).toBeLessThanOrEqual(epsHigh);
    expect(s.densityGPerMl25C).toBeGreaterThanOrEqual(rhoLow);
    expect(s.densityGPerMl25C).toBeLessThanOrEqual(rhoHigh);
  });

  it("finds solvents by abbreviation", () => {
    expect(
      computeSolution({
        solvent: "MeCN",
        components: [{ formula: "TBAPF6", amount: 0.1, unit: "M" }],
      }).solvent.id,
    ).toBe("acetonitrile");
    expect(
      computeSolution({
        solvent: "PC",
        components: [{ formula: "LiClO4", amount: 0.1, unit: "M" }],
      }).solvent.id,
    ).toBe("propylene-carbonate");
  });

  it("warns that non-aqueous εr and ρ are 25 °C values when another temperature is asked", () => {
    const r = computeSolution({
      solvent: "acetonitrile",
      temperatureC: 40,
      components: [{ formula: "TBAPF6", amount: 0.1, unit: "M" }],
    });
    expect(r.warnings.join(" ")).toMatch(/known here at 25 °C only/);
  });

  it("water follows the temperature (εr 87.74 at 0 °C, 55.72 at 100 °C: Malmberg & Maryott 1956)", () => {
    expect(
      computeSolution({
        temperatureC: 0,
        components: [{ formula: "NaCl", amount: 0.01, unit: "mol/kg" }],
      }).solvent.relativePermittivity,
    ).toBeCloseTo(87.74, 2);
    expect(
      computeSolution({
        temperatureC: 100,
        components: [{ formula: "NaCl", amount: 0.01, unit: "mol/kg" }],
      }).solvent.relativePermittivity,
    ).toBeCloseTo(55.72, 2);
  });
});
