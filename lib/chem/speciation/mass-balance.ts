/**
 * Free-ion molalities from totals at fixed conditional constants K′ = K γM γL / γML:
 *   T_i = m_i + Σ_{pairs p ∋ i} K′_p m_M m_L
 * solved by Newton's method in x_i = ln m_i, with the step limited to one unit of ln m so that
 * strong pairs (log K ≈ 3–6) converge from the totals.
 *
 * Each pair joins one cation and one anion, so the Jacobian J (J_ii = m_i + Σ_{p∋i} m_p,
 * J_ij = m_p of the pair of i and j) has a diagonal cation block and a diagonal anion block.
 * Only ions that can pair are unknowns (the others stay at their totals); the larger side is
 * eliminated and the dense system solved on the smaller side only (Schur complement):
 *   (D_S − C_LSᵀ D_L⁻¹ C_LS) dx_S = r_S − C_LSᵀ D_L⁻¹ r_L,   dx_L = D_L⁻¹ (r_L − C_LS dx_S).
 */
export interface PairLink {
  /** Index of the cation and of the anion in the ion list. */
  cation: number;
  anion: number;
}

const MAX_NEWTON_STEPS = 60;
const TOLERANCE = 1e-13;
/** Newton step in ln m below which the solve stops: the error after it is of order its square. */
const STEP_TOLERANCE = 1e-6;

/**
 * The unknowns for a pattern of ions present and the buffers Newton's method reuses (the
 * caller may keep it for later compositions with the same ions present).
 */
export interface MassBalanceSystem {
  /** The pairs that can form (both ions present), and their index in the caller's list. */
  links: readonly PairLink[];
  linkIndex: number[];
  /** Ion indices on the side solved densely (S) and on the side eliminated (L). */
  small: number[];
  large: number[];
  /** Position of each ion in `small` or `large` (−1 when it does not pair). */
  position: number[];
  /** True when the cations are the side solved densely. */
  cationsSmall: boolean;
  diagonal: Float64Array;
  residual: Float64Array;
  coupling: Float64Array;
  matrix: Float64Array;
  rhs: Float64Array;
}

/** Sets up the unknowns: ions present in some pair whose partner is present too. */
export function massBalanceSystem(
  totals: readonly number[],
  links: readonly PairLink[],
): MassBalanceSystem {
  const n = totals.length;
  const active = new Array<boolean>(n).fill(false);
  const linkIndex = links.flatMap((l, p) =>
    totals[l.cation] > 0 && totals[l.anion] > 0 ? [p] : [],
  );
  const activeLinks = linkIndex.map((p) => links[p]);
  for (const l of activeLinks) active[l.cation] = active[l.anion] = true;
  const cations: number[] = [];
  const anions: number[] = [];
  const isCation = new Array<boolean>(n).fill(false);
  for (const l of activeLinks) isCation[l.cation] = true;
  for (let i = 0; i < n; i++) if (active[i]) (isCation[i] ? cations : anions).push(i);
  const cationsSmall = cations.length <= anions.length;
  const small = cationsSmall ? cations : anions;
  const large = cationsSmall ? anions : cations;
  const position = new Array<number>(n).fill(-1);
  small.forEach((i, k) => (position[i] = k));
  large.forEach((i, k) => (position[i] = k));
  return {
    links: activeLinks,
    linkIndex,
    small,
    large,
    position,
    cationsSmall,
    diagonal: new Float64Array(n),
    residual: new Float64Array(n),
    coupling: new Float64Array(large.length * small.length),
    matrix: new Float64Array(small.length * small.length),
    rhs: new Float64Array(small.length),
  };
}

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
  system: MassBalanceSystem,
  totals: readonly number[],
  free: number[],
  kPrime: ArrayLike<number>,
): boolean {
  const { links, linkIndex, small, large, position, cationsSmall } = system;
  const { diagonal: D, residual: r } = system;
  const { coupling: C, matrix: M, rhs } = system;
  const nS = small.length;
  const nL = large.length;
  const sides = [small, large];
  for (let i = 0; i < totals.length; i++) if (position[i] < 0) free[i] = totals[i];
  for (let step = 0; step < MAX_NEWTON_STEPS; step++) {
    // Residual f_i = m_i + Σ m_p − T_i and the Jacobian's diagonal and coupling blocks.
    for (const side of sides)
      for (const i of side) {
        D[i] = free[i];
        r[i] = free[i] - totals[i];
      }
    C.fill(0);
    for (let p = 0; p < links.length; p++) {
      const { cation: c, anion: a } = links[p];
      const mp = kPrime[linkIndex[p]] * free[c] * free[a];
      D[c] += mp;
      D[a] += mp;
      r[c] += mp;
      r[a] += mp;
      const s = cationsSmall ? c : a;
      const l = cationsSmall ? a : c;
      C[position[l] * nS + position[s]] += mp;
    }
    let worst = 0;
    for (const i of small) worst = Math.max(worst, Math.abs(r[i]) / totals[i]);
    for (const i of large) worst = Math.max(worst, Math.abs(r[i]) / totals[i]);
    if (worst < TOLERANCE) return true;
    // Schur complement on the small side (right-hand side −f).
    for (let s = 0; s < nS; s++) {
      rhs[s] = -r[small[s]];
      for (let t = 0; t < nS; t++) M[s * nS + t] = s === t ? D[small[s]] : 0;
    }
    for (let l = 0; l < nL; l++) {
      const inv = 1 / D[large[l]];
      const rl = -r[large[l]];
      for (let s = 0; s < nS; s++) {
        const cls = C[l * nS + s];
        if (cls === 0) continue;
        rhs[s] -= cls * inv * rl;
        for (let t = 0; t < nS; t++) M[s * nS + t] -= cls * inv * C[l * nS + t];
      }
    }
    if (!solveLinear(M, rhs, nS)) return false;
    let largestStep = 0;
    for (let s = 0; s < nS; s++) {
      const dx = Math.max(-1, Math.min(1, rhs[s]));
      if (!Number.isFinite(dx)) return false;
      free[small[s]] *= Math.exp(dx);
      largestStep = Math.max(largestStep, Math.abs(dx));
    }
    for (let l = 0; l < nL; l++) {
      let v = -r[large[l]];
      for (let s = 0; s < nS; s++) v -= C[l * nS + s] * rhs[s];
      const dx = Math.max(-1, Math.min(1, v / D[large[l]]));
      if (!Number.isFinite(dx)) return false;
      free[large[l]] *= Math.exp(dx);
      largestStep = Math.max(largestStep, Math.abs(dx));
    }
    // Newton converges quadratically: after a step this small the residual is below TOLERANCE.
    if (largestStep < STEP_TOLERANCE) return true;
  }
  return false;
}

/**
 * A starting point for the first solve: each ion as if its partners were not depleted,
 *   m_i ≈ T_i / (1 + Σ_{p∋i} K′_p T_partner),
 * which is close when one side is in excess and saves Newton steps from the totals.
 */
export function initialFreeEstimate(
  system: MassBalanceSystem,
  totals: readonly number[],
  free: number[],
  kPrime: ArrayLike<number>,
): void {
  const { links, linkIndex, diagonal: D } = system;
  for (let i = 0; i < totals.length; i++) D[i] = 1;
  for (let p = 0; p < links.length; p++) {
    const { cation: c, anion: a } = links[p];
    const k = kPrime[linkIndex[p]];
    D[c] += k * totals[a];
    D[a] += k * totals[c];
  }
  for (let i = 0; i < totals.length; i++) free[i] = totals[i] / D[i];
}
