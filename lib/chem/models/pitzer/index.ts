export { pitzerModel, computePitzer } from "./pitzer-model";
export { pitzerBinarySalt } from "./binary-salt";
export { pitzerMixture } from "./equations";
export { eTheta } from "./e-theta";
export { jFunction } from "./j-function";
export { binaryParameters } from "./parameter-tables";
export { assemblePitzerSystem } from "./assemble";
