export {
  sitModel,
  computeSit,
  sitCoverage,
  sitEpsilon,
  sitMissingPairs,
  SIT_MAX_IONIC_STRENGTH_MOLAL,
} from "./sit-model";
export { SIT_EPSILON_25C } from "./epsilon-table";
export type { SitEpsilonRow } from "./epsilon-table";
