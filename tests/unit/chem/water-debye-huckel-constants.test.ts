// @vitest-environment node
import { describe, expect, it } from "vitest";
import {
  ChemInputError,
  debyeHuckelConstants,
  waterDensityGPerMl,
  waterRelativePermittivity,
} from "@/lib/chem";
import * as C from "@/lib/chem/constants";
import { readFixture, shortSource } from "../../support/read-reference";

const water = readFixture("water-properties.csv");
const bySource = (fragment: string) => water.filter((r) => r.original_source.includes(fragment));
const relative = (a: number, b: number) => Math.abs(a / b - 1);

describe("CODATA 2018 constants", () => {
  const constants = new Map(
    readFixture("constants.csv")
      .filter((r) => r.original_source.startsWith("CODATA 2018"))
      .map((r) => [r.symbol, Number(r.value)]),
  );
  it.each([
    ["e", C.ELEMENTARY_CHARGE_C],
    ["N_A", C.AVOGADRO_PER_MOL],
    ["k", C.BOLTZMANN_J_PER_K],
    ["epsilon_0", C.VACUUM_PERMITTIVITY_F_PER_M],
    ["F", C.FARADAY_C_PER_MOL],
    ["R", C.GAS_CONSTANT_J_PER_MOL_K],
  ])("%s matches CODATA 2018 (Tiesinga et al. 2021)", (symbol, value) => {
    expect(relative(value, constants.get(symbol)!)).toBeLessThan(1e-9);
  });
});

describe("water εr (Malmberg & Maryott 1956) and ρ (Kell 1975)", () => {
  const rows = water.filter((r) => r.relative_permittivity !== "");
  it.each(
    rows.map((r) => [
      Number(r.temperature_C),
      Number(r.relative_permittivity),
      Number(r.density_g_per_cm3),
    ]),
  )("%i °C: εr %f, ρ %f g/cm³ (correlations evaluated in water_properties.csv)", (t, eps, rho) => {
    expect(waterRelativePermittivity(t)).toBeCloseTo(eps, 2);
    expect(waterDensityGPerMl(t)).toBeCloseTo(rho, 5);
  });

  it("agrees with IAPWS-95 densities at 1 atm to 0.02 kg/m³ (IAPWS values from memory, correlations.md §2a)", () => {
    const iapws: [number, number][] = [
      [0, 999.84],
      [25, 997.05],
      [50, 988.03],
      [100, 958.35],
    ];
    for (const [t, rho] of iapws)
      expect(Math.abs(waterDensityGPerMl(t) * 1000 - rho)).toBeLessThan(0.02);
  });

  it("refuses temperatures outside 0–100 °C", () => {
    expect(() => waterRelativePermittivity(-5)).toThrow(ChemInputError);
    expect(() => waterDensityGPerMl(101)).toThrow(/outside the range/);
  });
});

describe("Debye–Hückel A and B of water from εr and ρ (general expression, CODATA 2018)", () => {
  // Robinson & Stokes (1959), Electrolyte Solutions, App. 7.1, concentration scale:
  // A_c = A_m / √ρ and B_c = B_m / √ρ (ρ in kg/dm³). Tolerance: 0.2 % (the bar).
  const rs = bySource("Robinson & Stokes (1959)");
  it("Robinson & Stokes table has 0–100 °C", () => expect(rs.length).toBeGreaterThanOrEqual(15));
  it.each(
    rs.map((r) => [
      Number(r.temperature_C),
      Number(r.A_gamma_log10),
      Number(r.B_gamma_per_angstrom),
      shortSource(r),
    ]),
  )("%i °C: A = %f, B = %f Å⁻¹ within 0.2 % (%s)", (t, a, b) => {
    const k = debyeHuckelConstants(t, "water");
    const sqrtRho = Math.sqrt(waterDensityGPerMl(t));
    expect(relative(k.aLog10 / sqrtRho, a)).toBeLessThan(0.002);
    expect(relative(k.bPerAngstrom / sqrtRho, b)).toBeLessThan(0.002);
  });

  it("Helgeson & Kirkham (1974) / EQ3/6 A and B at 25 °C within 0.2 %; 0.01–100 °C within 0.7 % (their εr differs)", () => {
    const hk = bySource("Helgeson & Kirkham");
    expect(hk.length).toBe(4);
    for (const r of hk) {
      const k = debyeHuckelConstants(Number(r.temperature_C), "water");
      const tolerance = Number(r.temperature_C) === 25 ? 0.002 : 0.007;
      expect(relative(k.aLog10, Number(r.A_gamma_log10))).toBeLessThan(tolerance);
      expect(relative(k.bPerAngstrom, Number(r.B_gamma_per_angstrom))).toBeLessThan(tolerance);
    }
  });

  it("Freeze & Cherry (1979) App. IV A and B within 0.8 % (older dielectric data, εr ≈ 78.5 at 25 °C)", () => {
    const fc = bySource("Freeze & Cherry");
    expect(fc.length).toBeGreaterThan(10);
    for (const r of fc) {
      const k = debyeHuckelConstants(Number(r.temperature_C), "water");
      expect(relative(k.aLog10, Number(r.A_gamma_log10))).toBeLessThan(0.008);
      expect(relative(k.bPerAngstrom, Number(r.B_gamma_per_angstrom))).toBeLessThan(0.008);
    }
  });

  it("Aφ: Pitzer (1991) 0.3915 at 25 °C within 0.2 %; Clegg, Rard & Pitzer (1994) 0–100 °C within 0.6 %", () => {
    expect(relative(debyeHuckelConstants(25).aPhi, 0.3915)).toBeLessThan(0.002);
    const crp = bySource("Clegg, Rard & Pitzer");
    expect(crp.length).toBe(15);
    for (const r of crp)
      expect(
        relative(debyeHuckelConstants(Number(r.temperature_C)).aPhi, Number(r.A_phi)),
      ).toBeLessThan(0.006);
  });

  it("A = 3 Aφ / ln 10 (definition)", () => {
    const k = debyeHuckelConstants(37);
    expect(k.aLog10).toBeCloseTo((3 * k.aPhi) / Math.LN10, 12);
  });

  it("other solvents: A scales as (εr T)^−3/2 √ρ — acetonitrile's A is larger than water's", () => {
    const w = debyeHuckelConstants(25, "water");
    const mecn = debyeHuckelConstants(25, "acetonitrile");
    const expected =
      w.aLog10 * (78.30334 / 35.94) ** 1.5 * Math.sqrt(0.7766 / waterDensityGPerMl(25));
    expect(mecn.aLog10).toBeCloseTo(expected, 3);
    expect(() => debyeHuckelConstants(100, "acetonitrile")).toThrow(/liquid range of acetonitrile/);
  });
});
