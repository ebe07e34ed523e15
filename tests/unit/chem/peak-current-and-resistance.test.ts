// @vitest-environment node
import { describe, expect, it } from "vitest";
import {
  ChemInputError,
  diffusionCoefficient,
  electrolyteConductivity,
  expectedPeakCurrent,
  iRDrop,
  judgeVoltammogram,
  listRedoxProbes,
  randlesSevcikPeakCurrent,
  reversiblePeakSeparationV,
  uncompensatedResistanceDisk,
  waterViscosityMPaS,
} from "@/lib/chem";
import { readFixture } from "../../support/read-reference";

const diffusion = readFixture("diffusion-coefficients.csv");

describe("Randles–Ševčík (Bard & Faulkner 2001, eqs. 6.2.18–6.2.19)", () => {
  const example = {
    electrons: 1,
    electrodeAreaCm2: 0.1,
    concentrationMolPerL: 1e-3,
    diffusionCoefficientCm2PerS: 1e-5,
    scanRateVPerS: 0.1,
  };

  it("matches the 25 °C form ip = 2.69×10⁵ n^{3/2} A D^½ C v^½ within 0.3 % (the constant is rounded): 26.9 µA", () => {
    const book = 2.69e5 * 0.1 * Math.sqrt(1e-5) * 1e-6 * Math.sqrt(0.1);
    expect(book * 1e6).toBeCloseTo(26.9, 1);
    expect(Math.abs(randlesSevcikPeakCurrent(example) / book - 1)).toBeLessThan(0.003);
  });

  it("n^{3/2}, √v, √D and 1/√T dependence", () => {
    const base = randlesSevcikPeakCurrent(example);
    expect(randlesSevcikPeakCurrent({ ...example, electrons: 2 }) / base).toBeCloseTo(2 ** 1.5, 10);
    expect(randlesSevcikPeakCurrent({ ...example, scanRateVPerS: 0.4 }) / base).toBeCloseTo(2, 10);
    expect(randlesSevcikPeakCurrent({ ...example, temperatureC: 50 }) / base).toBeCloseTo(
      Math.sqrt(298.15 / 323.15),
      10,
    );
  });

  it("reversible ΔEp 2.218 RT/nF: 57.0 mV at 25 °C for n = 1, 28.5 mV for n = 2 (B&F §6.2.1)", () => {
    expect(reversiblePeakSeparationV(1, 25) * 1000).toBeCloseTo(57.0, 1);
    expect(reversiblePeakSeparationV(2, 25) * 1000).toBeCloseTo(28.5, 1);
  });

  it("rejects non-positive inputs with ChemInputError", () => {
    expect(() => randlesSevcikPeakCurrent({ ...example, scanRateVPerS: 0 })).toThrow(
      ChemInputError,
    );
    expect(() => randlesSevcikPeakCurrent({ ...example, electrodeAreaCm2: Number.NaN })).toThrow(
      ChemInputError,
    );
  });
});

describe("redox probes' diffusion coefficients", () => {
  it.each([
    ["ferricyanide/ferrocyanide", "oxidized", "Fe(CN)6^3-"],
    ["ferricyanide/ferrocyanide", "reduced", "Fe(CN)6^4-"],
    ["hexaammineruthenium", "oxidized", "Ru(NH3)6^3+"],
    ["ferrocenemethanol", "reduced", "ferrocenemethanol"],
    ["ferrocene-acetonitrile", "reduced", "ferrocene"],
  ] as const)(
    "%s (%s) at 25 °C is the value in diffusion-coefficients.csv (memory rows)",
    (probe, form, species) => {
      const row = diffusion.find(
        (r) =>
          r.species === species &&
          r.temperature_C === "25" &&
          r.medium !== "infinite dilution in water",
      )!;
      expect(diffusionCoefficient(probe, form).diffusionCoefficientCm2PerS).toBe(
        Number(row.value_cm2_per_s),
      );
    },
  );

  it("ferricyanide in KCl is slower than at infinite dilution (CRC 8.96 ×10⁻⁶ cm²/s)", () => {
    const crc = Number(
      diffusion.find(
        (r) => r.species === "Fe(CN)6^3-" && r.medium === "infinite dilution in water",
      )!.value_cm2_per_s,
    );
    const d = diffusionCoefficient(
      "ferricyanide/ferrocyanide",
      "oxidized",
    ).diffusionCoefficientCm2PerS;
    expect(d).toBeLessThan(crc);
    expect(d).toBeGreaterThan(0.7 * crc);
  });

  it("aqueous probes follow Stokes–Einstein with water's viscosity, and say so", () => {
    const d37 = diffusionCoefficient("ferrocenemethanol", "reduced", 37);
    expect(d37.diffusionCoefficientCm2PerS / 7.8e-6).toBeCloseTo(
      (310.15 / 298.15) * (waterViscosityMPaS(25) / waterViscosityMPaS(37)),
      10,
    );
    expect(d37.notes.join(" ")).toMatch(/Stokes–Einstein/);
  });

  it("ferrocene in acetonitrile follows the published activation energy 7.1 kJ/mol (Wang, Rogers & Compton 2010)", () => {
    const ratio =
      diffusionCoefficient("ferrocene-acetonitrile", "reduced", 35).diffusionCoefficientCm2PerS /
      2.4e-5;
    expect(ratio).toBeCloseTo(Math.exp((-7100 / 8.314462618) * (1 / 308.15 - 1 / 298.15)), 6);
    expect(() => diffusionCoefficient("ferrocene-acetonitrile", "reduced", 80)).toThrow(
      ChemInputError,
    );
  });

  it("every probe names its source; unknown probes and missing forms are ChemInputErrors", () => {
    for (const p of listRedoxProbes()) expect(p.source.length).toBeGreaterThan(10);
    expect(() => diffusionCoefficient("unobtainium", "oxidized")).toThrow(ChemInputError);
    expect(() => diffusionCoefficient("ferrocenemethanol", "oxidized")).toThrow(
      /No diffusion coefficient/,
    );
  });

  it("expected peak current for 1 mM ferricyanide at a 3 mm disk, 100 mV/s", () => {
    const r = expectedPeakCurrent({
      probe: "ferricyanide/ferrocyanide",
      formInSolution: "oxidized",
      electrodeAreaCm2: Math.PI * 0.15 ** 2,
      concentrationMolPerL: 1e-3,
      scanRateVPerS: 0.1,
    });
    expect(r.forwardPeak).toBe("cathodic");
    expect(r.peakCurrentA).toBeCloseTo(
      randlesSevcikPeakCurrent({
        electrodeAreaCm2: Math.PI * 0.15 ** 2,
        concentrationMolPerL: 1e-3,
        diffusionCoefficientCm2PerS: 7.2e-6,
        scanRateVPerS: 0.1,
      }),
      15,
    );
    expect(r.peakCurrentA * 1e6).toBeGreaterThan(15);
    expect(r.peakCurrentA * 1e6).toBeLessThan(17);
    expect(r.notes.join(" ")).toMatch(/radial diffusion/);
  });
});

describe("uncompensated resistance of a disk (Newman 1966) and iR drop", () => {
  it("R_u = 1/(4κr): a 1.5 mm disk in 0.1 M KCl (κ ≈ 1.28 S/m) sees about 130 Ω (formula evaluated)", () => {
    const kappa = electrolyteConductivity({
      ions: [
        { formula: "K+", concentrationMolPerL: 0.1 },
        { formula: "Cl-", concentrationMolPerL: 0.1 },
      ],
    }).conductivitySPerM;
    const r = uncompensatedResistanceDisk({ radiusM: 1.5e-3, conductivitySPerM: kappa });
    expect(r).toBeCloseTo(1 / (4 * kappa * 1.5e-3), 12);
    expect(r).toBeGreaterThan(125);
    expect(r).toBeLessThan(135);
    expect(
      uncompensatedResistanceDisk({ radiusM: 0.75e-3, conductivitySPerM: kappa }) / r,
    ).toBeCloseTo(2, 12);
  });

  it("iR drop keeps the sign of the current", () => {
    expect(iRDrop({ currentA: -1e-4, resistanceOhm: 130 })).toBeCloseTo(-0.013, 12);
    expect(() => iRDrop({ currentA: 1e-4, resistanceOhm: -1 })).toThrow(ChemInputError);
    expect(() => uncompensatedResistanceDisk({ radiusM: 0, conductivitySPerM: 1 })).toThrow(
      ChemInputError,
    );
  });
});

describe("voltammogram verdict in plain words (common practice after B&F §6.2–6.5)", () => {
  it("ΔEp 72 mV: quasi-reversible or uncompensated resistance", () => {
    expect(judgeVoltammogram({ measured: { deltaEpV: 0.072 } }).verdict).toBe(
      "ΔEp 72 mV: quasi-reversible or uncompensated resistance.",
    );
  });

  it("ΔEp 59 mV for one electron is reversible; 30 mV for two electrons too", () => {
    expect(judgeVoltammogram({ measured: { deltaEpV: 0.059 } }).verdict).toMatch(
      /^ΔEp 59 mV: reversible/,
    );
    expect(judgeVoltammogram({ measured: { deltaEpV: 0.03 }, electrons: 2 }).verdict).toMatch(
      /reversible \(Nernstian\)/,
    );
  });

  it("small and large ΔEp, and a missing peak", () => {
    expect(judgeVoltammogram({ measured: { deltaEpV: 0.02 } }).verdict).toMatch(
      /adsorbed or thin-layer/,
    );
    expect(judgeVoltammogram({ measured: { deltaEpV: 0.35 } }).verdict).toMatch(/irreversible/);
    expect(judgeVoltammogram({ measured: { deltaEpV: null } }).verdict).toMatch(
      /one of the peaks is missing/,
    );
  });

  it("explains ΔEp by the iR drop when Ru is known: 2 ip Ru", () => {
    const r = judgeVoltammogram({
      measured: { deltaEpV: 0.072, anodicPeakCurrentA: 25e-6, cathodicPeakCurrentA: -25e-6 },
      uncompensatedResistanceOhm: 260,
    });
    expect(r.iRContributionV).toBeCloseTo(0.013, 12);
    expect(r.notes[0]).toMatch(/without it the couple looks reversible/);
  });

  it("peak ratio and measured against expected current", () => {
    const ok = judgeVoltammogram({
      measured: { deltaEpV: 0.06, anodicPeakCurrentA: 16e-6, cathodicPeakCurrentA: -15.5e-6 },
      expected: { peakCurrentA: 15.8e-6, forwardPeak: "cathodic" },
    });
    expect(ok.notes.join(" ")).toMatch(/chemically reversible/);
    expect(ok.notes.join(" ")).toMatch(/as expected/);
    expect(ok.measuredToExpectedPeakCurrent).toBeCloseTo(15.5 / 15.8, 10);
    const low = judgeVoltammogram({
      measured: { anodicPeakCurrentA: 8e-6, cathodicPeakCurrentA: -4e-6 },
      expected: { peakCurrentA: 15.8e-6 },
    });
    expect(low.notes.join(" ")).toMatch(/following the electron transfer/);
    expect(low.notes.join(" ")).toMatch(/below Randles–Ševčík/);
  });
});
