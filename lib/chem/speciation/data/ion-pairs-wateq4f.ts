/**
 * Ion-association constants at 25 °C and I = 0 for M + L ⇌ ML, with the enthalpy of reaction
 * or an analytical log K(T), from the WATEQ4F compilation: Ball & Nordstrom (1991), User's
 * manual for WATEQ4F, U.S. Geol. Surv. Open-File Report 91-183 (major ions after Nordstrom
 * et al. 1990, ACS Symp. Ser. 416, 398). Public copy: github usgs-coupled/phreeqc3
 * database/wateq4f.dat (read for this table). ΔH° is given there in kcal/mol; here in kJ/mol
 * (× 4.184). Analytical form: log10 K = A1 + A2 T + A3/T + A4 log10 T + A5/T² (T in K).
 *
 * Alkali hexacyanoferrate pairs: Eaton, George & Hanania (1967) J. Phys. Chem. 71, 2016 —
 * values from memory (no public copy found); marked so, and the tests use them only for
 * self-consistency.
 *
 * Not included: CaCl⁺ and MgCl⁺ (not in WATEQ4F; no compilation value could be read).
 */
export interface IonPairRow {
  /** Formula of the pair as Ionleaf writes it ("MgSO4(aq)", "NaSO4-"). */
  pair: string;
  cation: string;
  anion: string;
  log10K25: number;
  /** ΔrH° in kJ/mol, for the van 't Hoff form when no analytical expression is given. */
  deltaHkJPerMol: number;
  /** A1…A5 of the analytical log K(T), when published. */
  analytic?: readonly [number, number, number, number, number];
  source: string;
}

const W = "WATEQ4F (Ball & Nordstrom 1991)";
const EGH = "Eaton, George & Hanania (1967) J. Phys. Chem. 71, 2016 (from memory)";
const kcal = (x: number) => x * 4.184;

const p = (
  pair: string,
  cation: string,
  anion: string,
  log10K25: number,
  deltaHkcal: number,
  analytic?: IonPairRow["analytic"],
  source = W,
): IonPairRow => ({
  pair,
  cation,
  anion,
  log10K25,
  deltaHkJPerMol: kcal(deltaHkcal),
  ...(analytic ? { analytic } : {}),
  source,
});

export const ION_PAIRS: readonly IonPairRow[] = [
  // sulfate
  p("CaSO4(aq)", "Ca^2+", "SO4^2-", 2.3, 1.65),
  p("MgSO4(aq)", "Mg^2+", "SO4^2-", 2.37, 4.55),
  p("NaSO4-", "Na+", "SO4^2-", 0.7, 1.12),
  p("KSO4-", "K+", "SO4^2-", 0.85, 2.25, [3.106, 0, -673.6, 0, 0]),
  p("LiSO4-", "Li+", "SO4^2-", 0.64, 0),
  p("NH4SO4-", "NH4+", "SO4^2-", 1.11, 0),
  p("HSO4-", "H+", "SO4^2-", 1.988, 3.85, [-56.889, 0.006473, 2307.9, 19.8858, 0]),
  p("MnSO4(aq)", "Mn^2+", "SO4^2-", 2.25, 3.37),
  p("FeSO4(aq)", "Fe^2+", "SO4^2-", 2.25, 3.23),
  p("CuSO4(aq)", "Cu^2+", "SO4^2-", 2.31, 1.22),
  p("ZnSO4(aq)", "Zn^2+", "SO4^2-", 2.37, 1.36),
  p("CdSO4(aq)", "Cd^2+", "SO4^2-", 2.46, 1.08),
  p("NiSO4(aq)", "Ni^2+", "SO4^2-", 2.29, 1.52),
  p("PbSO4(aq)", "Pb^2+", "SO4^2-", 2.75, 0),
  p("AgSO4-", "Ag+", "SO4^2-", 1.29, 1.49),
  p("FeSO4+", "Fe^3+", "SO4^2-", 4.04, 3.91),
  p("AlSO4+", "Al^3+", "SO4^2-", 3.5, 2.29),
  // carbonate
  p("CaCO3(aq)", "Ca^2+", "CO3^2-", 3.224, 3.545, [-1228.732, -0.299444, 35512.75, 485.818, 0]),
  p("CaHCO3+", "Ca^2+", "HCO3-", 1.106, 2.69, [1209.12, 0.31294, -34765.05, -478.782, 0]),
  p("MgCO3(aq)", "Mg^2+", "CO3^2-", 2.98, 2.713, [0.991, 0.00667, 0, 0, 0]),
  p("MgHCO3+", "Mg^2+", "HCO3-", 1.07, 0.79, [-59.215, 0, 2537.455, 20.92298, 0]),
  p("NaCO3-", "Na+", "CO3^2-", 1.27, 8.91),
  p("NaHCO3(aq)", "Na+", "HCO3-", -0.25, 0),
  p("SrCO3(aq)", "Sr^2+", "CO3^2-", 2.81, 5.22, [-1.019, 0.012826, 0, 0, 0]),
  p("SrHCO3+", "Sr^2+", "HCO3-", 1.18, 6.05, [-3.248, 0.014867, 0, 0, 0]),
  // phosphate
  p("NaHPO4-", "Na+", "HPO4^2-", 0.29, 0),
  p("KHPO4-", "K+", "HPO4^2-", 0.29, 0),
  p("MgHPO4(aq)", "Mg^2+", "HPO4^2-", 2.87, 3.3),
  p("CaHPO4(aq)", "Ca^2+", "HPO4^2-", 2.739, 3.3),
  p("CaPO4-", "Ca^2+", "PO4^3-", 6.459, 3.1),
  p("CaH2PO4+", "Ca^2+", "H2PO4-", 1.408, 3.4),
  p("MgPO4-", "Mg^2+", "PO4^3-", 6.589, 3.1),
  p("MgH2PO4+", "Mg^2+", "H2PO4-", 1.513, 3.4),
  p("FeHPO4(aq)", "Fe^2+", "HPO4^2-", 3.6, 0),
  p("FeH2PO4+", "Fe^2+", "H2PO4-", 2.7, 0),
  // first chloro and nitrato complexes of the transition metals
  p("MnCl+", "Mn^2+", "Cl-", 0.61, 0),
  p("CuCl+", "Cu^2+", "Cl-", 0.43, 8.65),
  p("ZnCl+", "Zn^2+", "Cl-", 0.43, 7.79),
  p("CdCl+", "Cd^2+", "Cl-", 1.98, 0.59),
  p("NiCl+", "Ni^2+", "Cl-", 0.4, 0),
  p("PbCl+", "Pb^2+", "Cl-", 1.6, 4.38),
  p("FeCl^2+", "Fe^3+", "Cl-", 1.48, 5.6),
  p("CdNO3+", "Cd^2+", "NO3-", 0.4, -5.2),
  p("PbNO3+", "Pb^2+", "NO3-", 1.17, 0),
  // fluoride
  p("MgF+", "Mg^2+", "F-", 1.82, 3.2),
  p("CaF+", "Ca^2+", "F-", 0.94, 4.12),
  // alkali hexacyanoferrates
  p("KFe(CN)6^3-", "K+", "Fe(CN)6^4-", 2.35, 0, undefined, EGH),
  p("KFe(CN)6^2-", "K+", "Fe(CN)6^3-", 1.46, 0, undefined, EGH),
];
