/**
 * SIT (NEA-TDB form) against tabulated γ± (CRC Handbook 92nd ed.; Robinson & Stokes 1959) to
 * I = 3.5 mol/kg, the range NEA-TDB quote. SIT with one ε per salt is good to a few per cent
 * there (the NEA quote ε to ±0.01–0.02 kg/mol, i.e. ±2–5 % in γ± at 1–2 mol/kg); the test
 * states the tolerance per salt as measured. Ionleaf's stated SIT range is narrower (where it
 * stays within 2 %, sit-model.ts): points between the two carry a validity message.
 */
import { describe, expect, it } from "vitest";
import { computeSit, sitCoverage } from "@/lib/chem/models/sit";
import { GAMMA_REFERENCE } from "../../fixtures/reference/pitzer-gamma-reference";

// A (log10) = 0.5100 at 25 °C from Aφ = 0.3915 (Pitzer 1991; reference worked_examples.md §4).
const C25 = { temperatureK: 298.15, aLog10: 0.51, bPerAngstrom: 0.3287, aPhi: 0.3915 };

const SALTS: Record<
  string,
  { cation: string; zc: number; anion: string; za: number; tolerancePercent: number }
> = {
  HCl: { cation: "H+", zc: 1, anion: "Cl-", za: -1, tolerancePercent: 2 },
  LiCl: { cation: "Li+", zc: 1, anion: "Cl-", za: -1, tolerancePercent: 2 },
  NaCl: { cation: "Na+", zc: 1, anion: "Cl-", za: -1, tolerancePercent: 2.5 },
  KCl: { cation: "K+", zc: 1, anion: "Cl-", za: -1, tolerancePercent: 4 },
  // Measured misses, kept visible: one ε cannot follow KNO3 and Na2SO4, whose γ± fall fast with m
  // (NEA-TDB quote ε(K+,NO3−) = −0.11 ± 0.04 and ε(Na+,SO4²−) = −0.12 ± 0.06 for that reason).
  KNO3: { cation: "K+", zc: 1, anion: "NO3-", za: -1, tolerancePercent: 10 },
  MgCl2: { cation: "Mg^2+", zc: 2, anion: "Cl-", za: -1, tolerancePercent: 2.5 },
  CaCl2: { cation: "Ca^2+", zc: 2, anion: "Cl-", za: -1, tolerancePercent: 2 },
  Na2SO4: { cation: "Na+", zc: 1, anion: "SO4^2-", za: -2, tolerancePercent: 14 },
};

function sitMeanGamma(salt: string, m: number) {
  const s = SALTS[salt];
  const nuC = Math.abs(s.za);
  const nuA = s.zc;
  const g = nuC === 2 && nuA === 2 ? 2 : 1;
  const mc = (nuC / g) * m;
  const ma = (nuA / g) * m;
  const I = 0.5 * (mc * s.zc ** 2 + ma * s.za ** 2);
  const out = computeSit({
    ions: [
      { formula: s.cation, charge: s.zc, molality: mc },
      { formula: s.anion, charge: s.za, molality: ma },
    ],
    ionicStrengthMolal: I,
    temperatureC: 25,
    solvent: "water",
    constants: C25,
  });
  const lnMean = ((nuC / g) * out.lnGamma[0] + (nuA / g) * out.lnGamma[1]) / ((nuC + nuA) / g);
  return { gamma: Math.exp(lnMean), I, out };
}

describe("SIT γ± at 25 °C against published tables, I ≤ 3.5 mol/kg", () => {
  const summary: Record<string, { points: number; worstPercent: number }> = {};
  for (const salt of Object.keys(SALTS)) {
    it(`${salt} within ${SALTS[salt].tolerancePercent} %`, () => {
      let worst = 0;
      let points = 0;
      for (const row of GAMMA_REFERENCE.filter((r) => r.salt === salt && r.temperatureC === 25)) {
        const { gamma, I, out } = sitMeanGamma(salt, row.molality);
        if (I > 3.5) {
          expect(out.validityMessages.join(" ")).toMatch(/SIT is stated up to/);
          continue;
        }
        const dev = (100 * (gamma - row.gammaPm)) / row.gammaPm;
        expect(Math.abs(dev), `${salt} ${row.molality} mol/kg (${row.source})`).toBeLessThanOrEqual(
          SALTS[salt].tolerancePercent,
        );
        if (Math.abs(dev) > Math.abs(worst)) worst = dev;
        points++;
      }
      expect(points).toBeGreaterThan(0);
      summary[salt] = { points, worstPercent: Number(worst.toFixed(2)) };
    });
  }
  it("checked every salt against its table (and prints the per-salt deviations)", () => {
    console.table(summary);
    expect(Object.keys(summary).length).toBe(Object.keys(SALTS).length);
  });
});

describe("SIT internals", () => {
  it("D = A√I/(1 + 1.5√I): log10 γ(Na+) in 0.1 mol/kg NaCl is −0.1092 + 0.03×0.1 (ε(Na+,Cl−) = 0.03, NEA-TDB)", () => {
    const out = computeSit({
      ions: [
        { formula: "Na+", charge: 1, molality: 0.1 },
        { formula: "Cl-", charge: -1, molality: 0.1 },
      ],
      ionicStrengthMolal: 0.1,
      temperatureC: 25,
      solvent: "water",
      constants: C25,
    });
    const D = (0.51 * Math.sqrt(0.1)) / (1 + 1.5 * Math.sqrt(0.1));
    expect(out.lnGamma[0] / Math.LN10).toBeCloseTo(-D + 0.003, 10);
  });

  it("φ is consistent with γ (Gibbs–Duhem, Σ m d ln γ = d[(φ−1)Σm]) in a Na–Mg–Cl–NO3 mixture", () => {
    const ions = (s: number) => [
      { formula: "Na+", charge: 1, molality: 0.5 * s },
      { formula: "Mg^2+", charge: 2, molality: 0.2 * s },
      { formula: "Cl-", charge: -1, molality: 0.6 * s },
      { formula: "NO3-", charge: -1, molality: 0.3 * s },
    ];
    const run = (s: number) => {
      const list = ions(s);
      const I = 0.5 * list.reduce((a, i) => a + i.molality * i.charge ** 2, 0);
      return {
        list,
        out: computeSit({
          ions: list,
          ionicStrengthMolal: I,
          temperatureC: 25,
          solvent: "water",
          constants: C25,
        }),
      };
    };
    const h = 1e-5;
    const lo = run(1 - h);
    const hi = run(1 + h);
    const mid = run(1);
    const sumM = mid.list.reduce((a, i) => a + i.molality, 0);
    const lhs = mid.list.reduce(
      (a, ion, k) => a + ion.molality * (hi.out.lnGamma[k] - lo.out.lnGamma[k]),
      0,
    );
    const rhs =
      (hi.out.osmoticCoefficient! - 1) * sumM * (1 + h) -
      (lo.out.osmoticCoefficient! - 1) * sumM * (1 - h);
    expect(Math.abs(lhs - rhs)).toBeLessThan(1e-7);
  });

  it("outside 20–30 °C and above Ionleaf's stated I the result says so", () => {
    const run = (t: number, m: number) =>
      computeSit({
        ions: [
          { formula: "Na+", charge: 1, molality: m },
          { formula: "Cl-", charge: -1, molality: m },
        ],
        ionicStrengthMolal: m,
        temperatureC: t,
        solvent: "water",
        constants: C25,
      }).validityMessages.join(" ");
    expect(run(25, 0.2)).toBe("");
    expect(run(70, 0.2)).toMatch(/SIT is stated for 20–30 °C/);
    expect(run(25, 1)).toMatch(/SIT is stated up to I = 0.2 mol\/kg for 1:1 electrolytes/);
  });

  it("coverage: NaCl is covered; Na+ with HEPES- is not, and says why", () => {
    expect(
      sitCoverage(
        [
          { formula: "Na+", charge: 1, molality: 0.1 },
          { formula: "Cl-", charge: -1, molality: 0.1 },
        ],
        25,
        0.1,
      ).covered,
    ).toBe(true);
    const c = sitCoverage(
      [
        { formula: "Na+", charge: 1, molality: 0.1 },
        { formula: "HEPES-", charge: -1, molality: 0.1 },
      ],
      25,
      0.1,
    );
    expect(c.covered).toBe(false);
    expect(c.reasons.join(" ")).toMatch(/HEPES/);
  });
});
