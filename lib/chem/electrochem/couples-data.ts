/**
 * Standard reduction potentials E° (V vs SHE, 25 °C, unit activities, 1 bar).
 * Source: CRC Handbook of Chemistry and Physics, 92nd ed. (2011), P. Vanýsek, "Electrochemical
 * Series" (recalled); rows marked `confirmed` agree with tests/fixtures/reference/electrode-potentials.csv,
 * which names the public copy. Formal potentials: Skoog, West, Holler & Crouch, Fundamentals
 * of Analytical Chemistry, appendix "Standard and Formal Electrode Potentials" (the
 * hexacyanoferrate values confirmed, the others recalled).
 *
 * `oxidized`/`reduced` list the species whose activities enter the Nernst equation with
 * their stoichiometric numbers; solids, liquid metals and water (activity 1) are omitted.
 * Gases carry their partial pressure in bar as activity.
 */
export interface CoupleData {
  id: string;
  reaction: string;
  n: number;
  standardPotentialV: number;
  oxidized: Record<string, number>;
  reduced: Record<string, number>;
  confirmed?: true;
  formalPotentials?: { medium: string; potentialV: number }[];
  note?: string;
}

// Source: CRC Handbook of Chemistry and Physics, 92nd ed. (2011), Vanýsek, Electrochemical Series

const c = (
  id: string,
  reaction: string,
  n: number,
  e: number,
  oxidized: Record<string, number>,
  reduced: Record<string, number>,
  more: Partial<CoupleData> = {},
): CoupleData => ({ id, reaction, n, standardPotentialV: e, oxidized, reduced, ...more });

export const COUPLES: readonly CoupleData[] = [
  c("Li+/Li", "Li⁺ + e⁻ ⇌ Li(s)", 1, -3.0401, { "Li+": 1 }, {}),
  c("K+/K", "K⁺ + e⁻ ⇌ K(s)", 1, -2.931, { "K+": 1 }, {}),
  c("Ba2+/Ba", "Ba²⁺ + 2e⁻ ⇌ Ba(s)", 2, -2.912, { "Ba^2+": 1 }, {}, { confirmed: true }),
  c("Ca2+/Ca", "Ca²⁺ + 2e⁻ ⇌ Ca(s)", 2, -2.868, { "Ca^2+": 1 }, {}, { confirmed: true }),
  c("Na+/Na", "Na⁺ + e⁻ ⇌ Na(s)", 1, -2.71, { "Na+": 1 }, {}),
  c("Mg2+/Mg", "Mg²⁺ + 2e⁻ ⇌ Mg(s)", 2, -2.372, { "Mg^2+": 1 }, {}),
  c("Al3+/Al", "Al³⁺ + 3e⁻ ⇌ Al(s)", 3, -1.662, { "Al^3+": 1 }, {}, { confirmed: true }),
  c("H2O/H2,OH-", "2H₂O + 2e⁻ ⇌ H₂(g) + 2OH⁻", 2, -0.8277, {}, { H2: 1, "OH-": 2 }),
  c("Zn2+/Zn", "Zn²⁺ + 2e⁻ ⇌ Zn(s)", 2, -0.7618, { "Zn^2+": 1 }, {}),
  c("Fe2+/Fe", "Fe²⁺ + 2e⁻ ⇌ Fe(s)", 2, -0.447, { "Fe^2+": 1 }, {}),
  c("Cd2+/Cd", "Cd²⁺ + 2e⁻ ⇌ Cd(s)", 2, -0.403, { "Cd^2+": 1 }, {}, { confirmed: true }),
  c("PbSO4/Pb", "PbSO₄(s) + 2e⁻ ⇌ Pb(s) + SO₄²⁻", 2, -0.3588, {}, { "SO4^2-": 1 }),
  c("Co2+/Co", "Co²⁺ + 2e⁻ ⇌ Co(s)", 2, -0.28, { "Co^2+": 1 }, {}),
  c(
    "Ni2+/Ni",
    "Ni²⁺ + 2e⁻ ⇌ Ni(s)",
    2,
    -0.257,
    { "Ni^2+": 1 },
    {},
    { note: "Older tables give −0.230 V." },
  ),
  c("Sn2+/Sn", "Sn²⁺ + 2e⁻ ⇌ Sn(s)", 2, -0.1375, { "Sn^2+": 1 }, {}),
  c("Pb2+/Pb", "Pb²⁺ + 2e⁻ ⇌ Pb(s)", 2, -0.1262, { "Pb^2+": 1 }, {}),
  c("H+/H2", "2H⁺ + 2e⁻ ⇌ H₂(g)", 2, 0, { "H+": 2 }, { H2: 1 }),
  c("HgO/Hg", "HgO(s) + H₂O + 2e⁻ ⇌ Hg(l) + 2OH⁻", 2, 0.0977, {}, { "OH-": 2 }),
  c(
    "Ru(NH3)6 3+/2+",
    "[Ru(NH₃)₆]³⁺ + e⁻ ⇌ [Ru(NH₃)₆]²⁺",
    1,
    0.1,
    { "Ru(NH3)6^3+": 1 },
    { "Ru(NH3)6^2+": 1 },
  ),
  c(
    "Co(NH3)6 3+/2+",
    "[Co(NH₃)₆]³⁺ + e⁻ ⇌ [Co(NH₃)₆]²⁺",
    1,
    0.108,
    { "Co(NH3)6^3+": 1 },
    { "Co(NH3)6^2+": 1 },
  ),
  c("Sn4+/Sn2+", "Sn⁴⁺ + 2e⁻ ⇌ Sn²⁺", 2, 0.151, { "Sn^4+": 1 }, { "Sn^2+": 1 }),
  c("Cu2+/Cu+", "Cu²⁺ + e⁻ ⇌ Cu⁺", 1, 0.153, { "Cu^2+": 1 }, { "Cu+": 1 }),
  c(
    "AgCl/Ag",
    "AgCl(s) + e⁻ ⇌ Ag(s) + Cl⁻",
    1,
    0.22233,
    {},
    { "Cl-": 1 },
    { confirmed: true, note: "E° follows temperature by Bates & Bower (1954)." },
  ),
  c("Hg2Cl2/Hg", "Hg₂Cl₂(s) + 2e⁻ ⇌ 2Hg(l) + 2Cl⁻", 2, 0.26808, {}, { "Cl-": 2 }),
  c("Cu2+/Cu", "Cu²⁺ + 2e⁻ ⇌ Cu(s)", 2, 0.3419, { "Cu^2+": 1 }, {}, { confirmed: true }),
  c(
    "Fe(CN)6 3-/4-",
    "[Fe(CN)₆]³⁻ + e⁻ ⇌ [Fe(CN)₆]⁴⁻",
    1,
    0.358,
    { "Fe(CN)6^3-": 1 },
    { "Fe(CN)6^4-": 1 },
    {
      formalPotentials: [
        { medium: "1 M HCl", potentialV: 0.71 },
        { medium: "1 M HClO4 or H2SO4", potentialV: 0.72 },
      ],
      note: "Ion pairing with K⁺ shifts the measured potential noticeably with supporting electrolyte.",
    },
  ),
  c("O2/OH-", "O₂(g) + 2H₂O + 4e⁻ ⇌ 4OH⁻", 4, 0.401, { O2: 1 }, { "OH-": 4 }, { confirmed: true }),
  c("Cu+/Cu", "Cu⁺ + e⁻ ⇌ Cu(s)", 1, 0.521, { "Cu+": 1 }, {}),
  c("I2/I-", "I₂(s) + 2e⁻ ⇌ 2I⁻", 2, 0.5355, {}, { "I-": 2 }),
  c("I3-/I-", "I₃⁻ + 2e⁻ ⇌ 3I⁻", 2, 0.536, { "I3-": 1 }, { "I-": 3 }),
  c("Hg2SO4/Hg", "Hg₂SO₄(s) + 2e⁻ ⇌ 2Hg(l) + SO₄²⁻", 2, 0.6125, {}, { "SO4^2-": 1 }),
  c(
    "Fe3+/Fe2+",
    "Fe³⁺ + e⁻ ⇌ Fe²⁺",
    1,
    0.771,
    { "Fe^3+": 1 },
    { "Fe^2+": 1 },
    {
      formalPotentials: [
        { medium: "1 M HCl", potentialV: 0.7 },
        { medium: "1 M HClO4", potentialV: 0.732 },
        { medium: "1 M H2SO4", potentialV: 0.68 },
      ],
    },
  ),
  c("Hg2 2+/Hg", "Hg₂²⁺ + 2e⁻ ⇌ 2Hg(l)", 2, 0.7973, { "Hg2^2+": 1 }, {}),
  c("Ag+/Ag", "Ag⁺ + e⁻ ⇌ Ag(s)", 1, 0.7996, { "Ag+": 1 }, {}, { confirmed: true }),
  c("Br2/Br-", "Br₂(aq) + 2e⁻ ⇌ 2Br⁻", 2, 1.0873, { Br2: 1 }, { "Br-": 2 }, { confirmed: true }),
  c("O2/H2O", "O₂(g) + 4H⁺ + 4e⁻ ⇌ 2H₂O", 4, 1.229, { O2: 1, "H+": 4 }, {}, { confirmed: true }),
  c(
    "Cr2O7 2-/Cr3+",
    "Cr₂O₇²⁻ + 14H⁺ + 6e⁻ ⇌ 2Cr³⁺ + 7H₂O",
    6,
    1.232,
    { "Cr2O7^2-": 1, "H+": 14 },
    { "Cr^3+": 2 },
  ),
  c("Cl2/Cl-", "Cl₂(g) + 2e⁻ ⇌ 2Cl⁻", 2, 1.35827, { Cl2: 1 }, { "Cl-": 2 }, { confirmed: true }),
  c(
    "MnO4-/Mn2+",
    "MnO₄⁻ + 8H⁺ + 5e⁻ ⇌ Mn²⁺ + 4H₂O",
    5,
    1.507,
    { "MnO4-": 1, "H+": 8 },
    { "Mn^2+": 1 },
  ),
  c(
    "PbO2/PbSO4",
    "PbO₂(s) + SO₄²⁻ + 4H⁺ + 2e⁻ ⇌ PbSO₄(s) + 2H₂O",
    2,
    1.6913,
    { "SO4^2-": 1, "H+": 4 },
    {},
  ),
  c(
    "Ce4+/Ce3+",
    "Ce⁴⁺ + e⁻ ⇌ Ce³⁺",
    1,
    1.72,
    { "Ce^4+": 1 },
    { "Ce^3+": 1 },
    {
      formalPotentials: [
        { medium: "1 M H2SO4", potentialV: 1.44 },
        { medium: "1 M HNO3", potentialV: 1.61 },
        { medium: "1 M HClO4", potentialV: 1.7 },
      ],
    },
  ),
  c("H2O2/H2O", "H₂O₂ + 2H⁺ + 2e⁻ ⇌ 2H₂O", 2, 1.776, { H2O2: 1, "H+": 2 }, {}),
];

/**
 * E° of AgCl/Ag (V vs SHE) against temperature, the smoothing equation of Bates & Bower (1954)
 * J. Res. Natl. Bur. Stand. 53, 283–290, stated for 0–95 °C (coefficients from memory,
 * tests/fixtures/reference/correlations.md §5; it reproduces their 0–60 °C table within
 * 0.1 mV, electrode-potentials.csv):
 *   E° = 0.23659 − 4.8564e-4 t − 3.4205e-6 t² + 5.869e-9 t³   (t in °C)
 * One continuous function over the whole range (no table edge to jump at).
 */
export const AGCL_BATES_BOWER_1954 = {
  coefficients: [0.23659, -4.8564e-4, -3.4205e-6, 5.869e-9] as const,
  rangeC: { min: 0, max: 95 },
};
