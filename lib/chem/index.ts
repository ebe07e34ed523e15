/** Public API of the electrolyte engine (see docs/architecture.md, "The computation contract"). */
export { ENGINE_VERSION } from "./version";
export { ChemInputError, isChemInputError } from "./errors";
export { parseFormula, molarMass } from "./formula";
export type { ParsedFormula, Composition } from "./formula";
export { debyeHuckelConstants, debyeHuckelConstantsFrom } from "./debye-huckel-constants";
export { waterRelativePermittivity, waterDensityGPerMl } from "./solvents/water";
export { listSolvents } from "./solvents/catalogue";
export type { ActivityModelId, DebyeHuckelConstants } from "./models/types";
export { searchSpecies } from "./species/catalogue";
export { resolveSpecies } from "./species/resolve";
export type { ResolvedSpecies } from "./species/resolve";
export { computeSolution } from "./solution/compute-solution";
export type {
  SolutionInput,
  SolutionResult,
  SolutionComponentInput,
  IonResult,
  SaltResult,
  ComponentResult,
} from "./solution/types";
export { ACTIVITY_MODELS, listActivityModels, MODEL_REGISTRY, getModel } from "./models/registry";
export type { ActivityModelSummary, RequestedModel } from "./models/registry";
export { chooseModel, AUTO_CANDIDATES } from "./models/auto";
export type { AutoCandidate, AutoContext, AutoChoice } from "./models/auto";
export type {
  ActivityModel,
  ActivityModelInput,
  ActivityModelOutput,
  ActivityModelOptions,
  ModelIon,
} from "./models/types";
export {
  nernstPotential,
  nernstPotentialDetailed,
  nernstSlopeV,
  listCouples,
} from "./electrochem/nernst";
export type { NernstInput, NernstResult } from "./electrochem/nernst";
export {
  convertPotential,
  convertPotentialDetailed,
  listReferenceElectrodes,
  referencePotentialVsShe,
} from "./electrochem/reference-electrodes";
export type { ReferenceElectrodeId, PotentialOptions } from "./electrochem/reference-electrodes";
export { designBuffer, speciate } from "./acid-base";
export type {
  DesignBufferInput,
  DesignBufferResult,
  SpeciateInput,
  SpeciateResult,
  SpeciateComponent,
  RecipeComponent,
  SpeciesResult,
  ActivityConvention,
  BufferSystemId,
} from "./acid-base";
