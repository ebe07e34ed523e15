// @vitest-environment node
import { describe, expect, it } from "vitest";
import {
  ChemInputError,
  electrolyteConductivity,
  limitingIonicConductivity,
  onsagerCoefficients,
  waterViscosityMPaS,
} from "@/lib/chem";
import { readFixture } from "../../support/read-reference";

const lambdas = readFixture("ionic-conductivity.csv");
const standards = readFixture("conductivity-standards.csv");
const viscosities = readFixture("water-viscosity.csv");
const kcl = (c: number) => [
  { formula: "K+", concentrationMolPerL: c },
  { formula: "Cl-", concentrationMolPerL: c },
];

describe("limiting ionic conductivities (CRC Handbook, Vanýsek, 25 °C)", () => {
  const at25 = lambdas.filter((r) => r.temperature_C === "25");
  it("has the confirmed rows", () => expect(at25.length).toBeGreaterThanOrEqual(10));
  it.each(at25.map((r) => [r.ion, Number(r.value)] as const))(
    "%s: %f S cm² mol⁻¹ (CRC, Vanýsek)",
    (ion, value) => {
      expect(limitingIonicConductivity(ion).lambdaSCm2PerMolPerCharge).toBeCloseTo(value, 6);
    },
  );

  it("Nernst–Einstein D of K+ is the CRC table's 1.957 ×10⁻⁵ cm²/s", () => {
    expect(limitingIonicConductivity("K+").diffusionCoefficientCm2PerS).toBeCloseTo(1.957e-5, 8);
  });

  // The KCl temperature law against Lange's Handbook Table 8.32 (confirmed, jumbled copy).
  it.each(
    lambdas
      .filter((r) => r.temperature_C === "18" && r.ion !== "H+")
      .map((r) => [r.ion, Number(r.value)] as const),
  )("%s at 18 °C within 2 % of Lange's Table 8.32 (%f)", (ion, value) => {
    expect(
      Math.abs(limitingIonicConductivity(ion, 18).lambdaSCm2PerMolPerCharge / value - 1),
    ).toBeLessThan(0.02);
  });

  it("H+ away from 25 °C is flagged (proton hopping); Lange's 18 °C value is within 5 %", () => {
    const h = limitingIonicConductivity("H+", 18);
    expect(h.notes.join(" ")).toMatch(/proton hopping/);
    expect(Math.abs(h.lambdaSCm2PerMolPerCharge / 315.8 - 1)).toBeLessThan(0.05);
  });

  it("rejects neutral species, unknown ions and bad temperatures with ChemInputError", () => {
    expect(() => limitingIonicConductivity("KCl")).toThrow(ChemInputError);
    expect(() => limitingIonicConductivity("Xe+")).toThrow(/No limiting ionic conductivity/);
    expect(() => limitingIonicConductivity("K+", 120)).toThrow(ChemInputError);
  });
});

describe("viscosity of water (CRC correlations)", () => {
  it.each(viscosities.map((r) => [Number(r.temperature_C), Number(r.value_mPa_s)] as const))(
    "%i °C: %f mPa·s within 0.4 % (CRC 'Viscosity of Water', from memory)",
    (t, value) => expect(Math.abs(waterViscosityMPaS(t) / value - 1)).toBeLessThan(0.004),
  );
});

describe("electrolyte conductivity (extended Onsager, Robinson & Stokes 1959)", () => {
  it("Onsager coefficients at 25 °C: A ≈ 60.20, B ≈ 0.2289 (Robinson & Stokes, from memory; εr differs by 0.2 %)", () => {
    const { a, b } = onsagerCoefficients(25);
    expect(Math.abs(a / 60.2 - 1)).toBeLessThan(0.005);
    expect(Math.abs(b / 0.2289 - 1)).toBeLessThan(0.01);
  });

  const row = (molality: string, t = "25") =>
    standards.find((r) => r.molality_mol_per_kg === molality && r.temperature_C === t)!;

  it("0.01 mol/kg KCl at 25 °C: 1408.23 µS/cm within 0.3 % (NIST, Wu, Koch & Pratt 1991)", () => {
    const r = row("0.01");
    const k = electrolyteConductivity({ ions: kcl(Number(r.molarity_mol_per_L)) });
    expect(Math.abs((k.conductivityMSPerCm * 1000) / Number(r.value) - 1)).toBeLessThan(0.003);
    expect(k.validity.inRange).toBe(true);
  });

  it("0.01 mol/L KCl at 25 °C: 1413 µS/cm within 0.3 % (EPA Method 120.1)", () => {
    const epa = standards.find((r) => r.original_source.startsWith("US EPA"))!;
    const k = electrolyteConductivity({ ions: kcl(0.01) });
    expect(Math.abs((k.conductivityMSPerCm * 1000) / Number(epa.value) - 1)).toBeLessThan(0.003);
  });

  it("0.1 mol/kg KCl: 12 824.6 µS/cm within 2 %, at the edge of the form's range (NIST)", () => {
    const r = row("0.1");
    const k = electrolyteConductivity({ ions: kcl(Number(r.molarity_mol_per_L)) });
    expect(Math.abs((k.conductivityMSPerCm * 1000) / Number(r.value) - 1)).toBeLessThan(0.02);
  });

  it("1.0 mol/kg KCl is outside the range: flagged, and reads low (NIST 108 620 µS/cm)", () => {
    const r = row("1.0");
    const k = electrolyteConductivity({ ions: kcl(Number(r.molarity_mol_per_L)) });
    expect(k.validity.inRange).toBe(false);
    expect(k.validity.messages.join(" ")).toMatch(/above 0.1 mol\/L/);
    expect(k.conductivityMSPerCm * 1000).toBeLessThan(Number(r.value));
    expect(k.conductivityMSPerCm * 1000).toBeGreaterThan(0.85 * Number(r.value));
  });

  // The temperature law is the 0.01 mol/kg KCl standard's own ratio, so this is a
  // self-consistency check of the wiring (within the concentration term's small drift).
  it.each(["0", "18", "50"])(
    "0.01 mol/kg KCl at %s °C within 1 % of NIST (self-consistency)",
    (t) => {
      const r = row("0.01", t);
      const k = electrolyteConductivity({
        ions: kcl(Number(r.molarity_mol_per_L)),
        temperatureC: Number(t),
      });
      expect(Math.abs((k.conductivityMSPerCm * 1000) / Number(r.value) - 1)).toBeLessThan(0.01);
    },
  );

  it("multivalent ions and non-neutral inputs are marked as estimates", () => {
    const k2so4 = electrolyteConductivity({
      ions: [
        { formula: "K+", concentrationMolPerL: 0.02 },
        { formula: "SO4^2-", concentrationMolPerL: 0.01 },
      ],
    });
    expect(k2so4.validity.messages.join(" ")).toMatch(/multivalent/);
    const unbalanced = electrolyteConductivity({
      ions: [{ formula: "K+", concentrationMolPerL: 0.01 }],
    });
    expect(unbalanced.validity.messages.join(" ")).toMatch(/not electrically neutral/);
  });

  it("limiting conductivity is Kohlrausch's sum: 0.001 M KCl Λ° = 149.79 S cm²/mol (CRC λ°)", () => {
    const k = electrolyteConductivity({ ions: kcl(0.001) });
    expect((k.limitingConductivitySPerM * 10) / 0.001).toBeCloseTo(149.79, 6);
  });

  it("bad input is a ChemInputError", () => {
    expect(() => electrolyteConductivity({ ions: [] })).toThrow(ChemInputError);
    expect(() =>
      electrolyteConductivity({ ions: [{ formula: "K+", concentrationMolPerL: -1 }] }),
    ).toThrow(ChemInputError);
  });
});
