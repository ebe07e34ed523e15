// Adds up vitest's JSON reports and prints one closing line: "tests: N passed, N failed".
// A file that failed to load (no test ran in it) counts as one failure.
import { existsSync, readFileSync } from "node:fs";

let passed = 0;
let failed = 0;
let skipped = 0;
for (const file of process.argv.slice(2)) {
  if (!existsSync(file)) continue;
  const report = JSON.parse(readFileSync(file, "utf8"));
  passed += report.numPassedTests ?? 0;
  failed += report.numFailedTests ?? 0;
  skipped += (report.numPendingTests ?? 0) + (report.numTodoTests ?? 0);
  if (!report.success && (report.numFailedTests ?? 0) === 0)
    failed += Math.max(1, report.numFailedTestSuites ?? 0);
}
console.log("");
console.log(`tests: ${passed} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ""}`);
process.exit(failed > 0 || passed === 0 ? 1 : 0);
