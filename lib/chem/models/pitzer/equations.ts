/**
 * The Pitzer ion-interaction equations for a mixture of cations c and anions a
 * (Pitzer 1991, Activity Coefficients in Electrolyte Solutions, 2nd ed., Ch. 3, eqs. 59–66;
 * in the notation of Harvie, Møller & Weare 1984, Geochim. Cosmochim. Acta 48, 723):
 *
 *   F    = −Aφ[√I/(1+b√I) + (2/b)ln(1+b√I)] + ΣcΣa m_c m_a B′_ca + Σc<c′ m_c m_c′ Φ′_cc′ + Σa<a′ m_a m_a′ Φ′_aa′
 *   lnγM = z_M² F + Σa m_a(2B_Ma + Z C_Ma) + Σc m_c(2Φ_Mc + Σa m_a ψ_Mca) + Σa<a′ m_a m_a′ ψ_Maa′ + |z_M| ΣcΣa m_c m_a C_ca
 *   lnγX = (same with cations and anions exchanged)
 *   φ − 1 = (2/Σm_i)[−Aφ I^1.5/(1+b√I) + ΣcΣa m_c m_a(Bφ_ca + Z C_ca)
 *           + Σc<c′ m_c m_c′(Φφ_cc′ + Σa m_a ψ_cc′a) + Σa<a′ m_a m_a′(Φφ_aa′ + Σc m_c ψ_caa′)]
 *   ln a_w = −φ M_w Σm_i
 *
 * with B = β0 + β1 g(α1√I) + β2 g(α2√I), B′ = [β1 g′(α1√I) + β2 g′(α2√I)]/I,
 * Bφ = β0 + β1 e^(−α1√I) + β2 e^(−α2√I), C = Cφ/(2√|z_M z_X|), Z = Σ m_i|z_i|, b = 1.2,
 * Φ = θ + Eθ, Φ′ = Eθ′, Φφ = θ + Eθ + I Eθ′.
 */
import { eTheta } from "./e-theta";
import { PITZER_UNIVERSAL } from "./data/universal";

export interface PitzerBinaryTerms {
  beta0: number;
  beta1: number;
  beta2: number;
  alpha1: number;
  alpha2: number;
  cPhi: number;
}

/** A mixture resolved to numbers: every index refers to `cations` / `anions`. */
export interface PitzerSystem {
  cationCharges: number[];
  anionCharges: number[];
  cationMolalities: number[];
  anionMolalities: number[];
  /** binary[c][a]; null where no parameters exist (treated as zero, and reported upstream). */
  binary: (PitzerBinaryTerms | null)[][];
  thetaCations: number[][];
  thetaAnions: number[][];
  /** psiCations[c][c2][a] for c < c2. */
  psiCations: number[][][];
  /** psiAnions[a][a2][c] for a < a2. */
  psiAnions: number[][][];
}

export interface PitzerResult {
  lnGammaCations: number[];
  lnGammaAnions: number[];
  osmoticCoefficient: number;
  lnWaterActivity: number;
}

const B = PITZER_UNIVERSAL.b;

function g(x: number): number {
  if (x < 1e-6) return 1 - (2 * x) / 3; // series limit, avoids 0/0
  return (2 * (1 - (1 + x) * Math.exp(-x))) / (x * x);
}

function gPrime(x: number): number {
  if (x < 1e-6) return -0.5 + (2 * x) / 3;
  return (-2 * (1 - (1 + x + (x * x) / 2) * Math.exp(-x))) / (x * x);
}

export function pitzerMixture(system: PitzerSystem, aPhi: number): PitzerResult {
  const { cationCharges: zc, anionCharges: za, cationMolalities: mc, anionMolalities: ma } = system;
  const nc = zc.length;
  const na = za.length;
  let I = 0;
  let Z = 0;
  let sumM = 0;
  for (let i = 0; i < nc; i++) {
    I += mc[i] * zc[i] * zc[i];
    Z += mc[i] * Math.abs(zc[i]);
    sumM += mc[i];
  }
  for (let i = 0; i < na; i++) {
    I += ma[i] * za[i] * za[i];
    Z += ma[i] * Math.abs(za[i]);
    sumM += ma[i];
  }
  I /= 2;
  const sqrtI = Math.sqrt(I);
  const lnGc = new Array<number>(nc).fill(0);
  const lnGa = new Array<number>(na).fill(0);
  if (!(I > 0))
    return { lnGammaCations: lnGc, lnGammaAnions: lnGa, osmoticCoefficient: 1, lnWaterActivity: 0 };

  // Binary terms per cation–anion pair.
  const Bca: number[][] = [];
  const BPrime: number[][] = [];
  const BPhi: number[][] = [];
  const Cca: number[][] = [];
  let F = -aPhi * (sqrtI / (1 + B * sqrtI) + (2 / B) * Math.log(1 + B * sqrtI));
  let osmoticSum = (-aPhi * I * sqrtI) / (1 + B * sqrtI);
  for (let c = 0; c < nc; c++) {
    Bca.push(new Array<number>(na).fill(0));
    BPrime.push(new Array<number>(na).fill(0));
    BPhi.push(new Array<number>(na).fill(0));
    Cca.push(new Array<number>(na).fill(0));
    for (let a = 0; a < na; a++) {
      const p = system.binary[c][a];
      if (!p) continue;
      const x1 = p.alpha1 * sqrtI;
      const x2 = p.alpha2 * sqrtI;
      Bca[c][a] = p.beta0 + p.beta1 * g(x1) + p.beta2 * g(x2);
      BPrime[c][a] = (p.beta1 * gPrime(x1) + p.beta2 * gPrime(x2)) / I;
      BPhi[c][a] = p.beta0 + p.beta1 * Math.exp(-x1) + p.beta2 * Math.exp(-x2);
      Cca[c][a] = p.cPhi / (2 * Math.sqrt(Math.abs(zc[c] * za[a])));
      const mm = mc[c] * ma[a];
      F += mm * BPrime[c][a];
      osmoticSum += mm * (BPhi[c][a] + Z * Cca[c][a]);
    }
  }

  // Like-charge mixing: Φ, Φ′ and Φφ for every pair of cations and of anions.
  const phiC = pairTerms(zc, system.thetaCations, I, aPhi);
  const phiA = pairTerms(za, system.thetaAnions, I, aPhi);
  for (let i = 0; i < nc; i++)
    for (let j = i + 1; j < nc; j++) {
      const mm = mc[i] * mc[j];
      F += mm * phiC.prime[i][j];
      let psiSum = 0;
      for (let a = 0; a < na; a++) psiSum += ma[a] * system.psiCations[i][j][a];
      osmoticSum += mm * (phiC.osmotic[i][j] + psiSum);
    }
  for (let i = 0; i < na; i++)
    for (let j = i + 1; j < na; j++) {
      const mm = ma[i] * ma[j];
      F += mm * phiA.prime[i][j];
      let psiSum = 0;
      for (let c = 0; c < nc; c++) psiSum += mc[c] * system.psiAnions[i][j][c];
      osmoticSum += mm * (phiA.osmotic[i][j] + psiSum);
    }

  let sumMMC = 0; // Σc Σa m_c m_a C_ca
  for (let c = 0; c < nc; c++) for (let a = 0; a < na; a++) sumMMC += mc[c] * ma[a] * Cca[c][a];

  for (let M = 0; M < nc; M++) {
    let v = zc[M] * zc[M] * F + Math.abs(zc[M]) * sumMMC;
    for (let a = 0; a < na; a++) v += ma[a] * (2 * Bca[M][a] + Z * Cca[M][a]);
    for (let c = 0; c < nc; c++) {
      if (c === M) continue;
      let psiSum = 0;
      const lo = Math.min(M, c);
      const hi = Math.max(M, c);
      for (let a = 0; a < na; a++) psiSum += ma[a] * system.psiCations[lo][hi][a];
      v += mc[c] * (2 * phiC.value[lo][hi] + psiSum);
    }
    for (let a = 0; a < na; a++)
      for (let a2 = a + 1; a2 < na; a2++) v += ma[a] * ma[a2] * system.psiAnions[a][a2][M];
    lnGc[M] = v;
  }
  for (let X = 0; X < na; X++) {
    let v = za[X] * za[X] * F + Math.abs(za[X]) * sumMMC;
    for (let c = 0; c < nc; c++) v += mc[c] * (2 * Bca[c][X] + Z * Cca[c][X]);
    for (let a = 0; a < na; a++) {
      if (a === X) continue;
      let psiSum = 0;
      const lo = Math.min(X, a);
      const hi = Math.max(X, a);
      for (let c = 0; c < nc; c++) psiSum += mc[c] * system.psiAnions[lo][hi][c];
      v += ma[a] * (2 * phiA.value[lo][hi] + psiSum);
    }
    for (let c = 0; c < nc; c++)
      for (let c2 = c + 1; c2 < nc; c2++) v += mc[c] * mc[c2] * system.psiCations[c][c2][X];
    lnGa[X] = v;
  }

  const osmoticCoefficient = sumM > 0 ? 1 + (2 / sumM) * osmoticSum : 1;
  const lnWaterActivity = -osmoticCoefficient * PITZER_UNIVERSAL.waterMolarMassKgPerMol * sumM;
  return { lnGammaCations: lnGc, lnGammaAnions: lnGa, osmoticCoefficient, lnWaterActivity };
}

/** Φ_ij = θ + Eθ, Φ′_ij = Eθ′, Φφ_ij = θ + Eθ + I·Eθ′ for i < j (upper triangle filled). */
function pairTerms(z: number[], theta: number[][], I: number, aPhi: number) {
  const n = z.length;
  const value: number[][] = [];
  const prime: number[][] = [];
  const osmotic: number[][] = [];
  for (let i = 0; i < n; i++) {
    value.push(new Array<number>(n).fill(0));
    prime.push(new Array<number>(n).fill(0));
    osmotic.push(new Array<number>(n).fill(0));
    for (let j = i + 1; j < n; j++) {
      const e = eTheta(z[i], z[j], I, aPhi);
      value[i][j] = theta[i][j] + e.eTheta;
      prime[i][j] = e.eThetaPrime;
      osmotic[i][j] = theta[i][j] + e.eTheta + I * e.eThetaPrime;
    }
  }
  return { value, prime, osmotic };
}
