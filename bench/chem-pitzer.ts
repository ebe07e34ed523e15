/**
 * Benchmark: one Pitzer evaluation (γ of every ion, φ, a_w) for a 10-ion seawater-like
 * mixture (Na+, K+, Mg2+, Ca2+, H+, Cl−, SO4²−, HCO3−, Br−, CO3²−; I ≈ 0.7 mol/kg), with
 * parameter look-up, Eθ and validity checks included — what computeSolution pays per call.
 * Target: median under 0.5 ms per call (issue 4).
 *
 * Run alone with `npx tsx bench/chem-pitzer.ts`, or through `npm run bench`.
 */
import { pathToFileURL } from "node:url";
import { debyeHuckelConstants } from "@/lib/chem/debye-huckel-constants";
import { pitzerModel } from "@/lib/chem/models/pitzer";
import type { ModelIon } from "@/lib/chem/models/types";

// Seawater of salinity 35, mol/kg: Millero et al. (2008) Deep-Sea Res. I 55, 50, reference composition,
// rounded and from memory (a benchmark input, not a check value); H+ at pH 8.1.
const SEAWATER: readonly ModelIon[] = [
  { formula: "Na+", charge: 1, molality: 0.4861 },
  { formula: "K+", charge: 1, molality: 0.0106 },
  { formula: "Mg^2+", charge: 2, molality: 0.0547 },
  { formula: "Ca^2+", charge: 2, molality: 0.0107 },
  { formula: "H+", charge: 1, molality: 7.9e-9 },
  { formula: "Cl-", charge: -1, molality: 0.5657 },
  { formula: "SO4^2-", charge: -2, molality: 0.0293 },
  { formula: "HCO3-", charge: -1, molality: 0.0018 },
  { formula: "Br-", charge: -1, molality: 0.00087 },
  { formula: "CO3^2-", charge: -2, molality: 0.00026 },
];

export interface PitzerBenchReport {
  name: string;
  targetMs: number;
  medianMs: number;
  p95Ms: number;
  pass: boolean;
}

function ionicStrength(ions: readonly ModelIon[]): number {
  return 0.5 * ions.reduce((a, i) => a + i.molality * i.charge * i.charge, 0);
}

function runPitzerBench(batches = 60, callsPerBatch = 200): PitzerBenchReport {
  const constants = debyeHuckelConstants(25);
  const call = (k: number) => {
    // A small change per call so that nothing can be answered from a cache.
    const ions = SEAWATER.map((i) => ({ ...i, molality: i.molality * (1 + k * 1e-9) }));
    return pitzerModel.compute({
      ions,
      ionicStrengthMolal: ionicStrength(ions),
      temperatureC: 25,
      solvent: "water",
      constants,
    });
  };
  for (let k = 0; k < 2000; k++) call(-k); // warm-up (JIT)
  const perCall: number[] = [];
  let sink = 0;
  for (let b = 0; b < batches; b++) {
    const start = performance.now();
    for (let k = 0; k < callsPerBatch; k++) sink += call(b * callsPerBatch + k).lnGamma[0];
    perCall.push((performance.now() - start) / callsPerBatch);
  }
  if (!Number.isFinite(sink)) throw new Error("Pitzer bench produced a non-finite result");
  perCall.sort((a, b) => a - b);
  const medianMs = perCall[Math.floor(perCall.length / 2)];
  return {
    name: "chem: Pitzer, 10-ion seawater-like mixture",
    targetMs: 0.5,
    medianMs,
    p95Ms: perCall[Math.floor(perCall.length * 0.95)],
    pass: medianMs < 0.5,
  };
}

export function printPitzerBench(): PitzerBenchReport {
  const r = runPitzerBench();
  console.log(
    `${r.name}: median ${(r.medianMs * 1000).toFixed(1)} µs per call, p95 ${(r.p95Ms * 1000).toFixed(1)} µs (target < ${r.targetMs} ms) ${r.pass ? "PASS" : "FAIL"}`,
  );
  return r;
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) printPitzerBench();
