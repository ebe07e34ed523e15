export { sitModel, computeSit, sitCoverage } from "./sit-model";
