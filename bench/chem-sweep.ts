/**
 * Benchmark: the sweep of "auto" over molality and temperature that the continuity test walks
 * (tests/unit/chem/continuity-sweep.test.ts: seven salts, 0.001–6 mol/kg at 0, 25 and 60 °C, and
 * 0–100 °C in 0.25 K steps at 0.01, 0.5 and 3 mol/kg). Reports the time per point; no
 * target (it tells how long the test takes and how much a point costs across the range).
 *
 * Run alone with `npx tsx bench/chem-sweep.ts`, or through `npm run bench`.
 */
import { pathToFileURL } from "node:url";
import { computeSolution } from "@/lib/chem";

// The grid of tests/unit/chem/continuity-sweep.test.ts (benches may not import tests: keep
// the two in step).
const SWEEP_SALTS = ["NaCl", "CaCl2", "MgSO4", "Cu(NO3)2", "LiPF6", "K3Fe(CN)6", "HCl"];
const SWEEP_MOLALITY_TEMPERATURES_C = [0, 25, 60];
const SWEEP_TEMPERATURE_MOLALITIES = [0.01, 0.5, 3];

/** 0.001–6 mol/kg; steps of 0.5 % below 1, 0.2 % to 3, 0.1 % above (CaCl2 near 5 mol/kg). */
const SWEEP_MOLALITIES: number[] = [];
for (let m = 0.001; m <= 6; m *= m < 1 ? 1.005 : m < 3 ? 1.002 : 1.001) SWEEP_MOLALITIES.push(m);

/** 0–100 °C in steps of 0.25 K. */
const SWEEP_TEMPERATURES_C = Array.from({ length: 401 }, (_, i) => i * 0.25);

interface SweepPoint {
  gamma: number;
  used: string;
  said: boolean;
}

function sweepPoint(formula: string, molality: number, temperatureC: number): SweepPoint {
  const r = computeSolution({
    temperatureC,
    model: "auto",
    components: [{ formula, amount: molality, unit: "mol/kg" }],
  });
  return { gamma: r.salts[0].meanGamma, used: r.model.used, said: Boolean(r.modelChange) };
}

/** Walks the values; counts the jumps (≥ 0.5 % or a model change) said and not said. */
function sweep(values: readonly number[], at: (v: number) => SweepPoint) {
  let silent = 0;
  let said = 0;
  let prev = at(values[0]);
  for (const v of values.slice(1)) {
    const cur = at(v);
    const step = Math.abs(cur.gamma / prev.gamma - 1);
    if (step >= 0.005 || cur.used !== prev.used) {
      if (cur.said || prev.said) said++;
      else silent++;
    }
    prev = cur;
  }
  return { points: values.length, silent, said };
}

export interface SweepBenchReport {
  name: string;
  points: number;
  silentJumps: number;
  totalMs: number;
  microsecondsPerPoint: number;
  pass: boolean;
}

function runSweepBench(): SweepBenchReport {
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
