/**
 * Benchmark: `computeSolution` for a 10-component solution with each Debye–Hückel-family
 * model (median of batches, µs per call), the heap after 100 000 calls, and 50 different
 * solution blocks recomputed together. Targets (issue 3): < 50 µs per call for the
 * Debye–Hückel family; < 16 ms for 50 blocks.
 *
 * Amounts change on every call so that no cache can answer for the chemistry; the species
 * and unit caches stay warm, as in the editor after the first keystroke.
 * Run alone with `npx tsx bench/chem-dh.ts`, or through `npm run bench`.
 */
import { pathToFileURL } from "node:url";
import v8 from "node:v8";
import vm from "node:vm";
import { computeSolution, type ActivityModelId, type SolutionComponentInput } from "@/lib/chem";

const TEN_COMPONENTS: SolutionComponentInput[] = [
  { formula: "KCl", amount: 0.1, unit: "mol/L" },
  { formula: "K3Fe(CN)6", amount: 5, unit: "mmol/L" },
  { formula: "K4Fe(CN)6·3H2O", amount: 2.112, unit: "g", per: { amount: 1, unit: "L" } },
  { formula: "NaCl", amount: 20, unit: "mmol/kg" },
  { formula: "CaCl2·2H2O", amount: 0.147, unit: "g", per: { amount: 100, unit: "g" } },
  { formula: "MgSO4", amount: 1, unit: "mmol/L" },
  { formula: "NaH2PO4", amount: 2, unit: "mM" },
  { formula: "Na2HPO4", amount: 3, unit: "mM" },
  { formula: "KNO3", amount: 0.05, unit: "wt%" },
  { formula: "HCl", amount: 100, unit: "µmol/L" },
];

const MODELS: ActivityModelId[] = [
  "dh-limiting",
  "dh-extended",
  "guntelberg",
  "davies",
  "truesdell-jones",
];

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
}

function solutionFor(model: ActivityModelId | "auto", k: number, components = TEN_COMPONENTS) {
  return {
    model,
    temperatureC: 25,
    densityGPerMl: 1.005,
    components: components.map((c) => ({ ...c, amount: c.amount * (1 + (k % 997) * 1e-6) })),
  };
}

export interface DhBenchReport {
  perModelMedianMicroseconds: Record<string, number>;
  perModelMedianCpuMicroseconds: Record<string, number>;
  heapAfter100kCallsMb: number;
  heapGrowthMb: number;
  fiftyBlocksMedianMs: number;
  pass: boolean;
}

function runDhBench(batches = 40, callsPerBatch = 250): DhBenchReport {
  // Warm every model first, then interleave the batches so that load from other processes
  // on this shared machine falls on all models alike.
  for (let k = 0; k < 3000; k++) computeSolution(solutionFor(MODELS[k % MODELS.length], k));
  const samples: Record<string, number[]> = Object.fromEntries(MODELS.map((m) => [m, []]));
  const cpuSamples: Record<string, number[]> = Object.fromEntries(MODELS.map((m) => [m, []]));
  for (let b = 0; b < batches; b++) {
    for (const model of MODELS) {
      const cpuStart = process.cpuUsage();
      const start = performance.now();
      for (let k = 0; k < callsPerBatch; k++)
        computeSolution(solutionFor(model, b * callsPerBatch + k));
      samples[model].push(((performance.now() - start) * 1000) / callsPerBatch);
      const cpu = process.cpuUsage(cpuStart);
      cpuSamples[model].push((cpu.user + cpu.system) / callsPerBatch);
    }
  }
  const perModelMedianMicroseconds = Object.fromEntries(MODELS.map((m) => [m, median(samples[m])]));
  // CPU time of this process: what a call costs when the shared machine's other work is taken out.
  const perModelMedianCpuMicroseconds = Object.fromEntries(
    MODELS.map((m) => [m, median(cpuSamples[m])]),
  );

  // A collection before each reading, so the figure is what stays allocated (caches, leaks).
  v8.setFlagsFromString("--expose-gc");
  const gc = vm.runInNewContext("gc") as () => void;
  gc();
  const heapBefore = process.memoryUsage().heapUsed;
  for (let k = 0; k < 100_000; k++) computeSolution(solutionFor(MODELS[k % MODELS.length], k));
  gc();
  const heapAfter = process.memoryUsage().heapUsed;

  // 50 blocks: the ten components taken in different subsets and models, as an entry holds.
  const blocks = Array.from({ length: 50 }, (_, i) => {
    const model: ActivityModelId | "auto" = i % 6 === 5 ? "auto" : MODELS[i % 5];
    return { model, components: TEN_COMPONENTS.slice(0, 1 + (i % 10)) };
  });
  const fifty: number[] = [];
  for (let r = 0; r < 60; r++) {
    const start = performance.now();
    for (const block of blocks) computeSolution(solutionFor(block.model, r, block.components));
    fifty.push(performance.now() - start);
  }
  const fiftyBlocksMedianMs = median(fifty.slice(10));
  const dhWorst = Math.max(...Object.values(perModelMedianMicroseconds));
  return {
    perModelMedianMicroseconds,
    perModelMedianCpuMicroseconds,
    heapAfter100kCallsMb: heapAfter / 2 ** 20,
    heapGrowthMb: (heapAfter - heapBefore) / 2 ** 20,
    fiftyBlocksMedianMs,
    pass: dhWorst < 50 && fiftyBlocksMedianMs < 16,
  };
}

export function printDhBench(): DhBenchReport {
  const r = runDhBench();
  console.log(
    "chem: computeSolution, 10-component solution (median per call, wall clock and this process's CPU time; target < 50 µs)",
  );
  for (const [model, us] of Object.entries(r.perModelMedianMicroseconds)) {
    const cpu = r.perModelMedianCpuMicroseconds[model];
    console.log(
      `  ${model.padEnd(16)} ${us.toFixed(1).padStart(7)} µs wall, ${cpu.toFixed(1).padStart(6)} µs CPU ${us < 50 ? "PASS" : "FAIL"}`,
    );
  }
  console.log(
    `  heap after 100 000 calls: ${r.heapAfter100kCallsMb.toFixed(1)} MB (growth ${r.heapGrowthMb.toFixed(2)} MB, both after a full collection)`,
  );
  console.log(
    `chem: 50 solution blocks recomputed together: median ${r.fiftyBlocksMedianMs.toFixed(2)} ms (target < 16 ms) ${r.fiftyBlocksMedianMs < 16 ? "PASS" : "FAIL"}`,
  );
  return r;
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) printDhBench();
