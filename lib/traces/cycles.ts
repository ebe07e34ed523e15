/**
 * Cycles of a voltammogram: from the file's cycle column when it has one (a new cycle where
 * the number changes), else from the sweep. A cycle ends when the potential, after two
 * reversals, comes back to where the scan started, moving the way it started; a scan that
 * starts at a vertex ends each cycle at that vertex. Samples of cycle k are
 * [startRow, endRow): from the starting potential up to, not including, the next return.
 */
import { findSweepShape } from "./sweeps";
import type { TraceCycle } from "./types";

/** More cycles than this is a column that is not really cycle numbers (or a noisy sweep). */
export const MAX_CYCLES = 10_000;

export function cyclesFromColumn(values: Float64Array, points: number): TraceCycle[] {
  const cycles: TraceCycle[] = [];
  let start = 0;
  for (let i = 1; i <= points; i++) {
    if (i === points || values[i] !== values[start]) {
      // Runs of missing cycle numbers stay with the cycle before them.
      if (i < points && !(values[i] === values[i])) continue;
      const value = values[start];
      cycles.push({
        number: Number.isInteger(value) ? value : cycles.length + 1,
        startRow: start,
        endRow: i,
      });
      if (cycles.length > MAX_CYCLES) return cycles;
      start = i;
    }
  }
  return cycles;
}

export function cyclesFromSweep(potential: Float64Array, points: number): TraceCycle[] {
  const shape = findSweepShape(potential, 0, points);
  if (shape.vertices.length < 2 || shape.initialDirection === 0) {
    return points > 0 ? [{ number: 1, startRow: 0, endRow: points }] : [];
  }
  const startPotential = potential[0];
  const d0 = shape.initialDirection;
  const boundaries: number[] = [];
  for (let k = 1; k < shape.vertices.length; k += 2) {
    const vertex = shape.vertices[k];
    // Started at this vertex: the cycle ends here.
    if (Math.abs(potential[vertex] - startPotential) <= shape.hysteresisV) {
      boundaries.push(vertex);
      continue;
    }
    const stop = k + 1 < shape.vertices.length ? shape.vertices[k + 1] : points;
    for (let j = vertex + 1; j < stop; j++) {
      if ((potential[j] - startPotential) * d0 >= 0) {
        boundaries.push(j);
        break;
      }
    }
  }
  const cycles: TraceCycle[] = [];
  let start = 0;
  for (const boundary of [...boundaries, points]) {
    if (boundary > start)
      cycles.push({ number: cycles.length + 1, startRow: start, endRow: boundary });
    start = boundary;
    if (cycles.length > MAX_CYCLES) break;
  }
  return cycles;
}
