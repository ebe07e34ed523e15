/**
 * `npm run bench`: every area's benchmark, one import line each. Times are medians on this
 * machine; the load average is printed because the machine is shared.
 */
import os from "node:os";
import { printDhBench } from "./chem-dh";
import { printPitzerBench } from "./chem-pitzer";
import { printBufferBench } from "./chem-buffer";
import { printEditorRecomputeBench } from "./editor-recompute";
import { printSeawaterBench } from "./chem-seawater";
import { printSweepBench } from "./chem-sweep";
import { printTraceParseBench } from "./trace-parse";
import { printFinderBench } from "./finder";
import { printLoadBench } from "./load";
import { printUploadBench } from "./upload";

console.log(
  `Node ${process.version}, ${os.cpus().length} CPU(s), load average ${os
    .loadavg()
    .map((l) => l.toFixed(2))
    .join(" ")}\n`,
);

const reports = [
  printDhBench(),
  printPitzerBench(),
  printBufferBench(),
  printEditorRecomputeBench(),
  printSeawaterBench(),
  printSweepBench(),
  printTraceParseBench(),
  printFinderBench(),
  printLoadBench(),
  printUploadBench(),
];

const failed = reports.filter((r) => !r.pass).length;
console.log(
  `\n${reports.length - failed} of ${reports.length} benchmarks within target${failed ? ` (${failed} over: see above; check the load average)` : ""}.`,
);
