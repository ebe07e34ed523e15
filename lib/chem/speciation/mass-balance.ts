/**
 * Free-ion molalities from totals at fixed conditional constants K′ = K γM γL / γML:
 *   T_i = m_i + Σ_{pairs p ∋ i} K′_p m_M m_L
 * solved by Newton's method in x_i = ln m_i (each pair joins exactly two ions), with the step
 * limited to one unit of ln m so that strong pairs (log K ≈ 3–6) converge from the totals.
 */
export interface PairLink {
  /** Index of the cation and of the anion in the ion list. */
  cation: number;
  anion: number;
}

const MAX_NEWTON_STEPS = 60;
const TOLERANCE = 1e-13;

/** Solves A x = b in place by Gaussian elimination with partial pivoting (A is n×n, row-major). */
function solveLinear(A: Float64Array, b: Float64Array, n: number): boolean {
  for (let col = 0; col < n; col++) {
    let pivot = col;
    for (let r = col + 1; r < n; r++)
      if (Math.abs(A[r * n + col]) > Math.abs(A[pivot * n + col])) pivot = r;
    const pv = A[pivot * n + col];
    if (!(Math.abs(pv) > 0) || !Number.isFinite(pv)) return false;
    if (pivot !== col) {
      for (let c = 0; c < n; c++) {
        const t = A[col * n + c];
        A[col * n + c] = A[pivot * n + c];
        A[pivot * n + c] = t;
      }
      const t = b[col];
      b[col] = b[pivot];
      b[pivot] = t;
    }
    for (let r = col + 1; r < n; r++) {
      const f = A[r * n + col] / pv;
      if (f === 0) continue;
      for (let c = col; c < n; c++) A[r * n + c] -= f * A[col * n + c];
      b[r] -= f * b[col];
    }
  }
  for (let r = n - 1; r >= 0; r--) {
    let s = b[r];
    for (let c = r + 1; c < n; c++) s -= A[r * n + c] * b[c];
    b[r] = s / A[r * n + r];
  }
  return true;
}

/**
 * Updates `free` (molalities, start from the previous solution or the totals) in place.
 * Returns false when Newton's method does not converge.
 */
export function solveMassBalance(
  totals: ArrayLike<number>,
  free: Float64Array,
  links: readonly PairLink[],
  kPrime: ArrayLike<number>,
): boolean {
  const n = totals.length;
  const A = new Float64Array(n * n);
  const f = new Float64Array(n);
  for (let step = 0; step < MAX_NEWTON_STEPS; step++) {
    A.fill(0);
    for (let i = 0; i < n; i++) {
      f[i] = free[i] - totals[i];
      // An ion that is absent has no unknown: a unit row keeps the system regular.
      A[i * n + i] = totals[i] > 0 ? free[i] : 1;
    }
    for (let p = 0; p < links.length; p++) {
      const { cation: c, anion: a } = links[p];
      const mp = kPrime[p] * free[c] * free[a];
      f[c] += mp;
      f[a] += mp;
      A[c * n + c] += mp;
      A[a * n + a] += mp;
      A[c * n + a] += mp;
      A[a * n + c] += mp;
    }
    let worst = 0;
    for (let i = 0; i < n; i++) {
      const scale = totals[i] > 0 ? totals[i] : 1;
      worst = Math.max(worst, Math.abs(f[i]) / scale);
      f[i] = -f[i];
    }
    if (worst < TOLERANCE) return true;
    if (!solveLinear(A, f, n)) return false;
    for (let i = 0; i < n; i++) {
      if (!(totals[i] > 0)) continue;
      const dx = Math.max(-1, Math.min(1, f[i]));
      free[i] *= Math.exp(dx);
    }
  }
  return false;
}
