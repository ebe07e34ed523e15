/**
 * Truesdell–Jones parameters (å in ångström, b in kg/mol) for
 *   log10 γ = −A z² √I / (1 + B å √I) + b I
 * Truesdell & Jones (1974), J. Res. U.S. Geol. Surv. 2, 233–248, as tabulated in WATEQ4F
 * (Ball & Nordstrom 1991, U.S. Geol. Surv. Open-File Rep. 91-183), `-gamma a b` entries
 * (tests/fixtures/reference/ion-size.csv, confirmed). b = 0 marks ions for which WATEQ4F uses the
 * plain extended equation with its own å.
 */
// Source: Truesdell & Jones (1974) J. Res. USGS 2, 233–248; parameters of WATEQ4F (Ball & Nordstrom 1991)

export const TRUESDELL_JONES_PARAMETERS: Readonly<
  Record<string, { aAngstrom: number; b: number }>
> = {
  "H+": { aAngstrom: 9, b: 0 },
  "Li+": { aAngstrom: 6, b: 0 },
  "Na+": { aAngstrom: 4, b: 0.075 },
  "K+": { aAngstrom: 3.5, b: 0.015 },
  "Cu+": { aAngstrom: 2.5, b: 0 },
  "Mg^2+": { aAngstrom: 5.5, b: 0.2 },
  "Ca^2+": { aAngstrom: 5, b: 0.165 },
  "Sr^2+": { aAngstrom: 5.26, b: 0.121 },
  "Ba^2+": { aAngstrom: 5, b: 0 },
  "Mn^2+": { aAngstrom: 6, b: 0 },
  "Fe^2+": { aAngstrom: 6, b: 0 },
  "Cu^2+": { aAngstrom: 6, b: 0 },
  "Zn^2+": { aAngstrom: 6, b: 0 },
  "Al^3+": { aAngstrom: 9, b: 0 },
  "Fe^3+": { aAngstrom: 9, b: 0 },
  "Cl-": { aAngstrom: 3.5, b: 0.015 },
  "F-": { aAngstrom: 3.5, b: 0 },
  "OH-": { aAngstrom: 3.5, b: 0 },
  "NO3-": { aAngstrom: 3, b: 0 },
  "HCO3-": { aAngstrom: 5.4, b: 0 },
  "HSO4-": { aAngstrom: 4.5, b: 0 },
  "HS-": { aAngstrom: 3.5, b: 0 },
  "H2PO4-": { aAngstrom: 5.4, b: 0 },
  "CO3^2-": { aAngstrom: 5.4, b: 0 },
  "SO4^2-": { aAngstrom: 5, b: -0.04 },
  "HPO4^2-": { aAngstrom: 5, b: 0 },
  "S^2-": { aAngstrom: 5, b: 0 },
  "PO4^3-": { aAngstrom: 5, b: 0 },
};
