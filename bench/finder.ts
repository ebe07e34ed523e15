/**
 * Benchmark: the solution finder at a million solution rows (bench/finder-run.ts). It runs
 * in a child process with the scripts' tsconfig (server modules need the server-only shim)
 * and against its own scratch PostgreSQL cluster, so `npm run bench` stays one command:
 * the first run creates and seeds the database (about 1.5 minutes) and builds the app (a few
 * minutes); later runs take about two minutes. Set IONLEAF_SKIP_FINDER_BENCH=1 to skip it.
 */
import { spawnSync } from "node:child_process";
import path from "node:path";

const ROOT = new URL("..", import.meta.url).pathname;

export function printFinderBench(): { pass: boolean } {
  console.log("\nSolution finder at 1 000 000 solution rows (200 000 current)");
  if (process.env.IONLEAF_SKIP_FINDER_BENCH === "1") {
    console.log("skipped (IONLEAF_SKIP_FINDER_BENCH=1)");
    return { pass: true };
  }
  const run = spawnSync(
    path.join(ROOT, "node_modules/.bin/tsx"),
    ["--tsconfig", "tsconfig.scripts.json", "bench/finder-run.ts"],
    { cwd: ROOT, stdio: "inherit" },
  );
  return { pass: run.status === 0 };
}
