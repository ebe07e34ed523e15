// @vitest-environment node
import { describe, expect, it } from "vitest";
import {
  ChemInputError,
  junctionCorrectedPotential,
  limitingIonicConductivity,
  liquidJunctionPotential,
  nernstSlopeV,
  referenceFillingSolution,
} from "@/lib/chem";
import { readFixture } from "../../support/read-reference";

const published = readFixture("junction-potentials.csv");
const ions = (cation: string, anion: string, c: number) => [
  { formula: cation, concentrationMolPerL: c },
  { formula: anion, concentrationMolPerL: c },
];

describe("liquid junction potential, Henderson equation", () => {
  it("0.1 M HCl | 0.1 M KCl: within 1.5 mV of Bard & Faulkner's 26.78 mV (Table 2.3.2, from memory)", () => {
    const row = published.find((r) => r.junction === "0.1 M HCl | 0.1 M KCl")!;
    const r = liquidJunctionPotential({
      fillingSolution: ions("H+", "Cl-", 0.1),
      cellElectrolyte: ions("K+", "Cl-", 0.1),
    });
    expect(Math.abs(r.junctionPotentialV * 1000 - Number(row.value_mV))).toBeLessThan(1.5);
    // Both sides share Cl−; H+ diffuses into the KCl side faster than K+ comes back, so the
    // KCl side (the cell, β) is positive.
    expect(r.junctionPotentialV).toBeGreaterThan(0);
  });

  it("type 1 (0.1 | 0.01 M HCl) reduces to (t+ − t−)(RT/F) ln 10 with CRC λ° (self-consistency)", () => {
    const r = liquidJunctionPotential({
      fillingSolution: ions("H+", "Cl-", 0.1),
      cellElectrolyte: ions("H+", "Cl-", 0.01),
    });
    const h = limitingIonicConductivity("H+").lambdaSCm2PerMolPerCharge;
    const cl = limitingIonicConductivity("Cl-").lambdaSCm2PerMolPerCharge;
    expect(r.junctionPotentialV).toBeCloseTo(((h - cl) / (h + cl)) * nernstSlopeV(25), 12);
  });

  it("0.1 | 0.01 M HCl within 2 mV of 39 mV with measured transference numbers (B&F §2.3.4, from memory)", () => {
    const row = published.find((r) => r.junction === "0.1 M HCl | 0.01 M HCl")!;
    const r = liquidJunctionPotential({
      fillingSolution: ions("H+", "Cl-", 0.1),
      cellElectrolyte: ions("H+", "Cl-", 0.01),
    });
    expect(Math.abs(r.junctionPotentialV * 1000 - Number(row.value_mV))).toBeLessThan(2);
  });

  it("a concentrated KCl bridge keeps the junction to a few millivolts (the reason for salt bridges, B&F §2.3.5)", () => {
    const bridge = referenceFillingSolution("Ag/AgCl-satKCl")!;
    const r = liquidJunctionPotential({
      fillingSolution: bridge.ions,
      cellElectrolyte: ions("H+", "Cl-", 0.01),
    });
    expect(Math.abs(r.junctionPotentialV)).toBeLessThan(0.005);
    expect(r.uncertaintyV).toBeGreaterThanOrEqual(0.002);
    expect(r.uncertaintyNote).toMatch(/several millivolts/);
  });

  it("swapping the sides flips the sign; identical sides give zero", () => {
    const a = liquidJunctionPotential({
      fillingSolution: ions("H+", "Cl-", 0.1),
      cellElectrolyte: ions("K+", "Cl-", 0.1),
    });
    const b = liquidJunctionPotential({
      fillingSolution: ions("K+", "Cl-", 0.1),
      cellElectrolyte: ions("H+", "Cl-", 0.1),
    });
    expect(b.junctionPotentialV).toBeCloseTo(-a.junctionPotentialV, 12);
    const same = liquidJunctionPotential({
      fillingSolution: ions("K+", "Cl-", 0.1),
      cellElectrolyte: ions("K+", "Cl-", 0.1),
    });
    expect(same.junctionPotentialV).toBeCloseTo(0, 15);
  });

  it("removes the junction from a measured potential", () => {
    expect(junctionCorrectedPotential(0.25, 0.003)).toBeCloseTo(0.247, 12);
    expect(() => junctionCorrectedPotential(Number.NaN, 0)).toThrow(ChemInputError);
  });

  it("knows the filling solutions of the catalogue's reference electrodes", () => {
    expect(referenceFillingSolution("Ag/AgCl-3MKCl")!.ions).toEqual(ions("K+", "Cl-", 3));
    expect(referenceFillingSolution("SHE")).toBeNull();
  });

  it("bad input is a ChemInputError", () => {
    expect(() =>
      liquidJunctionPotential({ fillingSolution: [], cellElectrolyte: ions("K+", "Cl-", 0.1) }),
    ).toThrow(ChemInputError);
    expect(() =>
      liquidJunctionPotential({
        fillingSolution: [{ formula: "KCl", concentrationMolPerL: 1 }],
        cellElectrolyte: ions("K+", "Cl-", 0.1),
      }),
    ).toThrow(/no charge/);
  });
});
