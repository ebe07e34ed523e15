/**
 * Benchmark: parsing a 1 000 000-row cyclic-voltammetry export (~50 MB, comma-delimited,
 * header block, time / potential / current / cycle) streamed from disk.
 * Baseline, measured in the same run: papaparse alone on the same file (Papa.parse on a
 * Node read stream, strings only, rows counted and dropped); for context also papaparse
 * converting the cells to numbers itself (dynamicTyping), which our parser also does. Ours: parseTraceFile (the same
 * papaparse core, plus numbers into Float64Arrays in SI, cycles, technique, summary).
 * Each measurement runs in its own child process, so its peak resident memory (maxRSS) is
 * its own; three rounds alternate the two and the medians are reported.
 * Targets (attachments issue): under 3 s, under 300 MB, and within 1.5× of papaparse alone.
 *
 * Run alone with `npx tsx bench/trace-parse.ts`, or through `npm run bench`.
 */
import { spawnSync } from "node:child_process";
import {
  closeSync,
  createReadStream,
  mkdtempSync,
  openSync,
  rmSync,
  statSync,
  writeSync,
} from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";
import Papa from "papaparse";
import { parseTraceFile } from "@/lib/traces/parse-file";
import { simulateReversibleCv } from "@/lib/traces/simulate";

const ROWS = 1_000_000;
const TARGET_MS = 3000;
const TARGET_MB = 300;
const TARGET_RATIO = 1.5;

/** Scientific notation with 9 significant digits, as many exports write (~50 bytes a row). */
const scientific = (x: number) => x.toExponential(8);

/** Writes the export in batches: one simulated cycle repeated, time running on, noise added. */
export function writeCvExport(path: string, rows = ROWS): number {
  const sim = simulateReversibleCv({ stepV: 5e-4, noiseA: 1e-7, seed: 11 });
  const perCycle = sim.potentialV.length - 1;
  const fd = openSync(path, "w");
  writeSync(
    fd,
    "Technique: Cyclic Voltammetry\nScan rate (V/s) = 0.1\nElectrode area (cm2) = 0.0707\nReference electrode: Ag/AgCl (3 M KCl)\n\nTime (s),Potential (V),Current (A),Cycle\n",
  );
  const dt = sim.timeS[1];
  let batch: string[] = [];
  for (let r = 0; r < rows; r++) {
    const k = r % perCycle;
    batch.push(
      `${scientific(r * dt)},${scientific(sim.potentialV[k])},${scientific(sim.currentA[k])},${Math.floor(r / perCycle) + 1}`,
    );
    if (batch.length === 50_000) {
      writeSync(fd, batch.join("\n") + "\n");
      batch = [];
    }
  }
  if (batch.length) writeSync(fd, batch.join("\n") + "\n");
  closeSync(fd);
  return statSync(path).size;
}

interface ChildMeasurement {
  ms: number;
  rows: number;
  maxRssMb: number;
  rssAtStartMb: number;
}

type Mode = "papaparse" | "papaparse-numbers" | "ours";

async function measureInChild(mode: Mode, path: string): Promise<ChildMeasurement> {
  const rssAtStartMb = process.memoryUsage().rss / 2 ** 20;
  const start = performance.now();
  let rows = 0;
  if (mode !== "ours") {
    await new Promise<void>((resolve, reject) => {
      Papa.parse(createReadStream(path, { encoding: "utf8", highWaterMark: 1 << 20 }), {
        delimiter: ",",
        newline: "\n",
        dynamicTyping: mode === "papaparse-numbers",
        chunk: (result) => {
          rows += result.data.length;
        },
        complete: () => resolve(),
        error: (e) => reject(e),
      });
    });
  } else {
    rows = (await parseTraceFile(path)).summary.points;
  }
  const ms = performance.now() - start;
  return { ms, rows, maxRssMb: process.resourceUsage().maxRSS / 1024, rssAtStartMb };
}

function runChild(mode: Mode, path: string): ChildMeasurement {
  const self = fileURLToPath(import.meta.url);
  const child = spawnSync(process.execPath, [...process.execArgv, self, "--child", mode, path], {
    encoding: "utf8",
    maxBuffer: 1 << 20,
  });
  const line = child.stdout.trim().split("\n").pop() ?? "";
  if (child.status !== 0 || !line.startsWith("{"))
    throw new Error(`bench child ${mode} failed: ${child.stderr || child.stdout}`);
  return JSON.parse(line) as ChildMeasurement;
}

const median = (values: number[]) =>
  [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)];

export interface TraceParseBenchReport {
  rows: number;
  fileMb: number;
  papaparseMs: number;
  papaparseMaxRssMb: number;
  /** Context, not a target: papaparse converting to numbers itself (dynamicTyping). */
  papaparseNumbersMs: number;
  oursMs: number;
  oursMaxRssMb: number;
  oursRssGrowthMb: number;
  timeRatio: number;
  memoryRatio: number;
  pass: boolean;
}

function runTraceParseBench(rounds = 3): TraceParseBenchReport {
  const dir = mkdtempSync(join(tmpdir(), "ionleaf-bench-"));
  try {
    const path = join(dir, "cv-1e6.csv");
    const bytes = writeCvExport(path);
    const papa: ChildMeasurement[] = [];
    const papaNumbers: ChildMeasurement[] = [];
    const ours: ChildMeasurement[] = [];
    for (let r = 0; r < rounds; r++) {
      papa.push(runChild("papaparse", path));
      ours.push(runChild("ours", path));
      papaNumbers.push(runChild("papaparse-numbers", path));
    }
    if (ours.some((m) => m.rows !== ROWS))
      throw new Error(`parsed ${ours[0].rows} rows, expected ${ROWS}`);
    const report = {
      rows: ROWS,
      fileMb: bytes / 2 ** 20,
      papaparseMs: median(papa.map((m) => m.ms)),
      papaparseMaxRssMb: median(papa.map((m) => m.maxRssMb)),
      papaparseNumbersMs: median(papaNumbers.map((m) => m.ms)),
      oursMs: median(ours.map((m) => m.ms)),
      oursMaxRssMb: median(ours.map((m) => m.maxRssMb)),
      oursRssGrowthMb: median(ours.map((m) => m.maxRssMb - m.rssAtStartMb)),
    };
    const timeRatio = report.oursMs / report.papaparseMs;
    const memoryRatio = report.oursMaxRssMb / report.papaparseMaxRssMb;
    return {
      ...report,
      timeRatio,
      memoryRatio,
      pass:
        report.oursMs < TARGET_MS && report.oursMaxRssMb < TARGET_MB && timeRatio <= TARGET_RATIO,
    };
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

export function printTraceParseBench(): TraceParseBenchReport {
  const r = runTraceParseBench();
  const ok = (b: boolean) => (b ? "PASS" : "FAIL");
  console.log(
    `traces: parse a ${r.rows.toLocaleString("en")}-row CV export (${r.fileMb.toFixed(1)} MB) from disk, median of 3 child processes each`,
  );
  console.log(
    `  papaparse alone (baseline): ${r.papaparseMs.toFixed(0)} ms, peak RSS ${r.papaparseMaxRssMb.toFixed(0)} MB`,
  );
  console.log(
    `  papaparse with dynamicTyping (numbers, for context): ${r.papaparseNumbersMs.toFixed(0)} ms`,
  );
  console.log(
    `  parseTraceFile:             ${r.oursMs.toFixed(0)} ms (target < ${TARGET_MS} ms) ${ok(r.oursMs < TARGET_MS)}, peak RSS ${r.oursMaxRssMb.toFixed(0)} MB (target < ${TARGET_MB} MB) ${ok(r.oursMaxRssMb < TARGET_MB)}, RSS growth ${r.oursRssGrowthMb.toFixed(0)} MB`,
  );
  console.log(
    `  ratio to papaparse alone:   time ${r.timeRatio.toFixed(2)}× (target ≤ ${TARGET_RATIO}×) ${ok(r.timeRatio <= TARGET_RATIO)}, peak RSS ${r.memoryRatio.toFixed(2)}×`,
  );
  return r;
}

const argv = process.argv;
if (argv[2] === "--child") {
  void measureInChild(argv[3] as Mode, argv[4]).then((m) => console.log(JSON.stringify(m)));
} else if (argv[1] && import.meta.url === pathToFileURL(argv[1]).href) {
  printTraceParseBench();
}
