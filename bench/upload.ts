/**
 * Benchmark: server memory during a 200 MB upload and the first paint of a trace block over
 * 1 000 000 points (bench/upload-run.ts), against the production build and its own database
 * in the bench's scratch cluster, in a child process with the scripts' tsconfig.
 * IONLEAF_SKIP_UPLOAD_BENCH=1 skips it.
 */
import { spawnSync } from "node:child_process";
import path from "node:path";

const ROOT = new URL("..", import.meta.url).pathname;

export function printUploadBench(): { pass: boolean } {
  console.log(
    "\nAttachments: a 200 MB upload's server memory, and a 1 000 000-point trace's first paint",
  );
  if (process.env.IONLEAF_SKIP_UPLOAD_BENCH === "1") {
    console.log("skipped (IONLEAF_SKIP_UPLOAD_BENCH=1)");
    return { pass: true };
  }
  const run = spawnSync(
    path.join(ROOT, "node_modules/.bin/tsx"),
    ["--tsconfig", "tsconfig.scripts.json", "bench/upload-run.ts"],
    { cwd: ROOT, stdio: "inherit" },
  );
  return { pass: run.status === 0 };
}
