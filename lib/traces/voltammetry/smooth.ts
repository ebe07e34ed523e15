/**
 * Savitzky–Golay smoothing, quadratic over a window of 2m + 1 points
 * (Savitzky & Golay 1964, Anal. Chem. 36, 1627; coefficients in closed form from
 * Gorry 1990, Anal. Chem. 62, 570):
 *   c_i = 3 (3m² + 3m − 1 − 5i²) / ((2m − 1)(2m + 1)(2m + 3)),  i = −m … m.
 * Unlike a moving average it keeps the height of a peak a few windows wide. Near the ends
 * the window shrinks symmetrically, so every output point is centred.
 */
function coefficients(m: number): Float64Array {
  const c = new Float64Array(2 * m + 1);
  const norm = (2 * m - 1) * (2 * m + 1) * (2 * m + 3);
  for (let i = -m; i <= m; i++) c[i + m] = (3 * (3 * m * m + 3 * m - 1 - 5 * i * i)) / norm;
  return c;
}

/** Smooths y[start, end) with a window of `window` points (odd, ≥ 5; smaller windows return a copy). */
export function savitzkyGolay(
  y: ArrayLike<number>,
  start: number,
  end: number,
  window: number,
): Float64Array {
  const n = end - start;
  const out = new Float64Array(n);
  const half = Math.floor(window / 2);
  const cache = new Map<number, Float64Array>();
  for (let k = 0; k < n; k++) {
    const m = Math.min(half, k, n - 1 - k);
    if (m < 2) {
      out[k] = y[start + k];
      continue;
    }
    let c = cache.get(m);
    if (!c) cache.set(m, (c = coefficients(m)));
    let sum = 0;
    for (let i = -m; i <= m; i++) sum += c[i + m] * y[start + k + i];
    out[k] = sum;
  }
  return out;
}
