/**
 * Seawater-like mixture (S = 35; Millero et al. 2008 reference composition, rounded, from memory):
 * Ionleaf combines May et al. (2011) binaries with Harvie, Møller & Weare (1984) θ/ψ. This
 * bounds what that mixing of sets costs against HMW84's own consistent set, and checks the
 * mixture behaves as a Pitzer mixture should.
 */
import { describe, expect, it } from "vitest";
import { assemblePitzerSystem, computePitzer, pitzerMixture } from "@/lib/chem/models/pitzer";
import { HMW_1984_BINARY } from "@/lib/chem/models/pitzer/data/binary-hmw-1984";

const A_PHI_25C = 0.3915; // Pitzer (1991) Ch. 3 Table 1
const SEAWATER = [
  { formula: "Na+", charge: 1, molality: 0.4861 },
  { formula: "K+", charge: 1, molality: 0.0106 },
  { formula: "Mg^2+", charge: 2, molality: 0.0547 },
  { formula: "Ca^2+", charge: 2, molality: 0.0107 },
  { formula: "Cl-", charge: -1, molality: 0.5657 },
  { formula: "SO4^2-", charge: -2, molality: 0.0293 },
];
const I = 0.5 * SEAWATER.reduce((a, i) => a + i.molality * i.charge ** 2, 0);

describe("Pitzer in a seawater-like mixture", () => {
  it("May 2011 binaries with HMW84 mixing terms stay within 4 % of the all-HMW84 set for every ion", () => {
    const a = assemblePitzerSystem(SEAWATER, 25, I);
    const cations = ["Na+", "K+", "Mg^2+", "Ca^2+"];
    const anions = ["Cl-", "SO4^2-"];
    const hmw = {
      ...a.system,
      binary: cations.map((c) =>
        anions.map((x) => HMW_1984_BINARY.find((r) => r.cation === c && r.anion === x)!),
      ),
    };
    const mixed = pitzerMixture(a.system, A_PHI_25C);
    const pure = pitzerMixture(hmw, A_PHI_25C);
    const ln1 = [...mixed.lnGammaCations, ...mixed.lnGammaAnions];
    const ln2 = [...pure.lnGammaCations, ...pure.lnGammaAnions];
    ln1.forEach((v, i) =>
      expect(Math.abs(Math.exp(v - ln2[i]) - 1), `ion ${i}`).toBeLessThan(0.04),
    );
    expect(Math.abs(mixed.osmoticCoefficient - pure.osmoticCoefficient)).toBeLessThan(0.005);
  });

  it("is fully parameterised and in range at 25 °C: no validity messages, finite output", () => {
    const out = computePitzer({
      ions: SEAWATER,
      ionicStrengthMolal: I,
      temperatureC: 25,
      solvent: "water",
      constants: { temperatureK: 298.15, aLog10: 0.51, bPerAngstrom: 0.3287, aPhi: A_PHI_25C },
    });
    expect(out.validityMessages).toEqual([]);
    expect(out.lnGamma.every(Number.isFinite)).toBe(true);
    // divalent ions are far more non-ideal than monovalent ones at I ≈ 0.7 (common practice)
    expect(Math.exp(out.lnGamma[2])).toBeLessThan(Math.exp(out.lnGamma[0]) / 2);
  });

  it("the θ/ψ mixing terms are used: removing them moves ln γ(Mg2+) by more than 0.01", () => {
    const a = assemblePitzerSystem(SEAWATER, 25, I);
    const withE = pitzerMixture(a.system, A_PHI_25C).lnGammaCations[2];
    const noMixing = pitzerMixture(
      {
        ...a.system,
        thetaCations: a.system.thetaCations.map((r) => r.map(() => 0)),
        thetaAnions: a.system.thetaAnions.map((r) => r.map(() => 0)),
        psiCations: a.system.psiCations.map((r) => r.map((x) => x.map(() => 0))),
        psiAnions: a.system.psiAnions.map((r) => r.map((x) => x.map(() => 0))),
      },
      A_PHI_25C,
    ).lnGammaCations[2];
    expect(Math.abs(withE - noMixing)).toBeGreaterThan(0.01);
  });
});
