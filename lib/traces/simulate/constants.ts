/** The simulation uses lib/chem's CODATA 2018 constants, so simulated and expected values share them. */
export { FARADAY_C_PER_MOL, GAS_CONSTANT_J_PER_MOL_K } from "@/lib/chem";
