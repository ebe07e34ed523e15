export { pitzerModel, computePitzer, PITZER_FORMULA_TEX } from "./pitzer-model";
export { pitzerBinarySalt, meanLnGamma, stoichiometry } from "./binary-salt";
export type { BinarySaltInput, BinarySaltResult } from "./binary-salt";
export { pitzerMixture } from "./equations";
export { eTheta } from "./e-theta";
export { jFunction } from "./j-function";
export {
  BINARY_SETS_IN_PRIORITY,
  binaryParameters,
  thetaParameter,
  psiParameter,
} from "./parameter-tables";
export { assemblePitzerSystem } from "./assemble";
export { pitzerCoverage } from "./coverage";
export type { PitzerCoverage } from "./coverage";
export { pairAtTemperature } from "./temperature/pair-at-temperature";
export type { PairAtTemperature } from "./temperature/pair-at-temperature";
