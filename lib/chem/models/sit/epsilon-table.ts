/**
 * SIT ion-interaction coefficients ε(j,k) at 25 °C (kg/mol) for cation–anion pairs, from the
 * NEA Thermochemical Data Base review series: Grenthe et al. (1992) Chemical Thermodynamics of
 * Uranium, Appendix B, and Guillaumont et al. (2003) Update on the Chemical Thermodynamics of
 * U, Np, Pu, Am and Tc, Appendix B (Tables B-4, B-5), with Lemire et al. (2013). The values are
 * confirmed against a public database file that compiles them; which NEA volume each row comes
 * from is from memory. ε of two ions of the same sign is zero by the SIT convention.
 */
export interface SitEpsilonRow {
  cation: string;
  anion: string;
  epsilonKgPerMol: number;
  source: string;
}

const NEA =
  "NEA-TDB SIT coefficients (Grenthe et al. 1992; Guillaumont et al. 2003, App. B; Lemire et al. 2013)";

export const SIT_EPSILON_25C: readonly SitEpsilonRow[] = [
  { cation: "Ag+", anion: "Cl-", epsilonKgPerMol: 0.031, source: NEA },
  { cation: "Al^3+", anion: "Cl-", epsilonKgPerMol: 0.33, source: NEA },
  { cation: "Ba^2+", anion: "Cl-", epsilonKgPerMol: 0.07, source: NEA },
  { cation: "Ba^2+", anion: "ClO4-", epsilonKgPerMol: 0.15, source: NEA },
  { cation: "Ba^2+", anion: "NO3-", epsilonKgPerMol: -0.28, source: NEA },
  { cation: "Na+", anion: "Br-", epsilonKgPerMol: 0.05, source: NEA },
  { cation: "Ca^2+", anion: "Cl-", epsilonKgPerMol: 0.14, source: NEA },
  { cation: "Ca^2+", anion: "ClO4-", epsilonKgPerMol: 0.27, source: NEA },
  { cation: "Ca^2+", anion: "NO3-", epsilonKgPerMol: 0.02, source: NEA },
  { cation: "Cd^2+", anion: "Cl-", epsilonKgPerMol: 0.16, source: NEA },
  { cation: "Cd^2+", anion: "NO3-", epsilonKgPerMol: 0.09, source: NEA },
  { cation: "Na+", anion: "Cl-", epsilonKgPerMol: 0.03, source: NEA },
  { cation: "Co^2+", anion: "Cl-", epsilonKgPerMol: 0.16, source: NEA },
  { cation: "Co^2+", anion: "ClO4-", epsilonKgPerMol: 0.34, source: NEA },
  { cation: "Co^2+", anion: "NO3-", epsilonKgPerMol: 0.14, source: NEA },
  { cation: "Na+", anion: "CO3^2-", epsilonKgPerMol: -0.08, source: NEA },
  { cation: "Cu^2+", anion: "Cl-", epsilonKgPerMol: 0.08, source: NEA },
  { cation: "Cu^2+", anion: "ClO4-", epsilonKgPerMol: 0.32, source: NEA },
  { cation: "Cu^2+", anion: "NO3-", epsilonKgPerMol: 0.11, source: NEA },
  { cation: "Na+", anion: "F-", epsilonKgPerMol: 0.02, source: NEA },
  { cation: "Fe^2+", anion: "Cl-", epsilonKgPerMol: 0.17, source: NEA },
  { cation: "Fe^2+", anion: "ClO4-", epsilonKgPerMol: 0.37, source: NEA },
  { cation: "Fe^3+", anion: "Cl-", epsilonKgPerMol: 0.76, source: NEA },
  { cation: "Fe^3+", anion: "ClO4-", epsilonKgPerMol: 0.73, source: NEA },
  { cation: "Fe^3+", anion: "NO3-", epsilonKgPerMol: 0.42, source: NEA },
  { cation: "H+", anion: "Cl-", epsilonKgPerMol: 0.12, source: NEA },
  { cation: "H+", anion: "ClO4-", epsilonKgPerMol: 0.14, source: NEA },
  { cation: "H+", anion: "NO3-", epsilonKgPerMol: 0.07, source: NEA },
  { cation: "Na+", anion: "HCO3-", epsilonKgPerMol: 0.0, source: NEA },
  { cation: "Na+", anion: "HPO4^2-", epsilonKgPerMol: -0.15, source: NEA },
  { cation: "Na+", anion: "I-", epsilonKgPerMol: 0.08, source: NEA },
  { cation: "K+", anion: "Cl-", epsilonKgPerMol: 0.0, source: NEA },
  { cation: "K+", anion: "NO3-", epsilonKgPerMol: -0.11, source: NEA },
  { cation: "Li+", anion: "Cl-", epsilonKgPerMol: 0.1, source: NEA },
  { cation: "Li+", anion: "ClO4-", epsilonKgPerMol: 0.15, source: NEA },
  { cation: "Li+", anion: "NO3-", epsilonKgPerMol: 0.08, source: NEA },
  { cation: "Mg^2+", anion: "Cl-", epsilonKgPerMol: 0.19, source: NEA },
  { cation: "Mg^2+", anion: "ClO4-", epsilonKgPerMol: 0.33, source: NEA },
  { cation: "Mg^2+", anion: "NO3-", epsilonKgPerMol: 0.17, source: NEA },
  { cation: "Mn^2+", anion: "Cl-", epsilonKgPerMol: 0.13, source: NEA },
  { cation: "Na+", anion: "ClO4-", epsilonKgPerMol: 0.01, source: NEA },
  { cation: "NH4+", anion: "Cl-", epsilonKgPerMol: -0.01, source: NEA },
  { cation: "NH4+", anion: "ClO4-", epsilonKgPerMol: -0.08, source: NEA },
  { cation: "NH4+", anion: "NO3-", epsilonKgPerMol: -0.06, source: NEA },
  { cation: "Ni^2+", anion: "Cl-", epsilonKgPerMol: 0.17, source: NEA },
  { cation: "Ni^2+", anion: "ClO4-", epsilonKgPerMol: 0.37, source: NEA },
  { cation: "Ni^2+", anion: "NO3-", epsilonKgPerMol: 0.182, source: NEA },
  { cation: "Na+", anion: "NO3-", epsilonKgPerMol: -0.04, source: NEA },
  { cation: "Na+", anion: "OH-", epsilonKgPerMol: 0.04, source: NEA },
  { cation: "Pb^2+", anion: "Cl-", epsilonKgPerMol: 0.081, source: NEA },
  { cation: "Pb^2+", anion: "ClO4-", epsilonKgPerMol: 0.15, source: NEA },
  { cation: "Pb^2+", anion: "NO3-", epsilonKgPerMol: -0.2, source: NEA },
  { cation: "Na+", anion: "PO4^3-", epsilonKgPerMol: -0.25, source: NEA },
  { cation: "Na+", anion: "SO4^2-", epsilonKgPerMol: -0.12, source: NEA },
  { cation: "Zn^2+", anion: "Cl-", epsilonKgPerMol: 0.163, source: NEA },
  { cation: "Zn^2+", anion: "ClO4-", epsilonKgPerMol: 0.33, source: NEA },
  { cation: "Zn^2+", anion: "NO3-", epsilonKgPerMol: 0.16, source: NEA },
];
