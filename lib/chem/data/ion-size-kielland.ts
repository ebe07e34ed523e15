/**
 * Ion-size parameters å (ångström) of Kielland (1937), J. Am. Chem. Soc. 59, 1675–1678,
 * for the extended Debye–Hückel equation in water. Values as in
 * ../shared/reference/ion_size.csv (recalled; most confirmed by the same value in the EQ3/6
 * llnl.dat database). Kielland's "4.0–4.5" class is entered as 4.0, as Freeze & Cherry (1979)
 * App. IV reproduce it. Tetraalkylammonium sizes are Kielland's as recalled (memory).
 */
export const KIELLAND_ION_SIZE_SOURCE = "Kielland (1937) J. Am. Chem. Soc. 59, 1675–1678";

export const KIELLAND_ION_SIZE_ANGSTROM: Readonly<Record<string, number>> = {
  "H+": 9, "Li+": 6, "Na+": 4, "K+": 3, "Rb+": 2.5, "Cs+": 2.5, "NH4+": 2.5, "Ag+": 2.5, "Tl+": 2.5,
  "Mg^2+": 8, "Be^2+": 8, "Ca^2+": 6, "Cu^2+": 6, "Zn^2+": 6, "Mn^2+": 6, "Fe^2+": 6, "Ni^2+": 6,
  "Co^2+": 6, "Sn^2+": 6, "Sr^2+": 5, "Ba^2+": 5, "Cd^2+": 5, "Hg^2+": 5, "Pb^2+": 4.5, "Hg2^2+": 4,
  "Al^3+": 9, "Fe^3+": 9, "Cr^3+": 9, "La^3+": 9, "Ce^3+": 9, "In^3+": 9, "Ce^4+": 11,
  "N(CH3)4^+": 4.5, "N(C2H5)4^+": 6, "N(C3H7)4^+": 8,
  "F-": 3.5, "OH-": 3.5, "HS-": 3.5, "SCN-": 3.5, "ClO3-": 3.5, "ClO4-": 3.5, "BrO3-": 3.5,
  "IO4-": 3.5, "MnO4-": 3.5, "Cl-": 3, "Br-": 3, "I-": 3, "CN-": 3, "NO2-": 3, "NO3-": 3,
  "HCO3-": 4, "H2PO4-": 4, "IO3-": 4, "CH3COO-": 4, "HCOO-": 3.5,
  "CO3^2-": 4.5, "SO3^2-": 4.5, "MoO4^2-": 4.5, "C2O4^2-": 4.5,
  "SO4^2-": 4, "S2O3^2-": 4, "CrO4^2-": 4, "HPO4^2-": 4, "S^2-": 5, "WO4^2-": 5,
  "PO4^3-": 4, "Fe(CN)6^3-": 4, "Fe(CN)6^4-": 5,
};
