/**
 * Checks of the Pitzer machinery that do not depend on one table: worked examples evaluated
 * from published parameters, the J(x) approximation against its defining integral, and the
 * Gibbs–Duhem relation that γ and φ of any correct implementation must satisfy in a mixture.
 */
import { describe, expect, it } from "vitest";
import { eTheta, jFunction, pitzerMixture } from "@/lib/chem/models/pitzer";
import type { PitzerBinaryTerms, PitzerSystem } from "@/lib/chem/models/pitzer/equations";

const A_PHI_25C = 0.3915; // Pitzer (1991) Ch. 3 Table 1

function single(p: PitzerBinaryTerms, zc: number, za: number, nuC: number, nuA: number, m: number) {
  const r = pitzerMixture(
    {
      cationCharges: [zc],
      anionCharges: [za],
      cationMolalities: [nuC * m],
      anionMolalities: [nuA * m],
      binary: [[p]],
      thetaCations: [[0]],
      thetaAnions: [[0]],
      psiCations: [[[0]]],
      psiAnions: [[[0]]],
    },
    A_PHI_25C,
  );
  const gamma = Math.exp((nuC * r.lnGammaCations[0] + nuA * r.lnGammaAnions[0]) / (nuC + nuA));
  return { gamma, phi: r.osmoticCoefficient };
}

describe("worked examples (reference worked_examples.md §9, evaluated from published parameters)", () => {
  it("NaCl with Pitzer & Mayorga (1973) parameters: γ±(1 m) 0.6555, φ 0.9359; γ±(6 m) 0.9879, φ 1.2732", () => {
    const nacl = { beta0: 0.0765, beta1: 0.2664, beta2: 0, alpha1: 2, alpha2: 12, cPhi: 0.00127 };
    const one = single(nacl, 1, -1, 1, 1, 1);
    const six = single(nacl, 1, -1, 1, 1, 6);
    expect(one.gamma).toBeCloseTo(0.6555, 3);
    expect(one.phi).toBeCloseTo(0.9359, 3);
    expect(six.gamma).toBeCloseTo(0.9879, 3);
    expect(six.phi).toBeCloseTo(1.2732, 3);
  });

  it("MgSO4 (2:2, β2 term) with Harvie, Møller & Weare (1984) parameters: γ±(0.1) 0.1660, γ±(1.0) 0.0547, φ(1.0) 0.528", () => {
    const mgso4 = {
      beta0: 0.221,
      beta1: 3.343,
      beta2: -37.23,
      alpha1: 1.4,
      alpha2: 12,
      cPhi: 0.025,
    };
    expect(single(mgso4, 2, -2, 1, 1, 0.1).gamma).toBeCloseTo(0.166, 3);
    const one = single(mgso4, 2, -2, 1, 1, 1);
    expect(one.gamma).toBeCloseTo(0.0547, 3);
    expect(one.phi).toBeCloseTo(0.528, 2);
  });

  it("pure water: ln γ = 0, φ = 1, ln a_w = 0 (no division by I = 0)", () => {
    const nacl = { beta0: 0.0765, beta1: 0.2664, beta2: 0, alpha1: 2, alpha2: 12, cPhi: 0.00127 };
    const r = single(nacl, 1, -1, 1, 1, 0);
    expect(r.gamma).toBe(1);
    expect(r.phi).toBe(1);
  });

  it("reduces to the Debye–Hückel limiting law at high dilution: ln γ± → −|z+z−| A_γ √I", () => {
    const nacl = { beta0: 0.0765, beta1: 0.2664, beta2: 0, alpha1: 2, alpha2: 12, cPhi: 0.00127 };
    const m = 1e-6;
    const limitingLn = -3 * A_PHI_25C * Math.sqrt(m); // A_γ(ln) = 3Aφ (Pitzer 1991); next terms are O(I)
    const lnGamma = Math.log(single(nacl, 1, -1, 1, 1, m).gamma);
    expect(Math.abs(lnGamma - limitingLn) / Math.abs(limitingLn)).toBeLessThan(0.002);
  });
});

/** J(x) by direct quadrature of Pitzer's (1975) defining integral (Simpson's rule). */
function jByQuadrature(x: number): number {
  const n = 40000;
  const yMax = 60;
  const h = yMax / n;
  const f = (y: number) => {
    if (y === 0) return 0;
    const q = -(x / y) * Math.exp(-y);
    return (1 + q + (q * q) / 2 - Math.exp(q)) * y * y;
  };
  let s = f(0) + f(yMax);
  for (let i = 1; i < n; i++) s += (i % 2 ? 4 : 2) * f(i * h);
  return (s * h) / 3 / x;
}

describe("J(x) of the unsymmetrical mixing terms", () => {
  it("Pitzer's (1975) closed form agrees with the defining integral (within 2 % of J, 0.05 ≤ x ≤ 50)", () => {
    for (const x of [0.05, 0.1, 0.3, 1, 3, 10, 30, 50]) {
      const exact = jByQuadrature(x);
      expect(Math.abs(jFunction(x).j - exact) / exact, `x = ${x}`).toBeLessThan(0.02);
    }
  });

  it("J′ is the derivative of J (central difference)", () => {
    for (const x of [0.2, 2, 20]) {
      const h = 1e-5 * x;
      const numeric = (jFunction(x + h).j - jFunction(x - h).j) / (2 * h);
      expect(jFunction(x).jPrime).toBeCloseTo(numeric, 6);
    }
  });

  it("Eθ vanishes for ions of equal charge and is negative for Na+/Mg2+ (Pitzer 1975)", () => {
    expect(eTheta(1, 1, 0.7, A_PHI_25C)).toEqual({ eTheta: 0, eThetaPrime: 0 });
    expect(eTheta(1, 2, 0.7, A_PHI_25C).eTheta).toBeLessThan(0);
  });
});

describe("Gibbs–Duhem consistency in a seawater-like mixture with Eθ, θ and ψ", () => {
  // Σ m_i d ln γ_i = d[(φ − 1) Σ m_i] when all molalities scale together: a relation between
  // the γ and φ equations that fails if any term (B′, Eθ′, ψ) is mis-coded.
  const p = (
    beta0: number,
    beta1: number,
    beta2: number,
    alpha1: number,
    cPhi: number,
  ): PitzerBinaryTerms => ({
    beta0,
    beta1,
    beta2,
    alpha1,
    alpha2: 12,
    cPhi,
  });
  const zc = [1, 1, 2, 2];
  const za = [-1, -2];
  const system = (s: number): PitzerSystem => ({
    cationCharges: zc,
    anionCharges: za,
    cationMolalities: [0.486, 0.0106, 0.0547, 0.0107].map((m) => m * s),
    anionMolalities: [0.566, 0.0293].map((m) => m * s),
    binary: [
      [p(0.0765, 0.2644, 0, 2, 0.00127), p(0.01958, 1.113, 0, 2, 0.00497)],
      [p(0.04835, 0.2122, 0, 2, -0.00084), p(0.04995, 0.7793, 0, 2, 0)],
      [p(0.35235, 1.6815, 0, 2, 0.00519), p(0.221, 3.343, -37.23, 1.4, 0.025)],
      [p(0.3159, 1.614, 0, 2, -0.00034), p(0.2, 3.1973, -54.24, 1.4, 0)],
    ],
    thetaCations: [
      [0, -0.012, 0.07, 0.07],
      [0, 0, 0, 0.032],
      [0, 0, 0, 0.007],
      [0, 0, 0, 0],
    ],
    thetaAnions: [
      [0, 0.02],
      [0, 0],
    ],
    psiCations: zc.map((_, i) =>
      zc.map((__, j) =>
        i === 0 && j === 2 ? [-0.012, -0.015] : i === 0 && j === 1 ? [-0.0018, -0.01] : [0, 0],
      ),
    ),
    psiAnions: [
      [
        [0, 0, 0, 0],
        [0.0014, 0, -0.004, -0.018],
      ],
      [
        [0, 0, 0, 0],
        [0, 0, 0, 0],
      ],
    ],
  });
  it("holds to 1e-6 at I ≈ 0.7 and I ≈ 3 mol/kg", () => {
    for (const s0 of [1, 4]) {
      const h = 1e-5;
      const lo = pitzerMixture(system(s0 * (1 - h)), A_PHI_25C);
      const hi = pitzerMixture(system(s0 * (1 + h)), A_PHI_25C);
      const mid = system(s0);
      const molalities = [...mid.cationMolalities, ...mid.anionMolalities];
      const sumM = molalities.reduce((a, b) => a + b, 0);
      const dLnGamma = [
        ...hi.lnGammaCations.map((v, i) => v - lo.lnGammaCations[i]),
        ...hi.lnGammaAnions.map((v, i) => v - lo.lnGammaAnions[i]),
      ];
      const lhs = molalities.reduce((acc, m, i) => acc + m * dLnGamma[i], 0);
      const rhs =
        (hi.osmoticCoefficient - 1) * sumM * (1 + h) - (lo.osmoticCoefficient - 1) * sumM * (1 - h);
      expect(Math.abs(lhs - rhs), `scale ${s0}`).toBeLessThan(1e-6);
    }
  });
});
