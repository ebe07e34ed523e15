/**
 * Benchmark: a seawater-like six-ion solution (Na⁺, K⁺, Mg²⁺, Ca²⁺, Cl⁻, SO4²⁻) through
 * `computeSolution` with Truesdell–Jones and ion association on (NaSO4⁻, KSO4⁻, MgSO4°, CaSO4°
 * speciated by iteration on mass balance and ionic strength) — amounts to molality, density,
 * speciation, γ, φ, a_w, checks and messages. 1000 compositions (every amount varied by up to
 * ±10 %) in a loop after a warm-up pass; the loop is repeated and the median per solution
 * reported, wall clock and this process's CPU time.
 * Target: median under 35 µs per solution (a compiled speciation code does the same work in
 * about 350 µs per solution on this machine, so this keeps Ionleaf at least 10× faster).
 *
 * Run alone with `npx tsx bench/chem-seawater.ts`, or through `npm run bench`.
 */
import { pathToFileURL } from "node:url";
import { computeSolution, type SolutionInput } from "@/lib/chem";

// Seawater of salinity 35 as five salts, mol/kg: rounded from the reference composition of
// Millero et al. (2008), Deep-Sea Res. I 55, 50, from memory (a benchmark input, not a check value).
const SEAWATER_SALTS: readonly { formula: string; molality: number }[] = [
  { formula: "NaCl", molality: 0.4186 },
  { formula: "KCl", molality: 0.0106 },
  { formula: "MgCl2", molality: 0.0254 },
  { formula: "CaCl2", molality: 0.0107 },
  { formula: "MgSO4", molality: 0.0293 },
];

const SEAWATER_COMPOSITIONS = 1000;
const TARGET_MICROSECONDS = 35;

/** The k-th composition: each amount scaled by a different factor in 0.9–1.1. */
function seawaterComposition(k: number): SolutionInput {
  return {
    model: "truesdell-jones",
    temperatureC: 25,
    components: SEAWATER_SALTS.map((s, j) => ({
      formula: s.formula,
      amount: s.molality * (0.9 + (((k * (j + 3) * 37) % 1000) / 1000) * 0.2),
      unit: "mol/kg",
    })),
  };
}

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
}

export interface SeawaterBenchReport {
  name: string;
  medianMicroseconds: number;
  medianCpuMicroseconds: number;
  pairsSpeciated: number;
  pass: boolean;
}

function runSeawaterBench(rounds = 15): SeawaterBenchReport {
  const inputs = Array.from({ length: SEAWATER_COMPOSITIONS }, (_, k) => seawaterComposition(k));
  // Warm-up pass, which also checks that every composition was speciated.
  let pairsSpeciated = 0;
  for (const input of inputs) {
    const r = computeSolution(input);
    if (!r.speciation || r.speciation.pairs.length !== 4)
      throw new Error("seawater bench: a composition was not speciated into its four ion pairs");
    pairsSpeciated += r.speciation.pairs.length;
  }
  const wall: number[] = [];
  const cpu: number[] = [];
  let sink = 0;
  for (let round = 0; round < rounds; round++) {
    const cpuStart = process.cpuUsage();
    const start = performance.now();
    for (const input of inputs) sink += computeSolution(input).ionicStrength.molal;
    wall.push(((performance.now() - start) * 1000) / inputs.length);
    const used = process.cpuUsage(cpuStart);
    cpu.push((used.user + used.system) / inputs.length);
  }
  if (!Number.isFinite(sink)) throw new Error("seawater bench produced a non-finite result");
  const medianMicroseconds = median(wall);
  return {
    name: "chem: seawater-like six-ion solution, Truesdell–Jones with ion association",
    medianMicroseconds,
    medianCpuMicroseconds: median(cpu),
    pairsSpeciated,
    pass: medianMicroseconds < TARGET_MICROSECONDS,
  };
}

export function printSeawaterBench(): SeawaterBenchReport {
  const r = runSeawaterBench();
  console.log(
    `${r.name}: ${SEAWATER_COMPOSITIONS} compositions, median ${r.medianMicroseconds.toFixed(1)} µs wall, ${r.medianCpuMicroseconds.toFixed(1)} µs CPU per solution (target < ${TARGET_MICROSECONDS} µs) ${r.pass ? "PASS" : "FAIL"}`,
  );
  return r;
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href)
  printSeawaterBench();
