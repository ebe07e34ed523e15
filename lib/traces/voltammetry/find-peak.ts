/**
 * One peak on one monotone sweep. The peak is the largest excursion of the smoothed current
 * in the direction of the sweep's reaction (oxidation on a positive-going sweep, reduction on
 * a negative-going one), measured above a baseline.
 *
 * Baseline (common practice): a straight line fitted by least squares to the pre-peak
 * region of the same sweep — from 5 % to 30 % of the way from the start of the sweep to the
 * peak — and extrapolated under the peak. The peak current is the smoothed current minus
 * that line at the peak. The peak potential is where the smoothed current itself is
 * extreme, refined by a least-squares cubic through the top of the peak (see fitPeakTop),
 * so ΔEp means what it means in the published theory (Nicholson & Shain 1964),
 * independent of the baseline.
 *
 * No peak is reported (null) when the extreme sits at either end of the sweep, when it is
 * not at least five noise standard deviations (and 2 % of the cycle's current range) above
 * the baseline, or when the current does not fall back by a tenth of the peak height after
 * it: a rising wave without a maximum is not a peak.
 */
import { savitzkyGolay } from "./smooth";

export interface Peak {
  potentialV: number;
  /** Baseline-corrected, with its sign (positive anodic in the IUPAC convention). */
  currentA: number;
  /** The smoothed current at the peak, measured from zero. */
  rawCurrentA: number;
  baselineCurrentA: number;
  /** Sample index in the whole trace. */
  row: number;
}

export interface SweepInput {
  potentialV: ArrayLike<number>;
  currentA: ArrayLike<number>;
  start: number;
  end: number;
  /** +1 looks for a maximum (anodic in IUPAC), −1 for a minimum. */
  sign: 1 | -1;
  window: number;
  /** max − min of the smoothed current over the whole cycle. */
  cycleCurrentRangeA: number;
}

function baselineAt(
  e: ArrayLike<number>,
  i: ArrayLike<number>,
  from: number,
  to: number,
): ((potential: number) => number) | null {
  let n = 0;
  let sx = 0;
  let sy = 0;
  let sxx = 0;
  let sxy = 0;
  for (let k = from; k < to; k++) {
    const x = e[k];
    const y = i[k];
    if (!(x === x) || !(y === y)) continue;
    n++;
    sx += x;
    sy += y;
    sxx += x * x;
    sxy += x * y;
  }
  if (n < 2) return null;
  const det = n * sxx - sx * sx;
  if (!(Math.abs(det) > 0)) return () => sy / n;
  const slope = (n * sxy - sx * sy) / det;
  const intercept = (sy - slope * sx) / n;
  return (potential) => intercept + slope * potential;
}

export function findPeakOnSweep(input: SweepInput): Peak | null {
  const { potentialV: e, currentA: current, start, end, sign, window } = input;
  const n = end - start;
  if (n < 12) return null;
  const smooth = savitzkyGolay(current, start, end, window);
  let best = -1;
  for (let k = 0; k < n; k++)
    if (smooth[k] === smooth[k] && (best === -1 || sign * smooth[k] > sign * smooth[best]))
      best = k;
  const edge = Math.max(2, Math.floor(0.02 * n));
  if (best < edge || best > n - 1 - edge) return null;

  const from = Math.floor(0.05 * best);
  const to = Math.max(from + 2, Math.floor(0.3 * best));
  const line = baselineFromWindow(e, smooth, start, from, to);
  if (!line) return null;

  // Noise: spread of the raw current around the smoothed one over the sweep.
  let sq = 0;
  let count = 0;
  for (let k = 0; k < n; k++) {
    const r = current[start + k] - smooth[k];
    if (r === r) {
      sq += r * r;
      count++;
    }
  }
  const noise = count ? Math.sqrt(sq / count) : 0;

  const top = fitPeakTop(e, smooth, start, best, sign, line);
  const potentialV = top.potentialV;
  const rawCurrentA = top.currentA;
  const baselineCurrentA = line(potentialV);
  const height = sign * (rawCurrentA - baselineCurrentA);
  if (!(height > 5 * noise) || !(height > 0.02 * input.cycleCurrentRangeA)) return null;

  let fallsBack = false;
  for (let k = best + 1; k < n && !fallsBack; k++)
    if (sign * (smooth[k] - line(e[start + k])) < 0.9 * height) fallsBack = true;
  if (!fallsBack) return null;

  return {
    potentialV,
    currentA: rawCurrentA - baselineCurrentA,
    rawCurrentA,
    baselineCurrentA,
    row: start + best,
  };
}

function baselineFromWindow(
  e: ArrayLike<number>,
  smooth: Float64Array,
  start: number,
  from: number,
  to: number,
): ((potential: number) => number) | null {
  const potentials = new Float64Array(to - from);
  const currents = new Float64Array(to - from);
  for (let k = from; k < to; k++) {
    potentials[k - from] = e[start + k];
    currents[k - from] = smooth[k];
  }
  return baselineAt(potentials, currents, 0, potentials.length);
}

/** Solves a small dense linear system by Gaussian elimination with partial pivoting. */
function solveSmall(matrix: number[][], rhs: number[]): number[] | null {
  const n = rhs.length;
  const m = matrix.map((row, i) => [...row, rhs[i]]);
  for (let col = 0; col < n; col++) {
    let pivot = col;
    for (let r = col + 1; r < n; r++) if (Math.abs(m[r][col]) > Math.abs(m[pivot][col])) pivot = r;
    if (!(Math.abs(m[pivot][col]) > 1e-300)) return null;
    [m[col], m[pivot]] = [m[pivot], m[col]];
    for (let r = 0; r < n; r++) {
      if (r === col) continue;
      const factor = m[r][col] / m[col][col];
      for (let c = col; c <= n; c++) m[r][c] -= factor * m[col][c];
    }
  }
  return m.map((row, i) => row[n] / row[i]);
}

/**
 * Peak top: a least-squares cubic through the samples within 10 % of the peak height of the
 * top, and its maximum. The cubic follows the peak's asymmetry (steep rise, slow diffusional
 * fall), which a parabola would read as a shift of a millivolt; averaging over the top keeps
 * 1 % current noise from moving the peak by more than about 1.5 mV.
 */
function fitPeakTop(
  e: ArrayLike<number>,
  smooth: Float64Array,
  start: number,
  best: number,
  sign: 1 | -1,
  line: (potential: number) => number,
): { potentialV: number; currentA: number } {
  const fallback = { potentialV: e[start + best], currentA: smooth[best] };
  const height = sign * (smooth[best] - line(e[start + best]));
  const floor = smooth[best] - sign * 0.1 * height;
  let lo = best;
  let hi = best;
  while (lo > 0 && sign * (smooth[lo - 1] - floor) > 0) lo--;
  while (hi < smooth.length - 1 && sign * (smooth[hi + 1] - floor) > 0) hi++;
  if (hi - lo < 4) return fallback;
  // x scaled to [−1, 1] over the fitted span keeps the normal equations well conditioned.
  const eLo = e[start + lo];
  const eHi = e[start + hi];
  const mid = (eLo + eHi) / 2;
  const halfSpan = (eHi - eLo) / 2;
  if (!(Math.abs(halfSpan) > 0)) return fallback;
  const ata = Array.from({ length: 4 }, () => [0, 0, 0, 0]);
  const aty = [0, 0, 0, 0];
  for (let k = lo; k <= hi; k++) {
    const x = (e[start + k] - mid) / halfSpan;
    const powers = [1, x, x * x, x * x * x];
    for (let r = 0; r < 4; r++) {
      aty[r] += powers[r] * smooth[k];
      for (let c = 0; c < 4; c++) ata[r][c] += powers[r] * powers[c];
    }
  }
  const coef = solveSmall(ata, aty);
  if (!coef) return fallback;
  const [c0, c1, c2, c3] = coef;
  const value = (x: number) => c0 + x * (c1 + x * (c2 + x * c3));
  // Stationary points: c1 + 2 c2 x + 3 c3 x² = 0; keep a maximum (in the peak's sense) inside the span.
  const roots: number[] = [];
  if (Math.abs(c3) < 1e-12 * (Math.abs(c2) + Math.abs(c1))) {
    if (c2 !== 0) roots.push(-c1 / (2 * c2));
  } else {
    const disc = 4 * c2 * c2 - 12 * c3 * c1;
    if (disc >= 0) {
      const q = Math.sqrt(disc);
      roots.push((-2 * c2 + q) / (6 * c3), (-2 * c2 - q) / (6 * c3));
    }
  }
  const top = roots.filter((x) => Math.abs(x) <= 1 && sign * (2 * c2 + 6 * c3 * x) < 0);
  if (top.length === 0) return fallback;
  const x = top.reduce((a, b) => (sign * value(a) >= sign * value(b) ? a : b));
  return { potentialV: mid + x * halfSpan, currentA: value(x) };
}
