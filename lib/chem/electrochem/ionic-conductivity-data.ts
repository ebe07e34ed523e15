/**
 * Limiting (infinite-dilution) molar ionic conductivities per unit charge, λ°, in water at
 * 25 °C, in S cm² mol⁻¹ (= 10⁻⁴ m² S mol⁻¹): CRC Handbook of Chemistry and Physics,
 * P. Vanýsek, "Ionic Conductivity and Diffusion at Infinite Dilution" (e.g. 92nd ed. 2011).
 * Inorganic ions as transcribed in the open `chemicals` library
 * (github.com/CalebBell/chemicals, "CRC conductivity infinite dilution.tsv"; confirmed);
 * the organic ions (acetate, formate, tetraalkylammonium) are from the same table's organic
 * part, recalled (marked). Multivalent ions are per equivalent, as the handbook lists them
 * (½ SO₄²⁻ 80.0): the ion's molar conductivity is |z| λ°.
 * tests/fixtures/reference/ionic-conductivity.csv holds the rows with their sources.
 */
export const IONIC_CONDUCTIVITY_SOURCE =
  'CRC Handbook of Chemistry and Physics, Vanýsek, "Ionic Conductivity and Diffusion at Infinite Dilution", 25 °C';

export interface LimitingConductivityRow {
  /** Canonical formula as lib/chem spells ions ("SO4^2-"). */
  ion: string;
  lambdaSCm2PerMolPerCharge: number;
  recalled?: true;
}

const row = (ion: string, lambda: number, recalled?: true): LimitingConductivityRow =>
  recalled
    ? { ion, lambdaSCm2PerMolPerCharge: lambda, recalled }
    : { ion, lambdaSCm2PerMolPerCharge: lambda };

export const LIMITING_IONIC_CONDUCTIVITY_25C: readonly LimitingConductivityRow[] = [
  // cations
  row("H+", 349.65),
  row("Li+", 38.66),
  row("Na+", 50.08),
  row("K+", 73.48),
  row("Rb+", 77.8),
  row("Cs+", 77.2),
  row("NH4+", 73.5),
  row("Ag+", 61.9),
  row("Tl+", 74.7),
  row("Mg^2+", 53.0),
  row("Ca^2+", 59.47),
  row("Sr^2+", 59.4),
  row("Ba^2+", 63.6),
  row("Be^2+", 45),
  row("Mn^2+", 53.5),
  row("Fe^2+", 54),
  row("Co^2+", 55),
  row("Ni^2+", 49.6),
  row("Cu^2+", 53.6),
  row("Zn^2+", 52.8),
  row("Cd^2+", 54),
  row("Pb^2+", 71),
  row("Fe^3+", 68),
  row("Al^3+", 61),
  row("Cr^3+", 67),
  row("La^3+", 69.7),
  row("Ce^3+", 69.8),
  row("Co(NH3)6^3+", 101.9),
  row("N(CH3)4^+", 44.9, true),
  row("N(C2H5)4^+", 32.6, true),
  row("N(C3H7)4^+", 23.4, true),
  row("N(C4H9)4^+", 19.5, true),
  // anions
  row("OH-", 198),
  row("F-", 55.4),
  row("Cl-", 76.31),
  row("Br-", 78.1),
  row("I-", 76.8),
  row("NO3-", 71.42),
  row("NO2-", 71.8),
  row("ClO4-", 67.3),
  row("ClO3-", 64.6),
  row("BrO3-", 55.7),
  row("IO3-", 40.5),
  row("IO4-", 54.5),
  row("MnO4-", 61.3),
  row("SCN-", 66),
  row("CN-", 78),
  row("HCO3-", 44.5),
  row("CO3^2-", 69.3),
  row("SO4^2-", 80.0),
  row("HSO4-", 52),
  row("SO3^2-", 72),
  row("S2O3^2-", 85),
  row("HS-", 65),
  row("H2PO4-", 36),
  row("HPO4^2-", 57),
  row("PO4^3-", 92.8),
  row("CrO4^2-", 85),
  row("MoO4^2-", 74.5),
  row("WO4^2-", 69),
  row("PF6-", 56.9),
  row("Fe(CN)6^3-", 100.9),
  row("Fe(CN)6^4-", 110.4),
  row("CH3COO-", 40.9, true),
  row("HCOO-", 54.6, true),
  row("C2O4^2-", 74.1, true),
];

/**
 * Conductivity of 0.01 mol/kg KCl, µS/cm, 0–50 °C: NIST primary standards, Wu, Koch & Pratt
 * (1991) J. Res. Natl. Inst. Stand. Technol. 96, 191, as tabulated in the CRC Handbook
 * "Standard KCl Solutions for Calibrating Conductivity Cells" (confirmed in a public copy;
 * tests/fixtures/reference/conductivity-standards.csv). Its ratio to the 25 °C value is the
 * temperature law used for λ° (ionic-conductivity.ts).
 */
export const KCL_0_01_MOLAL_CONDUCTIVITY_US_PER_CM: readonly [number, number][] = [
  [0, 772.92],
  [5, 890.96],
  [10, 1013.95],
  [15, 1141.45],
  [18, 1219.93],
  [20, 1273.03],
  [25, 1408.23],
  [30, 1546.63],
  [35, 1687.79],
  [40, 1831.27],
  [45, 1976.62],
  [50, 2123.43],
];
