/**
 * Pitzer binary parameters of Harvie, Møller & Weare (1984), Geochim. Cosmochim. Acta 48,
 * 723–751, doi:10.1016/0016-7037(84)90098-X: the Na–K–Mg–Ca–H–Cl–SO4–OH–HCO3–CO3 system at
 * 25 °C, fitted together with the θ/ψ mixing terms of mixing-hmw-1984.ts and the Eθ terms.
 * HMW84 state no per-salt molality limit in this table: where the same salt is in May et al.
 * (2011) its fitted range is used; otherwise the limit and its basis are stated per row.
 * Columns: salt, cation, anion, β0, β1, β2, α1, α2, Cφ (kg/mol units of the Pitzer equations,
 * 25 °C), maximum molality of the fit (mol/kg), where that limit comes from, source.
 * Copied from the publication's table; the test suite checks γ± computed from these
 * rows against tabulated γ± (Robinson & Stokes 1959; CRC Handbook / Hamer & Wu 1972).
 */
import { binaryRow as r, type PitzerBinaryRow } from "./binary-row";

const SOURCE = "Harvie, Moller & Weare (1984) Geochim. Cosmochim. Acta 48, 723-751";

/**
 * HMW84 fitted these pairs from solubilities and e.m.f. in mixtures (chloride and sulfate media)
 * up to about I = 6 mol/kg (from memory of the paper's range); that is their limit in a mixture.
 */
const MIXTURE_I_MAX = 6;

export const HMW_1984_BINARY: readonly PitzerBinaryRow[] = [
  r("NaCl", "Na+", "Cl-", 0.0765, 0.2644, 0, 2, 12, 0.00127, 6.148, "range of the same salt in May et al. (2011)", SOURCE),
  r("Na2SO4", "Na+", "SO4^2-", 0.01958, 1.113, 0, 2, 12, 0.00497, 5, "range of the same salt in May et al. (2011)", SOURCE),
  { ...r("NaHSO4", "Na+", "HSO4-", 0.0454, 0.398, 0, 2, 12, 0, 1, "Ionleaf conservative limit: HMW84 give no per-salt range", SOURCE), maxIonicStrengthMolal: MIXTURE_I_MAX },
  r("NaOH", "Na+", "OH-", 0.0864, 0.253, 0, 2, 12, 0.0044, 11.5, "range of the same salt in May et al. (2011)", SOURCE),
  r("NaHCO3", "Na+", "HCO3-", 0.0277, 0.0411, 0, 2, 12, 0, 1.3, "range of the same salt in May et al. (2011)", SOURCE),
  r("Na2CO3", "Na+", "CO3^2-", 0.0399, 1.389, 0, 2, 12, 0.0044, 3.115, "range of the same salt in May et al. (2011)", SOURCE),
  r("KCl", "K+", "Cl-", 0.04835, 0.2122, 0, 2, 12, -0.00084, 5, "range of the same salt in May et al. (2011)", SOURCE),
  r("K2SO4", "K+", "SO4^2-", 0.04995, 0.7793, 0, 2, 12, 0, 2, "range of the same salt in May et al. (2011)", SOURCE),
  { ...r("KHSO4", "K+", "HSO4-", -0.0003, 0.1735, 0, 2, 12, 0, 1, "Ionleaf conservative limit: HMW84 give no per-salt range", SOURCE), maxIonicStrengthMolal: MIXTURE_I_MAX },
  r("KOH", "K+", "OH-", 0.1298, 0.32, 0, 2, 12, 0.0041, 14, "range of the same salt in May et al. (2011)", SOURCE),
  r("KHCO3", "K+", "HCO3-", 0.0296, -0.013, 0, 2, 12, -0.008, 1, "range of the same salt in May et al. (2011)", SOURCE),
  r("K2CO3", "K+", "CO3^2-", 0.1488, 1.43, 0, 2, 12, -0.0015, 8.102, "range of the same salt in May et al. (2011)", SOURCE),
  r("CaCl2", "Ca^2+", "Cl-", 0.3159, 1.614, 0, 2, 12, -0.00034, 5, "range of the same salt in May et al. (2011)", SOURCE),
  { ...r("CaSO4", "Ca^2+", "SO4^2-", 0.2, 3.1973, -54.24, 1.4, 12, 0, 0.02, "solubility of gypsum (about 0.015 mol/kg); HMW84 give no per-salt limit", SOURCE), maxIonicStrengthMolal: MIXTURE_I_MAX },
  { ...r("Ca(HSO4)2", "Ca^2+", "HSO4-", 0.2145, 2.53, 0, 2, 12, 0, 1, "Ionleaf conservative limit: HMW84 give no per-salt range", SOURCE), maxIonicStrengthMolal: MIXTURE_I_MAX },
  { ...r("Ca(OH)2", "Ca^2+", "OH-", -0.1747, -0.2303, -5.72, 2, 12, 0, 0.02, "solubility of portlandite (about 0.02 mol/kg); HMW84 give no per-salt limit", SOURCE), maxIonicStrengthMolal: MIXTURE_I_MAX },
  { ...r("Ca(HCO3)2", "Ca^2+", "HCO3-", 0.4, 2.977, 0, 2, 12, 0, 1, "Ionleaf conservative limit: HMW84 give no per-salt range", SOURCE), maxIonicStrengthMolal: MIXTURE_I_MAX },
  r("MgCl2", "Mg^2+", "Cl-", 0.35235, 1.6815, 0, 2, 12, 0.00519, 5.925, "range of the same salt in May et al. (2011)", SOURCE),
  r("MgSO4", "Mg^2+", "SO4^2-", 0.221, 3.343, -37.23, 1.4, 12, 0.025, 3.618, "range of the same salt in May et al. (2011)", SOURCE),
  { ...r("Mg(HSO4)2", "Mg^2+", "HSO4-", 0.4746, 1.729, 0, 2, 12, 0, 1, "Ionleaf conservative limit: HMW84 give no per-salt range", SOURCE), maxIonicStrengthMolal: MIXTURE_I_MAX },
  { ...r("Mg(HCO3)2", "Mg^2+", "HCO3-", 0.329, 0.6072, 0, 2, 12, 0, 1, "Ionleaf conservative limit: HMW84 give no per-salt range", SOURCE), maxIonicStrengthMolal: MIXTURE_I_MAX },
  r("HCl", "H+", "Cl-", 0.1775, 0.2945, 0, 2, 12, 0.0008, 10.5, "range of the same salt in May et al. (2011)", SOURCE),
  { ...r("H2SO4", "H+", "SO4^2-", 0.0298, 0, 0, 2, 12, 0.0438, 1, "Ionleaf conservative limit: HMW84 give no per-salt range", SOURCE), maxIonicStrengthMolal: MIXTURE_I_MAX },
  { ...r("HHSO4", "H+", "HSO4-", 0.2065, 0.5556, 0, 2, 12, 0, 1, "Ionleaf conservative limit: HMW84 give no per-salt range", SOURCE), maxIonicStrengthMolal: MIXTURE_I_MAX },
];
