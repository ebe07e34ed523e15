/**
 * Benchmark: the sweep of "auto" over molality and temperature that the continuity test walks
 * (tests/unit/chem/continuity-grid.ts: seven salts, 0.001–6 mol/kg at 0, 25 and 60 °C, and
 * 0–100 °C in 0.25 K steps at 0.01, 0.5 and 3 mol/kg). Reports the time per point; no
 * target (it tells how long the test takes and how much a point costs across the range).
 *
 * Run alone with `npx tsx bench/chem-sweep.ts`, or through `npm run bench`.
 */
import { pathToFileURL } from "node:url";
import {
  SWEEP_MOLALITIES,
  SWEEP_MOLALITY_TEMPERATURES_C,
  SWEEP_SALTS,
  SWEEP_TEMPERATURE_MOLALITIES,
  SWEEP_TEMPERATURES_C,
  sweep,
  sweepPoint,
} from "../tests/unit/chem/continuity-grid";

export interface SweepBenchReport {
  name: string;
  points: number;
  silentJumps: number;
  totalMs: number;
  microsecondsPerPoint: number;
  pass: boolean;
}

export function runSweepBench(): SweepBenchReport {
  let points = 0;
  let silentJumps = 0;
  const walk = () => {
    points = 0;
    silentJumps = 0;
    for (const salt of SWEEP_SALTS) {
      for (const T of SWEEP_MOLALITY_TEMPERATURES_C) {
        const s = sweep(SWEEP_MOLALITIES, (m) => sweepPoint(salt, m, T));
        points += s.points;
        silentJumps += s.silent;
      }
      for (const m of SWEEP_TEMPERATURE_MOLALITIES) {
        const s = sweep(SWEEP_TEMPERATURES_C, (T) => sweepPoint(salt, m, T));
        points += s.points;
        silentJumps += s.silent;
      }
    }
  };
  walk(); // warm-up
  const start = performance.now();
  walk();
  const totalMs = performance.now() - start;
  return {
    name: "chem: continuity sweep of auto over molality and temperature",
    points,
    silentJumps,
    totalMs,
    microsecondsPerPoint: (totalMs * 1000) / points,
    // A timing without a target; it fails only if the sweep itself finds a silent jump.
    pass: silentJumps === 0,
  };
}

export function printSweepBench(): SweepBenchReport {
  const r = runSweepBench();
  console.log(
    `${r.name}: ${r.points} points in ${r.totalMs.toFixed(0)} ms, ${r.microsecondsPerPoint.toFixed(1)} µs per point (no target; ${r.silentJumps} silent jumps) ${r.pass ? "PASS" : "FAIL"}`,
  );
  return r;
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) printSweepBench();
