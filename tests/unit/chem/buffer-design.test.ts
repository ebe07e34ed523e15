/**
 * Recipe mode (`designBuffer`): recipes that re-speciate to their target, a published recipe,
 * temperature behaviour from ΔrH° (Goldberg, Kishore & Lennen 2002), ionic-strength top-up,
 * cautions, and typed errors.
 */
import { describe, expect, it } from "vitest";
import { designBuffer, molarMass, speciate } from "@/lib/chem";

const numbersIn = (value: unknown): number[] =>
  typeof value === "number"
    ? [value]
    : value && typeof value === "object"
      ? Object.values(value).flatMap(numbersIn)
      : [];

describe("designBuffer: two forms", () => {
  const recipe = designBuffer({
    buffer: "phosphate",
    pH: 7.4,
    totalConcentrationMolar: 0.1,
    volumeMl: 1000,
    temperatureC: 25,
  });

  it("weighs the hydrates named in the catalogue, with their molar masses", () => {
    const formulas = recipe.components.map((c) => c.formula);
    expect(formulas).toEqual(["NaH2PO4·H2O", "Na2HPO4·7H2O"]);
    for (const c of recipe.components)
      expect(c.massG! / c.amountMol).toBeCloseTo(molarMass(c.formula), 9);
    const total = recipe.components.reduce((a, c) => a + c.amountMol, 0);
    // 0.1 mol/L × 1 L of phosphate, less the small molarity↔molality round trip
    expect(total).toBeCloseTo(0.1, 6);
  });

  it("the weighed masses, speciated forward, give the target pH (round trip)", () => {
    const back = speciate({
      components: recipe.components.map((c) => ({ formula: c.formula, massG: c.massG })),
      volumeMl: 1000,
      temperatureC: 25,
    });
    expect(back.pH).toBeCloseTo(7.4, 6);
    expect(back.ionicStrength.molar).toBeCloseTo(recipe.ionicStrength.molar, 8);
  });

  it("matches a published 0.1 M, pH 7.4 sodium phosphate recipe: 19 % acid form (Gomori 1955; from memory) within 2 points", () => {
    const total = recipe.components.reduce((a, c) => a + c.amountMol, 0);
    expect(Math.abs(recipe.components[0].amountMol / total - 0.19)).toBeLessThan(0.02);
  });

  it("reports I, the species distribution and the pH convention", () => {
    expect(recipe.ionicStrength.molar).toBeGreaterThan(0.2);
    expect(recipe.ionicStrength.molar).toBeLessThan(0.3);
    const hpo4 = recipe.species.find((s) => s.formula === "HPO4^2-")!;
    expect(hpo4.fraction).toBeGreaterThan(0.75);
    expect(recipe.pHConvention).toMatch(/Davies/);
    for (const n of numbersIn(recipe)) expect(Number.isFinite(n)).toBe(true);
  });

  it("citrate: citric acid + trisodium citrate reach pH 5.0", () => {
    const r = designBuffer({
      buffer: "citrate",
      pH: 5,
      totalConcentrationMolar: 0.05,
      volumeMl: 250,
    });
    expect(r.components.map((c) => c.formula)).toEqual(["C6H8O7·H2O", "Na3C6H5O7·2H2O"]);
    expect(r.pH).toBeCloseTo(5, 6);
    expect(r.cautions.join(" ")).toMatch(/eye irritation/);
  });

  it("borate from boric acid and borax carries the reproductive-toxicity caution", () => {
    const r = designBuffer({
      buffer: "borate",
      pH: 8.8,
      totalConcentrationMolar: 0.02,
      volumeMl: 100,
    });
    expect(r.pH).toBeCloseTo(8.8, 6);
    expect(r.cautions.join(" ")).toMatch(/Repr\. 1B/);
  });
});

describe("designBuffer: titrate with a strong acid or base stock", () => {
  it("Tris base to pH 8.0 takes HCl, and says HCl is corrosive", () => {
    const r = designBuffer({
      buffer: "tris",
      pH: 8,
      totalConcentrationMolar: 0.05,
      volumeMl: 500,
      method: "titrate",
    });
    const titrant = r.components.find((c) => c.role === "titrant")!;
    expect(titrant.formula).toBe("HCl");
    // ≈ the TrisH+ fraction at pH 8 (pKa 8.07 with activity correction) × 0.025 mol: between 40 % and 60 %
    expect(titrant.amountMol / 0.025).toBeGreaterThan(0.4);
    expect(titrant.amountMol / 0.025).toBeLessThan(0.6);
    expect(titrant.volumeMl).toBeCloseTo(titrant.amountMol * 1000, 9);
    expect(r.cautions.join(" ")).toMatch(/Hydrochloric acid is corrosive/);
    expect(r.procedure.join(" ")).toMatch(/mL of 1 mol\/L HCl/);
  });

  it("HEPES free acid to pH 7.4 at 37 °C takes NaOH, with the sodium hydroxide caution", () => {
    const r = designBuffer({
      buffer: "hepes",
      pH: 7.4,
      totalConcentrationMolar: 0.02,
      volumeMl: 100,
      method: "titrate",
      temperatureC: 37,
    });
    expect(r.components[1].formula).toBe("NaOH");
    expect(r.pH).toBeCloseTo(7.4, 6);
    expect(r.cautions.join(" ")).toMatch(/Sodium hydroxide is corrosive/);
  });

  it("Tris pKa falls by about 0.025–0.031 per K over 25–37 °C (common practice: −0.028/K near 25 °C)", () => {
    const at = (t: number) =>
      designBuffer({
        buffer: "tris",
        pH: 7.5,
        totalConcentrationMolar: 0.05,
        volumeMl: 100,
        temperatureC: t,
      }).systems[0].pKa[0];
    const slope = (at(37) - at(25)) / 12;
    expect(slope).toBeLessThan(-0.025);
    expect(slope).toBeGreaterThan(-0.031);
  });

  it("a stock too dilute for the volume is refused, naming the field", () => {
    expect(() =>
      designBuffer({
        buffer: "tris",
        pH: 7.2,
        totalConcentrationMolar: 0.5,
        volumeMl: 100,
        method: "titrate",
        titrant: { formula: "HCl", concentrationMolar: 0.1 },
      }),
    ).toThrowError(expect.objectContaining({ field: "titrant.concentrationMolar" }));
  });
});

describe("designBuffer: ionic strength top-up", () => {
  it("adds NaCl to reach I = 0.15 mol/L and the result is at that I and at the target pH", () => {
    const r = designBuffer({
      buffer: "mops",
      pH: 7.2,
      totalConcentrationMolar: 0.02,
      volumeMl: 1000,
      targetIonicStrengthMolar: 0.15,
    });
    const salt = r.components.find((c) => c.role === "salt")!;
    expect(salt.formula).toBe("NaCl");
    expect(salt.massG).toBeGreaterThan(0);
    expect(r.ionicStrength.molar).toBeCloseTo(0.15, 6);
    expect(r.pH).toBeCloseTo(7.2, 6);
  });

  it("added salt raises the Na2HPO4 needed for the same pH: higher I lowers the apparent pKa′ (pKa + log γ(HPO4²⁻)/γ(H2PO4⁻))", () => {
    const plain = designBuffer({
      buffer: "phosphate",
      pH: 7.0,
      totalConcentrationMolar: 0.02,
      volumeMl: 100,
    });
    const salty = designBuffer({
      buffer: "phosphate",
      pH: 7.0,
      totalConcentrationMolar: 0.02,
      volumeMl: 100,
      targetIonicStrengthMolar: 0.3,
    });
    expect(salty.components[1].amountMol).toBeGreaterThan(plain.components[1].amountMol);
  });
});

describe("designBuffer: errors", () => {
  const base = { buffer: "phosphate" as const, pH: 7, totalConcentrationMolar: 0.1, volumeMl: 100 };
  it.each([
    [{ ...base, buffer: "glycine" as never }, "buffer"],
    [{ ...base, pH: 15 }, "pH"],
    [{ ...base, totalConcentrationMolar: -0.1 }, "totalConcentrationMolar"],
    [{ ...base, volumeMl: 0 }, "volumeMl"],
    [{ ...base, reagents: ["CH3COONa", "Na2HPO4"] }, "reagents[0]"],
    [{ ...base, buffer: "carbonate" as const, pH: 7 }, "pH"],
    [{ ...base, buffer: "borate" as const, pH: 9.5 }, "pH"], // boric acid + borax give at most 50 % borate
  ])("refuses %o on field %s", (input, field) => {
    expect(() => designBuffer(input)).toThrowError(
      expect.objectContaining({ name: "ChemInputError", field }),
    );
  });
});

describe("designBuffer: sweep over every buffer, method and pH (no NaN, only typed errors)", () => {
  const buffers = [
    "phosphate",
    "acetate",
    "citrate",
    "carbonate",
    "borate",
    "tris",
    "hepes",
    "mes",
    "mops",
  ] as const;
  it("every result is finite and re-speciates to its target, or is a ChemInputError", () => {
    let designed = 0;
    for (const buffer of buffers)
      for (const method of ["two-forms", "titrate"] as const)
        for (let pH = 2; pH <= 12; pH += 1)
          for (const temperatureC of [4, 25, 37]) {
            try {
              const r = designBuffer({
                buffer,
                pH,
                totalConcentrationMolar: 0.05,
                volumeMl: 250,
                method,
                temperatureC,
                targetIonicStrengthMolar: 0.2,
              });
              for (const n of numbersIn(r))
                expect(Number.isFinite(n), `${buffer} ${method} pH ${pH}`).toBe(true);
              expect(Math.abs(r.pH - pH)).toBeLessThan(1e-6);
              designed++;
            } catch (e) {
              expect(e).toMatchObject({ name: "ChemInputError" });
            }
          }
    expect(designed).toBeGreaterThan(100);
  });
});
