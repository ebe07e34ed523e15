/** Simulated traces and the files they are written as: fixtures for tests and the bench. */
export { simulateReversibleCv } from "./cv-reversible";
export { simulateChronoamperometry } from "./chronoamperometry";
export { simulateRandlesSpectrum, randlesImpedance } from "./impedance-randles";
export { simulateOpenCircuit } from "./open-circuit";
export { allLayoutVariants, describeLayout } from "./layouts";
export type { TraceFileLayout } from "./layouts";
export { writeTraceFile } from "./write-trace-file";
export {
  cvTrace,
  chronoamperometryTrace,
  impedanceTrace,
  openCircuitTrace,
} from "./traces-to-write";
