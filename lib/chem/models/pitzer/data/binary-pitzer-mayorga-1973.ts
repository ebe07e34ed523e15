/**
 * Pitzer binary parameters of Pitzer & Mayorga (1973), J. Phys. Chem. 77, 2300–2308,
 * doi:10.1021/j100638a009 (Tables I–IX; 2:1, 3:1, 4:1 and 5:1 values converted from the
 * scaled form in which the paper prints them). Only the ion pairs that neither May et al.
 * (2011) nor HMW84 cover are kept here. The paper's own max-m column is not copied here,
 * so Ionleaf applies a conservative 1 mol/kg limit and says so.
 * Columns: salt, cation, anion, β0, β1, β2, α1, α2, Cφ (kg/mol units of the Pitzer equations,
 * 25 °C), maximum molality of the fit (mol/kg), where that limit comes from, source.
 * Copied from the publication's table; the test suite checks γ± computed from these
 * rows against tabulated γ± (Robinson & Stokes 1959; CRC Handbook / Hamer & Wu 1972).
 */
import { binaryRow as r, type PitzerBinaryRow } from "./binary-row";

const PM73 = "Pitzer & Mayorga (1973) J. Phys. Chem. 77, 2300-2308";
const LIMIT = "Ionleaf conservative limit: PM73 max m not copied here";

export const PITZER_MAYORGA_1973_BINARY: readonly PitzerBinaryRow[] = [
  r("NaClO3", "Na+", "ClO3-", 0.0249, 0.2455, 0, 2, 12, 0.0004, 1, LIMIT, `${PM73}, Table I`),
  r("NaH2AsO4", "Na+", "H2AsO4-", -0.0442, 0.2895, 0, 2, 12, 0, 1, LIMIT, `${PM73}, Table I`),
  r("NaBO2", "Na+", "BO2-", -0.0526, 0.1104, 0, 2, 12, 0.0154, 1, LIMIT, `${PM73}, Table I`),
  r("NaBF4", "Na+", "BF4-", -0.0252, 0.1824, 0, 2, 12, 0.0021, 1, LIMIT, `${PM73}, Table I`),
  r("KH2AsO4", "K+", "H2AsO4-", -0.0584, 0.0626, 0, 2, 12, 0, 1, LIMIT, `${PM73}, Table I`),
  r("KPtF6", "K+", "PtF6-", -0.163, -0.282, 0, 2, 12, 0, 1, LIMIT, `${PM73}, Table I`),
  r("TlClO4", "Tl+", "ClO4-", -0.087, -0.023, 0, 2, 12, 0, 1, LIMIT, `${PM73}, Table I`),
  r("TlNO3", "Tl+", "NO3-", -0.105, -0.378, 0, 2, 12, 0, 1, LIMIT, `${PM73}, Table I`),
  r("NH4Br", "NH4+", "Br-", 0.0624, 0.1947, 0, 2, 12, -0.00436, 1, LIMIT, `${PM73}, Table I`),
  r("Ba(OH)2", "Ba^2+", "OH-", 0.17175, 1.2, 0, 2, 12, 0, 1, LIMIT, `${PM73}, Table VI`),
  r("UO2Cl2", "UO2^2+", "Cl-", 0.42735, 1.644, 0, 2, 12, -0.0368632, 1, LIMIT, `${PM73}, Table VI`),
  r("UO2(ClO4)2", "UO2^2+", "ClO4-", 0.611325, 2.14425, 0, 2, 12, 0.0216852, 1, LIMIT, `${PM73}, Table VI`),
  r("UO2(NO3)2", "UO2^2+", "NO3-", 0.460725, 1.61325, 0, 2, 12, -0.031544, 1, LIMIT, `${PM73}, Table VI`),
  r("Na2CrO4", "Na+", "CrO4^2-", 0.09375, 1.3695, 0, 2, 12, -0.0021584, 1, LIMIT, `${PM73}, Table VI`),
  r("Na2HAsO4", "Na+", "HAsO4^2-", 0.030525, 1.62975, 0, 2, 12, 0.0018031, 1, LIMIT, `${PM73}, Table VI`),
  r("K2CrO4", "K+", "CrO4^2-", 0.075825, 1.239, 0, 2, 12, -0.0007796, 1, LIMIT, `${PM73}, Table VI`),
  r("K2HAsO4", "K+", "HAsO4^2-", 0.1296, 1.6485, 0, 2, 12, -0.0178191, 1, LIMIT, `${PM73}, Table VI`),
  r("AlCl3", "Al^3+", "Cl-", 0.699333, 5.844667, 0, 2, 12, 0.0027328, 1, LIMIT, `${PM73}, Table VIII`),
  r("Ga(ClO4)3", "Ga^3+", "ClO4-", 0.8254, 6.529333, 0, 2, 12, 0.034795, 1, LIMIT, `${PM73}, Table VIII`),
  r("InCl3", "In^3+", "Cl-", -1.12, -2.566667, 0, 2, 12, 0, 1, LIMIT, `${PM73}, Table VIII`),
  r("Na3AsO4", "Na+", "AsO4^3-", 0.2388, 3.93, 0, 2, 12, -0.0477276, 1, LIMIT, `${PM73}, Table VIII`),
  r("K3P3O9", "K+", "P3O9^3-", 0.324467, 5.566, 0, 2, 12, -0.0341022, 1, LIMIT, `${PM73}, Table VIII`),
  r("K3AsO4", "K+", "AsO4^3-", 0.4994, 4.340667, 0, 2, 12, -0.1299423, 1, LIMIT, `${PM73}, Table VIII`),
  r("ThCl4", "Th^4+", "Cl-", 1.081333, 14.22, 0, 2, 12, -0.1273635, 1, LIMIT, `${PM73}, Table IX`),
  r("Na4P2O7", "Na+", "P2O7^4-", 0.436875, 10.725, 0, 2, 12, 0, 1, LIMIT, `${PM73}, Table IX`),
  r("K4P2O7", "K+", "P2O7^4-", 0.610625, 11.175, 0, 2, 12, -0.0755625, 1, LIMIT, `${PM73}, Table IX`),
  r("Na5P3O10", "Na+", "P3O10^5-", 1.1214, 21.66, 0, 2, 12, -0.0437375, 1, LIMIT, `${PM73}, Table IX`),
  r("K5P3O10", "K+", "P3O10^5-", 1.1634, 23.784, 0, 2, 12, -0.0283086, 1, LIMIT, `${PM73}, Table IX`),
  r("NaCH3COO", "Na+", "CH3COO-", 0.1426, 0.3237, 0, 2, 12, -0.00629, 1, LIMIT, `${PM73}, Table II`),
  r("KCH3COO", "K+", "CH3COO-", 0.1587, 0.3251, 0, 2, 12, -0.0066, 1, LIMIT, `${PM73}, Table II`),
];
