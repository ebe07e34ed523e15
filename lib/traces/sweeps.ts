/**
 * Turning points of a potential sweep. A reversal counts once the potential has come back
 * from its running extreme by more than the hysteresis, so noise on the potential readback
 * (tenths of a millivolt) is never a reversal while a real vertex (the whole window) is.
 */
export interface SweepShape {
  /** Indices of the vertices (the extreme sample before each reversal). */
  vertices: number[];
  /** +1 when the first sweep goes to positive potentials, −1 to negative, 0 when it never moves. */
  initialDirection: 1 | -1 | 0;
  hysteresisV: number;
}

/** 1 % of the potential window, at least 0.2 mV: far above readback noise, far below a sweep. */
function sweepHysteresis(potential: ArrayLike<number>, start: number, end: number): number {
  let min = Infinity;
  let max = -Infinity;
  for (let i = start; i < end; i++) {
    const e = potential[i];
    if (e < min) min = e;
    if (e > max) max = e;
  }
  return max > min ? Math.max(0.01 * (max - min), 2e-4) : 2e-4;
}

export function findSweepShape(
  potential: ArrayLike<number>,
  start = 0,
  end = potential.length,
  hysteresisV = sweepHysteresis(potential, start, end),
): SweepShape {
  const vertices: number[] = [];
  let direction: 1 | -1 | 0 = 0;
  let initialDirection: 1 | -1 | 0 = 0;
  let first = start;
  while (first < end && !(potential[first] === potential[first])) first++;
  if (first >= end) return { vertices, initialDirection, hysteresisV };
  let extremeIndex = first;
  let extreme = potential[first];
  for (let i = first + 1; i < end; i++) {
    const e = potential[i];
    if (!(e === e)) continue;
    if (direction === 0) {
      if (e - potential[first] > hysteresisV) direction = 1;
      else if (potential[first] - e > hysteresisV) direction = -1;
      if (direction !== 0) {
        initialDirection = direction;
        extreme = e;
        extremeIndex = i;
      }
      continue;
    }
    if ((e - extreme) * direction > 0) {
      extreme = e;
      extremeIndex = i;
    } else if ((extreme - e) * direction > hysteresisV) {
      vertices.push(extremeIndex);
      direction = direction === 1 ? -1 : 1;
      extreme = e;
      extremeIndex = i;
    }
  }
  return { vertices, initialDirection, hysteresisV };
}

/**
 * Monotone pieces [start, end) of a sweep, split at the vertices. The vertex sample ends
 * one piece and begins the next.
 */
export function sweepSegments(
  potential: ArrayLike<number>,
  start: number,
  end: number,
): { start: number; end: number; direction: 1 | -1 }[] {
  const shape = findSweepShape(potential, start, end);
  if (shape.initialDirection === 0) return [];
  const bounds = [start, ...shape.vertices, end - 1];
  const segments: { start: number; end: number; direction: 1 | -1 }[] = [];
  let direction = shape.initialDirection;
  for (let k = 0; k + 1 < bounds.length; k++) {
    if (bounds[k + 1] > bounds[k])
      segments.push({ start: bounds[k], end: bounds[k + 1] + 1, direction });
    direction = direction === 1 ? -1 : 1;
  }
  return segments;
}
