/**
 * Benchmark: 50 signed-in members saving and searching at once (bench/load-run.ts), against
 * the production build and its own database in the bench's scratch cluster. It runs in a
 * child process with the scripts' tsconfig, like the finder bench. The mixed run lasts 60 s;
 * IONLEAF_LOAD_SECONDS sets another length, IONLEAF_SKIP_LOAD_BENCH=1 skips it.
 */
import { spawnSync } from "node:child_process";
import path from "node:path";

const ROOT = new URL("..", import.meta.url).pathname;

export function printLoadBench(): { pass: boolean } {
  const seconds = process.env.IONLEAF_LOAD_SECONDS ?? "60";
  console.log(`\nLoad: 50 signed-in members saving and searching for ${seconds} s`);
  if (process.env.IONLEAF_SKIP_LOAD_BENCH === "1") {
    console.log("skipped (IONLEAF_SKIP_LOAD_BENCH=1)");
    return { pass: true };
  }
  const run = spawnSync(
    path.join(ROOT, "node_modules/.bin/tsx"),
    ["--tsconfig", "tsconfig.scripts.json", "bench/load-run.ts", "--duration", seconds],
    { cwd: ROOT, stdio: "inherit" },
  );
  return { pass: run.status === 0 };
}
