export { pitzerModel, computePitzer } from "./pitzer-model";
export { pitzerWaterAPhi } from "./water-a-phi";
export { pitzerBinarySalt } from "./binary-salt";
export { pitzerMixture } from "./equations";
export { eTheta } from "./e-theta";
export { jFunction } from "./j-function";
export { BINARY_SETS_IN_PRIORITY, binaryParameters } from "./parameter-tables";
export { assemblePitzerSystem } from "./assemble";
export { pairAtTemperature } from "./temperature/pair-at-temperature";
