/** Simulated traces and the files they are written as: fixtures for tests and the bench. */
export { simulateReversibleCv } from "./cv-reversible";
export type { ReversibleCvInput, SimulatedCv } from "./cv-reversible";
export { simulateChronoamperometry } from "./chronoamperometry";
export type { ChronoamperometryInput, SimulatedChronoamperometry } from "./chronoamperometry";
export { simulateRandlesSpectrum, randlesImpedance } from "./impedance-randles";
export type { RandlesInput, SimulatedImpedance } from "./impedance-randles";
export { simulateOpenCircuit } from "./open-circuit";
export type { OpenCircuitInput } from "./open-circuit";
export {
  allLayoutVariants,
  describeLayout,
  NAME_STYLES,
  HEADER_STYLES,
  UNIT_SETS,
  DIALECTS,
} from "./layouts";
export type { TraceFileLayout, NameStyle, HeaderStyle } from "./layouts";
export { writeTraceFile, columnNameFor, formatValue, writtenUnit } from "./write-trace-file";
export type { TraceToWrite } from "./write-trace-file";
export { seededRandom, seededGaussian } from "./random";
export {
  cvTrace,
  chronoamperometryTrace,
  impedanceTrace,
  openCircuitTrace,
} from "./traces-to-write";
