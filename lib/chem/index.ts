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
export { FARADAY_C_PER_MOL, GAS_CONSTANT_J_PER_MOL_K } from "./constants";
export { waterViscosityMPaS } from "./solvents/water-viscosity";
export {
  limitingIonicConductivity,
  listIonicConductivities,
  conductivityTemperatureRatio,
} from "./electrochem/ionic-conductivity";
export type { LimitingConductivity } from "./electrochem/ionic-conductivity";
export {
  electrolyteConductivity,
  onsagerCoefficients,
  CONDUCTIVITY_METHOD,
} from "./electrochem/electrolyte-conductivity";
export type {
  IonConcentration,
  ElectrolyteConductivityInput,
  ElectrolyteConductivityResult,
} from "./electrochem/electrolyte-conductivity";
export {
  liquidJunctionPotential,
  junctionCorrectedPotential,
} from "./electrochem/junction-potential";
export type {
  JunctionPotentialInput,
  JunctionPotentialResult,
} from "./electrochem/junction-potential";
export { referenceFillingSolution } from "./electrochem/reference-fillings";
export { uncompensatedResistanceDisk, iRDrop } from "./electrochem/uncompensated-resistance";
export { listRedoxProbes, findRedoxProbe, diffusionCoefficient } from "./electrochem/redox-probes";
export type {
  RedoxProbe,
  RedoxProbeId,
  DiffusionCoefficientResult,
} from "./electrochem/redox-probes";
export {
  randlesSevcikPeakCurrent,
  reversiblePeakSeparationV,
  expectedPeakCurrent,
} from "./electrochem/peak-current";
export type {
  RandlesSevcikInput,
  ExpectedPeakInput,
  ExpectedPeak,
} from "./electrochem/peak-current";
export { judgeVoltammogram } from "./electrochem/judge-voltammogram";
export type { JudgeVoltammogramInput, VoltammogramVerdict } from "./electrochem/judge-voltammogram";
