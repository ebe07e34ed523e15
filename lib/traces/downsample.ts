/**
 * A million points are too many to send to a browser plot and too many to draw. The series
 * is cut into buckets of consecutive samples and each bucket keeps its lowest and its
 * highest y (in their original order), so a peak one sample wide still shows. The first and
 * last samples are always kept.
 */
import { TraceParseError } from "./errors";

export interface PlotSeries {
  x: Float64Array;
  y: Float64Array;
}

export function downsampleForPlot(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  maxPoints: number,
): PlotSeries {
  if (x.length !== y.length)
    throw new TraceParseError("x and y must have the same length.", "bad_series");
  if (!Number.isInteger(maxPoints) || maxPoints < 4)
    throw new TraceParseError("maxPoints must be an integer of at least 4.", "bad_series");
  const n = x.length;
  if (n <= maxPoints) return { x: Float64Array.from(x), y: Float64Array.from(y) };
  const buckets = Math.floor((maxPoints - 2) / 2);
  const outX = new Float64Array(maxPoints);
  const outY = new Float64Array(maxPoints);
  let out = 0;
  outX[out] = x[0];
  outY[out++] = y[0];
  const inner = n - 2;
  for (let b = 0; b < buckets; b++) {
    const from = 1 + Math.floor((b * inner) / buckets);
    const to = 1 + Math.floor(((b + 1) * inner) / buckets);
    let low = -1;
    let high = -1;
    for (let i = from; i < to; i++) {
      const v = y[i];
      if (!(v === v)) continue;
      if (low === -1 || v < y[low]) low = i;
      if (high === -1 || v > y[high]) high = i;
    }
    if (low === -1) continue;
    const first = Math.min(low, high);
    const second = Math.max(low, high);
    outX[out] = x[first];
    outY[out++] = y[first];
    if (second !== first) {
      outX[out] = x[second];
      outY[out++] = y[second];
    }
  }
  outX[out] = x[n - 1];
  outY[out++] = y[n - 1];
  return { x: outX.slice(0, out), y: outY.slice(0, out) };
}
