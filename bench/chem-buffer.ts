/**
 * Benchmark: one buffer recipe — 1 L of 0.1 mol/L sodium phosphate, pH 7.4 at 37 °C, topped
 * up with NaCl to I = 0.3 mol/L — including the I iteration and the forward re-speciation.
 * Also times a reverse `speciate` of the same recipe. Target: median under 5 ms per recipe.
 *
 * Run alone with `npx tsx bench/chem-buffer.ts`, or through `npm run bench`.
 */
import { pathToFileURL } from "node:url";
import { designBuffer, speciate } from "@/lib/chem/acid-base";

export interface BufferBenchReport {
  name: string;
  targetMs: number;
  designMedianMs: number;
  speciateMedianMs: number;
  pass: boolean;
}

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
}

function runBufferBench(rounds = 200): BufferBenchReport {
  const design = (k: number) =>
    designBuffer({
      buffer: "phosphate",
      pH: 7.4 + k * 1e-9,
      totalConcentrationMolar: 0.1,
      volumeMl: 1000,
      temperatureC: 37,
      targetIonicStrengthMolar: 0.3,
    });
  for (let k = 0; k < 50; k++) design(-k); // warm-up
  const designTimes: number[] = [];
  const speciateTimes: number[] = [];
  for (let k = 0; k < rounds; k++) {
    let start = performance.now();
    const recipe = design(k);
    designTimes.push(performance.now() - start);
    start = performance.now();
    const back = speciate({
      components: recipe.components.map((c) => ({ formula: c.formula, amountMol: c.amountMol })),
      volumeMl: 1000,
      temperatureC: 37,
    });
    speciateTimes.push(performance.now() - start);
    if (!Number.isFinite(back.pH)) throw new Error("buffer bench produced a non-finite pH");
  }
  const designMedianMs = median(designTimes);
  return {
    name: "chem: buffer recipe (phosphate, NaCl to I = 0.3, 37 °C)",
    targetMs: 5,
    designMedianMs,
    speciateMedianMs: median(speciateTimes),
    pass: designMedianMs < 5,
  };
}

export function printBufferBench(): BufferBenchReport {
  const r = runBufferBench();
  console.log(
    `${r.name}: designBuffer median ${r.designMedianMs.toFixed(3)} ms, speciate median ${r.speciateMedianMs.toFixed(3)} ms (target < ${r.targetMs} ms) ${r.pass ? "PASS" : "FAIL"}`,
  );
  return r;
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) printBufferBench();
