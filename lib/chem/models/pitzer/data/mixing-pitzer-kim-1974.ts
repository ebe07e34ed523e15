/**
 * θ and ψ mixing parameters at 25 °C of Pitzer & Kim (1974), J. Am. Chem. Soc. 96, 5701–5707,
 * kept only for pairs of ions of the SAME charge that HMW84 do not cover (Li+, Br−, NO3−,
 * ClO4−, Cs+, NH4+, CH3COO− mixtures). Pitzer & Kim fitted without the Eθ terms; for ions of
 * equal charge Eθ is identically zero, so these values are consistent with the Eθ framework.
 * Their values for pairs of different charge (e.g. θ(Na, Mg) = 0) predate Eθ and are left out.
 */
import { thetaRow as theta, psiRow as psi, type PitzerMixingRow } from "./mixing-row";

const SOURCE = "Pitzer & Kim (1974) J. Am. Chem. Soc. 96, 5701-5707";

export const PITZER_KIM_1974_MIXING: readonly PitzerMixingRow[] = [
  theta("Li+", "Na+", 0.012, SOURCE),
  theta("Cs+", "Na+", -0.033, SOURCE),
  theta("K+", "Li+", -0.022, SOURCE),
  theta("Cs+", "K+", 0, SOURCE),
  theta("Cs+", "Li+", -0.095, SOURCE),
  theta("H+", "Li+", 0.015, SOURCE),
  theta("H+", "NH4+", -0.016, SOURCE),
  theta("Cs+", "H+", -0.044, SOURCE),
  theta("Br-", "Cl-", 0, SOURCE),
  theta("Cl-", "NO3-", 0.016, SOURCE),
  theta("Br-", "OH-", -0.065, SOURCE),
  psi("Li+", "Na+", "Cl-", -0.003, SOURCE),
  psi("Cs+", "Na+", "Cl-", -0.003, SOURCE),
  psi("K+", "Li+", "Cl-", -0.01, SOURCE),
  psi("Cs+", "K+", "Cl-", -0.0013, SOURCE),
  psi("Cs+", "Li+", "Cl-", -0.0094, SOURCE),
  psi("H+", "Li+", "Cl-", 0, SOURCE),
  psi("H+", "NH4+", "Cl-", 0, SOURCE),
  psi("Cs+", "H+", "Cl-", -0.019, SOURCE),
  psi("K+", "Na+", "Br-", -0.0022, SOURCE),
  psi("H+", "Na+", "Br-", -0.012, SOURCE),
  psi("H+", "K+", "Br-", -0.021, SOURCE),
  psi("H+", "Li+", "Br-", 0, SOURCE),
  psi("K+", "Na+", "NO3-", -0.0012, SOURCE),
  psi("Li+", "Na+", "NO3-", -0.0072, SOURCE),
  psi("Li+", "Na+", "ClO4-", -0.008, SOURCE),
  psi("H+", "Na+", "ClO4-", -0.016, SOURCE),
  psi("H+", "Li+", "ClO4-", -0.0017, SOURCE),
  psi("Li+", "Na+", "CH3COO-", -0.0043, SOURCE),
  psi("Br-", "Cl-", "Na+", 0, SOURCE),
  psi("Cl-", "NO3-", "Na+", -0.006, SOURCE),
  psi("Br-", "OH-", "Na+", -0.018, SOURCE),
  psi("Cl-", "NO3-", "Mg^2+", 0, SOURCE),
  psi("Cl-", "NO3-", "Ca^2+", -0.017, SOURCE),
  psi("Br-", "Cl-", "K+", 0, SOURCE),
  psi("Cl-", "NO3-", "K+", -0.006, SOURCE),
  psi("Br-", "OH-", "K+", -0.014, SOURCE),
  psi("Cl-", "NO3-", "Li+", -0.003, SOURCE),
];
