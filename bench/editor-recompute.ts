/**
 * Benchmark: recomputing every solution block of an entry with 50 of them, as the editor does
 * when an entry opens (cold) and on a keystroke in one block (memoised: one miss, 49 hits).
 * Target: under one frame, 16 ms (median CPU time), for the cold recompute (issue 5).
 *
 * Run alone with `npx tsx bench/editor-recompute.ts`, or through `npm run bench`.
 */
import { pathToFileURL } from "node:url";
import { defaultSolutionBlockInput } from "@/lib/document/block-defaults";
import type { SolutionBlockInput, SolutionComponentInput } from "@/lib/document/block-schemas";
import {
  evaluateSolutionBlock,
  evaluateSolutionBlockCached,
} from "@/lib/document/evaluate-solution-block";

// Typical electrochemistry electrolytes: supporting electrolytes, redox probes, buffers,
// weighed stocks, a non-aqueous one. Amounts are what a lab would write.
const RECIPES: {
  model?: SolutionBlockInput["model"];
  solvent?: string;
  temperatureC?: number;
  components: SolutionComponentInput[];
}[] = [
  { components: [{ formula: "KCl", amount: 0.1, unit: "mol/L" }] },
  {
    components: [
      { formula: "KCl", amount: 0.1, unit: "mol/L" },
      { formula: "K3Fe(CN)6", amount: 5, unit: "mmol/L" },
      { formula: "K4Fe(CN)6", amount: 5, unit: "mmol/L" },
    ],
  },
  { components: [{ formula: "NaClO4", amount: 0.5, unit: "mol/kg" }] },
  { components: [{ formula: "H2SO4", amount: 0.5, unit: "mol/L" }] },
  { components: [{ formula: "KNO3", amount: 5.055, unit: "g", perAmount: 100, perUnit: "mL" }] },
  {
    components: [
      { formula: "CuSO4·5H2O", amount: 1.25, unit: "g", perAmount: 50, perUnit: "mL" },
      { formula: "H2SO4", amount: 0.1, unit: "mol/L" },
    ],
  },
  { components: [{ formula: "NaCl", amount: 1, unit: "mol/kg" }], model: "pitzer" },
  { components: [{ formula: "KOH", amount: 0.1, unit: "mol/L" }], temperatureC: 40 },
  {
    components: [
      { formula: "MgCl2", amount: 20, unit: "mmol/kg" },
      { formula: "NaCl", amount: 0.05, unit: "mol/kg" },
    ],
    model: "davies",
  },
  { components: [{ formula: "N(C4H9)4PF6", amount: 0.1, unit: "mol/L" }], solvent: "acetonitrile" },
];

function typicalEntryBlocks(count = 50, jitter = 0): SolutionBlockInput[] {
  return Array.from({ length: count }, (_, i) => {
    const recipe = RECIPES[i % RECIPES.length];
    return defaultSolutionBlockInput({
      name: `Solution ${i + 1}`,
      solvent: recipe.solvent ?? "water",
      temperatureC: recipe.temperatureC ?? 25,
      model: recipe.model ?? "auto",
      // A small change per block and per run, so no cache anywhere can answer for it.
      components: recipe.components.map((c) => ({
        ...c,
        amount: (c.amount as number) * (1 + i * 1e-4 + jitter * 1e-7),
      })),
    });
  });
}

function percentile(sorted: number[], p: number): number {
  return sorted[Math.min(sorted.length - 1, Math.floor(p * sorted.length))];
}

export interface BenchReport {
  name: string;
  targetMs: number;
  coldMedianMs: number;
  coldP95Ms: number;
  /** CPU time of the same runs: the work itself, without the time other processes took. */
  coldCpuMedianMs: number;
  keystrokeMedianMs: number;
  errors: number;
  pass: boolean;
}

function runEditorRecomputeBench(rounds = 40): BenchReport {
  // Warm-up: the JIT and lib/chem's species caches, as after the first render of an entry.
  for (let r = 0; r < 20; r++)
    typicalEntryBlocks(50, -r - 1).forEach((b) => evaluateSolutionBlock(b));

  const cold: number[] = [];
  const coldCpu: number[] = [];
  let errors = 0;
  for (let r = 0; r < rounds; r++) {
    const blocks = typicalEntryBlocks(50, r);
    const cpu = process.cpuUsage();
    const start = performance.now();
    for (const block of blocks) if (evaluateSolutionBlock(block).status !== "ok") errors++;
    cold.push(performance.now() - start);
    const used = process.cpuUsage(cpu);
    coldCpu.push((used.user + used.system) / 1000);
  }

  // A keystroke: one block's amount changes, the other 49 come from the memo.
  const blocks = typicalEntryBlocks(50, 10_000);
  blocks.forEach((b) => evaluateSolutionBlockCached(b));
  const keystroke: number[] = [];
  for (let r = 0; r < rounds; r++) {
    const edited = blocks.map((block, i) =>
      i === r % 50
        ? {
            ...block,
            components: block.components.map((c) => ({
              ...c,
              amount: (c.amount as number) * (1 + (r + 1) * 1e-6),
            })),
          }
        : block,
    );
    const start = performance.now();
    edited.forEach((b) => evaluateSolutionBlockCached(b));
    keystroke.push(performance.now() - start);
  }

  cold.sort((a, b) => a - b);
  coldCpu.sort((a, b) => a - b);
  keystroke.sort((a, b) => a - b);
  const report: BenchReport = {
    name: "editor: recompute 50 solution blocks",
    targetMs: 16,
    coldMedianMs: percentile(cold, 0.5),
    coldP95Ms: percentile(cold, 0.95),
    coldCpuMedianMs: percentile(coldCpu, 0.5),
    keystrokeMedianMs: percentile(keystroke, 0.5),
    errors: errors / rounds,
    // On a shared 2-core machine wall time mostly measures the other processes (p95 and even
    // the median swing with the load average), so the verdict uses the CPU time the
    // recompute itself took; wall median and p95 are printed beside it.
    pass: percentile(coldCpu, 0.5) < 16,
  };
  return report;
}

export function printEditorRecomputeBench(): BenchReport {
  const report = runEditorRecomputeBench();
  const ms = (v: number) => `${v.toFixed(2)} ms`;
  console.log(
    `${report.name}: cold CPU median ${ms(report.coldCpuMedianMs)} (target < ${report.targetMs} ms), wall median ${ms(report.coldMedianMs)}, p95 ${ms(report.coldP95Ms)} ` +
      `${report.pass ? "PASS" : "FAIL"}; one keystroke (memoised) median ${ms(report.keystrokeMedianMs)}` +
      (report.errors ? `; ${report.errors} block(s) refused by the engine` : ""),
  );
  return report;
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href)
  printEditorRecomputeBench();
